package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.ServiceDemand;

/**
 * Checks a planned tour independently of how it was made: it leaves its start node and ends where asked
 * (back at the start for a closed tour), consecutive steps share a node, no one-way street is driven
 * against its direction, and its service steps meet the demand of every edge it must cover, in the
 * demanded directions, without claiming more service than demanded. Runs on every plan, O(steps + edges);
 * a failure is a bug in a solver, not bad input.
 */
public final class TourValidator {

    private TourValidator() {
    }

    /** Problems of a closed tour that must drive each of {@code mustCover} at least once, in any direction. */
    public static List<String> problems(StreetNetwork network, Tour tour, int[] mustCover) {
        return problems(network, tour, ServiceDemand.everyEdge(network), mustCover, tour.start());
    }

    /**
     * Problems found, empty when the tour is valid.
     *
     * @param mustCover the edges whose demand this tour must meet
     * @param end       the node the tour must end at
     */
    public static List<String> problems(StreetNetwork network, Tour tour, ServiceDemand demand, int[] mustCover,
                                        int end) {
        List<String> problems = new ArrayList<>();
        int steps = tour.steps();
        if (steps == 0) {
            for (int e : mustCover) {
                if (demand.needs(e)) {
                    problems.add("empty tour but edges to cover");
                    break;
                }
            }
            return problems;
        }
        if (tour.entry(network, 0) != tour.start()) {
            problems.add("first step does not leave the start node " + tour.start());
        }
        if (tour.exit(network, steps - 1) != end) {
            problems.add(end == tour.start() ? "last step does not return to the start node " + end
                    : "last step does not end at node " + end);
        }
        int m = network.edgeCount();
        boolean[] driven = new boolean[m];
        int[] servedAlong = new int[m];
        int[] servedAgainst = new int[m];
        for (int i = 0; i < steps; i++) {
            int e = tour.edges()[i];
            if (i > 0 && tour.exit(network, i - 1) != tour.entry(network, i)) {
                problems.add("steps " + i + " and " + (i + 1) + " do not share a node");
            }
            driven[e] = true;
            Travel travel = network.travel(e);
            if (travel.oneWay() && tour.forward()[i] != (travel == Travel.FORWARD)
                    && network.from(e) != network.to(e)) {
                problems.add("step " + (i + 1) + " drives one-way edge " + e + " against its direction");
            }
            if (tour.service()[i]) {
                (tour.forward()[i] ? servedAlong : servedAgainst)[e]++;
            }
        }
        int undriven = 0;
        int unmet = 0;
        int overclaimed = 0;
        for (int e : mustCover) {
            if (demand.needs(e) && !driven[e]) {
                undriven++;
                continue;
            }
            int along = servedAlong[e];
            int against = servedAgainst[e];
            boolean loop = network.from(e) == network.to(e);
            int extraAlong = along - demand.along()[e];
            int extraAgainst = against - demand.against()[e];
            if (loop) {
                // a loop has no direction to tell its passes apart
                int extra = along + against - demand.passes(e);
                if (extra < 0) {
                    unmet++;
                } else if (extra > 0) {
                    overclaimed++;
                }
            } else if (Math.min(extraAlong, 0) + Math.min(extraAgainst, 0) < 0) {
                unmet++;
            } else if (extraAlong + extraAgainst != demand.either()[e]) {
                if (extraAlong + extraAgainst < demand.either()[e]) {
                    unmet++;
                } else {
                    overclaimed++;
                }
            }
        }
        if (undriven > 0) {
            problems.add(undriven + " edges to cover are never driven");
        }
        if (unmet > 0) {
            problems.add(unmet + " edges to cover are not serviced as demanded");
        }
        if (overclaimed > 0) {
            problems.add(overclaimed + " edges are marked as serviced more often than demanded");
        }
        return problems;
    }
}
