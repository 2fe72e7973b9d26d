package org.streetcomb.trip;

import java.util.HashMap;
import java.util.Map;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.StreetNetwork;

/**
 * Shortest-path distances found when asked, for networks too large for a full table: a search from the
 * depot answers every depot leg, and any other pair runs a Dijkstra search that stops at its target
 * (cheap between consecutive tasks of a tour, which lie close together) and is remembered.
 */
final class LazyDistances implements Distances {

    private final DijkstraSearch search;
    private final DijkstraSearch fromDepot;
    private final int depot;
    private final Map<Long, Double> known = new HashMap<>();

    LazyDistances(StreetNetwork network, int depot) {
        this.search = new DijkstraSearch(network);
        this.fromDepot = new DijkstraSearch(network);
        this.depot = depot;
        fromDepot.start(depot);
    }

    @Override
    public double between(int from, int to) {
        if (from == to) {
            return 0;
        }
        if (from == depot || to == depot) {
            return fromDepot.runTo(from == depot ? to : from);
        }
        long key = ((long) Math.min(from, to) << 32) | Math.max(from, to);
        return known.computeIfAbsent(key, k -> {
            search.start(from);
            return search.runTo(to);
        });
    }
}
