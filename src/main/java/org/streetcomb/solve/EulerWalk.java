package org.streetcomb.solve;

import org.streetcomb.network.StreetNetwork;

/**
 * The order in which one walk drives a solver's traversals, by Hierholzer's algorithm (1873), iterative:
 * the solve stage needs the order of a single closed or open tour to seed {@link ServiceOrderSearch},
 * and the tour stage's walk (which builds validated tours, with service marks) comes after this stage.
 * The traversals must satisfy the degree conditions of an Euler walk from {@code start} to {@code end}
 * and be connected; O(E).
 */
final class EulerWalk {

    private EulerWalk() {
    }

    /**
     * The walk from {@code start} through the traversals it can reach, as (edge, direction) steps: {@code steps[2i]} is the edge, {@code steps[2i + 1]} 1 when it
     * is driven along its digitised direction and 0 against it.
     */
    static int[] steps(StreetNetwork network, Traversals traversals, int start) {
        int n = network.nodeCount();
        int m = network.edgeCount();
        int count = 0;
        for (int e = 0; e < m; e++) {
            count += traversals.total(e);
        }
        int[] edgeOf = new int[count];
        // 0 along, 1 against, 2 either way
        int[] kind = new int[count];
        int[] first = new int[n + 1];
        int c = 0;
        for (int e = 0; e < m; e++) {
            int[] times = {traversals.along()[e], traversals.against()[e], traversals.either()[e]};
            for (int k = 0; k < 3; k++) {
                for (int x = 0; x < times[k]; x++) {
                    edgeOf[c] = e;
                    kind[c++] = k;
                    if (k != 1) {
                        first[network.from(e) + 1]++;
                    }
                    if (k != 0) {
                        first[network.to(e) + 1]++;
                    }
                }
            }
        }
        for (int v = 0; v < n; v++) {
            first[v + 1] += first[v];
        }
        int[] incident = new int[first[n]];
        int[] fill = first.clone();
        for (int i = 0; i < count; i++) {
            int e = edgeOf[i];
            if (kind[i] != 1) {
                incident[fill[network.from(e)]++] = i;
            }
            if (kind[i] != 0) {
                incident[fill[network.to(e)]++] = i;
            }
        }
        boolean[] used = new boolean[count];
        int[] next = first.clone();
        int[] nodeStack = new int[count + 1];
        int[] stepStack = new int[count + 1];
        int[] steps = new int[2 * count];
        int depth = 0;
        int written = count;
        nodeStack[0] = start;
        stepStack[0] = -1;
        while (depth >= 0) {
            int v = nodeStack[depth];
            while (next[v] < first[v + 1] && used[incident[next[v]]]) {
                next[v]++;
            }
            if (next[v] < first[v + 1]) {
                int i = incident[next[v]++];
                used[i] = true;
                int e = edgeOf[i];
                boolean along = kind[i] == 0 || kind[i] == 2 && network.from(e) == v;
                depth++;
                nodeStack[depth] = network.other(e, v);
                stepStack[depth] = 2 * e + (along ? 1 : 0);
            } else {
                if (stepStack[depth] >= 0) {
                    written--;
                    steps[2 * written] = stepStack[depth] / 2;
                    steps[2 * written + 1] = stepStack[depth] % 2;
                }
                depth--;
            }
        }
        // traversals in other parts were not reached: only the walk from start is returned
        return java.util.Arrays.copyOfRange(steps, 2 * written, 2 * count);
    }
}
