package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * Cutting edges into pieces, checked against GeographicLib's own geodesic inverse (Karney 2013), computed
 * here point by point on the pieces' polylines and independently of the class under test. Invented lines
 * near the demo town.
 */
class SplitNetworkTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private static RoadFeature line(String id, Travel travel, double... lonLat) {
        Coordinate[] c = new Coordinate[lonLat.length / 2];
        for (int i = 0; i < c.length; i++) {
            c[i] = new Coordinate(lonLat[2 * i], lonLat[2 * i + 1]);
        }
        return new RoadFeature(id, "Street " + id, GEOMETRY.createLineString(c), travel, true, Map.of());
    }


    @Test
    void piecesAddUpToTheEdgeAndEachCutLiesAtItsOffset() {
        // a bent one-way line of three segments (about 160, 150 and 120 m), and a two-way line joining its ends
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                line("a", Travel.FORWARD, -31.2, 44.6, -31.198, 44.6003, -31.1965, 44.6014, -31.1955, 44.6023),
                line("b", Travel.BOTH, -31.1955, 44.6023, -31.2, 44.6)));
        int bent = network.feature(0).id().equals("a") ? 0 : 1;
        double length = network.length(bent);
        double[][] cuts = new double[2][];
        // one cut inside the first segment, one inside the third
        cuts[bent] = new double[] {100, length - 60};
        SplitNetwork split = SplitNetwork.of(network, cuts);
        StreetNetwork pieces = split.network();

        assertEquals(network.edgeCount() + 2, pieces.edgeCount());
        assertEquals(network.nodeCount() + 2, pieces.nodeCount());
        for (int v = 0; v < network.nodeCount(); v++) {
            assertEquals(network.lon(v), pieces.lon(v), "original nodes keep their ids");
            assertEquals(network.lat(v), pieces.lat(v));
        }
        double sum = 0;
        int[] ofBent = new int[3];
        int n = 0;
        for (int p = 0; p < pieces.edgeCount(); p++) {
            assertEquals(PolylineGeodesics.length(pieces, p), pieces.length(p), 1e-6, "piece " + p);
            assertEquals(pieces.lon(pieces.from(p)), pieces.pointLon(p, 0), 0, "a piece starts at its tail node");
            assertEquals(pieces.lat(pieces.to(p)), pieces.pointLat(p, pieces.pointCount(p) - 1), 0);
            assertSame(network.feature(split.parent()[p]), pieces.feature(p));
            assertEquals(network.travel(split.parent()[p]), pieces.travel(p));
            if (split.parent()[p] == bent) {
                sum += PolylineGeodesics.length(pieces, p);
                ofBent[n++] = p;
            }
        }
        assertEquals(3, n);
        assertEquals(length, sum, 1e-6, "GeographicLib lengths of the pieces add up to the edge's");
        assertEquals(100, PolylineGeodesics.length(pieces, ofBent[0]), 1e-6);
        assertEquals(60, PolylineGeodesics.length(pieces, ofBent[2]), 1e-6);
        assertEquals(network.from(bent), pieces.from(ofBent[0]));
        assertEquals(pieces.to(ofBent[0]), pieces.from(ofBent[1]));
        assertEquals(pieces.to(ofBent[1]), pieces.from(ofBent[2]));
        assertEquals(network.to(bent), pieces.to(ofBent[2]));
        assertEquals(100, split.start()[ofBent[1]], 0);
        assertEquals(length - 60, split.end()[ofBent[1]], 0);
    }

    @Test
    void aCutAtAVertexAddsNoZeroLengthSegment() {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                line("a", Travel.BOTH, -31.2, 44.6, -31.198, 44.6, -31.196, 44.6)));
        double atVertex = Geodesic.WGS84.Inverse(44.6, -31.2, 44.6, -31.198).s12;
        SplitNetwork split = SplitNetwork.of(network, new double[][] {{0.001, atVertex}});
        StreetNetwork pieces = split.network();
        assertEquals(2, pieces.edgeCount(), "a cut closer than a centimetre to an end is left out");
        for (int p = 0; p < 2; p++) {
            assertEquals(2, pieces.pointCount(p));
            assertTrue(pieces.length(p) > 100);
        }
        assertEquals(network.length(0), pieces.length(0) + pieces.length(1), 1e-6);
    }
}
