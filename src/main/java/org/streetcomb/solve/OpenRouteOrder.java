package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Heading;
import org.streetcomb.network.Reach;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.network.StrongComponents;
import org.streetcomb.network.TravelArcs;

/**
 * Checks that an open route (start and end apart) can take, in one order, the areas that one-way streets
 * join in one direction only. Within a strongly connected area a vehicle goes anywhere and back; between
 * areas it can only go on. So the areas holding streets to service, with the start's first and the end's
 * last, must follow one another along drivable ways, and a street to service that leads from one area to
 * another must lead to the next one in that order and be the only such pass, since the route leaves each
 * area once. Each street can pass the per-street check of {@link ReachabilityCheck} (reachable from the
 * start, the end reachable from it) and the set still be impossible: two one-way streets leading out of
 * the same area, say. Strong components by Tarjan's algorithm, which numbers them so that every arc
 * between two runs from a higher number to a lower one; then one search between each pair of consecutive
 * areas, over the areas numbered between them only, so O(nodes + arcs) in all.
 */
final class OpenRouteOrder {

    private OpenRouteOrder() {
    }

    /**
     * The areas an open route must pass, in order, with the street to service leading from each to the
     * next (-1 where none does).
     *
     * @param areas     the strong components of the network
     * @param order     the areas holding the start, the end or streets to service, from the start's to the end's
     * @param crossing  for each area in {@code order} but the last, the edge to service leading to the next, or -1
     */
    record Chain(StrongComponents areas, int[] order, int[] crossing) {
    }

    /** Throws {@link NoTourError} naming two streets that no single open route can service together. */
    static void check(PostmanProblem problem, String source) {
        if (problem.open()) {
            chain(problem, source);
        }
    }

    /** The chain of areas of an open route; throws {@link NoTourError} when no single route can service them. */
    static Chain chain(PostmanProblem problem, String source) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        TravelArcs arcs = new TravelArcs(network);
        StrongComponents areas = StrongComponents.of(network, arcs);
        int start = problem.starts()[0];
        int end = problem.end();
        boolean[] part = Reach.of(network, start, Heading.ANY);
        int k = areas.count();
        String[] street = new String[k];
        int[] node = new int[k];
        Arrays.fill(node, -1);
        mark(areas.of(start), start, "the start", street, node);
        mark(areas.of(end), end, "the end", street, node);
        List<int[]> crossings = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            if (!demand.needs(e) || !part[network.from(e)]) {
                continue;
            }
            int u = network.from(e);
            int v = network.to(e);
            int passes = demand.along()[e] + demand.against()[e] + demand.either()[e];
            String name = describe(network, e);
            if (areas.of(u) == areas.of(v)) {
                mark(areas.of(u), u, name, street, node);
                continue;
            }
            // a pass between areas runs the only way the street permits
            int tail = demand.against()[e] > 0 || demand.either()[e] > 0 && !Heading.OUTBOUND.allows(network, e, u) ? v : u;
            int head = network.other(e, tail);
            mark(areas.of(tail), tail, name, street, node);
            mark(areas.of(head), head, name, street, node);
            crossings.add(new int[] {areas.of(tail), areas.of(head), e, passes});
        }
        int[] order = java.util.stream.IntStream.range(0, k).filter(a -> node[a] >= 0)
                .boxed().sorted((a, b) -> Integer.compare(b, a)).mapToInt(Integer::intValue).toArray();
        int[] position = new int[k];
        for (int i = 0; i < order.length; i++) {
            position[order[i]] = i;
        }
        if (order[0] != areas.of(start) || order[order.length - 1] != areas.of(end)) {
            throw refused(source, street[order[0]] + " cannot be reached after the start, or " + street[order[order.length - 1]]
                    + " cannot be left for the end");
        }
        for (int i = 0; i + 1 < order.length; i++) {
            if (!reaches(network, arcs, areas, node[order[i]], order[i + 1], order[i])) {
                throw refused(source, street[order[i]] + " and " + street[order[i + 1]]
                        + " lie in parts of the network that one-way streets join so that neither leads to the other "
                        + "on the way from the start to the end");
            }
        }
        int[] leaving = new int[k];
        Arrays.fill(leaving, -1);
        int[] crossing = new int[Math.max(0, order.length - 1)];
        Arrays.fill(crossing, -1);
        for (int[] c : crossings) {
            if (position[c[1]] != position[c[0]] + 1) {
                throw refused(source, describe(network, c[2]) + " leads one way from " + street[c[0]] + "'s part of "
                        + "the network past " + street[order[position[c[0]] + 1]] + ", which the route could then not reach");
            }
            if (leaving[c[0]] >= 0 || c[3] > 1) {
                String other = leaving[c[0]] >= 0 ? describe(network, leaving[c[0]]) : "a second pass of it";
                throw refused(source, describe(network, c[2]) + " and " + other + " both lead one way out of the same "
                        + "part of the network, which an open route leaves only once");
            }
            leaving[c[0]] = c[2];
            crossing[position[c[0]]] = c[2];
        }
        return new Chain(areas, order, crossing);
    }

    private static void mark(int area, int at, String name, String[] street, int[] node) {
        if (node[area] < 0) {
            node[area] = at;
            street[area] = name;
        }
    }

    /** Whether {@code to} is reachable from {@code from}, searching only areas numbered from {@code to} to {@code fromArea}. */
    private static boolean reaches(StreetNetwork network, TravelArcs arcs, StrongComponents areas, int from, int to,
                                   int fromArea) {
        boolean[] seen = new boolean[network.nodeCount()];
        int[] queue = new int[network.nodeCount()];
        int head = 0, tail = 0;
        queue[tail++] = from;
        seen[from] = true;
        while (head < tail) {
            int v = queue[head++];
            if (areas.of(v) == to) {
                return true;
            }
            for (int i = arcs.outStart(v); i < arcs.outEnd(v); i++) {
                int w = arcs.head(arcs.outArc(i));
                int a = areas.of(w);
                if (!seen[w] && a >= to && a <= fromArea) {
                    seen[w] = true;
                    queue[tail++] = w;
                }
            }
        }
        return false;
    }

    private static String describe(StreetNetwork network, int e) {
        int u = network.from(e);
        int v = network.to(e);
        return String.format(Locale.ROOT, "%s at %.6f,%.6f", network.feature(e).id(),
                (network.lon(u) + network.lon(v)) / 2, (network.lat(u) + network.lat(v)) / 2);
    }

    private static NoTourError refused(String source, String why) {
        return new NoTourError(source + ": no single route from the start to the end can service every street: " + why
                + ". Check these one-way streets, plan a closed tour, or service the parts separately");
    }
}
