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
        check(problem, source, false, new ArrayList<>());
    }

    /**
     * With {@code leaveOut}, returns the problem without the streets that cannot be serviced on a drivable
     * tour and adds a warning naming them; otherwise throws {@link NoTourError} naming them. Either way it
     * throws when no street to service is left.
     */
    public static PostmanProblem check(PostmanProblem problem, String source, boolean leaveOut, List<String> warnings) {
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
        Set<String> named = new java.util.HashSet<>();
        int demanded = 0;
        int cut = 0;
        boolean[] keep = new boolean[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            if (!demand.needs(e)) {
                continue;
            }
            demanded++;
            int u = network.from(e);
            int v = network.to(e);
            boolean alongOk = Heading.OUTBOUND.allows(network, e, u) && fromStart[u] && toEnd[v];
            boolean againstOk = Heading.OUTBOUND.allows(network, e, v) && fromStart[v] && toEnd[u];
            boolean ok = (demand.along()[e] == 0 || alongOk) && (demand.against()[e] == 0 || againstOk)
                    && (demand.either()[e] == 0 || alongOk || againstOk);
            cut += ok ? 0 : 1;
            keep[e] = ok;
            if (!ok && named.add(network.feature(e).id())) {
                String where = String.format(Locale.ROOT, "%s at %.6f,%.6f", network.feature(e).id(),
                        (network.lon(u) + network.lon(v)) / 2, (network.lat(u) + network.lat(v)) / 2);
                (fromStart[u] || fromStart[v] ? cannotLeave : cannotEnter).add(where);
            }
        }
        if (cut == 0) {
            OpenRouteOrder.check(problem, source);
            return problem;
        }
        List<String> parts = new ArrayList<>();
        if (!cannotEnter.isEmpty()) {
            parts.add(cannotEnter.size() + " streets (by feature) cannot be reached from the start (" + listed(cannotEnter) + ")");
        }
        if (!cannotLeave.isEmpty()) {
            parts.add(cannotLeave.size() + " streets (by feature) cannot be left towards the "
                    + (problem.open() ? "end" : "start") + " (" + listed(cannotLeave) + ")");
        }
        if (leaveOut && cut < demanded) {
            warnings.add("left out, as one-way streets cut them off: " + String.join("; ", parts));
            PostmanProblem kept = new PostmanProblem(network, demand.restrictedTo(keep), problem.starts(), problem.end());
            OpenRouteOrder.check(kept, source);
            return kept;
        }
        String hint = 2 * cut > demanded
                ? ". Many streets are cut off: the depot or end may itself sit on a one-way street that leads away; "
                  + "check the one-way streets around it" : ". Check their one-way direction, or leave them out of the plan (--leave-out-cut-off)";
        throw new NoTourError(source + ": one-way streets cut off some streets to service: " + String.join("; ", parts)
                + hint);
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
