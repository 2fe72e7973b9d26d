package org.streetcomb.solve;

import java.util.Arrays;
import java.util.Map;
import org.jgrapht.Graph;
import org.jgrapht.alg.flow.mincost.CapacityScalingMinimumCostFlow;
import org.jgrapht.alg.flow.mincost.MinimumCostFlowProblem;
import org.jgrapht.alg.interfaces.MinimumCostFlowAlgorithm;
import org.jgrapht.graph.builder.GraphTypeBuilder;

/**
 * A minimum-cost flow over arcs given by int ids, solved by JGraphT's capacity-scaling algorithm
 * (Edmonds &amp; Karp's scaling with successive shortest paths; integral supplies and capacities, real
 * costs). This class only translates between the solvers' primitive arrays and JGraphT's graph.
 *
 * <p>JGraphT 1.5.3 prices arcs by the graph's edge weights and ignores the problem's cost function (seen
 * here: an unweighted graph gave every arc cost 1), so the costs are set as edge weights.
 */
final class MinCostFlow {

    /** Capacity that no flow here can reach: every unit is one deadhead traversal. */
    static final int UNBOUNDED = CapacityScalingMinimumCostFlow.CAP_INF;

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
     * Node potentials of the last solution (JGraphT's dual solution): the reduced cost
     * {@code cost - potential[tail] + potential[head]} of every arc with spare capacity is at least zero, so
     * any path from u to v in the residual network costs at least {@code potential[u] - potential[v]}.
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
        for (int s : supply) {
            any |= s != 0;
        }
        if (!any) {
            return flow;
        }
        Graph<Integer, Integer> graph = GraphTypeBuilder.<Integer, Integer>directed()
                .allowingMultipleEdges(true).allowingSelfLoops(true).weighted(true).buildGraph();
        boolean[] present = new boolean[nodes];
        for (int a = 0; a < arcs; a++) {
            if (tails[a] == heads[a]) {
                continue;
            }
            for (int v : new int[] {tails[a], heads[a]}) {
                if (!present[v]) {
                    present[v] = true;
                    graph.addVertex(v);
                }
            }
            graph.addEdge(tails[a], heads[a], a);
            graph.setEdgeWeight(a, costs[a]);
        }
        for (int v = 0; v < nodes; v++) {
            if (supply[v] != 0 && !present[v]) {
                throw new IllegalStateException("node " + v + " has supply " + supply[v] + " but no arcs");
            }
        }
        MinimumCostFlowProblem<Integer, Integer> problem = new MinimumCostFlowProblem.MinimumCostFlowProblemImpl<>(
                graph, v -> supply[v], a -> capacities[a], a -> 0, a -> costs[a]);
        CapacityScalingMinimumCostFlow<Integer, Integer> algorithm = new CapacityScalingMinimumCostFlow<>();
        MinimumCostFlowAlgorithm.MinimumCostFlow<Integer> result = algorithm.getMinimumCostFlow(problem);
        for (Map.Entry<Integer, Double> entry : algorithm.getDualSolution().entrySet()) {
            potential[entry.getKey()] = entry.getValue();
        }
        for (Map.Entry<Integer, Double> entry : result.getFlowMap().entrySet()) {
            flow[entry.getKey()] = (int) Math.round(entry.getValue());
        }
        return flow;
    }
}
