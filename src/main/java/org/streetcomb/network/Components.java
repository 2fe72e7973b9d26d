package org.streetcomb.network;

import java.util.Arrays;

/**
 * Connected components of a network, numbered by decreasing total street length (component 0 is the main
 * network), ties broken by lowest node id so the numbering is stable. Found by breadth-first search over
 * the adjacency arrays, O(nodes + edges).
 */
public final class Components {

    private final int[] componentOfNode;
    private final int[] edgeCounts;
    private final double[] lengths;

    private Components(int[] componentOfNode, int[] edgeCounts, double[] lengths) {
        this.componentOfNode = componentOfNode;
        this.edgeCounts = edgeCounts;
        this.lengths = lengths;
    }

    public static Components of(StreetNetwork network) {
        int n = network.nodeCount();
        int[] raw = new int[n];
        Arrays.fill(raw, -1);
        int[] queue = new int[n];
        int count = 0;
        for (int start = 0; start < n; start++) {
            if (raw[start] >= 0 || network.degree(start) == 0) {
                continue;
            }
            int head = 0, tail = 0;
            queue[tail++] = start;
            raw[start] = count;
            while (head < tail) {
                int v = queue[head++];
                for (int i = network.incidenceStart(v); i < network.incidenceEnd(v); i++) {
                    int w = network.other(network.incidentEdge(i), v);
                    if (raw[w] < 0) {
                        raw[w] = count;
                        queue[tail++] = w;
                    }
                }
            }
            count++;
        }
        int[] rawEdges = new int[count];
        double[] rawLength = new double[count];
        for (int e = 0; e < network.edgeCount(); e++) {
            int c = raw[network.from(e)];
            rawEdges[c]++;
            rawLength[c] += network.length(e);
        }
        // components were discovered in order of their lowest node id, so a stable sort keeps that tie-break
        Integer[] order = new Integer[count];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, (a, b) -> Double.compare(rawLength[b], rawLength[a]));
        int[] rank = new int[count];
        int[] edges = new int[count];
        double[] lengths = new double[count];
        for (int r = 0; r < count; r++) {
            rank[order[r]] = r;
            edges[r] = rawEdges[order[r]];
            lengths[r] = rawLength[order[r]];
        }
        int[] component = new int[n];
        for (int v = 0; v < n; v++) {
            component[v] = raw[v] < 0 ? -1 : rank[raw[v]];
        }
        return new Components(component, edges, lengths);
    }

    public int count() {
        return edgeCounts.length;
    }

    /** The component of {@code node}, or -1 for a node without edges. */
    public int of(int node) {
        return componentOfNode[node];
    }

    public int edgeCount(int component) {
        return edgeCounts[component];
    }

    /** Total street length of the component in metres. */
    public double length(int component) {
        return lengths[component];
    }

    /** The edge ids of each component, in id order. */
    public int[][] edgesByComponent(StreetNetwork network) {
        int[][] edges = new int[count()][];
        int[] fill = new int[count()];
        for (int c = 0; c < count(); c++) {
            edges[c] = new int[edgeCounts[c]];
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            int c = componentOfNode[network.from(e)];
            edges[c][fill[c]++] = e;
        }
        return edges;
    }
}
