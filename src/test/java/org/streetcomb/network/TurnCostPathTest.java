package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.DirectedWeightedPseudograph;
import org.junit.jupiter.api.Test;
import org.streetcomb.FieldFixtures;
import org.streetcomb.TestNetworks;
import org.streetcomb.read.RoadFeature;

/**
 * The arc search against outside references: with no turn cost it finds JGraphT's Dijkstra shortest path
 * lengths on the demo town (a general-purpose reference library); with a cost for turning back it takes the
 * detour round a block exactly when the detour is cheaper than the cost, on a street with one block beside it.
 */
class TurnCostPathTest {

    @Test
    void withoutTurnCostsItIsTheShortestPath() {
        StreetNetwork network = FieldFixtures.demoTown().network();
        DirectedWeightedPseudograph<Integer, DefaultWeightedEdge> graph = new DirectedWeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            graph.addVertex(v);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            for (int side = 0; side < 2; side++) {
                int from = side == 0 ? network.from(e) : network.to(e);
                if (Heading.OUTBOUND.allows(network, e, from)) {
                    graph.setEdgeWeight(graph.addEdge(from, network.other(e, from)), network.length(e));
                }
            }
        }
        DijkstraShortestPath<Integer, DefaultWeightedEdge> reference = new DijkstraShortestPath<>(graph);
        TurnCostPath search = new TurnCostPath(network, (in, node, out) -> 0);
        Random random = new Random(5);
        for (int k = 0; k < 200; k++) {
            int from = random.nextInt(network.nodeCount());
            int to = random.nextInt(network.nodeCount());
            int[] arcs = search.arcs(-1, from, to, -1);
            double length = 0;
            int at = from;
            for (int arc : arcs) {
                int e = arc >> 1;
                assertEquals(at, (arc & 1) == 0 ? network.from(e) : network.to(e), "each arc leaves where the last arrived");
                at = TurnCostPath.head(network, arc);
                length += network.length(arc >> 1);
            }
            assertEquals(to, at);
            assertEquals(reference.getPathWeight(from, to), length, 1e-6, from + " to " + to);
        }
    }

    /**
     * A street A-B-C with a block B-D-E-C beside its second half (every side 100 m): a vehicle at C that came
     * from B and must head back to A turns back (200 m to A) unless turning back costs more than the block's
     * extra 200 m (B-C-E-D-B then to A: 400 m).
     */
    @Test
    void turningBackIsAvoidedWhenTheBlockIsCheaper() {
        double m = 1 / 111_320.0;
        List<RoadFeature> lines = List.of(
                TestNetworks.line("ab", 0, 0, 100 * m, 0),
                TestNetworks.line("bc", 100 * m, 0, 200 * m, 0),
                TestNetworks.line("bd", 100 * m, 0, 100 * m, 100 * m),
                TestNetworks.line("de", 100 * m, 100 * m, 200 * m, 100 * m),
                TestNetworks.line("ec", 200 * m, 100 * m, 200 * m, 0));
        StreetNetwork network = TestNetworks.network(lines);
        int a = NearestNode.of(network, 0, 0).node();
        int b = NearestNode.of(network, 100 * m, 0).node();
        int c = NearestNode.of(network, 200 * m, 0).node();
        int bc = edgeBetween(network, b, c);
        int arrived = TurnCostPath.arcFrom(network, bc, b);
        for (double cost : new double[] {100, 300}) {
            TurnCostPath search = new TurnCostPath(network, (in, node, out) -> (in >> 1) == (out >> 1) ? cost : 0);
            int[] arcs = search.arcs(arrived, c, a, -1);
            double length = 0;
            for (int arc : arcs) {
                length += network.length(arc >> 1);
            }
            assertEquals(cost < 200 ? 200 : 400, length, 2, "turning back costs " + cost + " m (sides of about 100 m on the ellipsoid)");
        }
    }

    private static int edgeBetween(StreetNetwork network, int u, int v) {
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.from(e) == u && network.to(e) == v || network.from(e) == v && network.to(e) == u) {
                return e;
            }
        }
        throw new AssertionError("no edge " + u + "-" + v);
    }
}
