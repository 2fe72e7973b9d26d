package org.streetcomb.tour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.streetcomb.TestNetworks;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.GeoJsonReader;
import org.streetcomb.solve.UndirectedPostman;

/** The validator accepts planned tours and rejects each kind of broken walk (common practice). */
class TourValidatorTest {

    private final StreetNetwork demo = TestNetworks.network(
            new GeoJsonReader().read(Path.of("fixtures/demo/brackenford.geojson")).features());
    private final int[] allEdges = IntStream.range(0, demo.edgeCount()).toArray();
    private final Tour planned = TourPlanner.tours(demo, Components.of(demo), UndirectedPostman.solve(demo), 0, false).get(0);

    @Test
    void plannedDemoTourIsValid() {
        assertEquals(List.of(), TourValidator.problems(demo, planned, allEdges));
        assertEquals(0, planned.start());
    }

    @Test
    void droppingTheLastStepLeavesTheTourOpen() {
        int n = planned.steps() - 1;
        Tour open = new Tour(planned.start(), Arrays.copyOf(planned.edges(), n),
                Arrays.copyOf(planned.forward(), n), Arrays.copyOf(planned.service(), n));
        assertTrue(TourValidator.problems(demo, open, allEdges).stream().anyMatch(p -> p.contains("does not return")));
    }

    @Test
    void swappingTwoStepsBreaksContinuity() {
        int[] edges = planned.edges().clone();
        boolean[] forward = planned.forward().clone();
        int i = 3, j = planned.steps() / 2;
        int e = edges[i];
        edges[i] = edges[j];
        edges[j] = e;
        boolean f = forward[i];
        forward[i] = forward[j];
        forward[j] = f;
        Tour broken = new Tour(planned.start(), edges, forward, planned.service());
        assertTrue(TourValidator.problems(demo, broken, allEdges).stream().anyMatch(p -> p.contains("do not share a node")));
    }

    @Test
    void anUncoveredStreetIsReported() {
        Tour partial = new Tour(planned.start(), new int[] {planned.edges()[0], planned.edges()[0]},
                new boolean[] {planned.forward()[0], !planned.forward()[0]}, new boolean[] {true, false});
        assertTrue(TourValidator.problems(demo, partial, allEdges).stream().anyMatch(p -> p.contains("never driven")));
    }
}
