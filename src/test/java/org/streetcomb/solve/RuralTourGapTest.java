package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.TourPlanner;

/**
 * Rural tours (a random share of a grid's streets to service) against the exact shortest walk found by
 * exhaustive search ({@link ExhaustiveWalk}: Dijkstra over node and streets serviced so far), on families
 * of invented grids: undirected, mixed and all one-way; closed (start = end) and open. Every tour is
 * validated, the plan's lower bound must not exceed the optimum, and the mean and largest gap to the
 * optimum must stay under the levels measured (with a margin); one pass per street, and both kerbs (with
 * one-way streets once or twice). Writes target/quality/rural-gaps.md.
 */
class RuralTourGapTest {

    /** Seeds per family: 0..N-1 (the documented study runs 400 with -Drural.seeds=400). */
    private static final int SEEDS = Integer.getInteger("rural.seeds", 120);

    static Stream<Arguments> families() {
        return Stream.of(
            // name, columns, rows, one-way share, required share, open, kerbs, mean gap bound, max gap bound
            Arguments.of("4x3, a third one-way, open", 4, 3, 0.34, 0.35, true, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("4x3, a third one-way, closed", 4, 3, 0.34, 0.35, false, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("4x3, two-way, closed", 4, 3, 0.0, 0.35, false, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("4x3, two-way, open", 4, 3, 0.0, 0.35, true, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("4x3, two thirds one-way, closed", 4, 3, 0.67, 0.35, false, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("5x4, a third one-way, closed", 5, 4, 0.34, 0.35, false, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("5x4, a third one-way, open", 5, 4, 0.34, 0.35, true, KerbMode.ONE_PASS, 0.02, 0.15),
            Arguments.of("4x3, a third one-way, closed, both kerbs", 4, 3, 0.34, 0.25, false, KerbMode.BOTH_KERBS,
                    0.02, 0.15),
            Arguments.of("4x3, a third one-way, open, both kerbs, one-way twice", 4, 3, 0.34, 0.25, true,
                    KerbMode.BOTH_KERBS_ONE_WAY_TWICE, 0.02, 0.15));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("families")
    void staysCloseToTheExhaustiveOptimum(String name, int columns, int rows, double oneWay, double share,
                                          boolean open, KerbMode kerbs, double meanBound, double maxBound)
            throws IOException {
        int cases = 0;
        double sum = 0;
        double max = 0;
        for (int seed = 0; seed < SEEDS; seed++) {
            Random random = new Random(seed);
            StreetNetwork network = new NetworkBuilder(0.5).build(ExhaustiveWalk.grid(columns, rows, oneWay, random));
            boolean[] required = new boolean[network.edgeCount()];
            int count = 0;
            int passes = 0;
            for (int e = 0; e < required.length; e++) {
                // at most 12 service passes, so the exhaustive search stays small
                int need = kerbs == KerbMode.ONE_PASS || network.travel(e).oneWay() && kerbs == KerbMode.BOTH_KERBS ? 1 : 2;
                required[e] = passes + need <= 12 && random.nextDouble() < share;
                count += required[e] ? 1 : 0;
                passes += required[e] ? need : 0;
            }
            int start = random.nextInt(network.nodeCount());
            int end = open ? random.nextInt(network.nodeCount()) : start;
            if (count == 0 || open && start == end) {
                continue;
            }
            ServiceDemand demand = ServiceDemand.of(network, required, kerbs);
            Components parts = Components.of(network);
            PostmanProblem problem = new PostmanProblem(network, demand,
                    TourPlanner.starts(network, parts, demand, start, false), end);
            try {
                ReachabilityCheck.check(problem, "grid " + seed);
            } catch (NoTourError e) {
                continue;
            }
            if (problem.starts().length != 1) {
                continue;
            }
            Augmentation plan = PostmanVariants.solve(problem);
            TourPlanner.tours(problem, parts, plan);
            double optimum = ExhaustiveWalk.shortest(network, demand, start, end);
            double ours = plan.traversals().length(network);
            assertTrue(ours >= optimum - 1e-6, name + " seed " + seed);
            assertTrue(plan.lowerBound() <= optimum + 1e-6, name + " seed " + seed + ": bound above the optimum");
            double gap = ours / optimum - 1;
            sum += gap;
            max = Math.max(max, gap);
            cases++;
        }
        double mean = sum / cases;
        String row = String.format(Locale.ROOT, "| %s | 0-%d | %d | %.2f %% | %.2f %% |%n", name, SEEDS - 1, cases,
                100 * mean, 100 * max);
        Path out = Path.of("target/quality/rural-gaps.md");
        Files.createDirectories(out.getParent());
        Files.writeString(out, row, java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
        assertTrue(cases > SEEDS / 4, name + ": only " + cases + " cases");
        assertTrue(mean <= meanBound, name + String.format(Locale.ROOT, ": mean gap %.4f", mean));
        assertTrue(max <= maxBound, name + String.format(Locale.ROOT, ": max gap %.4f", max));
    }
}
