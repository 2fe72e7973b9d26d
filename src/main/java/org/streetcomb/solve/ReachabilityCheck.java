package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Heading;
import org.streetcomb.network.Reach;
import org.streetcomb.network.StreetNetwork;

/**
 * Checks, before solving, that a vehicle can drive every street to be serviced: enter it from the tour's
 * start, and leave it to reach the tour's end. With one-way streets a network can be connected on the map
 * yet not strongly connected (a one-way street leading out of the layer, into a dead end, or a one-way
 * pair cut at the edge of an extract). Such streets are named, with their locations, instead of failing
 * obscurely in the solver. Two breadth-first searches per tour, O(V + E).
 */
public final class ReachabilityCheck {

    /** Streets named in the message; the rest are counted. */
    private static final int LISTED = 5;

    private ReachabilityCheck() {
    }

    /** Throws {@link NoTourError} naming the streets that cannot be serviced on a drivable tour. */
    public static void check(PostmanProblem problem, String source) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        boolean[] fromStart = new boolean[network.nodeCount()];
        boolean[] toEnd = new boolean[network.nodeCount()];
        for (int t = 0; t < problem.starts().length; t++) {
            int start = problem.starts()[t];
            int end = t == 0 ? problem.end() : start;
            or(fromStart, Reach.of(network, start, Heading.OUTBOUND));
            or(toEnd, Reach.of(network, end, Heading.INBOUND));
        }
        Set<String> cannotEnter = new LinkedHashSet<>();
        Set<String> cannotLeave = new LinkedHashSet<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            if (!demand.needs(e)) {
                continue;
            }
            int u = network.from(e);
            int v = network.to(e);
            boolean alongOk = Heading.OUTBOUND.allows(network, e, u) && fromStart[u] && toEnd[v];
            boolean againstOk = Heading.OUTBOUND.allows(network, e, v) && fromStart[v] && toEnd[u];
            boolean ok = (demand.along()[e] == 0 || alongOk) && (demand.against()[e] == 0 || againstOk)
                    && (demand.either()[e] == 0 || alongOk || againstOk);
            if (!ok) {
                String where = String.format(Locale.ROOT, "%s at %.6f,%.6f", network.feature(e).id(),
                        (network.lon(u) + network.lon(v)) / 2, (network.lat(u) + network.lat(v)) / 2);
                (fromStart[u] || fromStart[v] ? cannotLeave : cannotEnter).add(where);
            }
        }
        if (cannotEnter.isEmpty() && cannotLeave.isEmpty()) {
            return;
        }
        List<String> parts = new ArrayList<>();
        if (!cannotEnter.isEmpty()) {
            parts.add(cannotEnter.size() + " streets cannot be reached from the start (" + listed(cannotEnter) + ")");
        }
        if (!cannotLeave.isEmpty()) {
            parts.add(cannotLeave.size() + " streets cannot be left towards the "
                    + (problem.open() ? "end" : "start") + " (" + listed(cannotLeave) + ")");
        }
        throw new NoTourError(source + ": one-way streets cut off some streets to service: " + String.join("; ", parts)
                + ". Check their one-way direction, or leave them out of the plan");
    }

    private static String listed(Set<String> streets) {
        List<String> shown = new ArrayList<>();
        for (String s : streets) {
            if (shown.size() == LISTED) {
                shown.add("and " + (streets.size() - LISTED) + " more");
                break;
            }
            shown.add(s);
        }
        return String.join(", ", shown);
    }

    private static void or(boolean[] into, boolean[] from) {
        for (int i = 0; i < into.length; i++) {
            into[i] |= from[i];
        }
    }
}
