package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.quality.MixedOsmReference;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/** The time-limited proof search (CirculationSearch) against stored exact optima. */
class CirculationSearchTest {

    @Test
    void provesTheOptimumOfARealNetworkTheHeuristicMisses() {
        // Andorra la Vella (OpenStreetMap, ODbL; fixtures/benchmarks/mixed-osm), its strongly connected core, every
        // street once; reference: optimum 67444.680 m in fixtures/benchmarks/mixed-osm/values.csv, computed by
        // ExactMixedReference (OR-Tools CP-SAT, decimetre lengths, a separate model)
        PostmanProblem problem = andorraLaVella();
        StreetNetwork network = problem.network();
        Augmentation heuristic = PostmanVariants.solve(problem);
        assertFalse(heuristic.certified(), "the heuristic alone no longer misses: pick another instance");
        List<String> progress = new ArrayList<>();
        Augmentation proved = CirculationSearch.improve(problem, heuristic, 60, progress::add);
        assertTrue(proved.method().endsWith("optimal, proved (lengths in whole centimetres)"), proved.method());
        assertTrue(proved.certified());
        // TourPlanner validates the tour: continuity, one-way directions, every street serviced
        List<Tour> tours = TourPlanner.tours(problem, Components.of(network), proved);
        assertEquals(67444.680, tours.get(0).length(network), 0.01 * network.edgeCount() / 100);
        assertTrue(proved.lowerBound() <= 67444.680 + 1e-6);
        assertFalse(progress.isEmpty());
    }

    @Test
    void aTimeLimitGivesTheBestTourWithItsCertifiedGap() {
        // same instance, no time to search: the heuristic's tour is kept and its certified gap stated
        PostmanProblem problem = andorraLaVella();
        StreetNetwork network = problem.network();
        Augmentation heuristic = PostmanVariants.solve(problem);
        Augmentation timed = CirculationSearch.improve(problem, heuristic, 0.001, line -> { });
        assertTrue(timed.method().contains(": time limit, certified gap "), timed.method());
        assertTrue(timed.traversals().length(network) <= heuristic.traversals().length(network) + 1e-6);
        assertTrue(timed.lowerBound() <= 67444.680 + 1e-6);
    }

    /** The core of Andorra la Vella with every street required once, closed at its first node. */
    private static PostmanProblem andorraLaVella() {
        StreetNetwork network = MixedOsmReference.network("fixtures/benchmarks/mixed-osm/andorra-vella.osm.pbf");
        int start = 0;
        while (network.degree(start) == 0) {
            start++;
        }
        return new PostmanProblem(network, ServiceDemand.of(network, DirectedPostmanTest.all(network), KerbMode.ONE_PASS),
                new int[] {start}, start);
    }
}
