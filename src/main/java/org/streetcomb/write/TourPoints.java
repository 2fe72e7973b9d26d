package org.streetcomb.write;

import java.util.Arrays;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/**
 * The points of a tour as a device draws it: each step's geometry in driving order, simplified by
 * Douglas-Peucker (JTS {@link DouglasPeuckerSimplifier}) within a tolerance in metres, measured in a
 * local equirectangular plane. Steps are simplified one at a time so every junction stays a point of
 * the track, and a point equal to the one before it is dropped.
 *
 * @param lon  longitudes in degrees
 * @param lat  latitudes in degrees
 * @param step for each point, the index of the tour step it belongs to (a junction belongs to the step it
 *             ends)
 */
record TourPoints(double[] lon, double[] lat, int[] step) {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    int size() {
        return lon.length;
    }

    static TourPoints of(StreetNetwork network, Tour tour, double toleranceMetres) {
        int capacity = 1;
        for (int e : tour.edges()) {
            capacity += network.pointCount(e);
        }
        double[] lon = new double[capacity];
        double[] lat = new double[capacity];
        int[] step = new int[capacity];
        int n = 0;
        LocalFrame frame = LocalFrame.around(network.lon(tour.start()), network.lat(tour.start()));
        for (int i = 0; i < tour.steps(); i++) {
            Coordinate[] points = stepPoints(network, frame, tour.edges()[i], tour.forward()[i], toleranceMetres);
            for (Coordinate c : points) {
                double x = frame.lon(c.x);
                double y = frame.lat(c.y);
                if (n > 0 && x == lon[n - 1] && y == lat[n - 1]) {
                    continue;
                }
                lon[n] = x;
                lat[n] = y;
                step[n] = i;
                n++;
            }
        }
        return new TourPoints(Arrays.copyOf(lon, n), Arrays.copyOf(lat, n), Arrays.copyOf(step, n));
    }

    private static Coordinate[] stepPoints(StreetNetwork network, LocalFrame frame, int e, boolean forward,
                                           double tolerance) {
        int count = network.pointCount(e);
        Coordinate[] points = new Coordinate[count];
        for (int k = 0; k < count; k++) {
            int i = forward ? k : count - 1 - k;
            points[k] = new Coordinate(frame.x(network.pointLon(e, i)), frame.y(network.pointLat(e, i)));
        }
        if (tolerance <= 0 || count <= 2) {
            return points;
        }
        Geometry simplified = DouglasPeuckerSimplifier.simplify(GEOMETRY.createLineString(points), tolerance);
        return simplified.isEmpty() ? new Coordinate[] {points[0], points[count - 1]} : simplified.getCoordinates();
    }
}
