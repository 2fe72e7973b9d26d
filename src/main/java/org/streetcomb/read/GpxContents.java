package org.streetcomb.read;

/**
 * What a GPX file held, counted while it streamed past.
 *
 * @param tracks       {@code trk} elements
 * @param segments     {@code trkseg} elements
 * @param points       {@code trkpt} fixes passed on
 * @param untimed      fixes without a {@code time}
 * @param waypoints    {@code wpt} elements (not used: they are not part of a drive)
 * @param routePoints  {@code rtept} elements (not used: a route is a plan, not a recording)
 */
public record GpxContents(int tracks, int segments, int points, int untimed, int waypoints, int routePoints) {
}
