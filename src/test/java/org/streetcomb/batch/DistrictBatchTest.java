package org.streetcomb.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.streetcomb.ExternalTool;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.Place;
import org.streetcomb.read.PlaceLayerReader;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;

/**
 * The batch over 20 invented districts tiling part of the Baltimore OpenStreetMap extract (fixtures/osm,
 * ODbL): the districts' service plus what one-way streets cut off equals the length of the streets inside
 * them as JTS's overlay clip gives it (an outside reference, lengths by GeographicLib); one and two threads
 * write the same files; bad areas each get a line and the rest are planned.
 */
class DistrictBatchTest {

    private static final Path ROADS = Path.of("fixtures/osm/baltimore.osm.pbf");
    private static final Path DISTRICTS = Path.of("fixtures/areas/baltimore-districts.geojson");
    private static final Path BAD = Path.of("fixtures/areas/baltimore-bad-areas.geojson");

    private static List<DistrictBatch.Row> run(Path areas, Path out, int threads, String depotField) {
        return DistrictBatch.run(new DistrictBatch.Request(ROADS, ReadOptions.DEFAULTS, areas,
                PlaceLayerReader.read(areas, null, null), depotField, 1000, true, out, threads), line -> { });
    }

    /**
     * Depots from a point layer: the area holding a point is planned from it, exactly as when the same point
     * is its depot attribute; an area holding none gets a line of its own and the others go on.
     */
    /**
     * Each planned area's folder holds its report and picture beside the tour, GPX and sheet, and index.html
     * maps every area with its figures (the per-area files and the index, issue 17).
     */
    @Test
    void eachAreaHasItsReportAndTheBatchAnIndexMap(@TempDir Path tmp) throws IOException {
        List<DistrictBatch.Row> rows = run(DISTRICTS, tmp, 2, null);
        for (DistrictBatch.Row row : rows) {
            if (row.status().equals("planned")) {
                Path folder;
                try (java.util.stream.Stream<Path> folders = Files.list(tmp)) {
                    folder = folders.filter(f -> f.getFileName().toString().startsWith(String.format("%03d-", row.index())))
                            .findFirst().orElseThrow();
                }
                for (String file : new String[] {"tour.geojson", "tour.gpx", "directions.html", "report.html", "map.png"}) {
                    assertTrue(Files.size(folder.resolve(file)) > 0, folder + "/" + file);
                }
            }
        }
        String index = Files.readString(tmp.resolve("index.html"));
        for (DistrictBatch.Row row : rows) {
            assertTrue(index.contains(row.label()), "index.html names " + row.label());
        }
        long planned = rows.stream().filter(r -> r.status().equals("planned")).count();
        assertTrue(index.contains("Planned areas (" + planned + ")"), "the index's legend counts the planned areas");
    }

    @Test
    void depotsFromAPointLayerAreTheAreasDepots(@TempDir Path tmp) throws IOException {
        List<Place> areas = PlaceLayerReader.read(DISTRICTS, null, null);
        org.locationtech.jts.geom.Point inside = areas.get(0).geometry().getInteriorPoint();
        double[] depot = {inside.getX(), inside.getY()};
        List<DistrictBatch.Row> byLayer = DistrictBatch.run(new DistrictBatch.Request(ROADS, ReadOptions.DEFAULTS, DISTRICTS,
                areas, null, 1000, true, tmp.resolve("layer"), 2, List.of(depot)), line -> { });
        String withField = Files.readString(DISTRICTS).replaceFirst("\"name\": ?\"Ash District\"",
                String.format(java.util.Locale.ROOT, "\"name\":\"Ash District\",\"depot\":\"%.9f,%.9f\"", depot[0], depot[1]));
        assertTrue(withField.contains("\"depot\":"), "the attribute was written");
        Path fielded = tmp.resolve("fielded.geojson");
        Files.writeString(fielded, withField);
        List<DistrictBatch.Row> byField = run(fielded, tmp.resolve("field"), 2, "depot");
        assertEquals("planned", byLayer.get(0).status(), byLayer.get(0).message());
        assertEquals(byField.get(0).serviceKm(), byLayer.get(0).serviceKm(), 1e-9);
        assertEquals(byField.get(0).deadheadKm(), byLayer.get(0).deadheadKm(), 1e-9);
        for (DistrictBatch.Row row : byLayer.subList(1, byLayer.size())) {
            assertTrue(row.message().contains("no point of the depot layer lies in the area"), row.message());
        }
    }

