package org.streetcomb.network;

import org.streetcomb.read.Travel;

/**
 * The directions a vehicle may drive each edge, as arcs in compressed adjacency arrays. Arc {@code 2e}
 * runs along edge {@code e} in its digitised direction (from → to) and arc {@code 2e + 1} against it; an
 * arc exists only where the edge's travel permits it, so a two-way street gives both.
 */
public final class TravelArcs {

    private final StreetNetwork network;
    private final int[] outStart;
    private final int[] outArcs;
    private final int[] inStart;
    private final int[] inArcs;

    public TravelArcs(StreetNetwork network) {
        this.network = network;
        int n = network.nodeCount();
        outStart = new int[n + 1];
        inStart = new int[n + 1];
        int arcs = 0;
        for (int a = 0; a < 2 * network.edgeCount(); a++) {
            if (allowed(a)) {
                outStart[tail(a) + 1]++;
                inStart[head(a) + 1]++;
                arcs++;
            }
        }
        for (int v = 0; v < n; v++) {
            outStart[v + 1] += outStart[v];
            inStart[v + 1] += inStart[v];
        }
        outArcs = new int[arcs];
        inArcs = new int[arcs];
        int[] outFill = outStart.clone();
        int[] inFill = inStart.clone();
        for (int a = 0; a < 2 * network.edgeCount(); a++) {
            if (allowed(a)) {
                outArcs[outFill[tail(a)]++] = a;
                inArcs[inFill[head(a)]++] = a;
            }
        }
    }

    public boolean allowed(int arc) {
        Travel travel = network.travel(arc >> 1);
        return (arc & 1) == 0 ? travel != Travel.BACKWARD : travel != Travel.FORWARD;
    }

    public int tail(int arc) {
        return (arc & 1) == 0 ? network.from(arc >> 1) : network.to(arc >> 1);
    }

    public int head(int arc) {
        return (arc & 1) == 0 ? network.to(arc >> 1) : network.from(arc >> 1);
    }

    public int outStart(int node) {
        return outStart[node];
    }

    public int outEnd(int node) {
        return outStart[node + 1];
    }

    public int outArc(int i) {
        return outArcs[i];
    }

    public int inStart(int node) {
        return inStart[node];
    }

    public int inEnd(int node) {
        return inStart[node + 1];
    }

    public int inArc(int i) {
        return inArcs[i];
    }
}
