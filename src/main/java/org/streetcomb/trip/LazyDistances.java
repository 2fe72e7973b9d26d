package org.streetcomb.trip;

import java.util.HashMap;
import java.util.Map;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;

/**
 * Shortest-path distances found when asked, for networks too large for a full table: searches out of
 * and into the depot answer every depot leg, and any other pair runs a Dijkstra search that stops at its target
 * (cheap between consecutive tasks of a tour, which lie close together) and is remembered. One-way
 * streets are followed only their permitted way.
 */
final class LazyDistances implements Distances {

    private final DijkstraSearch search;
    private final DijkstraSearch fromDepot;
    private final DijkstraSearch toDepot;
    private final int depot;
    private final Map<Long, Double> known = new HashMap<>();

    LazyDistances(StreetNetwork network, int depot) {
        this.search = new DijkstraSearch(network, Heading.OUTBOUND);
        this.fromDepot = new DijkstraSearch(network, Heading.OUTBOUND);
        this.toDepot = new DijkstraSearch(network, Heading.INBOUND);
        this.depot = depot;
        fromDepot.start(depot);
        toDepot.start(depot);
    }

    @Override
    public double between(int from, int to) {
        if (from == to) {
            return 0;
        }
        if (from == depot) {
            return fromDepot.runTo(to);
        }
        if (to == depot) {
            return toDepot.runTo(from);
        }
        long key = ((long) from << 32) | to;
        return known.computeIfAbsent(key, k -> {
            search.start(from);
            return search.runTo(to);
        });
    }
}