    /**
     * GDAL as the outside reference for the cut: the road lines the reader keeps are written as GeoJSON, each
     * planned district's are clipped by {@code ogr2ogr -clipsrc} and measured on the ellipsoid by GDAL's SQLite
     * dialect ({@code ST_Length(geometry, 1)}, SpatiaLite); their sum must equal the districts' service plus
     * left-out length to 0.2 % (streets drawn exactly along a shared border count in both clips, once in the
     * batch).
     */
    @Test
    void districtsServiceWhatGdalClipsInsideThem(@TempDir Path tmp) throws IOException, InterruptedException {
        gdalAgrees(ROADS, DISTRICTS, tmp);
    }

    /**
     * The largest OpenStreetMap extract of the shared collection (Andorra, 4,764 highway ways; fixtures/osm,
     * ODbL) cut into twenty invented zones: every zone is planned or fails with its own line (zones over the
     * mountains hold no street), and the planned ones service what GDAL clips inside them.
     */
    @Test
    void theLargestSharedExtractInTwentyZones(@TempDir Path tmp) throws IOException, InterruptedException {
        List<DistrictBatch.Row> rows = gdalAgrees(Path.of("fixtures/osm/andorra.osm.pbf"),
                Path.of("fixtures/areas/andorra-zones.geojson"), tmp);
        assertEquals(20, rows.size());
        assertTrue(rows.stream().filter(r -> r.status().equals("planned")).count() >= 12, "zones planned");
        rows.stream().filter(r -> !r.status().equals("planned"))
                .forEach(r -> assertTrue(r.message().contains("no street to service inside the area"), r.message()));
    }

    private static List<DistrictBatch.Row> gdalAgrees(Path roadLayer, Path districts, Path tmp)
            throws IOException, InterruptedException {
        List<DistrictBatch.Row> rows = DistrictBatch.run(new DistrictBatch.Request(roadLayer, ReadOptions.DEFAULTS,
                districts, PlaceLayerReader.read(districts, null, null), null, 1000, true, tmp.resolve("out"), 2), line -> { });
        StringBuilder geojson = new StringBuilder("{\"type\":\"FeatureCollection\",\"features\":[");
        List<RoadFeature> roads = LayerReaders.read(roadLayer).features();
        for (int i = 0; i < roads.size(); i++) {
            geojson.append(i == 0 ? "" : ",").append("{\"type\":\"Feature\",\"properties\":{},\"geometry\":{"
                    + "\"type\":\"LineString\",\"coordinates\":[");
            Coordinate[] c = roads.get(i).line().getCoordinates();
            for (int k = 0; k < c.length; k++) {
                geojson.append(k == 0 ? "" : ",").append('[').append(c[k].x).append(',').append(c[k].y).append(']');
            }
            geojson.append("]}}");
        }
        Path lines = tmp.resolve("roads.geojson");
        Files.writeString(lines, geojson.append("]}"));
        List<Place> areas = PlaceLayerReader.read(districts, null, null);
        double clipped = 0;
        double planned = 0;
        for (int a = 0; a < areas.size(); a++) {
            if (!rows.get(a).status().equals("planned")) {
                continue;
            }
            planned += (rows.get(a).serviceKm() + rows.get(a).leftOutKm()) * 1000;
            Path inside = tmp.resolve("inside-" + a + ".geojson");
            ExternalTool.run("ogr2ogr", "-f", "GeoJSON", "-clipsrc", areas.get(a).geometry().toText(), inside.toString(),
                    lines.toString());
            String sum = ExternalTool.run("ogrinfo", "-dialect", "SQLite", "-sql",
                    "SELECT SUM(ST_Length(geometry, 1)) AS metres FROM roads", inside.toString());
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("metres \\(Real\\) = ([0-9.eE+-]+)").matcher(sum);
            if (m.find()) {
                clipped += Double.parseDouble(m.group(1));
            }
        }
        assertTrue(clipped > 0, "GDAL measured the clipped streets");
        assertEquals(clipped, planned, clipped * 2e-3, districts + ": service = GDAL's clipped street length");
        return rows;
    }

