package org.streetcomb.solve;

import org.streetcomb.network.StreetNetwork;

/**
 * What a postman solver must plan: the service demand, and the node each tour starts from, one per part
 * of the network that has demand. The first tour (the depot's) ends at {@code end}, which is its start for
 * a closed tour; all other tours are closed.
 */
public record PostmanProblem(StreetNetwork network, ServiceDemand demand, int[] starts, int end) {

    public boolean open() {
        return starts.length > 0 && end != starts[0];
    }

    /** +1 at an open tour's start, -1 at its end, 0 elsewhere: out-degree minus in-degree the walk needs. */
    public int endBalance(int node) {
        if (!open()) {
            return 0;
        }
        return (node == starts[0] ? 1 : 0) - (node == end ? 1 : 0);
    }
}
