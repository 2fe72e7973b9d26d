package org.streetcomb.match;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.streetcomb.network.Bridges;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * Turning pockets: small dead-end structures such as the loop of a turning head, too small for GPS to tell
 * which of their edges a vehicle drove.
 *
 * <p>A pocket is the far side of a bridge edge (one whose removal cuts the network, found with
 * {@link Bridges}) that holds at least one edge and fits in a square of side {@code size}
 * metres. A vehicle that enters a pocket must turn inside it and leave the way it came, but with fixes
 * metres apart and noise of several metres the matched path through a loop 20 m across is a guess; so
 * when the matched path entered a pocket, the whole pocket counts as driven. Larger dead-end structures are
 * left to the matcher. O(V + E) for the bridges, plus a bounded search beyond each bridge.
 */
public final class TurningPockets {

    /** Pockets larger than this many edges are not searched for. */
    private static final int MOST_EDGES = 64;

    private TurningPockets() {
    }

    /** Whether each node lies on a pocket: a street that reaches one ends there, as far as a crew turning is concerned. */
    public static boolean[] nodes(StreetNetwork network, List<int[]> pockets) {
        boolean[] on = new boolean[network.nodeCount()];
        for (int[] pocket : pockets) {
            for (int e : pocket) {
                on[network.from(e)] = true;
                on[network.to(e)] = true;
            }
        }
        return on;
    }

    /** The edge sets of the pockets of {@code network} that fit in a square of side {@code size} metres. */
    public static List<int[]> of(StreetNetwork network, LocalFrame frame, double size) {
        List<int[]> pockets = new ArrayList<>();
        for (int bridge : Bridges.of(network)) {
            for (int side : new int[] {network.from(bridge), network.to(bridge)}) {
                int[] pocket = beyond(network, bridge, side);
                if (pocket != null && pocket.length > 0 && fits(network, frame, pocket, size)) {
                    pockets.add(pocket);
                }
            }
        }
        return pockets;
    }

    /** The edges reachable from {@code start} without crossing {@code bridge}, or null when too many. */
    private static int[] beyond(StreetNetwork network, int bridge, int start) {
        BitSet seenNodes = new BitSet();
        BitSet edges = new BitSet();
        int[] queue = new int[MOST_EDGES + 2];
        int head = 0, tail = 0;
        queue[tail++] = start;
        seenNodes.set(start);
        while (head < tail) {
            int v = queue[head++];
            for (int i = network.incidenceStart(v); i < network.incidenceEnd(v); i++) {
                int e = network.incidentEdge(i);
                if (e == bridge || edges.get(e)) {
                    continue;
                }
                edges.set(e);
                if (edges.cardinality() > MOST_EDGES) {
                    return null;
                }
                int w = network.other(e, v);
                if (!seenNodes.get(w)) {
                    seenNodes.set(w);
                    queue[tail++] = w;
                }
            }
        }
        return edges.stream().toArray();
    }

    private static boolean fits(StreetNetwork network, LocalFrame frame, int[] pocket, double size) {
        double[] box = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int e : pocket) {
            for (int k = 0; k < network.pointCount(e); k++) {
                double x = frame.x(network.pointLon(e, k));
                double y = frame.y(network.pointLat(e, k));
                box[0] = Math.min(box[0], x);
                box[1] = Math.max(box[1], x);
                box[2] = Math.min(box[2], y);
                box[3] = Math.max(box[3], y);
            }
        }
        return box[1] - box[0] <= size && box[3] - box[2] <= size;
    }

    /** Credits every pocket the matched path entered as driven, in each permitted direction; needs merged intervals. */
    public static void credit(StreetNetwork network, List<int[]> pockets, DrivenIntervals driven) {
        List<int[]> entered = pockets.stream()
                .filter(p -> Arrays.stream(p).anyMatch(e -> driven.of(e, true).length > 0 || driven.of(e, false).length > 0))
                .toList();
        for (int[] pocket : entered) {
            for (int e : pocket) {
                var travel = network.travel(e);
                if (travel != Travel.BACKWARD) {
                    driven.addWhole(e, true);
                }
                if (travel != Travel.FORWARD) {
                    driven.addWhole(e, false);
                }
            }
        }
    }
}
