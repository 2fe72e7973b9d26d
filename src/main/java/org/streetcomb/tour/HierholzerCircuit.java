package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.solve.Traversals;

/**
 * Euler walks through the traversals a solver chose, by Hierholzer's algorithm (C. Hierholzer, 1873),
 * iteratively with an explicit stack so a million-edge part does not overflow the call stack. O(E) time
 * and memory. Undirected traversals need even degree at every node; directed ones need in-degree equal to
 * out-degree. The first walk may be open: then its start has one surplus (undirected: odd) end and its end
 * one deficit, and the walk ends there.
 *
 * <p>A traversal is marked as service while its edge still has unmet demand in that direction (or in
 * either direction); the rest are deadhead. The input must satisfy the degree conditions (the solvers
 * guarantee it); a violation is a bug and raises {@link IllegalStateException}.
 */
public final class HierholzerCircuit {

    private static final byte ALONG = 0;
    private static final byte AGAINST = 1;
    private static final byte EITHER = 2;

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
        boolean directed = traversals.isDirected();
        int n = network.nodeCount();
        int m = network.edgeCount();
        int instances = 0;
        for (int e = 0; e < m; e++) {
            instances += traversals.total(e);
        }
        int[] instanceEdge = new int[instances];
        byte[] instanceKind = new byte[instances];
        int[] nodeStart = new int[n + 1];
        int[] balance = new int[n];
        int c = 0;
        for (int e = 0; e < m; e++) {
            int u = network.from(e);
            int v = network.to(e);
            c = fill(instanceEdge, instanceKind, c, e, ALONG, traversals.along()[e]);
            c = fill(instanceEdge, instanceKind, c, e, AGAINST, traversals.against()[e]);
            c = fill(instanceEdge, instanceKind, c, e, EITHER, traversals.either()[e]);
            if (directed) {
                nodeStart[u + 1] += traversals.along()[e];
                nodeStart[v + 1] += traversals.against()[e];
                balance[u] += traversals.along()[e] - traversals.against()[e];
                balance[v] += traversals.against()[e] - traversals.along()[e];
            } else {
                if (traversals.along()[e] + traversals.against()[e] > 0) {
                    throw new IllegalStateException("edge " + e + " has both directed and undirected traversals");
                }
                nodeStart[u + 1] += traversals.either()[e];
                nodeStart[v + 1] += traversals.either()[e];
            }
        }
        int start0 = starts.length > 0 ? starts[0] : -1;
        for (int v = 0; v < n; v++) {
            int wanted = start0 == end ? 0 : (v == start0 ? 1 : 0) - (v == end ? 1 : 0);
            boolean ok = directed ? balance[v] == wanted : Math.floorMod(nodeStart[v + 1], 2) == Math.abs(wanted);
            if (!ok) {
                throw new IllegalStateException("node " + v + (directed ? " is unbalanced" : " has odd degree")
                        + " after augmentation");
            }
        }
        for (int v = 0; v < n; v++) {
            nodeStart[v + 1] += nodeStart[v];
        }
        int[] incident = new int[directed ? instances : 2 * instances];
        int[] fill = nodeStart.clone();
        for (int i = 0; i < instances; i++) {
            int e = instanceEdge[i];
            if (instanceKind[i] == AGAINST) {
                incident[fill[network.to(e)]++] = i;
            } else {
                incident[fill[network.from(e)]++] = i;
                if (instanceKind[i] == EITHER) {
                    incident[fill[network.to(e)]++] = i;
                }
            }
        }
        int[] next = nodeStart.clone();
        boolean[] used = new boolean[instances];
        int[] stackNode = new int[instances + 1];
        int[] stackInstance = new int[instances + 1];
        int[] dueAlong = demand.along().clone();
        int[] dueAgainst = demand.against().clone();
        int[] dueEither = demand.either().clone();
        List<Tour> tours = new ArrayList<>(starts.length);
        int remaining = instances;
        for (int start : starts) {
            int top = 0;
            stackNode[0] = start;
            stackInstance[0] = -1;
            // popped traversals come out in reverse driving order
            int[] reversedEdges = new int[remaining];
            boolean[] reversedForward = new boolean[remaining];
            int count = 0;
            while (top >= 0) {
                int v = stackNode[top];
                while (next[v] < nodeStart[v + 1] && used[incident[next[v]]]) {
                    next[v]++;
                }
                if (next[v] < nodeStart[v + 1]) {
                    int i = incident[next[v]++];
                    used[i] = true;
                    top++;
                    stackNode[top] = network.other(instanceEdge[i], v);
                    stackInstance[top] = i;
                } else {
                    if (top > 0) {
                        int i = stackInstance[top];
                        int e = instanceEdge[i];
                        reversedEdges[count] = e;
                        reversedForward[count] = instanceKind[i] == EITHER
                                ? network.from(e) == stackNode[top - 1] : instanceKind[i] == ALONG;
                        count++;
                    }
                    top--;
                }
            }
            remaining -= count;
            int[] edges = new int[count];
            boolean[] forward = new boolean[count];
            boolean[] service = new boolean[count];
            for (int i = 0; i < count; i++) {
                int e = reversedEdges[count - 1 - i];
                edges[i] = e;
                forward[i] = reversedForward[count - 1 - i];
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
        if (remaining != 0) {
            throw new IllegalStateException(remaining + " traversals outside the start nodes' parts");
        }
        return tours;
    }

    private static int fill(int[] instanceEdge, byte[] instanceKind, int c, int edge, byte kind, int count) {
        for (int k = 0; k < count; k++) {
            instanceEdge[c] = edge;
            instanceKind[c++] = kind;
        }
        return c;
    }
}
