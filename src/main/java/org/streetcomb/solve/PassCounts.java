package org.streetcomb.solve;

import org.streetcomb.network.StreetNetwork;

/**
 * Passes counted per edge along its digitised direction, against it and either way: the arithmetic that
 * the service demand ({@link ServiceDemand}) and a solution's traversals ({@link Traversals}) share, kept
 * here once. Each method is O(E).
 */
public interface PassCounts {

    int[] along();

    int[] against();

    int[] either();

    /** Passes of the edge, all directions. O(1). */
    default int passes(int edge) {
        return along()[edge] + against()[edge] + either()[edge];
    }

    /** True when no pass is either way, so every pass has a fixed direction. */
    default boolean directed() {
        for (int x : either()) {
            if (x > 0) {
                return false;
            }
        }
        return true;
    }

    /** Total length of the passes, metres. */
    default double length(StreetNetwork network) {
        double sum = 0;
        for (int e = 0; e < along().length; e++) {
            sum += passes(e) * network.length(e);
        }
        return sum;
    }
}
