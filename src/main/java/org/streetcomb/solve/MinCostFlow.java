package org.streetcomb.solve;

import com.google.ortools.Loader;
import com.google.ortools.graph.MinCostFlowBase;
import java.util.Arrays;

/**
 * A minimum-cost flow over arcs given by int ids, solved by OR-Tools' {@code MinCostFlow} (Goldberg's cost
 * scaling push-relabel, O(n^2 m log(n C)); Apache-2.0), used by the directed, mixed and rural solvers. This class
 * keeps the arcs in primitive arrays, hands them to OR-Tools and reads the flow back.
 *
 * <p>OR-Tools prices arcs in whole units, so lengths are scaled to micrometres (rounded); the flow is optimal for
 * the scaled costs, which moves a total by at most a micrometre per unit of flow on each arc, far below the
 * millimetres the outputs print. Costs too large for OR-Tools' 64-bit cost scaling are retried in millimetres.
 *
 * <p>Node potentials (the dual solution) are not exposed by OR-Tools' Java interface; they are recovered from the
 * optimal flow as shortest distances in its residual network (Bellman-Ford with a FIFO queue, exact in the
 * scaled integer costs; an optimal flow leaves no negative cycle). It replaces JGraphT's capacity scaling; the
 * solvers' tests against exact optima (MixedPostmanTest, MixedOsmTest, PostmanSolverContractTest) hold with it.
 * Its speed against the old flow is not measured yet.
 */
final class MinCostFlow {

    /** Capacity that no flow here can reach: every unit is one deadhead traversal. */
    static final int UNBOUNDED = Integer.MAX_VALUE;

    /** Scaled cost units per metre tried in turn: micrometres, then millimetres. */
    private static final double[] SCALES = {1e6, 1e3};

    private int[] tails = new int[64];
    private int[] heads = new int[64];
    private double[] costs = new double[64];
    private int[] capacities = new int[64];
    private int arcs;
    private final int nodes;
    private double[] potential;

    MinCostFlow(int nodes) {
        this.nodes = nodes;
    }

    /** Adds an arc and returns its id. */
    int addArc(int tail, int head, double cost, int capacity) {
        if (arcs == tails.length) {
            tails = Arrays.copyOf(tails, 2 * arcs);
            heads = Arrays.copyOf(heads, 2 * arcs);
            costs = Arrays.copyOf(costs, 2 * arcs);
            capacities = Arrays.copyOf(capacities, 2 * arcs);
        }
        tails[arcs] = tail;
        heads[arcs] = head;
        costs[arcs] = cost;
        capacities[arcs] = capacity;
        return arcs++;
    }

    /**
     * Node potentials of the last solution: the reduced cost {@code cost - potential[tail] + potential[head]} of
     * every arc with spare capacity is at least zero, so any path from u to v in the residual network costs at
     * least {@code potential[u] - potential[v]}.
     */
    double[] potentials() {
        return potential;
    }

    /**
     * The flow on each arc of a minimum-cost flow that sends {@code supply[v]} units out of every node
     * (negative: into it). The supplies must sum to zero and be routable; otherwise this is a bug upstream.
     */
    int[] solve(int[] supply) {
        int[] flow = new int[arcs];
        potential = new double[nodes];
        boolean any = false;
        long total = 0;
        for (int s : supply) {
            any |= s != 0;
            total += Math.abs(s);
        }
        if (!any) {
            return flow;
        }
        Loader.loadNativeLibraries();
        // no arc needs more than every unit of supply: a finite capacity keeps OR-Tools' sums in range
        long cap = Math.max(1, total);
        for (double scale : SCALES) {
            com.google.ortools.graph.MinCostFlow solver = new com.google.ortools.graph.MinCostFlow(nodes, arcs);
            try {
                long[] scaled = new long[arcs];
                for (int a = 0; a < arcs; a++) {
                    scaled[a] = Math.round(costs[a] * scale);
                    solver.addArcWithCapacityAndUnitCost(tails[a], heads[a], Math.min(cap, capacities[a]), scaled[a]);
                }
                for (int v = 0; v < nodes; v++) {
                    if (supply[v] != 0) {
                        solver.setNodeSupply(v, supply[v]);
                    }
                }
                MinCostFlowBase.Status status = solver.solve();
                if (status == MinCostFlowBase.Status.BAD_COST_RANGE) {
                    continue;
                }
                if (status != MinCostFlowBase.Status.OPTIMAL) {
                    throw new IllegalStateException("minimum-cost flow: " + status);
                }
                for (int a = 0; a < arcs; a++) {
                    flow[a] = (int) solver.getFlow(a);
                }
                residualPotentials(flow, scaled, cap, scale);
                return flow;
            } finally {
                solver.delete();
            }
        }
        throw new IllegalStateException("minimum-cost flow: arc lengths out of range");
    }

    /**
     * Sets {@link #potential} to minus the shortest distance from a virtual source joined to every node at no cost,
     * over the residual network of {@code flow}: O(n m) worst case, near-linear on street networks. Should the
     * relaxations pass a generous work limit, the potentials stay zero (they only rank candidate moves).
     */
    private void residualPotentials(int[] flow, long[] scaled, long cap, double scale) {
        int[] start = new int[nodes + 1];
        for (int a = 0; a < arcs; a++) {
            if (flow[a] < Math.min(cap, capacities[a])) {
                start[tails[a] + 1]++;
            }
            if (flow[a] > 0) {
                start[heads[a] + 1]++;
            }
        }
        for (int v = 0; v < nodes; v++) {
            start[v + 1] += start[v];
        }
        int[] fill = Arrays.copyOf(start, nodes);
        int[] to = new int[start[nodes]];
        long[] cost = new long[start[nodes]];
        for (int a = 0; a < arcs; a++) {
            if (flow[a] < Math.min(cap, capacities[a])) {
                to[fill[tails[a]]] = heads[a];
                cost[fill[tails[a]]++] = scaled[a];
            }
            if (flow[a] > 0) {
                to[fill[heads[a]]] = tails[a];
                cost[fill[heads[a]]++] = -scaled[a];
            }
        }
        long[] distance = new long[nodes];
        int[] queue = new int[nodes];
        boolean[] queued = new boolean[nodes];
        for (int v = 0; v < nodes; v++) {
            queue[v] = v;
            queued[v] = true;
        }
        int head = 0;
        int size = nodes;
        long work = 0;
        long limit = 64L * (nodes + to.length) + 1_000_000;
        while (size > 0) {
            int u = queue[head];
            head = head + 1 == nodes ? 0 : head + 1;
            size--;
            queued[u] = false;
            for (int i = start[u]; i < start[u + 1]; i++) {
                if (++work > limit) {
                    return;
                }
                int v = to[i];
                if (distance[u] + cost[i] < distance[v]) {
                    distance[v] = distance[u] + cost[i];
                    if (!queued[v]) {
                        queued[v] = true;
                        queue[(head + size) % nodes] = v;
                        size++;
                    }
                }
            }
        }
        for (int v = 0; v < nodes; v++) {
            potential[v] = -distance[v] / scale;
        }
    }
}
