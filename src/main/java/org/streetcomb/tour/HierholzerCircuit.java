package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;

/**
 * Euler circuits of the connected components of a network in which every edge is taken once plus its
 * deadhead copies, by Hierholzer's algorithm (C. Hierholzer, 1873), iteratively with an explicit stack so
 * a million-edge component does not overflow the call stack. O(E) time and memory.
 *
 * <p>The first traversal of each street in driving order is marked as its service; the others are
 * deadhead. The input must have even degree at every node once copies are counted (the postman solvers
 * guarantee it); an odd node is a bug and raises {@link IllegalStateException}.
 */
public final class HierholzerCircuit {

    private HierholzerCircuit() {
    }

    /**
     * One circuit from each start node, each covering the component of its start; the start nodes must lie
     * in distinct components.
     *
     * @param copies  extra traversals per edge
     * @param starts  the start and end node of each circuit
     * @param include which edges to traverse (those of the starts' components)
     */
    public static List<Tour> of(StreetNetwork network, int[] copies, int[] starts, boolean[] include) {
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] firstInstance = new int[m + 1];
        for (int e = 0; e < m; e++) {
            firstInstance[e + 1] = firstInstance[e] + (include[e] ? 1 + copies[e] : 0);
        }
        int instances = firstInstance[m];
        int[] instanceEdge = new int[instances];
        int[] nodeStart = new int[n + 1];
        for (int e = 0; e < m; e++) {
            for (int c = firstInstance[e]; c < firstInstance[e + 1]; c++) {
                instanceEdge[c] = e;
            }
            int k = firstInstance[e + 1] - firstInstance[e];
            nodeStart[network.from(e) + 1] += k;
            nodeStart[network.to(e) + 1] += k;
        }
        for (int v = 0; v < n; v++) {
            if (nodeStart[v + 1] % 2 != 0) {
                throw new IllegalStateException("node " + v + " has odd degree after augmentation");
            }
            nodeStart[v + 1] += nodeStart[v];
        }
        int[] incident = new int[2 * instances];
        int[] fill = nodeStart.clone();
        for (int c = 0; c < instances; c++) {
            int e = instanceEdge[c];
            incident[fill[network.from(e)]++] = c;
            incident[fill[network.to(e)]++] = c;
        }
        int[] next = nodeStart.clone();
        boolean[] used = new boolean[instances];
        int[] stackNode = new int[instances + 1];
        int[] stackInstance = new int[instances + 1];
        boolean[] serviced = new boolean[m];
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
                    int c = incident[next[v]++];
                    used[c] = true;
                    top++;
                    stackNode[top] = network.other(instanceEdge[c], v);
                    stackInstance[top] = c;
                } else {
                    if (top > 0) {
                        int e = instanceEdge[stackInstance[top]];
                        reversedEdges[count] = e;
                        reversedForward[count] = network.from(e) == stackNode[top - 1];
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
                edges[i] = reversedEdges[count - 1 - i];
                forward[i] = reversedForward[count - 1 - i];
                service[i] = !serviced[edges[i]];
                serviced[edges[i]] = true;
            }
            tours.add(new Tour(start, edges, forward, service));
        }
        if (remaining != 0) {
            throw new IllegalStateException(remaining + " traversals outside the start nodes' components");
        }
        return tours;
    }
}