    @Test
    void districtsServiceEveryStreetInsideThemOnceAndThreadsDoNotChangeTheFiles(@TempDir Path tmp) throws IOException {
        List<DistrictBatch.Row> rows = run(DISTRICTS, tmp.resolve("one"), 1, null);
        run(DISTRICTS, tmp.resolve("two"), 2, null);
        assertEquals(20, rows.size());
        // an area whose every street one-way streets cut off (a harbour-side district) is failed, never half-planned
        rows.stream().filter(r -> !r.status().equals("planned"))
                .forEach(r -> assertTrue(r.message().contains("one-way streets cut off"), r.message()));
        assertTrue(rows.stream().filter(r -> r.status().equals("planned")).count() >= 18);
        double planned = rows.stream().mapToDouble(r -> r.serviceKm() + r.leftOutKm()).sum() * 1000;
        double clipped = 0;
        List<RoadFeature> roads = LayerReaders.read(ROADS).features();
        List<Place> areas = PlaceLayerReader.read(DISTRICTS, null, null);
        for (int a = 0; a < areas.size(); a++) {
            Place area = areas.get(a);
            if (!rows.get(a).status().equals("planned")) {
                continue;
            }
            for (RoadFeature f : roads) {
                if (f.line().getEnvelopeInternal().intersects(area.geometry().getEnvelopeInternal())) {
                    clipped += geodesic(f.line().intersection(area.geometry()));
                }
            }
        }
        // a street drawn exactly along a shared border is counted by the clip in both districts, by the batch once
        assertEquals(clipped, planned, clipped * 2e-3, "districts' service = clipped street length");
        assertEquals(files(tmp.resolve("one")), files(tmp.resolve("two")));
        for (String name : files(tmp.resolve("one"))) {
            assertTrue(Arrays.equals(Files.readAllBytes(tmp.resolve("one").resolve(name)),
                    Files.readAllBytes(tmp.resolve("two").resolve(name))), name);
        }
    }

    @Test
    void badAreasGetALineEachAndTheRestArePlanned(@TempDir Path tmp) {
        List<DistrictBatch.Row> rows = run(BAD, tmp, 2, "depot");
        assertEquals(List.of(rows.get(0).status(), rows.get(1).status(), "failed", "failed", "failed", "failed", "failed"),
                rows.stream().map(DistrictBatch.Row::status).toList(), rows.toString());
        assertTrue(rows.get(2).message().contains("not a polygon"), rows.get(2).message());
        assertTrue(rows.get(3).message().contains("no street to service"), rows.get(3).message());
        assertTrue(rows.get(4).message().contains("no street to service"), rows.get(4).message());
        assertTrue(rows.get(5).message().contains("outside the area"), rows.get(5).message());
        assertTrue(rows.get(6).message().contains("not a valid polygon"), rows.get(6).message());
    }

    private static double geodesic(Geometry lines) {
        double sum = 0;
        for (int g = 0; g < lines.getNumGeometries(); g++) {
            Geometry part = lines.getGeometryN(g);
            Coordinate[] c = part.getCoordinates();
            for (int k = 0; k + 1 < c.length && part.getDimension() == 1; k++) {
                sum += Geodesic.WGS84.Inverse(c[k].y, c[k].x, c[k + 1].y, c[k + 1].x).s12;
            }
        }
        return sum;
    }

    private static List<String> files(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).map(p -> root.relativize(p).toString()).sorted().toList();
        }
    }
}
