package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.locationtech.jts.geom.Envelope;
import org.streetcomb.ExternalTool;
import org.streetcomb.cli.Main;

/**
 * A feature's id is the FID desktop GIS shows for it, so "feature 908" in a message is the feature a user
 * finds as FID 908. The reference is GDAL (an outside reader): {@code ogr2ogr -preserve_fid} writes every
 * feature with its FID as the GeoJSON id, transformed to WGS 84 by PROJ. Each of our features must sit where
 * GDAL's feature of the same id sits (the centres of their boxes within {@link #METRES}); neighbouring
 * features lie farther apart than that, so an id off by one fails. Layers: the shapefile and GeoPackage
 * fixtures (OpenStreetMap and City of Mesa data, NOTICE) and a GeoJSON layer without ids.
 */
class FeatureIdGdalTest {

    /** Agreement of two transformations of the same coordinates (SIS and PROJ pick the same datum shifts). */
    private static final double METRES = 10;
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    static Stream<Arguments> layers() {
        return Stream.of(
                Arguments.of("fixtures/shapefiles/aurich-dhdn-gk2/roads.shp", null),
                Arguments.of("fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp", null),
                Arguments.of("fixtures/geopackage/mesa.gpkg", null),
                Arguments.of("fixtures/geopackage/mesa-two-layers.gpkg", "south_part"));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("layers")
    void everyIdIsTheFidGdalShows(String layer, String table) throws Exception {
        Map<String, Envelope> gdal = gdalBoxes(layer, table);
        Map<String, Envelope> ours = ourBoxes(LayerReaders.read(Path.of(layer),
                table == null ? ReadOptions.DEFAULTS : ReadOptions.DEFAULTS.withLayer(table)));
        assertSamePlaces(layer, gdal, ours);
    }

    @Test
    void aGeoJsonLayerWithoutIdsCountsFromZeroAsGdalDoes() throws Exception {
        JsonNode seoul = JSON.readTree(Path.of("fixtures/real/roads-seoul.geojson").toFile());
        for (JsonNode feature : seoul.get("features")) {
            ((ObjectNode) feature).remove("id");
        }
        Path layer = dir.resolve("no-ids.geojson");
        JSON.writeValue(layer.toFile(), seoul);
        Map<String, Envelope> ours = ourBoxes(LayerReaders.read(layer));
        assertTrue(ours.containsKey("0"), "the first feature is FID 0");
        assertSamePlaces(layer.toString(), gdalBoxes(layer.toString(), null), ours);
    }

    /** The ids in `health` findings are GDAL's FIDs too: each finding's place lies on its features. */
    @Test
    void healthFindingsNameTheFeaturesGdalShows() throws Exception {
        String layer = "fixtures/shapefiles/aurich-dhdn-gk2/roads.shp";
        Map<String, Envelope> gdal = gdalBoxes(layer, null);
        StringWriter out = new StringWriter();
        assertEquals(0, Main.run(new String[] {"health", layer, "--json"}, new PrintWriter(out, true),
                new PrintWriter(new StringWriter(), true)));
        int checked = 0;
        for (JsonNode finding : JSON.readTree(out.toString()).get("findings")) {
            double lon = finding.at("/at/0").asDouble();
            double lat = finding.at("/at/1").asDouble();
            if (finding.get("kind").asText().equals("separate_part")) {
                continue; // placed at the part's middle, not on a named feature
            }
            for (JsonNode id : finding.get("feature_ids")) {
                Envelope box = new Envelope(gdal.get(id.asText()));
                double pad = METRES / 111_320;
                box.expandBy(pad / Math.cos(Math.toRadians(lat)), pad);
                assertTrue(box.contains(lon, lat), finding.get("problem").asText() + ": not on GDAL's FID " + id);
                checked++;
            }
        }
        assertTrue(checked >= 5, "findings checked: " + checked);
    }

    /** The option naming an id field: each id is that field's value on the feature GDAL shows. */
    @Test
    void theIdFieldGivesTheFieldsValue() throws Exception {
        Path layer = Path.of("fixtures/geopackage/mesa.gpkg");
        List<RoadFeature> byFid = LayerReaders.read(layer).features();
        List<RoadFeature> byField = LayerReaders.read(layer, ReadOptions.DEFAULTS.withIdField("ID")).features();
        JsonNode gdal = gdalFeatures(layer.toString(), null);
        Map<String, Double> fieldByFid = new HashMap<>();
        for (JsonNode feature : gdal.get("features")) {
            fieldByFid.put(feature.get("id").asText(), feature.at("/properties/ID").asDouble());
        }
        assertEquals(byFid.size(), byField.size());
        for (int i = 0; i < byFid.size(); i++) {
            assertEquals(fieldByFid.get(byFid.get(i).id()), Double.parseDouble(byField.get(i).id()), 0,
                    "FID " + byFid.get(i).id());
        }
    }

    private static void assertSamePlaces(String layer, Map<String, Envelope> gdal, Map<String, Envelope> ours) {
        assertTrue(ours.size() >= 0.95 * gdal.size(), layer + ": " + ours.size() + " of " + gdal.size() + " features read");
        List<String> wrong = new ArrayList<>();
        for (Map.Entry<String, Envelope> e : ours.entrySet()) {
            Envelope theirs = gdal.get(e.getKey());
            if (theirs == null || metres(theirs.centre().x, theirs.centre().y, e.getValue().centre().x,
                    e.getValue().centre().y) > METRES) {
                wrong.add(e.getKey());
            }
        }
        assertEquals(List.of(), wrong.subList(0, Math.min(10, wrong.size())), layer + ": " + wrong.size()
                + " ids whose feature is not where GDAL's feature of that FID is");
    }

    private static Map<String, Envelope> ourBoxes(RoadLayer layer) {
        Map<String, Envelope> boxes = new HashMap<>();
        for (RoadFeature f : layer.features()) {
            boxes.computeIfAbsent(f.id(), id -> new Envelope()).expandToInclude(f.line().getEnvelopeInternal());
        }
        return boxes;
    }

    private Map<String, Envelope> gdalBoxes(String layer, String table) throws Exception {
        Map<String, Envelope> boxes = new HashMap<>();
        for (JsonNode feature : gdalFeatures(layer, table).get("features")) {
            Envelope box = new Envelope();
            addPositions(feature.at("/geometry/coordinates"), box);
            boxes.put(feature.get("id").asText(), box);
        }
        return boxes;
    }

    private static void addPositions(JsonNode node, Envelope box) {
        if (node.isArray() && node.size() >= 2 && node.get(0).isNumber()) {
            box.expandToInclude(node.get(0).asDouble(), node.get(1).asDouble());
        } else if (node.isArray()) {
            node.forEach(child -> addPositions(child, box));
        }
    }

    private JsonNode gdalFeatures(String layer, String table) throws IOException, InterruptedException {
        Path out = Files.createTempFile(dir, "gdal", ".geojson");
        Files.delete(out);
        List<String> command = new ArrayList<>(List.of("ogr2ogr", "-f", "GeoJSON", out.toString(), layer));
        if (table != null) {
            command.add(table);
        }
        command.addAll(List.of("-t_srs", "EPSG:4326", "-preserve_fid"));
        ExternalTool.run(command.toArray(new String[0]));
        return JSON.readTree(out.toFile());
    }

    private static double metres(double lon1, double lat1, double lon2, double lat2) {
        double dy = (lat2 - lat1) * 111_320;
        double dx = (lon2 - lon1) * 111_320 * Math.cos(Math.toRadians((lat1 + lat2) / 2));
        return Math.hypot(dx, dy);
    }
}
