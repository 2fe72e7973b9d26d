package org.streetcomb.network;

import java.util.function.IntPredicate;

/**
 * Finds the network node nearest a point, by geodesic distance. A linear scan: it runs once or twice per
 * plan, so an index would cost more to build than it saves.
 */
public final class NearestNode {

    /** @param node the nearest node, @param distance its geodesic distance in metres */
    public record Hit(int node, double distance) {
    }

    private NearestNode() {
    }

    /** Only nodes with at least one edge are candidates; returns null for a network without edges. */
    public static Hit of(StreetNetwork network, double lon, double lat) {
        return of(network, lon, lat, v -> true);
    }

    /** The nearest node among those with at least one edge that {@code candidate} accepts. */
    public static Hit of(StreetNetwork network, double lon, double lat, IntPredicate candidate) {
        // screen by a cheap planar distance, then measure the winner on the ellipsoid
        double cos = Math.cos(Math.toRadians(lat));
        int best = -1;
        double bestScore = Double.POSITIVE_INFINITY;
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) == 0 || !candidate.test(v)) {
                continue;
            }
            double dx = (network.lon(v) - lon) * cos;
            double dy = network.lat(v) - lat;
            double score = dx * dx + dy * dy;
            if (score < bestScore) {
                bestScore = score;
                best = v;
            }
        }
        return best < 0 ? null
                : new Hit(best, GeodesicLength.between(lon, lat, network.lon(best), network.lat(best)));
    }
}
