package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/** The mixed postman heuristic against the exact integer circulation optimum (OR-Tools CP-SAT). */
class MixedPostmanTest {

    /** The stated gap per instance on generated grids (see docs/quality.md for the measured values). */
    static final double MAX_GAP = 0.05;

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10})
    void generatedGridsWithinGapOfExactOptimum(long seed) {
        // generated mixed networks (seeded 6x7 grids, a third of the streets one-way), every street required;
        // reference: the exact integer circulation model solved by OR-Tools CP-SAT (ExactMixedReference)
        StreetNetwork network = GraphFixtures.mixedGrid(seed, 6, 7, 0.35, 1.0).network();
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = DirectedPostmanTest.plan(network, DirectedPostmanTest.all(network), KerbMode.ONE_PASS,
                0, 0, a);
        double ours = tours.get(0).length(network);
        ExactMixedReference.Result exact = ExactMixedReference.solve(network,
                ServiceDemand.of(network, DirectedPostmanTest.all(network), KerbMode.ONE_PASS), 20);
        assertTrue(exact.proved(), "reference not proved optimal");
        assertTrue(ours >= exact.optimum() - 1e-6, "below the optimum: " + ours + " < " + exact.optimum());
        assertTrue(ours <= exact.optimum() * (1 + MAX_GAP), "gap above the stated one: " + ours + " vs " + exact.optimum());
        assertTrue(a[0].lowerBound() <= exact.optimum() + 1e-6, "bound above the optimum");
        assertTrue(a[0].method().startsWith("mixed postman"), a[0].method());
    }

    @Test
    void evenAndBalancedAfterOrientingNeedsNoDeadhead() {
        // common practice: a mixed network that is even and balanced after orienting gets no deadhead; a ring of
        // one-way and two-way streets all in one circular order
        GraphFixtures.Graph g = new GraphFixtures.Graph(4, new java.util.ArrayList<>(), new java.util.ArrayList<>(),
                new java.util.ArrayList<>());
        int[][] ring = {{0, 1, 10}, {1, 2, 20}, {2, 3, 30}, {3, 0, 40}};
        for (int i = 0; i < ring.length; i++) {
            g.edges().add(ring[i]);
            g.travel().add(i % 2 == 0 ? org.streetcomb.read.Travel.FORWARD : org.streetcomb.read.Travel.BOTH);
            g.required().add(true);
        }
        StreetNetwork network = g.network();
        Augmentation[] a = new Augmentation[1];
        List<Tour> tours = DirectedPostmanTest.plan(network, DirectedPostmanTest.all(network), KerbMode.ONE_PASS,
                0, 0, a);
        assertEquals(network.totalLength(), tours.get(0).length(network), 1e-9);
    }
}
