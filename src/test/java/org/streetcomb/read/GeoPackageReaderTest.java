package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.network.GeodesicLength;

/**
 * The Mesa streets as a GeoPackage (written by GDAL's ogr2ogr from the shapefile fixture, see NOTICE)
 * against GDAL's ogrinfo, the independent reader: feature count and total geodesic length in WGS 84
 * (SpatiaLite's ST_Length on the ellipsoid, through GDAL's SQLite dialect); and against the shapefile
 * reader on the same data. The CRS comes from the file's gpkg_spatial_ref_sys, not from --crs.
 */
class GeoPackageReaderTest {

    private static final Path MESA = Path.of("fixtures/geopackage/mesa.gpkg");

    @TempDir
    Path dir;

    /**
     * A GeoPackage in write-ahead-log mode (SQLite's WAL journal, which GIS programs often leave set) is read
     * without leaving -wal and -shm files beside it or changing it (hostile corpus, issue 14).
     */
    @Test
    void aGeoPackageInWalModeIsLeftAsItWas() throws Exception {
        Path gpkg = dir.resolve("wal.gpkg");
        Files.copy(Path.of("fixtures/geopackage/mesa.gpkg"), gpkg);
        try (java.sql.Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + gpkg);
             java.sql.Statement s = c.createStatement()) {
            s.execute("PRAGMA journal_mode=WAL");
        }
        java.util.Map<String, String> before = org.streetcomb.FolderHashes.of(dir);
        assertEquals(java.util.Set.of("wal.gpkg"), before.keySet(), "WAL set and the connection closed cleanly");
        // SQLite file format: bytes 18 and 19 of the header are 2 for WAL (sqlite.org/fileformat2.html)
        assertEquals(2, Files.readAllBytes(gpkg)[18], "the copy is in WAL mode");
        assertEquals(293, LayerReaders.read(gpkg).features().size());
        assertEquals(before, org.streetcomb.FolderHashes.of(dir), "no -wal or -shm left, the file unchanged");
    }

    @Test
    void matchesGdalAndTheShapefile() {
        RoadLayer layer = LayerReaders.read(MESA);
        String gdal = Gdal.ogrinfo("-dialect", "SQLite", "-sql", "SELECT COUNT(*) AS n, "
                + "SUM(ST_Length(ST_Transform(geom, 4326), 1)) AS metres FROM streets", MESA.toString());

        assertEquals((int) Gdal.number(gdal, "n"), layer.report().featuresRead());
        double metres = length(layer);
        // datum shifts differ slightly between PROJ and SIS; lengths agree far closer than 1 in 10,000
        assertEquals(Gdal.number(gdal, "metres"), metres, 1e-4 * metres);

        RoadLayer shapefile = LayerReaders.read(Path.of("fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp"),
                ReadOptions.DEFAULTS.withCrs("EPSG:2223"));
        assertEquals(shapefile.features().size(), layer.features().size());
        assertEquals(length(shapefile), metres, 1e-6 * metres);
        assertEquals(shapefile.features().get(0).properties().keySet(),
                layer.features().get(0).properties().keySet().stream().filter(k -> !k.equals("fid"))
                        .collect(Collectors.toSet()));
    }

    @Test
    void readingAWalModeGeoPackageLeavesNothingBeside() throws Exception {
        // a copy of the fixture switched to write-ahead-log mode by the SQLite JDBC driver; read-only opening
        // once left streets.gpkg-wal and streets.gpkg-shm beside it
        Path gpkg = dir.resolve("streets.gpkg");
        Files.copy(MESA, gpkg);
        try (var db = java.sql.DriverManager.getConnection("jdbc:sqlite:" + gpkg);
             var sql = db.createStatement(); var rs = sql.executeQuery("PRAGMA journal_mode=WAL")) {
            assertEquals("wal", rs.getString(1));
        }
        assertEquals(java.util.List.of(gpkg), java.util.List.of(Files.list(dir).toArray()));
        byte[] before = Files.readAllBytes(gpkg);
        int features = LayerReaders.read(gpkg).report().featuresRead();
        assertEquals(LayerReaders.read(MESA).report().featuresRead(), features);
        PlaceLayerReader.read(gpkg, null, null);
        try (var files = Files.list(dir)) {
            assertEquals(java.util.List.of(gpkg), files.toList());
        }
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(gpkg)));
    }

    /**
     * A GeoPackage with two line layers (two parts of the Mesa streets, split by ogr2ogr, see NOTICE):
     * --layer reads the one named, with the feature count and length ogrinfo gives for that table.
     */
    @Test
    void readsTheNamedLayerOfSeveral() {
        Path two = Path.of("fixtures/geopackage/mesa-two-layers.gpkg");
        for (String table : new String[] {"north_part", "south_part"}) {
            RoadLayer layer = LayerReaders.read(two, ReadOptions.DEFAULTS.withLayer(table));
            String gdal = Gdal.ogrinfo("-dialect", "SQLite", "-sql", "SELECT COUNT(*) AS n, "
                    + "SUM(ST_Length(ST_Transform(geom, 4326), 1)) AS metres FROM " + table, two.toString());
            assertEquals((int) Gdal.number(gdal, "n"), layer.report().featuresRead(), table);
            assertEquals(Gdal.number(gdal, "metres"), length(layer), 1e-4 * length(layer), table);
        }
        Refusals.assertRefused(dir, two, "several line layers (north_part, south_part): name the road layer with --layer");
        Refusals.assertRefused(dir, two, "no line layer named roads; its line layers: north_part, south_part",
                "--layer=roads");
        Refusals.assertRefused(dir, Path.of("fixtures/demo/brackenford.geojson"), "--layer does not apply",
                "--layer=streets");
    }

    @Test
    void refusesAFileThatIsNotAGeoPackage() throws IOException {
        Path fake = dir.resolve("roads.gpkg");
        Files.writeString(fake, "not a database\n".repeat(200));
        Refusals.assertRefused(dir, fake, "roads.gpkg: not a GeoPackage");
    }

    private static double length(RoadLayer layer) {
        double sum = 0;
        for (RoadFeature f : layer.features()) {
            var c = f.line().getCoordinates();
            for (int i = 1; i < c.length; i++) {
                sum += GeodesicLength.between(c[i - 1].x, c[i - 1].y, c[i].x, c[i].y);
            }
        }
        return sum;
    }
}
