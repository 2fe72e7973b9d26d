package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.provider.CsvSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.Travel;
import org.streetcomb.read.TravelMode;

/**
 * Grade separation on geometric lines against OpenStreetMap's own topology (the outside reference): the
 * Baltimore extract's streets, read as plain lines (whole ways, geometry only), must join at shared
 * vertices into exactly the network that OSM's shared node ids give, bridges and tunnels apart; plain
 * noding at crossings must not.
 */
class SharedVertexJoinTest {

    @Test
    void sharedVerticesReproduceOsmTopology() {
        RoadLayer osm = LayerReaders.read(Path.of("fixtures/osm/baltimore.osm.pbf"),
                ReadOptions.DEFAULTS.withRoads(TravelMode.DRIVE, true, true));
        StreetNetwork reference = new NetworkBuilder(0.01).build(osm);

        RoadLayer lines = new RoadLayer(osm.source(), wholeWays(osm.features()), osm.report());
        StreetNetwork joined = new NetworkBuilder(0.01).build(lines.gradeSeparated(null));
        StreetNetwork noded = new NetworkBuilder(0.01).build(lines.features());

        assertEquals(reference.nodeCount(), joined.nodeCount());
        assertEquals(reference.edgeCount(), joined.edgeCount());
        assertEquals(reference.totalLength(), joined.totalLength(), 1e-6 * reference.totalLength());
        assertTrue(noded.nodeCount() > reference.nodeCount(), "crossings add junctions that OSM does not have");
    }

    @ParameterizedTest
    @CsvSource({"'', 4", "layer, 2"})
    void levelsKeepABridgeOffTheStreetItCrosses(String levelField, int edges) {
        // common practice: a bridge (layer 1) drawn through a vertex of the street below (layer 0) does not
        // meet it there; it meets the network where it ends
        GeometryFactory g = new GeometryFactory();
        RoadFeature street = line(g, "0", -31.20, 44.60, -31.19, 44.60, -31.18, 44.60);
        RoadFeature bridge = line(g, "1", -31.19, 44.59, -31.19, 44.60, -31.19, 44.61);
        RoadLayer layer = new RoadLayer(Path.of("bridge.geojson"), List.of(street, bridge), null)
                .gradeSeparated(levelField.isEmpty() ? null : levelField);
        assertEquals(edges, new NetworkBuilder(0.5).build(layer).edgeCount());
    }

    private static RoadFeature line(GeometryFactory g, String level, double... lonLat) {
        Coordinate[] c = new Coordinate[lonLat.length / 2];
        for (int i = 0; i < c.length; i++) {
            c[i] = new Coordinate(lonLat[2 * i], lonLat[2 * i + 1]);
        }
        return new RoadFeature(level, "", g.createLineString(c), Travel.BOTH, true, Map.of("layer", level));
    }

    /** The pieces of each way merged back into one line per way, in order, as a geometric layer holds it. */
    private static List<RoadFeature> wholeWays(List<RoadFeature> pieces) {
        Map<String, List<RoadFeature>> byWay = new LinkedHashMap<>();
        for (RoadFeature piece : pieces) {
            byWay.computeIfAbsent(piece.id(), k -> new ArrayList<>()).add(piece);
        }
        List<RoadFeature> ways = new ArrayList<>();
        for (List<RoadFeature> parts : byWay.values()) {
            List<Coordinate> coords = new ArrayList<>();
            RoadFeature first = parts.get(0);
            for (RoadFeature part : parts) {
                LineString line = part.line();
                boolean continues = !coords.isEmpty() && coords.get(coords.size() - 1).equals2D(line.getCoordinateN(0));
                if (!continues && !coords.isEmpty()) { // a way cut where its nodes are missing: keep runs apart
                    ways.add(feature(first, coords));
                    coords = new ArrayList<>();
                }
                for (int i = coords.isEmpty() ? 0 : 1; i < line.getNumPoints(); i++) {
                    coords.add(line.getCoordinateN(i));
                }
            }
            ways.add(feature(first, coords));
        }
        return ways;
    }

    private static RoadFeature feature(RoadFeature like, List<Coordinate> coords) {
        LineString line = like.line().getFactory().createLineString(coords.toArray(new Coordinate[0]));
        return new RoadFeature(like.id(), like.name(), line, like.travel(), like.required(), like.properties());
    }
}
