package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;
import org.streetcomb.tour.TourValidator;

/**
 * Every row of the variant table against the solver contract, on small invented grids where the exact
 * shortest walk is known from exhaustive search ({@link ExhaustiveWalk}: Dijkstra over node and service
 * passes done, independent of every solver): the table routes the problem to the row's solver; the tour
 * built from its augmentation is valid (continuous, ends where asked, meets the demand in permitted
 * directions); its lower bound is at most the optimum and its tour at least the optimum; a solver that
 * states it is exact reaches the optimum on every case.
 */
class PostmanSolverContractTest {

    /** Cases per row: the first this many generated problems that the table sends to the row. */
    private static final int CASES = 6;

    /** A generated problem and its exact optimum. */
    record Case(PostmanProblem problem, int start, double optimum, long seed) {
    }

    static Stream<Arguments> rows() {
        return PostmanVariants.TABLE.stream().map(v -> Arguments.of(v.when(), v));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void keepsTheContract(String when, PostmanVariants.Variant row) {
        PostmanSolver solver = row.solver();
        assertFalse(solver.method().isBlank());
        assertFalse(solver.complexity().isBlank());
        List<Case> cases = casesFor(row);
        assertEquals(CASES, cases.size(), "generated problems routed to this row");
        for (Case c : cases) {
            PostmanProblem problem = c.problem();
            StreetNetwork network = problem.network();
            Augmentation plan = solver.solve(problem);
            List<Tour> tours = TourPlanner.tours(problem, Components.of(network), plan);
            assertEquals(1, tours.size(), "seed " + c.seed());
            int[] all = IntStream.range(0, network.edgeCount()).toArray();
            assertEquals(List.of(), TourValidator.problems(network, tours.get(0), problem.demand(), all,
                    problem.end()), "seed " + c.seed());
            double ours = tours.get(0).length(network);
            assertTrue(ours >= c.optimum() - 1e-6, "seed " + c.seed() + ": below the exhaustive optimum");
            assertTrue(plan.lowerBound() <= c.optimum() + 1e-6, "seed " + c.seed() + ": bound above the optimum");
            if (solver.exact()) {
                assertEquals(c.optimum(), ours, 1e-6, "seed " + c.seed() + ": an exact solver missed the optimum");
                assertTrue(plan.certified(), "seed " + c.seed());
            }
        }
    }

    /** The first {@link #CASES} generated problems that the table sends to {@code row}. */
    private static List<Case> casesFor(PostmanVariants.Variant row) {
        List<Case> cases = new ArrayList<>();
        double[] oneWayShares = {0, 0.34, 0.67, 1};
        KerbMode[] kerbModes = KerbMode.values();
        for (long seed = 0; seed < 20_000 && cases.size() < CASES; seed++) {
            Random random = new Random(seed);
            int columns = 2 + random.nextInt(3);
            int rows = 2 + random.nextInt(2);
            double oneWay = oneWayShares[random.nextInt(oneWayShares.length)];
            KerbMode kerbs = random.nextInt(3) == 0 ? kerbModes[random.nextInt(kerbModes.length)] : KerbMode.ONE_PASS;
            boolean everyStreet = random.nextBoolean();
            boolean open = random.nextInt(3) == 0;
            StreetNetwork network = new NetworkBuilder(0.5).build(ExhaustiveWalk.grid(columns, rows, oneWay, random));
            boolean[] required = new boolean[network.edgeCount()];
            int passes = 0;
            for (int e = 0; e < required.length; e++) {
                required[e] = everyStreet || random.nextDouble() < 0.4;
                passes += required[e] ? ServiceDemand.of(network, single(required.length, e), kerbs).passes(e) : 0;
            }
            int start = random.nextInt(network.nodeCount());
            int end = open ? random.nextInt(network.nodeCount()) : start;
            // at most 12 service passes, so the exhaustive search stays small
            if (passes == 0 || passes > 12 || open && start == end) {
                continue;
            }
            ServiceDemand demand = ServiceDemand.of(network, required, kerbs);
            Components parts = Components.of(network);
            PostmanProblem problem = new PostmanProblem(network, demand,
                    TourPlanner.starts(network, parts, demand, start, false), end);
            try {
                ReachabilityCheck.check(problem, "grid " + seed);
                if (problem.starts().length != 1 || PostmanVariants.choose(problem) != row.solver()) {
                    continue;
                }
            } catch (NoTourError unreachable) {
                continue;
            }
            cases.add(new Case(problem, start, ExhaustiveWalk.shortest(network, demand, start, end), seed));
        }
        return cases;
    }

    private static boolean[] single(int m, int e) {
        boolean[] one = new boolean[m];
        one[e] = true;
        return one;
    }
}
