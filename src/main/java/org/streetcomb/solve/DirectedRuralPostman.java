package org.streetcomb.solve;

import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;

/**
 * The directed rural postman problem (NP-hard), by the construction of Christofides, Campos, Corberán
 * &amp; Mota (Math. Programming Study 26, 1986), Frederickson's scheme carried over to one-way streets:
 * join the groups of arcs to service and the tour's ends by shortest drivable paths along a spanning tree
 * ({@link ComponentConnector}), then balance every node by minimum-cost flow ({@link DirectedPostman}).
 * The groups are taken twice: as the service arcs give them, and as they are once the service arcs alone
 * are balanced (the balancing paths often join groups for free); the shorter result is kept.
 * A balanced walk whose arcs are connected is a tour. Improvement: each connecting path is dropped in
 * turn and the flow solved again; the drop is kept when the result is still connected and shorter.
 *
 * <p>Lower bound: the service length plus the minimum-cost flow that balances the service arcs alone
 * (connection relaxed).
 */
public final class DirectedRuralPostman implements PostmanSolver {

    /** Connecting paths tried for removal, each one flow solve. */
    static final int DROP_ATTEMPTS = 60;


    @Override
    public String method() {
        return "Christofides, Campos, Corberan & Mota 1986: spanning tree over the groups of arcs to service, then minimum-cost flow";
    }

    @Override
    public boolean exact() {
        return false;
    }

    @Override
    public String complexity() {
        return "O(g m log n) for g groups, plus one minimum-cost flow per connecting path tried for removal (at most DROP_ATTEMPTS)";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int m = network.edgeCount();
        Traversals balancedService = DirectedPostman.balance(problem, demand.along(), demand.against());
        boolean[] serviced = new boolean[m];
        boolean[] servicedOrBalanced = new boolean[m];
        for (int e = 0; e < m; e++) {
            serviced[e] = demand.needs(e);
            servicedOrBalanced[e] = balancedService.passes(e) > 0;
        }
        ServiceGroups groups = ServiceGroups.of(problem, serviced);
        // joined by its own links, every group is reached; joined as the balanced service arcs group them,
        // the final flow may take other paths than those that joined them, so that tour is checked
        Construction best = construct(problem, groups, groups);
        Construction other = construct(problem, groups, ServiceGroups.of(problem, servicedOrBalanced));
        if (other.traversals.length(network) < best.traversals.length(network) && connected(problem, groups, other.traversals)) {
            best = other;
        }
        double service = demand.length(network);
        double total = best.traversals.length(network);
        double bound = balancedService.length(network);
        String method = "directed rural postman, heuristic (spanning tree over " + best.groups
                + " groups, minimum-cost flow; " + best.dropped + " connecting streets dropped)";
        return new Augmentation(best.traversals, total - service, UndirectedPostman.oddNodes(network).length,
                method, total <= bound + 1e-9 * Math.max(1, total), bound);
    }

    private record Construction(Traversals traversals, int groups, int dropped) {
    }

    /**
     * Links {@code linked}'s groups, balances, then drops connecting streets one at a time while the tour
     * gets shorter and still joins all of {@code groups}.
     */
    private static Construction construct(PostmanProblem problem, ServiceGroups groups, ServiceGroups linked) {
        StreetNetwork network = problem.network();
        int m = network.edgeCount();
        int[][] links = ComponentConnector.connect(network, linked.group, linked.count, true);
        Traversals best = withLinks(problem, links);
        int dropped = 0;
        int[] linkEdges = java.util.stream.IntStream.range(0, m)
                .filter(e -> links[0][e] + links[1][e] > 0).toArray();
        for (int i = 0; i < Math.min(linkEdges.length, DROP_ATTEMPTS); i++) {
            int e = linkEdges[i];
            int[] saved = {links[0][e], links[1][e]};
            links[0][e] = 0;
            links[1][e] = 0;
            Traversals trial = withLinks(problem, links);
            if (trial.length(network) < best.length(network) - 1e-9 && connected(problem, groups, trial)) {
                best = trial;
                dropped++;
            } else {
                links[0][e] = saved[0];
                links[1][e] = saved[1];
            }
        }
        return new Construction(best, linked.count, dropped);
    }

    /** Whether the traversals join every group of streets to service (and the tour's ends). */
    private static boolean connected(PostmanProblem problem, ServiceGroups groups, Traversals traversals) {
        StreetNetwork network = problem.network();
        Components components = Components.of(network);
        int[] part = new int[network.nodeCount()];
        for (int v = 0; v < part.length; v++) {
            part[v] = Math.max(components.of(v), 0);
        }
        return groups.connected(network, part, components.count(), totals(traversals));
    }

    private static Traversals withLinks(PostmanProblem problem, int[][] links) {
        ServiceDemand demand = problem.demand();
        int m = problem.network().edgeCount();
        int[] along = demand.along().clone();
        int[] against = demand.against().clone();
        for (int e = 0; e < m; e++) {
            along[e] += links[0][e];
            against[e] += links[1][e];
        }
        return DirectedPostman.balance(problem, along, against);
    }

    static int[] totals(Traversals traversals) {
        int[] total = new int[traversals.along().length];
        for (int e = 0; e < total.length; e++) {
            total[e] = traversals.passes(e);
        }
        return total;
    }
}
