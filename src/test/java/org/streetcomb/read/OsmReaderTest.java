package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.stream.Collectors;
import org.apache.commons.compress.compressors.bzip2.BZip2CompressorInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;

/**
 * OpenStreetMap extracts against GDAL's OSM driver (ogrinfo, the independent reader): the number of
 * driveable ways and their total geodesic length (SpatiaLite ST_Length on the ellipsoid). The fixtures
 * are real extracts listed in NOTICE.
 */
class OsmReaderTest {

    private static final String DRIVE_CLASSES = "'motorway','motorway_link','trunk','trunk_link','primary',"
            + "'primary_link','secondary','secondary_link','tertiary','tertiary_link','unclassified','residential',"
            + "'living_street','service'";

    @TempDir
    Path dir;

    /** Drive with service roads and private access, so the selection is the road classes alone. */
    private static ReadOptions everyDriveClass() {
        return ReadOptions.DEFAULTS.withRoads(TravelMode.DRIVE, true, true);
    }

    @ParameterizedTest
    @CsvSource({"fixtures/osm/aguascalientes.osm.pbf", "fixtures/osm/aguascalientes.osm.bz2",
        "fixtures/osm/West-Oakland.osm.bz2", "fixtures/osm/baltimore.osm.pbf"})
    void matchesGdal(String path) throws IOException {
        Path file = Path.of(path);
        RoadLayer layer = LayerReaders.read(file, everyDriveClass());
        Path plain = file;
        if (path.endsWith(".bz2")) { // GDAL's OSM driver reads plain XML or PBF
            plain = dir.resolve("plain.osm");
            try (InputStream in = new BZip2CompressorInputStream(Files.newInputStream(file))) {
                Files.copy(in, plain);
            }
        }
        String gdal = Gdal.ogrinfo("-dialect", "SQLite", "-sql", "SELECT COUNT(*) AS n, SUM(ST_Length(GEOMETRY, 1)) AS metres"
                + " FROM lines WHERE highway IN (" + DRIVE_CLASSES + ")", plain.toString());
        Set<String> ways = layer.features().stream().map(RoadFeature::id).collect(Collectors.toSet());
        assertEquals((int) Gdal.number(gdal, "n"), ways.size());
        double metres = new NetworkBuilder(0.5).build(layer).totalLength();
        assertEquals(Gdal.number(gdal, "metres"), metres, 1e-6 * metres);
    }

    @Test
    void waysMeetOnlyAtSharedNodes() {
        // Baltimore's extract lists relations before ways (SOURCES.md), and has motorway bridges over
        // streets: joining by node id must give no more junctions than OSM has shared nodes.
        RoadLayer layer = LayerReaders.read(Path.of("fixtures/osm/baltimore.osm.pbf"), everyDriveClass());
        StreetNetwork byIds = new NetworkBuilder(0.5).build(layer);
        StreetNetwork byGeometry = new NetworkBuilder(0.5).build(layer.features());
        assertEquals(layer.features().size(), byIds.edgeCount());
        assertTrue(byGeometry.edgeCount() > byIds.edgeCount(),
                "geometric noding adds false junctions at crossings: " + byGeometry.edgeCount() + " vs " + byIds.edgeCount());
    }

    @Test
    void countsWaysCutAtTheExtractEdge() {
        // SOURCES.md: about 190 highway ways of the Helsinki extract reference nodes not in the file
        RoadLayer layer = LayerReaders.read(Path.of("fixtures/osm/Helsinki.osm.pbf"), everyDriveClass());
        assertEquals(1, layer.report().notes().size(), layer.report().notes().toString());
        assertTrue(layer.report().notes().getOrDefault("ways cut where their nodes are missing from the extract", 0) > 0);
    }

    @Test
    void pbfAndXmlOfTheSameDataAgree() {
        // SOURCES.md: the Aguascalientes .osm.pbf and .osm.bz2 hold the same data
        RoadLayer pbf = LayerReaders.read(Path.of("fixtures/osm/aguascalientes.osm.pbf"));
        RoadLayer xml = LayerReaders.read(Path.of("fixtures/osm/aguascalientes.osm.bz2"));
        assertEquals(pbf.report(), xml.report());
        assertEquals(pbf.features().stream().map(f -> f.id() + f.travel() + f.line()).toList(),
                xml.features().stream().map(f -> f.id() + f.travel() + f.line()).toList());
    }
}
