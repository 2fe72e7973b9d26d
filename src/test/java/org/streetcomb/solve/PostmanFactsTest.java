package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.jgrapht.alg.shortestpath.DijkstraShortestPath;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.WeightedPseudograph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.TestNetworks;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/** Facts of the trade (common practice) that every postman tour must respect. */
class PostmanFactsTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {31, 32, 33, 34, 35})
    void everyNetworkHasAnEvenNumberOfOddNodes(long seed) {
        // common practice (the handshake lemma): degrees sum to twice the edge count
        StreetNetwork network = TestNetworks.network(TestNetworks.grid(9, 7, 0.7, seed));
        assertEquals(0, UndirectedPostman.oddNodes(network).length % 2);
    }

    @Test
    void withAllDegreesEvenTheTourIsExactlyTheNetwork() {
        // common practice: an Eulerian network needs no deadhead
        StreetNetwork even = evenRing();
        assertEquals(0, UndirectedPostman.oddNodes(even).length);
        Augmentation augmentation = UndirectedPostman.solve(even);
        List<Tour> tours = TourPlanner.tours(even, Components.of(even), augmentation, 0, false);
        assertEquals(0, augmentation.deadhead());
        assertEquals(even.totalLength(), tours.get(0).length(even), 1e-9);
    }

    @Test
    void withTwoOddNodesTheExtraIsTheirShortestPath() {
        // common practice: with exactly two odd nodes the deadhead is one shortest path between them;
        // the path length here comes from JGraphT's Dijkstra, independent of ours.
        List<RoadFeature> lines = new ArrayList<>(TestNetworks.grid(3, 3, 1.0, 5));
        StreetNetwork lattice = TestNetworks.network(lines);
        int[] odd = UndirectedPostman.oddNodes(lattice);
        // pair all border odd nodes but two by extra straight streets, leaving exactly two odd nodes
        for (int i = 2; i + 1 < odd.length; i += 2) {
            lines.add(TestNetworks.line("x" + i, lattice.lon(odd[i]), lattice.lat(odd[i]),
                    lattice.lon(odd[i + 1]), lattice.lat(odd[i + 1])));
        }
        StreetNetwork network = TestNetworks.network(lines);
        int[] remaining = UndirectedPostman.oddNodes(network);
        assertEquals(2, remaining.length);

        WeightedPseudograph<Integer, DefaultWeightedEdge> graph = new WeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            graph.addVertex(v);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            graph.setEdgeWeight(graph.addEdge(network.from(e), network.to(e)), network.length(e));
        }
        double path = new DijkstraShortestPath<>(graph).getPathWeight(remaining[0], remaining[1]);

        assertEquals(path, UndirectedPostman.solve(network).deadhead(), 1e-6);
    }

    /** Two concentric closed rings joined by two spokes each drawn twice: every node has even degree. */
    private static StreetNetwork evenRing() {
        List<RoadFeature> lines = new ArrayList<>();
        double[] ring = new double[2 * 13];
        for (int k = 0; k <= 12; k++) {
            ring[2 * k] = 5 + 0.002 * Math.cos(2 * Math.PI * k / 12);
            ring[2 * k + 1] = 5 + 0.002 * Math.sin(2 * Math.PI * k / 12);
        }
        lines.add(TestNetworks.line("ring", ring));
        lines.add(TestNetworks.line("spoke-a", ring[0], ring[1], 5, 5));
        lines.add(TestNetworks.line("spoke-b", 5, 5, ring[12], ring[13]));
        lines.add(TestNetworks.line("spoke-c", ring[0], ring[1], 5.0005, 5.0003, 5, 5));
        lines.add(TestNetworks.line("spoke-d", 5, 5, 5.0001, 5.001, ring[12], ring[13]));
        return TestNetworks.network(lines);
    }
}
