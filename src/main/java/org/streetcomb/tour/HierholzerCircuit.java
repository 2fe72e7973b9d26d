package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.EulerWalk;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.solve.Traversals;

/**
 * The tours through the traversals a solver chose: checks the degree conditions, walks each part with
 * Hierholzer's algorithm ({@link EulerWalk}, the one home of the walk; O(E) time and memory) and marks
 * the service passes. Undirected traversals need even degree at every node; directed ones need in-degree
 * equal to out-degree. The first walk may be open: then its start has one surplus (undirected: odd) end
 * and its end one deficit, and the walk ends there.
 *
 * <p>A traversal is marked as service while its edge still has unmet demand in that direction (or in
 * either direction); the rest are deadhead. The input must satisfy the degree conditions (the solvers
 * guarantee it); a violation is a bug and raises {@link IllegalStateException}.
 */
public final class HierholzerCircuit {

    private HierholzerCircuit() {
    }

    /**
     * One walk from each start node, each covering the traversals reachable from its start; the starts
     * must lie in distinct parts and every traversal must be reachable from one of them.
     *
     * @param end where the first walk ends (its start for a closed walk)
     */
    public static List<Tour> of(StreetNetwork network, Traversals traversals, ServiceDemand demand, int[] starts,
                                int end) {
        boolean directed = traversals.directed();
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] degree = new int[n];
        int[] balance = new int[n];
        for (int e = 0; e < m; e++) {
            int u = network.from(e);
            int v = network.to(e);
            if (directed) {
                balance[u] += traversals.along()[e] - traversals.against()[e];
                balance[v] += traversals.against()[e] - traversals.along()[e];
            } else {
                if (traversals.along()[e] + traversals.against()[e] > 0) {
                    throw new IllegalStateException("edge " + e + " has both directed and undirected traversals");
                }
                degree[u] += traversals.either()[e];
                degree[v] += traversals.either()[e];
            }
        }
        int start0 = starts.length > 0 ? starts[0] : -1;
        for (int v = 0; v < n; v++) {
            int wanted = start0 == end ? 0 : (v == start0 ? 1 : 0) - (v == end ? 1 : 0);
            boolean ok = directed ? balance[v] == wanted : Math.floorMod(degree[v], 2) == Math.abs(wanted);
            if (!ok) {
                throw new IllegalStateException("node " + v + (directed ? " is unbalanced" : " has odd degree")
                        + " after augmentation");
            }
        }
        EulerWalk walk = new EulerWalk(network, traversals);
        int[] dueAlong = demand.along().clone();
        int[] dueAgainst = demand.against().clone();
        int[] dueEither = demand.either().clone();
        List<Tour> tours = new ArrayList<>(starts.length);
        for (int start : starts) {
            int[] steps = walk.from(start);
            int count = steps.length / 2;
            int[] edges = new int[count];
            boolean[] forward = new boolean[count];
            boolean[] service = new boolean[count];
            for (int i = 0; i < count; i++) {
                int e = steps[2 * i];
                edges[i] = e;
                forward[i] = steps[2 * i + 1] == 1;
                int[] due = forward[i] ? dueAlong : dueAgainst;
                if (due[e] > 0) {
                    due[e]--;
                    service[i] = true;
                } else if (dueEither[e] > 0) {
                    dueEither[e]--;
                    service[i] = true;
                }
            }
            tours.add(new Tour(start, edges, forward, service));
        }
        if (walk.remaining() != 0) {
            throw new IllegalStateException(walk.remaining() + " traversals outside the start nodes' parts");
        }
        return tours;
    }
}
