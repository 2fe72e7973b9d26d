package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;

/**
 * An open route through parts of the network that one-way streets join in one direction only (the areas
 * of {@link OpenRouteOrder.Chain}). Inside a strongly connected area the postman methods apply as usual;
 * across areas they do not, since the route leaves each area once and every pass from one area to the
 * next must be the route's own (a connecting path or a balancing flow that crossed again could never
 * come back). So each area is planned on its own, as an open route from where the route enters it to
 * where it leaves, and the areas are joined by the street to service that leads to the next area or, where
 * none does, by the shortest drivable path from the entry point to the next area. The joins are chosen
 * greedily, so the result is a heuristic even where each area's plan is exact; the lower bound is the
 * mixed relaxation of the whole problem ({@link MixedPostman#lowerBound}).
 */
final class AreaChainPostman implements PostmanSolver {


    @Override
    public String method() {
        return "an open route planned area by area through the parts one-way streets join in one direction only, each area by its own variant";
    }

    @Override
    public boolean exact() {
        return false;
    }

    @Override
    public String complexity() {
        return "the chosen variant per area, plus one Dijkstra search per area joined";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        return solve(problem, OpenRouteOrder.chain(problem, "the open route"));
    }

    private Augmentation solve(PostmanProblem problem, OpenRouteOrder.Chain chain) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int m = network.edgeCount();
        int[] along = new int[m];
        int[] against = new int[m];
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        int[] order = chain.order();
        List<String> methods = new ArrayList<>();
        int entry = problem.starts()[0];
        for (int i = 0; i < order.length; i++) {
            int area = order[i];
            int exit;
            int next = -1;
            if (i == order.length - 1) {
                exit = problem.end();
            } else if (chain.crossing()[i] >= 0) {
                int e = chain.crossing()[i];
                boolean forward = chain.areas().of(network.from(e)) == area;
                exit = forward ? network.from(e) : network.to(e);
                next = network.other(e, exit);
                (forward ? along : against)[e]++;
            } else {
                // the path's nodes inside this area come first (it cannot come back once out): the area's
                // own route runs to the last of them, and the rest of the path is the crossing
                exit = entry;
                int node = entry;
                boolean out = false;
                for (int e : pathToArea(network, search, entry, order[i + 1], chain)) {
                    int w = network.other(e, node);
                    if (!out && chain.areas().of(w) != area) {
                        out = true;
                        exit = node;
                    }
                    if (out) {
                        (network.from(e) == node ? along : against)[e]++;
                    }
                    node = w;
                }
                next = node;
            }
            methods.add(planArea(problem, area, entry, exit, chain, along, against, search));
            entry = next;
        }
        addClosedParts(problem, along, against);
        Traversals traversals = Traversals.directed(along, against);
        double total = traversals.length(network);
        double bound = MixedPostman.lowerBound(problem);
        String method = "open route through " + order.length + " parts joined one way by one-way streets, each planned "
                + "on its own (" + String.join("; ", methods.stream().distinct().toList()) + ")";
        return new Augmentation(traversals, total - demand.length(network), UndirectedPostman.oddNodes(network).length,
                method, total <= bound + 1e-9 * Math.max(1, total), bound);
    }

    /** Plans the streets to service inside one area, from {@code entry} to {@code exit}; returns the method. */
    private static String planArea(PostmanProblem problem, int area, int entry, int exit, OpenRouteOrder.Chain chain,
                                   int[] along, int[] against, DijkstraSearch search) {
        StreetNetwork network = problem.network();
        boolean[] inside = new boolean[network.edgeCount()];
        boolean any = false;
        for (int e = 0; e < inside.length; e++) {
            inside[e] = chain.areas().of(network.from(e)) == area && chain.areas().of(network.to(e)) == area;
            any |= inside[e] && problem.demand().needs(e);
        }
        if (!any) {
            search.start(entry);
            search.runTo(exit);
            add(network, entry, search.pathTo(exit), along, against);
            return "a shortest path where nothing is to be serviced";
        }
        PostmanProblem part = new PostmanProblem(network, problem.demand().restrictedTo(inside), new int[] {entry}, exit);
        Augmentation plan = PostmanVariants.solve(part);
        for (int e = 0; e < along.length; e++) {
            along[e] += plan.traversals().along()[e];
            against[e] += plan.traversals().against()[e];
        }
        return plan.method();
    }

    /** The other parts of the network, each a closed tour from its own start, planned together. */
    private static void addClosedParts(PostmanProblem problem, int[] along, int[] against) {
        int[] starts = problem.starts();
        if (starts.length < 2) {
            return;
        }
        StreetNetwork network = problem.network();
        boolean[] first = org.streetcomb.network.Reach.of(network, starts[0], Heading.ANY);
        boolean[] others = new boolean[network.edgeCount()];
        for (int e = 0; e < others.length; e++) {
            others[e] = !first[network.from(e)];
        }
        int[] rest = java.util.Arrays.copyOfRange(starts, 1, starts.length);
        Augmentation plan = PostmanVariants.solve(new PostmanProblem(network, problem.demand().restrictedTo(others),
                rest, rest[0]));
        for (int e = 0; e < along.length; e++) {
            along[e] += plan.traversals().along()[e];
            against[e] += plan.traversals().against()[e];
        }
    }

    /** The shortest drivable path from {@code from} to the nearest node of the area {@code to}. */
    private static int[] pathToArea(StreetNetwork network, DijkstraSearch search, int from, int to,
                                    OpenRouteOrder.Chain chain) {
        search.start(from);
        for (int v = search.next(); v >= 0; v = search.next()) {
            if (chain.areas().of(v) == to) {
                return search.pathTo(v);
            }
        }
        throw new IllegalStateException("area " + to + " unreachable though the chain was checked");
    }

    private static void add(StreetNetwork network, int from, int[] path, int[] along, int[] against) {
        int node = from;
        for (int e : path) {
            boolean forward = network.from(e) == node;
            (forward ? along : against)[e]++;
            node = network.other(e, node);
        }
    }
}
