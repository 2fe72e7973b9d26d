package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.quality.MixedOsmReference;

/**
 * The LP bound's cutting planes end on their work budget, never on the clock, and the bound stays below the exact
 * optimum. Instance: the Baltimore window (OpenStreetMap, ODbL; see NOTICE) cut to its strongly connected core;
 * reference: its optimum in fixtures/benchmarks/mixed-osm/values.csv, computed by the integer circulation model in
 * OR-Tools CP-SAT ({@code MixedOsmReference}).
 */
class MixedLpBoundTest {

    @Test
    void aBudgetCutShortGivesTheSameBoundTwiceAndStaysBelowTheOptimum() throws Exception {
        StreetNetwork network = MixedOsmReference.network("fixtures/benchmarks/mixed-osm/baltimore-window.osm.pbf");
        PostmanProblem problem = new PostmanProblem(network, ServiceDemand.everyEdge(network), new int[] {0}, 0);
        // three rounds of at most 20 cuts: far from the end of the separation (62 rounds, 365 cuts)
        MixedLpBound.Limits limits = new MixedLpBound.Limits(3, 20, 100_000, 120);
        MixedLpBound.Result first = MixedLpBound.solve(problem, limits);
        MixedLpBound.Result second = MixedLpBound.solve(problem, limits);
        assertNotNull(first);
        assertEquals(3, first.rounds());
        assertEquals(40, first.cuts(), "20 cuts after each of the first two rounds, the third only re-solves");
        assertFalse(first.stoppedByClock());
        assertEquals(first.bound(), second.bound());
        assertArrayEquals(first.along(), second.along());
        assertArrayEquals(first.against(), second.against());

        double optimum = Files.readAllLines(Path.of("fixtures/benchmarks/mixed-osm/values.csv")).stream()
                .filter(row -> row.startsWith("baltimore-window,")).mapToDouble(row -> Double.parseDouble(row.split(",")[3]))
                .findFirst().orElseThrow();
        MixedLpBound.Result full = MixedLpBound.solve(problem, MixedPostman.LP_LIMITS);
        assertTrue(first.bound() <= full.bound(), "more rounds never lower the bound");
        assertTrue(full.bound() <= optimum + 1e-3 * network.edgeCount(), "bound above the optimum: " + full.bound());
    }
}
