package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.tour.TourPlanner;

/**
 * Whether one open route can service a set of streets with one-way streets among them, against an
 * exhaustive search of every walk: a breadth-first search over (node, streets serviced so far), which
 * decides it exactly on small grids (invented grids with random one-way streets and random streets to
 * service). Where a route exists, the solver must find one (validated like every tour), no shorter than
 * the shortest walk (Dijkstra over the same states) and with a lower bound no higher than it.
 */
class OpenRouteOrderTest {

    @Test
    void agreesWithAnExhaustiveSearchOfWalks() {
        int feasible = 0, refused = 0;
        for (int seed = 0; seed < 400; seed++) {
            Random random = new Random(seed);
            StreetNetwork network = new NetworkBuilder(0.5).build(ExhaustiveWalk.grid(4, 3, 0.34, random));
            boolean[] required = new boolean[network.edgeCount()];
            int count = 0;
            for (int e = 0; e < required.length; e++) {
                required[e] = count < 10 && random.nextDouble() < 0.35;
                count += required[e] ? 1 : 0;
            }
            if (count == 0) {
                continue;
            }
            ServiceDemand demand = ServiceDemand.of(network, required, KerbMode.ONE_PASS);
            int start = random.nextInt(network.nodeCount());
            int end = random.nextInt(network.nodeCount());
            if (start == end) {
                continue;
            }
            Components parts = Components.of(network);
            PostmanProblem problem = new PostmanProblem(network, demand, TourPlanner.starts(network, parts, demand,
                    start, false), end);
            boolean exists = routeExists(network, required, start, end);
            boolean accepted;
            try {
                ReachabilityCheck.check(problem, "grid " + seed);
                accepted = true;
            } catch (NoTourError e) {
                accepted = false;
                assertTrue(e.getMessage().startsWith("grid " + seed + ": "), e.getMessage());
            }
            assertEquals(exists, accepted, "seed " + seed);
            if (accepted) {
                // the solver finds a route wherever one exists; TourPlanner validates it
                Augmentation plan = PostmanVariants.solve(problem);
                TourPlanner.tours(problem, parts, plan);
                double optimum = ExhaustiveWalk.shortest(network, required, start, end);
                double ours = plan.traversals().length(network);
                assertTrue(ours >= optimum - 1e-6 && plan.lowerBound() <= optimum + 1e-6, "seed " + seed);
                feasible++;
            } else {
                refused++;
            }
        }
        assertTrue(feasible > 50 && refused > 50, feasible + " feasible, " + refused + " refused");
    }

    /** Exhaustive: a walk from start to end along permitted directions that drives every required edge. */
    private static boolean routeExists(StreetNetwork network, boolean[] required, int start, int end) {
        int[] bit = new int[network.edgeCount()];
        int bits = 0;
        for (int e = 0; e < bit.length; e++) {
            bit[e] = required[e] ? 1 << bits++ : 0;
        }
        int full = (1 << bits) - 1;
        boolean[][] seen = new boolean[network.nodeCount()][1 << bits];
        ArrayDeque<int[]> queue = new ArrayDeque<>();
        queue.add(new int[] {start, 0});
        seen[start][0] = true;
        while (!queue.isEmpty()) {
            int[] s = queue.poll();
            if (s[0] == end && s[1] == full) {
                return true;
            }
            for (int i = network.incidenceStart(s[0]); i < network.incidenceEnd(s[0]); i++) {
                int e = network.incidentEdge(i);
                boolean forward = network.from(e) == s[0];
                Travel travel = network.travel(e);
                if (forward ? travel == Travel.BACKWARD : travel == Travel.FORWARD) {
                    continue;
                }
                int w = network.other(e, s[0]);
                int mask = s[1] | bit[e];
                if (!seen[w][mask]) {
                    seen[w][mask] = true;
                    queue.add(new int[] {w, mask});
                }
            }
        }
        return false;
    }
}
