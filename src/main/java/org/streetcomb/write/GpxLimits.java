package org.streetcomb.write;

/**
 * What a handheld unit can take, for the GPX export. Many handheld units hold at most about 10,000 points
 * per track and about 250 points per route (from memory; check the unit's manual), so the defaults are
 * those and both are options.
 *
 * @param simplifyMetres   Douglas-Peucker tolerance for track geometry, 0 to keep every vertex
 * @param maxTrackPoints   most points in one track; longer tracks are split into numbered parts
 * @param maxRoutePoints   most points in one route; longer routes are split into numbered parts
 * @param routes           also write a route per tour with a point at each turn
 */
public record GpxLimits(double simplifyMetres, int maxTrackPoints, int maxRoutePoints, boolean routes) {

    public static final int DEFAULT_TRACK_POINTS = 10_000;
    public static final int DEFAULT_ROUTE_POINTS = 250;

    public GpxLimits {
        if (!(simplifyMetres >= 0)) {
            throw new IllegalArgumentException("simplification tolerance must be 0 or more metres");
        }
        if (maxTrackPoints < 2 || maxRoutePoints < 2) {
            throw new IllegalArgumentException("point limits must be at least 2");
        }
    }
}
