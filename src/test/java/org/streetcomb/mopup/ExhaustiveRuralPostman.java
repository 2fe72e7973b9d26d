package org.streetcomb.mopup;

import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.ServiceDemand;

/**
 * The exact undirected rural postman optimum of a small network by exhaustive search, a test reference
 * independent of the planner's solvers. A walk from {@code start} to {@code end} driving edge e t(e) times
 * exists exactly when the edges with t(e) &gt; 0 are connected and hold the start, and every node has even
 * degree except the two ends of an open walk (Euler). An optimal walk drives no edge more than twice: take
 * two traversals off an edge driven three times or more and the parities and the connection stay. So it
 * tries t(e) in {1, 2} for each edge with demand and {0, 1, 2} for the others, cutting off a branch when a
 * node whose edges are all decided has the wrong parity or the length reaches the best found. Exponential:
 * for networks of a dozen edges.
 */
final class ExhaustiveRuralPostman {

    private final StreetNetwork network;
    private final ServiceDemand demand;
    private final int start;
    private final int end;
    private final int[] lastEdge;
    private final int[] count;
    private final int[] degree;
    private double best = Double.POSITIVE_INFINITY;

    private ExhaustiveRuralPostman(StreetNetwork network, ServiceDemand demand, int start, int end) {
        this.network = network;
        this.demand = demand;
        this.start = start;
        this.end = end;
        this.lastEdge = new int[network.nodeCount()];
        java.util.Arrays.fill(lastEdge, -1);
        for (int e = 0; e < network.edgeCount(); e++) {
            lastEdge[network.from(e)] = e;
            lastEdge[network.to(e)] = e;
        }
        this.count = new int[network.edgeCount()];
        this.degree = new int[network.nodeCount()];
    }

    /** The shortest walk from {@code start} to {@code end} meeting every demand, ignoring demanded directions. */
    static double optimum(StreetNetwork network, ServiceDemand demand, int start, int end) {
        ExhaustiveRuralPostman search = new ExhaustiveRuralPostman(network, demand, start, end);
        search.branch(0, 0);
        return search.best;
    }

    private void branch(int e, double length) {
        if (length >= best) {
            return;
        }
        if (e == network.edgeCount()) {
            if (connected()) {
                best = length;
            }
            return;
        }
        for (int t = demand.needs(e) ? 1 : 0; t <= 2; t++) {
            count[e] = t;
            degree[network.from(e)] += t;
            degree[network.to(e)] += t;
            if (parityHolds(network.from(e), e) && parityHolds(network.to(e), e)) {
                branch(e + 1, length + t * network.length(e));
            }
            degree[network.from(e)] -= t;
            degree[network.to(e)] -= t;
        }
        count[e] = 0;
    }

    private boolean parityHolds(int node, int decided) {
        if (lastEdge[node] != decided) {
            return true;
        }
        boolean odd = start != end && (node == start || node == end);
        return (degree[node] % 2 == 1) == odd;
    }

    private boolean connected() {
        int[] parent = new int[network.nodeCount()];
        for (int v = 0; v < parent.length; v++) {
            parent[v] = v;
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            if (count[e] > 0) {
                parent[root(parent, network.from(e))] = root(parent, network.to(e));
            }
        }
        int home = root(parent, start);
        for (int e = 0; e < network.edgeCount(); e++) {
            if (count[e] > 0 && root(parent, network.from(e)) != home) {
                return false;
            }
        }
        return root(parent, end) == home || start == end;
    }

    private static int root(int[] parent, int v) {
        while (parent[v] != v) {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }
        return v;
    }
}
