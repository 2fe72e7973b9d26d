package org.streetcomb.network;

import java.util.Arrays;

/**
 * Strongly connected components of the drivable arcs, by Tarjan's algorithm (R. Tarjan, "Depth-first
 * search and linear graph algorithms", SIAM J. Computing 1(2), 1972), O(nodes + arcs). Written by hand
 * with an explicit stack over the int-indexed arcs: a library graph would copy every node and arc into
 * boxed objects, and the recursion would overflow the call stack on long one-way chains.
 * Nodes without edges belong to no component (-1).
 */
public final class StrongComponents {

    private final int[] componentOfNode;
    private final int count;

    private StrongComponents(int[] componentOfNode, int count) {
        this.componentOfNode = componentOfNode;
        this.count = count;
    }

    public static StrongComponents of(StreetNetwork network, TravelArcs arcs) {
        int n = network.nodeCount();
        int[] component = new int[n];
        int[] index = new int[n];
        int[] low = new int[n];
        Arrays.fill(component, -1);
        Arrays.fill(index, -1);
        boolean[] onStack = new boolean[n];
        int[] stack = new int[n];
        int[] callNode = new int[n];
        int[] callNext = new int[n];
        int sp = 0;
        int counter = 0;
        int count = 0;
        for (int start = 0; start < n; start++) {
            if (index[start] >= 0 || network.degree(start) == 0) {
                continue;
            }
            int csp = 0;
            index[start] = low[start] = counter++;
            stack[sp++] = start;
            onStack[start] = true;
            callNode[csp] = start;
            callNext[csp++] = arcs.outStart(start);
            while (csp > 0) {
                int v = callNode[csp - 1];
                if (callNext[csp - 1] < arcs.outEnd(v)) {
                    int w = arcs.head(arcs.outArc(callNext[csp - 1]++));
                    if (index[w] < 0) {
                        index[w] = low[w] = counter++;
                        stack[sp++] = w;
                        onStack[w] = true;
                        callNode[csp] = w;
                        callNext[csp++] = arcs.outStart(w);
                    } else if (onStack[w]) {
                        low[v] = Math.min(low[v], index[w]);
                    }
                    continue;
                }
                csp--;
                if (low[v] == index[v]) {
                    int w;
                    do {
                        w = stack[--sp];
                        onStack[w] = false;
                        component[w] = count;
                    } while (w != v);
                    count++;
                }
                if (csp > 0) {
                    int u = callNode[csp - 1];
                    low[u] = Math.min(low[u], low[v]);
                }
            }
        }
        return new StrongComponents(component, count);
    }

    public int count() {
        return count;
    }

    /** The component of {@code node}, or -1 for a node without edges. */
    public int of(int node) {
        return componentOfNode[node];
    }
}
