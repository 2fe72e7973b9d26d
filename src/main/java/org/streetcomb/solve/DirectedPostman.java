package org.streetcomb.solve;

import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * The directed Chinese postman problem, solved exactly by minimum-cost flow (Edmonds &amp; Johnson 1973;
 * Beltrami &amp; Bodin 1974): deadhead flows from every node with more service passes in than out to every
 * node with more out than in, along any street in a permitted direction, at minimum total length. The
 * flow runs on the street network itself rather than on a complete graph of shortest paths between
 * unbalanced nodes: the optimum is the same (an optimal flow decomposes into shortest paths) and the
 * network stays sparse. Every node is then balanced; when the service passes alone connect each part
 * (every street to be serviced, in some direction), the tour is optimal.
 *
 * <p>Also the balancing step of the directed rural postman and the re-optimisation of mixed solutions
 * once every street has a direction. The problem must have passed {@link ReachabilityCheck}.
 */
public final class DirectedPostman implements PostmanSolver {


    @Override
    public String method() {
        return "Edmonds & Johnson 1973; Beltrami & Bodin 1974: minimum-cost flow balancing every node";
    }

    @Override
    public boolean exact() {
        return true;
    }

    @Override
    public String complexity() {
        return "one minimum-cost flow on the street network: O(m log U (m + n log n)) by capacity scaling";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        if (!demand.directed()) {
            throw new IllegalStateException("the directed postman needs a direction for every service pass");
        }
        Traversals traversals = balance(problem, demand.along(), demand.against());
        double total = traversals.length(network);
        double deadhead = total - demand.length(network);
        return new Augmentation(traversals, deadhead, UndirectedPostman.oddNodes(network).length,
                "directed postman, exact (minimum-cost flow)", true, total);
    }

    /**
     * Adds to the directed passes {@code along} and {@code against} (not changed) the minimum-length deadhead
     * that balances every node, and returns the total traversals.
     */
    static Traversals balance(PostmanProblem problem, int[] along, int[] against) {
        return balanced(problem, along, against).traversals();
    }

    /**
     * Traversals with their node potentials: sending k more units of deadhead from u to v would cost at
     * least k * (potential[u] - potential[v]).
     */
    record Balanced(Traversals traversals, double[] potential) {
    }

    static Balanced balanced(PostmanProblem problem, int[] along, int[] against) {
        StreetNetwork network = problem.network();
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] supply = new int[n];
        for (int e = 0; e < m; e++) {
            int u = network.from(e);
            int v = network.to(e);
            // a node entered more often than it is left must start deadhead paths
            supply[v] += along[e] - against[e];
            supply[u] += against[e] - along[e];
        }
        for (int v = 0; v < n; v++) {
            supply[v] += problem.endBalance(v);
        }
        MinCostFlow flow = new MinCostFlow(n);
        int[] alongArc = new int[m];
        int[] againstArc = new int[m];
        for (int e = 0; e < m; e++) {
            Travel travel = network.travel(e);
            alongArc[e] = travel == Travel.BACKWARD ? -1
                    : flow.addArc(network.from(e), network.to(e), network.length(e), MinCostFlow.UNBOUNDED);
            againstArc[e] = travel == Travel.FORWARD ? -1
                    : flow.addArc(network.to(e), network.from(e), network.length(e), MinCostFlow.UNBOUNDED);
        }
        int[] x = flow.solve(supply);
        int[] a = along.clone();
        int[] b = against.clone();
        for (int e = 0; e < m; e++) {
            a[e] += alongArc[e] < 0 ? 0 : x[alongArc[e]];
            b[e] += againstArc[e] < 0 ? 0 : x[againstArc[e]];
        }
        return new Balanced(Traversals.directed(a, b), flow.potentials());
    }
}
