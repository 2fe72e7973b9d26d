package org.streetcomb.tour;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.streetcomb.FieldFixtures;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Arrangement;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.timing.StageClock;

/**
 * The turn-aware order against its baseline, the plain Hierholzer order of the same tour, on the demo
 * town and on a real OpenStreetMap extract (Yongsan, Seoul; fixtures/real, see NOTICE): the same
 * directed traversals, the same length to the millimetre, a valid tour, never more U-turns, and never
 * fewer U-turns than the tour's visits to dead ends, where turning back is unavoidable.
 */
class TurnAwareOrderTest {

    static Stream<Arguments> layers() {
        return Stream.of(
                Arguments.of("demo town", FieldFixtures.DEMO_TOWN, new LonLat(-31.2, 44.6), TrafficSide.RIGHT),
                Arguments.of("Seoul", Path.of("fixtures/real/roads-seoul.geojson"), null, TrafficSide.RIGHT),
                Arguments.of("demo town, left-hand traffic", FieldFixtures.DEMO_TOWN, new LonLat(-31.2, 44.6),
                        TrafficSide.LEFT));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("layers")
    void sameTraversalsSameLengthNoMoreUTurns(String name, Path layer, LonLat depot, TrafficSide side) {
        Plan plan = FieldFixtures.plan(layer, depot);
        StreetNetwork network = plan.network();
        EdgeBearings bearings = EdgeBearings.of(network);
        int[][] edgesOf = plan.components().edgesByComponent(network);
        TurnCounts before = TurnCounts.none();
        TurnCounts after = TurnCounts.none();
        for (Tour plain : plan.tours()) {
            Tour ordered = TurnAwareOrder.of(network, bearings, side, plain);
            assertEquals(List.of(), TourValidator.problems(network, ordered, edgesOf[plan.components().of(plain.start())]));
            assertEquals(plain.start(), ordered.start());
            assertEquals(Math.round(plain.length(network) * 1000), Math.round(ordered.length(network) * 1000));
            assertEquals(Math.round(plain.deadhead(network) * 1000), Math.round(ordered.deadhead(network) * 1000));
            assertArrayEquals(traversals(plain), traversals(ordered), "the same multiset of directed traversals");
            assertArrayEquals(servicePasses(network, plain), servicePasses(network, ordered), "each street serviced as often");
            assertServiceOnFirstPass(network, ordered);
            TurnCounts p = TurnCounts.of(network, bearings, side, plain);
            TurnCounts o = TurnCounts.of(network, bearings, side, ordered);
            assertTrue(o.uTurns() <= p.uTurns(), "U-turns " + p.uTurns() + " -> " + o.uTurns());
            assertTrue(o.uTurns() >= deadEndVisits(network, ordered), "a dead end can only be left by turning back");
            before = before.plus(p);
            after = after.plus(o);
        }
        assertTrue(after.uTurns() < before.uTurns(), "the reorder should find fewer U-turns on " + name);
    }

    /**
     * An open route (the demo town's tour ending at the far side of the yard) keeps its start and its end,
     * drives the same traversals, stays a valid walk and loses U-turns like a closed tour does.
     */
    @org.junit.jupiter.api.Test
    void openRouteKeepsItsEndsAndLosesUTurns() {
        ServiceOptions toEnd = new ServiceOptions(KerbMode.ONE_PASS, null, new LonLat(-31.18, 44.61), false);
        Plan plan = Planner.plan(new PlanRequest(FieldFixtures.DEMO_TOWN, new LonLat(-31.2, 44.6), 0.5, 500, false,
                ReadOptions.DEFAULTS, toEnd, new Arrangement(TrafficSide.RIGHT, false, null)),
                new StageClock(StageClock.SILENT));
        StreetNetwork network = plan.network();
        EdgeBearings bearings = EdgeBearings.of(network);
        Tour plain = plan.tours().get(0);
        int end = plain.end(network);
        assertTrue(end != plain.start(), "the fixture asks for an open route");
        Tour ordered = TurnAwareOrder.of(network, bearings, TrafficSide.RIGHT, plain);
        assertEquals(List.of(), TourValidator.problems(network, ordered, ServiceDemand.everyEdge(network),
                plan.components().edgesByComponent(network)[plan.components().of(plain.start())], end));
        assertEquals(plain.start(), ordered.start());
        assertEquals(end, ordered.end(network));
        assertArrayEquals(traversals(plain), traversals(ordered), "the same multiset of directed traversals");
        assertServiceOnFirstPass(network, ordered);
        int before = TurnCounts.of(network, bearings, TrafficSide.RIGHT, plain).uTurns();
        int after = TurnCounts.of(network, bearings, TrafficSide.RIGHT, ordered).uTurns();
        assertTrue(after < before, "U-turns " + before + " -> " + after);
    }

    /** Each traversal as edge and direction, sorted. */
    private static long[] traversals(Tour tour) {
        long[] keys = new long[tour.steps()];
        for (int i = 0; i < keys.length; i++) {
            keys[i] = 2L * tour.edges()[i] + (tour.forward()[i] ? 1 : 0);
        }
        Arrays.sort(keys);
        return keys;
    }

    private static int[] servicePasses(StreetNetwork network, Tour tour) {
        int[] passes = new int[network.edgeCount()];
        for (int i = 0; i < tour.steps(); i++) {
            passes[tour.edges()[i]] += tour.service()[i] ? 1 : 0;
        }
        return passes;
    }

    /** A street serviced once is serviced the first time it is driven (common practice: no pass wasted). */
    private static void assertServiceOnFirstPass(StreetNetwork network, Tour tour) {
        int[] passes = servicePasses(network, tour);
        boolean[] seen = new boolean[network.edgeCount()];
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            if (passes[e] == 1 && !seen[e]) {
                assertTrue(tour.service()[i], "first pass of edge " + e + " is deadhead");
            }
            seen[e] = true;
        }
    }

    private static int deadEndVisits(StreetNetwork network, Tour tour) {
        int visits = 0;
        for (int i = 0; i + 1 < tour.steps(); i++) {
            if (network.degree(tour.exit(network, i)) == 1) {
                visits++;
            }
        }
        return visits;
    }
}
