package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.jgrapht.Graph;
import org.jgrapht.alg.cycle.ChinesePostman;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.DirectedWeightedPseudograph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/** The directed postman: exact by minimum-cost flow, checked against JGraphT's independent solver. */
class DirectedPostmanTest {

    static List<Tour> plan(StreetNetwork network, boolean[] required, KerbMode kerbs, int start, int end,
                           Augmentation[] out) {
        ServiceDemand demand = ServiceDemand.of(network, required, kerbs);
        PostmanProblem problem = new PostmanProblem(network, demand, new int[] {start}, end);
        ReachabilityCheck.check(problem, "test");
        Augmentation augmentation = PostmanVariants.solve(problem);
        out[0] = augmentation;
        // TourPlanner validates every tour: continuity, ends, one-way directions, demand met
        return TourPlanner.tours(problem, Components.of(network), augmentation);
    }

    static boolean[] all(StreetNetwork network) {
        boolean[] r = new boolean[network.edgeCount()];
        Arrays.fill(r, true);
        return r;
    }

    /** Reference: JGraphT's ChinesePostman (Kuhn-Munkres assignment over shortest paths for digraphs). */
    static double jgraphtDirected(StreetNetwork network) {
        Graph<Integer, DefaultWeightedEdge> g = new DirectedWeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) > 0) {
                g.addVertex(v);
            }
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            boolean along = network.travel(e) != Travel.BACKWARD;
            int u = along ? network.from(e) : network.to(e);
            int v = along ? network.to(e) : network.from(e);
            g.setEdgeWeight(g.addEdge(u, v), network.length(e));
        }
        return new ChinesePostman<Integer, DefaultWeightedEdge>().getCPPSolution(g).getWeight();
    }

    @Test
    void everyArcOfTheCamposInstanceMatchesJgrapht() throws Exception {
        // instance: fixtures/benchmarks/drpp/P80-10-1.0 (Campos collection, see NOTICE), every arc required
        // so that it is a directed postman instance; reference: JGraphT ChinesePostman on the same digraph
        StreetNetwork network = GraphFixtures.drpp(Path.of("fixtures/benchmarks/drpp/P80-10-1.0")).network();
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = plan(network, all(network), KerbMode.ONE_PASS, 0, 0, a);
        assertEquals(jgraphtDirected(network), tours.get(0).length(network), 1e-6);
        assertTrue(a[0].certified());
        assertTrue(a[0].method().startsWith("directed postman, exact"));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void randomOneWayGridsMatchJgrapht(long seed) {
        // generated all-one-way grids (seeded), made strongly connected; reference: JGraphT ChinesePostman
        GraphFixtures.Graph g = GraphFixtures.mixedGrid(seed, 5, 6, 1.0, 1.0);
        StreetNetwork network = g.network();
        boolean oneWayOnly = true;
        for (int e = 0; e < network.edgeCount(); e++) {
            oneWayOnly &= network.travel(e).oneWay();
        }
        if (!oneWayOnly) {
            // the generator reopened some streets to both directions: make them one arc each way
            network = asArcs(network);
        }
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = plan(network, all(network), KerbMode.ONE_PASS, 0, 0, a);
        assertEquals(jgraphtDirected(network), tours.get(0).length(network), 1e-6);
    }

    /** Each two-way street as two opposite one-way arcs. */
    private static StreetNetwork asArcs(StreetNetwork network) {
        GraphFixtures.Graph g = new GraphFixtures.Graph(network.nodeCount(), new ArrayList<>(), new ArrayList<>(),
                new ArrayList<>());
        for (int e = 0; e < network.edgeCount(); e++) {
            int len = (int) network.length(e);
            g.edges().add(new int[] {network.from(e), network.to(e), len});
            g.travel().add(network.travel(e) == Travel.BOTH ? Travel.FORWARD : network.travel(e));
            g.required().add(true);
            if (network.travel(e) == Travel.BOTH) {
                g.edges().add(new int[] {network.to(e), network.from(e), len});
                g.travel().add(Travel.FORWARD);
                g.required().add(true);
            }
        }
        return g.network();
    }

    @Test
    void balancedCircuitNeedsNoDeadhead() {
        // common practice: when every node is balanced the tour equals the network length
        GraphFixtures.Graph g = new GraphFixtures.Graph(4, new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        int[][] arcs = {{0, 1, 5}, {1, 2, 7}, {2, 3, 3}, {3, 0, 4}, {0, 2, 6}, {2, 0, 8}};
        for (int[] arc : arcs) {
            g.edges().add(arc);
            g.travel().add(Travel.FORWARD);
            g.required().add(true);
        }
        StreetNetwork network = g.network();
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = plan(network, all(network), KerbMode.ONE_PASS, 0, 0, a);
        assertEquals(network.totalLength(), tours.get(0).length(network), 1e-9);
        assertEquals(0, a[0].deadhead(), 1e-9);
    }

    @Test
    void bothKerbsOfTwoWayStreetsIsTwiceTheNetwork() {
        // common practice: with both kerbs of every two-way street to service, each street is driven once each
        // way and every node is balanced, so the tour is exactly twice the network length
        GraphFixtures.Graph g = GraphFixtures.mixedGrid(11, 4, 4, 0.0, 1.0);
        StreetNetwork network = g.network();
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = plan(network, all(network), KerbMode.BOTH_KERBS, 0, 0, a);
        assertEquals(2 * network.totalLength(), tours.get(0).length(network), 1e-9);
        assertTrue(a[0].method().startsWith("directed postman, exact"));
    }

    @Test
    void deadEndOneWayIsNamed() {
        // a one-way street into a node with no way out: the check names it instead of failing in the solver
        GraphFixtures.Graph g = new GraphFixtures.Graph(4, new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        int[][] arcs = {{0, 1, 5}, {1, 2, 7}, {2, 0, 3}, {2, 3, 4}};
        for (int[] arc : arcs) {
            g.edges().add(arc);
            g.travel().add(Travel.FORWARD);
            g.required().add(true);
        }
        StreetNetwork network = g.network();
        NoTourError error = assertThrows(NoTourError.class,
                () -> plan(network, all(network), KerbMode.ONE_PASS, 0, 0, new Augmentation[1]));
        assertTrue(error.getMessage().contains("1 streets (by feature) cannot be left"), error.getMessage());
        assertTrue(error.getMessage().contains("e3 at"), error.getMessage());
    }
}
