package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.BiconnectivityInspector;
import org.jgrapht.graph.Pseudograph;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/** The bridges of a network, against JGraphT's BiconnectivityInspector, and on a chain too deep for recursion. */
class BridgesTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    @Test
    void sameBridgesAsJgraphtOnRandomMultigraphsWithParallelEdgesAndLoops() {
        Random random = new Random(11);
        for (int trial = 0; trial < 200; trial++) {
            int n = 2 + random.nextInt(30);
            int m = random.nextInt(2 * n);
            int[] from = new int[m];
            int[] to = new int[m];
            Graph<Integer, Integer> reference = new Pseudograph<>(Integer.class);
            for (int v = 0; v < n; v++) {
                reference.addVertex(v);
            }
            for (int e = 0; e < m; e++) {
                // a few parallel edges and loops on purpose
                from[e] = random.nextInt(n);
                to[e] = e > 0 && random.nextInt(8) == 0 ? to[e - 1] : random.nextInt(n);
                if (e > 0 && random.nextInt(8) == 0) {
                    from[e] = from[e - 1];
                }
                reference.addEdge(from[e], to[e], e);
            }
            int[] expected = new BiconnectivityInspector<>(reference).getBridges().stream().mapToInt(Integer::intValue)
                    .sorted().toArray();
            assertArrayEquals(expected, Bridges.of(network(n, from, to)), "trial " + trial);
        }
    }

    @Test
    void everyEdgeOfALongChainIsABridgeWithoutOverflowingTheStack() {
        // a tree's every edge is a bridge (common practice); 200 000 deep would overflow a recursive search
        int n = 200_000;
        int[] from = new int[n - 1];
        int[] to = new int[n - 1];
        for (int e = 0; e < n - 1; e++) {
            from[e] = e;
            to[e] = e + 1;
        }
        assertEquals(n - 1, Bridges.of(network(n, from, to)).length);
    }

    private static StreetNetwork network(int n, int[] from, int[] to) {
        List<RoadFeature> features = new ArrayList<>();
        for (int e = 0; e < from.length; e++) {
            features.add(new RoadFeature("e" + e, "", GEOMETRY.createLineString(new Coordinate[] {new Coordinate(0, 0),
                new Coordinate(0, 0)}), Travel.BOTH, true, Map.of()));
        }
        return StreetNetwork.ofGraph(n, from, to, new double[from.length], features);
    }
}
