package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.streetcomb.TestNetworks;

/**
 * Noding and snapping: facts of the trade (common practice) for a routable centreline network, with
 * lengths checked against GeographicLib (Karney's geodesic inverse on WGS84) called directly here, not through
 * {@link GeodesicLength}.
 */
class NetworkBuilderTest {

    /** About 1 m of latitude in degrees, near latitude 20 (1 degree of latitude is about 110.7 km there). */
    private static final double METRE = 1 / 110_700.0;

    @Test
    void crossingLinesMeetAtAJunction() {
        StreetNetwork network = TestNetworks.network(List.of(
                TestNetworks.line("a", 10.000, 20.000, 10.002, 20.002),
                TestNetworks.line("b", 10.000, 20.002, 10.002, 20.000)));
        assertEquals(4, network.edgeCount());
        assertEquals(5, network.nodeCount());
        double total = geodesic(10.000, 20.000, 10.002, 20.002) + geodesic(10.000, 20.002, 10.002, 20.000);
        assertEquals(total, network.totalLength(), 1e-3, "splitting keeps the length (to the mm)");
        assertEdgeLengthsAreGeodesic(network);
    }

    @Test
    void aLineEndingOnAnotherLinesVertexSplitsIt() {
        StreetNetwork network = TestNetworks.network(List.of(
                TestNetworks.line("through", 10.000, 20.000, 10.001, 20.000, 10.002, 20.000),
                TestNetworks.line("side", 10.001, 20.000, 10.001, 20.001)));
        assertEquals(3, network.edgeCount());
        assertEquals(4, network.nodeCount());
        assertEdgeLengthsAreGeodesic(network);
        assertEquals(geodesic(10.000, 20.000, 10.001, 20.000) + geodesic(10.001, 20.000, 10.002, 20.000)
                + geodesic(10.001, 20.000, 10.001, 20.001), network.totalLength(), 1e-6);
    }

    @Test
    void endsCloserThanTheToleranceAreJoinedAndFartherOnesAreNot() {
        var near = List.of(
                TestNetworks.line("a", 10.000, 20.000, 10.001, 20.000),
                TestNetworks.line("b", 10.001, 20.000 + 0.3 * METRE, 10.002, 20.000));
        var far = List.of(
                TestNetworks.line("a", 10.000, 20.000, 10.001, 20.000),
                TestNetworks.line("b", 10.001, 20.000 + 0.8 * METRE, 10.002, 20.000));
        assertEquals(3, new NetworkBuilder(0.5).build(near).nodeCount());
        assertEquals(4, new NetworkBuilder(0.5).build(far).nodeCount());
        assertEquals(3, new NetworkBuilder(1.0).build(far).nodeCount());
    }

    @Test
    void zeroLengthPiecesAreDropped() {
        StreetNetwork network = TestNetworks.network(List.of(
                TestNetworks.line("street", 10.000, 20.000, 10.001, 20.000),
                TestNetworks.line("dot", 10.005, 20.005, 10.005, 20.005 + 0.1 * METRE)));
        assertEquals(1, network.edgeCount());
        assertEquals("street", network.feature(0).id());
    }

    @Test
    void aClosedLoopIsOneEdgeFromAndToTheSameNode() {
        StreetNetwork network = TestNetworks.network(List.of(TestNetworks.line("loop",
                10.000, 20.000, 10.001, 20.000, 10.001, 20.001, 10.000, 20.000)));
        assertEquals(1, network.edgeCount());
        assertEquals(network.from(0), network.to(0));
        assertEquals(2, network.degree(network.from(0)));
        assertEquals(geodesic(10.000, 20.000, 10.001, 20.000) + geodesic(10.001, 20.000, 10.001, 20.001)
                + geodesic(10.001, 20.001, 10.000, 20.000), network.length(0), 1e-6);
    }

    /** Each edge's length is the sum of GeographicLib's geodesic distances between its stored points. */
    private static void assertEdgeLengthsAreGeodesic(StreetNetwork network) {
        for (int e = 0; e < network.edgeCount(); e++) {
            double sum = 0;
            for (int i = 0; i + 1 < network.pointCount(e); i++) {
                sum += geodesic(network.pointLon(e, i), network.pointLat(e, i), network.pointLon(e, i + 1),
                        network.pointLat(e, i + 1));
            }
            assertEquals(sum, network.length(e), 1e-6, "edge " + e);
        }
    }

    private static double geodesic(double lon1, double lat1, double lon2, double lat2) {
        return Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2).s12;
    }
}
