package org.streetcomb.solve;

import java.util.Arrays;
import org.streetcomb.network.StreetNetwork;

/**
 * The one home of the Euler walk over traversals, by Hierholzer's algorithm (C. Hierholzer, 1873),
 * iterative with an explicit stack so a million-edge part does not overflow the call stack. Three users:
 * the solve stage reads a tour's order off it to seed {@link ServiceOrderSearch}, {@link MixedPostman}
 * orients its even undirected remainder along the greedy trails ({@link #step}), and the tour stage's
 * {@code HierholzerCircuit} builds the validated tours from it. It lives in solve, below its users.
 *
 * <p>A walk holds the traversals (along, against or either way, per edge) as instances in a compressed
 * incidence list: building it is O(V + T) for T traversals, and all walks together take O(V + T) time,
 * since every instance is used once and each node's cursor only moves forward. Traversals used by one walk
 * stay used for the next, so walks from starts in distinct parts share one instance. The caller ensures
 * the degree conditions of an Euler walk (even, or balanced, apart from an open walk's ends).
 */
public final class EulerWalk {

    private static final byte ALONG = 0;
    private static final byte AGAINST = 1;
    private static final byte EITHER = 2;

    private final StreetNetwork network;
    private final int[] edgeOf;
    private final byte[] kind;
    private final int[] first;
    private final int[] incident;
    private final int[] next;
    private final boolean[] used;
    private int remaining;

    /** A walk through the traversals counted per edge along, against and either way. */
    public EulerWalk(StreetNetwork network, int[] along, int[] against, int[] either) {
        this.network = network;
        int n = network.nodeCount();
        int m = network.edgeCount();
        int count = 0;
        for (int e = 0; e < m; e++) {
            count += along[e] + against[e] + either[e];
        }
        edgeOf = new int[count];
        kind = new byte[count];
        first = new int[n + 1];
        int c = 0;
        for (int e = 0; e < m; e++) {
            int[] times = {along[e], against[e], either[e]};
            for (byte k = ALONG; k <= EITHER; k++) {
                for (int x = 0; x < times[k]; x++) {
                    edgeOf[c] = e;
                    kind[c++] = k;
                    if (k != AGAINST) {
                        first[network.from(e) + 1]++;
                    }
                    if (k != ALONG) {
                        first[network.to(e) + 1]++;
                    }
                }
            }
        }
        for (int v = 0; v < n; v++) {
            first[v + 1] += first[v];
        }
        incident = new int[first[n]];
        int[] fill = first.clone();
        for (int i = 0; i < count; i++) {
            int e = edgeOf[i];
            if (kind[i] != AGAINST) {
                incident[fill[network.from(e)]++] = i;
            }
            if (kind[i] != ALONG) {
                incident[fill[network.to(e)]++] = i;
            }
        }
        next = first.clone();
        used = new boolean[count];
        remaining = count;
    }

    /** A walk through a solver's traversals. */
    public EulerWalk(StreetNetwork network, Traversals traversals) {
        this(network, traversals.along(), traversals.against(), traversals.either());
    }

    /**
     * The walk from {@code start} through the traversals it can reach, as (edge, direction) steps:
     * {@code steps[2i]} is the edge, {@code steps[2i + 1]} 1 when it is driven along its digitised direction
     * and 0 against it.
     */
    static int[] steps(StreetNetwork network, Traversals traversals, int start) {
        return new EulerWalk(network, traversals).from(start);
    }

    /** Traversals no walk or step has used yet. */
    public int remaining() {
        return remaining;
    }

    /**
     * Uses the next unused traversal leaving {@code v}: returns {@code 2 * edge + 1} when it is driven along
     * the edge's digitised direction, {@code 2 * edge} against it, or -1 when none is left at {@code v}.
     */
    public int step(int v) {
        while (next[v] < first[v + 1] && used[incident[next[v]]]) {
            next[v]++;
        }
        if (next[v] == first[v + 1]) {
            return -1;
        }
        int i = incident[next[v]++];
        used[i] = true;
        remaining--;
        int e = edgeOf[i];
        boolean along = kind[i] == ALONG || kind[i] == EITHER && network.from(e) == v;
        return 2 * e + (along ? 1 : 0);
    }

    /**
     * Hierholzer's walk from {@code start} through every unused traversal it can reach, in driving order, as
     * (edge, direction) steps like {@link #steps}.
     */
    public int[] from(int start) {
        int capacity = remaining;
        int[] nodeStack = new int[capacity + 1];
        int[] stepStack = new int[capacity + 1];
        int[] steps = new int[2 * capacity];
        int depth = 0;
        int written = capacity;
        nodeStack[0] = start;
        stepStack[0] = -1;
        while (depth >= 0) {
            int v = nodeStack[depth];
            int step = step(v);
            if (step >= 0) {
                depth++;
                nodeStack[depth] = network.other(step / 2, v);
                stepStack[depth] = step;
            } else {
                // popped traversals come out in reverse driving order
                if (stepStack[depth] >= 0) {
                    written--;
                    steps[2 * written] = stepStack[depth] / 2;
                    steps[2 * written + 1] = stepStack[depth] % 2;
                }
                depth--;
            }
        }
        return Arrays.copyOfRange(steps, 2 * written, 2 * capacity);
    }
}
