package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.Heading;
import org.streetcomb.network.Reach;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;

/**
 * The largest strongly connected core of a network with one-way streets, as a network of its own: the
 * streets whose ends a vehicle can both reach from and return to one node, for the node that gives most.
 * Real extracts cut at a boundary always have one-way streets leading out; the core is a proper mixed
 * postman instance (every street drivable on a closed tour).
 */
public final class StrongCore {

    private StrongCore() {
    }

    public static StreetNetwork of(StreetNetwork network) {
        boolean[] best = null;
        int bestEdges = -1;
        boolean[] tried = new boolean[network.nodeCount()];
        for (int v = 0; v < network.nodeCount(); v++) {
            if (tried[v] || network.degree(v) == 0) {
                continue;
            }
            boolean[] out = Reach.of(network, v, Heading.OUTBOUND);
            boolean[] in = Reach.of(network, v, Heading.INBOUND);
            boolean[] core = new boolean[network.nodeCount()];
            for (int w = 0; w < core.length; w++) {
                core[w] = out[w] && in[w];
                tried[w] |= core[w];
            }
            int edges = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                edges += core[network.from(e)] && core[network.to(e)] ? 1 : 0;
            }
            if (edges > bestEdges) {
                bestEdges = edges;
                best = core;
            }
        }
        List<Integer> kept = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            if (best[network.from(e)] && best[network.to(e)]) {
                kept.add(e);
            }
        }
        int[] from = new int[kept.size()];
        int[] to = new int[kept.size()];
        double[] length = new double[kept.size()];
        List<RoadFeature> features = new ArrayList<>();
        for (int i = 0; i < kept.size(); i++) {
            int e = kept.get(i);
            from[i] = network.from(e);
            to[i] = network.to(e);
            length[i] = network.length(e);
            features.add(network.feature(e));
        }
        return StreetNetwork.ofGraph(network.nodeCount(), from, to, length, features);
    }
}
