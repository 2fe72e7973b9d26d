package org.streetcomb.plan;

import org.streetcomb.network.LonLat;

/**
 * What the mop-up tour after an audit should look like.
 *
 * @param depot       where the tour ends (and starts, without {@code start}), or null for the default depot
 * @param start       where the crew is now, or null to start at the depot
 * @param depotReach  the depot and start may lie at most this many metres from the nearest street node
 * @param turnBack    the tour may turn back where a missed stretch ends mid-street
 * @param arrangement trips and turn-aware order, as for a plan
 */
public record MopUpRequest(LonLat depot, LonLat start, double depotReach, boolean turnBack, Arrangement arrangement) {
}
