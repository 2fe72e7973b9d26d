package org.streetcomb.network;

import org.streetcomb.read.Travel;

/** Which edges a search may follow, and in which direction. */
public enum Heading {
    /** Every edge in both directions: one-way restrictions ignored. */
    ANY,
    /** Away from the source, as a vehicle may drive: one-way streets only along their permitted direction. */
    OUTBOUND,
    /** Towards the source, as a vehicle may drive: distances are from each node to the source. */
    INBOUND;

    /** Whether a search at {@code node} may relax {@code edge} to its other end. */
    public boolean allows(StreetNetwork network, int edge, int node) {
        if (this == ANY) {
            return true;
        }
        Travel travel = network.travel(edge);
        if (travel == Travel.BOTH || network.from(edge) == network.to(edge)) {
            return true;
        }
        boolean leavesAlong = network.from(edge) == node;
        boolean drivenAlong = this == OUTBOUND ? leavesAlong : !leavesAlong;
        return drivenAlong == (travel == Travel.FORWARD);
    }
}
