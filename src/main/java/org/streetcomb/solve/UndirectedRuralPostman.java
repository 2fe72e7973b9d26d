package org.streetcomb.solve;

import java.util.Arrays;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;

/**
 * The undirected rural postman problem (only some streets to service, any street usable to get about;
 * NP-hard), by Frederickson's construction (J. ACM 26, 1979): join the groups of streets to service and
 * the tour's ends by shortest paths along a minimum spanning tree ({@link ComponentConnector}), make the
 * result even by a minimum-cost pairing of its odd nodes ({@link UndirectedPostman}'s matching step),
 * then improve: drive any street at most twice beyond what it needs, and drop doubled deadhead streets
 * whose removal keeps the tour connected (longest first), as in the shortening step of Hertz, Laporte
 * &amp; Nanchen-Hugo (1999).
 *
 * <p>Lower bound: the service length plus the larger of a minimum-cost pairing of the odd nodes of the
 * streets to service (any tour adds deadhead that makes them even) and, for closed tours, the sum of each
 * group's distance to its nearest other group ({@link ComponentConnector#nearestGroupBound}).
 */
public final class UndirectedRuralPostman implements PostmanSolver {

    /** Drop attempts, each a connectivity check of O(E): bounds the improvement on large networks. */
    static final int DROP_ATTEMPTS = 2000;


    @Override
    public String method() {
        return "Frederickson 1979: spanning tree over the groups of streets to service, then minimum-cost pairing; Hertz, Laporte & Nanchen-Hugo 1999 shortening";
    }

    @Override
    public boolean exact() {
        return false;
    }

    @Override
    public String complexity() {
        return "O(g m log n) for g groups of streets to service, plus the pairing of the undirected postman";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int m = network.edgeCount();
        boolean[] serviced = new boolean[m];
        for (int e = 0; e < m; e++) {
            serviced[e] = demand.needs(e);
        }
        ServiceGroups groups = ServiceGroups.of(problem, serviced);
        int[] either = demand.either().clone();
        int[][] links = ComponentConnector.connect(network, groups.group, groups.count, false);
        for (int e = 0; e < m; e++) {
            either[e] += links[0][e] + links[1][e];
        }
        UndirectedPostman.Matched matched = UndirectedPostman.addMatching(problem, either);
        improve(problem, groups, either);
        double service = demand.length(network);
        Traversals traversals = Traversals.undirected(either);
        double total = traversals.length(network);
        double pairing = UndirectedPostman.addMatching(problem, demand.either().clone()).cost();
        double joining = problem.open() ? 0 : ComponentConnector.nearestGroupBound(network, groups.group, groups.count);
        double bound = service + Math.max(pairing, joining);
        String method = "undirected rural postman, heuristic (Frederickson's construction: spanning tree over "
                + groups.count + " groups, " + matched.describe() + "; doubled-street removal)";
        return new Augmentation(traversals, total - service, UndirectedPostman.oddNodes(network).length, method,
                total <= bound + 1e-9 * Math.max(1, total), bound);
    }

    private static void improve(PostmanProblem problem, ServiceGroups groups, int[] either) {
        StreetNetwork network = problem.network();
        int[] need = problem.demand().either();
        for (int e = 0; e < either.length; e++) {
            int floor = Math.max(need[e], 1);
            while (either[e] - 2 >= floor) {
                either[e] -= 2;
            }
        }
        Components components = Components.of(network);
        int[] part = new int[network.nodeCount()];
        for (int v = 0; v < part.length; v++) {
            part[v] = Math.max(components.of(v), 0);
        }
        Integer[] candidates = java.util.stream.IntStream.range(0, either.length)
                .filter(e -> need[e] == 0 && either[e] == 2).boxed().toArray(Integer[]::new);
        Arrays.sort(candidates, (a, b) -> network.length(a) != network.length(b)
                ? Double.compare(network.length(b), network.length(a)) : Integer.compare(a, b));
        for (int i = 0; i < Math.min(candidates.length, DROP_ATTEMPTS); i++) {
            int e = candidates[i];
            either[e] = 0;
            if (!groups.connected(network, part, components.count(), either)) {
                either[e] = 2;
            }
        }
    }
}
