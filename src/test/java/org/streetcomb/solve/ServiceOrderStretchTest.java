package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.TourPlanner;

/**
 * Tours with more service passes than are searched together are searched in stretches of their
 * constructed order. On invented grids, with stretches of four passes: every tour is valid, never longer
 * than the construction, never shorter than the exact shortest walk ({@link ExhaustiveWalk}), and the
 * stretches together shorten the tours.
 */
class ServiceOrderStretchTest {

    @Test
    void stretchesKeepToursValidAndShortenThem() {
        double constructedTotal = 0;
        double stretchedTotal = 0;
        int cases = 0;
        for (int seed = 0; seed < 150; seed++) {
            Random random = new Random(seed);
            StreetNetwork network = new NetworkBuilder(0.5).build(ExhaustiveWalk.grid(5, 4, 0.34, random));
            boolean[] required = new boolean[network.edgeCount()];
            int count = 0;
            for (int e = 0; e < required.length; e++) {
                required[e] = count < 12 && random.nextDouble() < 0.4;
                count += required[e] ? 1 : 0;
            }
            int start = random.nextInt(network.nodeCount());
            if (count < 9) {
                continue;
            }
            ServiceDemand demand = ServiceDemand.of(network, required, KerbMode.ONE_PASS);
            Components parts = Components.of(network);
            PostmanProblem problem = new PostmanProblem(network, demand,
                    TourPlanner.starts(network, parts, demand, start, false), start);
            try {
                ReachabilityCheck.check(problem, "grid " + seed);
            } catch (NoTourError e) {
                continue;
            }
            Augmentation constructed = new MixedPostman().solve(problem);
            Augmentation stretched = ServiceOrderSearch.improve(problem, constructed, 4);
            TourPlanner.tours(problem, parts, stretched);
            double optimum = ExhaustiveWalk.shortest(network, required, start, start);
            double before = constructed.traversals().length(network);
            double after = stretched.traversals().length(network);
            assertTrue(after <= before + 1e-6 && after >= optimum - 1e-6, "seed " + seed);
            constructedTotal += before;
            stretchedTotal += after;
            cases++;
        }
        assertTrue(cases > 40, cases + " cases");
        assertTrue(stretchedTotal < 0.97 * constructedTotal, stretchedTotal + " vs " + constructedTotal);
    }
}
