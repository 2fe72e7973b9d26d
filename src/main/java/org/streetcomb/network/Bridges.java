package org.streetcomb.network;

import java.util.Arrays;

/**
 * The bridges of the street network taken as an undirected multigraph: the edges whose removal leaves
 * their two ends in separate parts. Tarjan's low-point method (R. E. Tarjan, "A note on finding the
 * bridges of a graph", Information Processing Letters 2(6), 1974), O(nodes + edges). Written by hand with
 * an explicit stack over the int-indexed incidence lists: a recursive search (JGraphT's
 * BiconnectivityInspector) overflows the call stack on a network of some ten thousand edges. Parallel
 * edges are never bridges (only the edge a node was entered by is skipped, not its twin); loops never are.
 */
public final class Bridges {

    private Bridges() {
    }

    /** The bridges' edge ids, ascending. */
    public static int[] of(StreetNetwork network) {
        int n = network.nodeCount();
        int[] index = new int[n];
        int[] low = new int[n];
        Arrays.fill(index, -1);
        int[] callNode = new int[n];
        int[] callEdge = new int[n];
        int[] callNext = new int[n];
        boolean[] bridge = new boolean[network.edgeCount()];
        int counter = 0;
        for (int start = 0; start < n; start++) {
            if (index[start] >= 0) {
                continue;
            }
            int csp = 0;
            index[start] = low[start] = counter++;
            callNode[csp] = start;
            callEdge[csp] = -1;
            callNext[csp++] = network.incidenceStart(start);
            while (csp > 0) {
                int v = callNode[csp - 1];
                if (callNext[csp - 1] < network.incidenceEnd(v)) {
                    int e = network.incidentEdge(callNext[csp - 1]++);
                    if (e == callEdge[csp - 1]) {
                        continue;
                    }
                    int w = network.other(e, v);
                    if (index[w] < 0) {
                        index[w] = low[w] = counter++;
                        callNode[csp] = w;
                        callEdge[csp] = e;
                        callNext[csp++] = network.incidenceStart(w);
                    } else {
                        low[v] = Math.min(low[v], index[w]);
                    }
                    continue;
                }
                int entered = callEdge[--csp];
                if (csp > 0) {
                    int u = callNode[csp - 1];
                    low[u] = Math.min(low[u], low[v]);
                    if (low[v] > index[u]) {
                        bridge[entered] = true;
                    }
                }
            }
        }
        int count = 0;
        for (boolean b : bridge) {
            count += b ? 1 : 0;
        }
        int[] bridges = new int[count];
        for (int e = 0, k = 0; e < bridge.length; e++) {
            if (bridge[e]) {
                bridges[k++] = e;
            }
        }
        return bridges;
    }
}
