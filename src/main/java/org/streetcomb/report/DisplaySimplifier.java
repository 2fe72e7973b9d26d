package org.streetcomb.report;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;

/**
 * Simplifies lines for display with JTS's Douglas-Peucker simplifier (Douglas and Peucker 1973), so that
 * large plans stay quick to draw. The tolerance is in metres: each line is measured in an equirectangular
 * plane scaled at its own first latitude, which over one street is exact to far better than a pixel.
 * Only what is drawn is simplified; lengths and summaries always come from the full geometry.
 */
final class DisplaySimplifier {

    /** Metres per degree of latitude on the mean Earth radius (IUGG R1, 6 371 008.8 m). */
    private static final double METRES_PER_DEGREE = Math.PI / 180 * 6_371_008.8;
    private static final GeometryFactory FACTORY = new GeometryFactory();

    private final double tolerance;

    /** @param tolerance metres; 0 keeps every vertex */
    DisplaySimplifier(double tolerance) {
        if (!(tolerance >= 0)) {
            throw new IllegalArgumentException("tolerance must be 0 or more metres");
        }
        this.tolerance = tolerance;
    }

    /** The part (lon, lat pairs) with vertices dropped that lie within the tolerance of the simplified line. */
    double[] simplify(double[] part) {
        int n = part.length / 2;
        if (tolerance == 0 || n <= 2) {
            return part;
        }
        double xScale = METRES_PER_DEGREE * Math.cos(Math.toRadians(part[1]));
        Coordinate[] coordinates = new Coordinate[n];
        for (int i = 0; i < n; i++) {
            coordinates[i] = new Coordinate(part[2 * i] * xScale, part[2 * i + 1] * METRES_PER_DEGREE);
        }
        Geometry simplified = DouglasPeuckerSimplifier.simplify(FACTORY.createLineString(coordinates), tolerance);
        Coordinate[] kept = simplified.getCoordinates();
        if (kept.length == n || kept.length < 2) {
            return part;
        }
        double[] out = new double[2 * kept.length];
        for (int i = 0; i < kept.length; i++) {
            out[2 * i] = kept[i].x / xScale;
            out[2 * i + 1] = kept[i].y / METRES_PER_DEGREE;
        }
        return out;
    }
}
