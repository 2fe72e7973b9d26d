package org.streetcomb.network;

/** The nodes a vehicle can reach from a node, or get to a node from, by breadth-first search. O(V + E). */
public final class Reach {

    private Reach() {
    }

    /** Nodes reachable from {@code source} ({@link Heading#OUTBOUND}) or that reach it ({@link Heading#INBOUND}). */
    public static boolean[] of(StreetNetwork network, int source, Heading heading) {
        boolean[] seen = new boolean[network.nodeCount()];
        int[] queue = new int[network.nodeCount()];
        int head = 0, tail = 0;
        queue[tail++] = source;
        seen[source] = true;
        while (head < tail) {
            int v = queue[head++];
            for (int i = network.incidenceStart(v); i < network.incidenceEnd(v); i++) {
                int e = network.incidentEdge(i);
                int w = network.other(e, v);
                if (!seen[w] && heading.allows(network, e, v)) {
                    seen[w] = true;
                    queue[tail++] = w;
                }
            }
        }
        return seen;
    }
}
