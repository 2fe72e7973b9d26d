package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * Checks a planned tour independently of how it was made: it is closed and starts and ends at its start
 * node, consecutive steps share a node, no one-way street is driven against its direction, and every
 * edge it must cover is driven at least once. Runs on every plan, O(steps + edges); a failure is a bug in
 * a solver, not bad input.
 */
public final class TourValidator {

    private TourValidator() {
    }

    /** Problems found, empty when the tour is valid; {@code mustCover} lists the edges it must drive. */
    public static List<String> problems(StreetNetwork network, Tour tour, int[] mustCover) {
        List<String> problems = new ArrayList<>();
        int steps = tour.steps();
        if (steps == 0) {
            if (mustCover.length > 0) {
                problems.add("empty tour but edges to cover");
            }
            return problems;
        }
        if (tour.entry(network, 0) != tour.start()) {
            problems.add("first step does not leave the start node " + tour.start());
        }
        if (tour.exit(network, steps - 1) != tour.start()) {
            problems.add("last step does not return to the start node " + tour.start());
        }
        BitSet covered = new BitSet(network.edgeCount());
        for (int i = 0; i < steps; i++) {
            int e = tour.edges()[i];
            covered.set(e);
            if (i > 0 && tour.exit(network, i - 1) != tour.entry(network, i)) {
                problems.add("steps " + i + " and " + (i + 1) + " do not share a node");
            }
            var travel = network.travel(e);
            if (travel.oneWay() && tour.forward()[i] != (travel == Travel.FORWARD)
                    && network.from(e) != network.to(e)) {
                problems.add("step " + (i + 1) + " drives one-way edge " + e + " against its direction");
            }
        }
        int missing = 0;
        for (int e : mustCover) {
            if (!covered.get(e)) {
                missing++;
            }
        }
        if (missing > 0) {
            problems.add(missing + " edges to cover are never driven");
        }
        return problems;
    }
}
