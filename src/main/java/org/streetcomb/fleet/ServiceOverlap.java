package org.streetcomb.fleet;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.index.strtree.STRtree;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.trip.Trip;

/**
 * How much the vehicles' areas interleave: the share of the service length that has another vehicle's
 * serviced streets within {@link #RADIUS_METRES}. Each serviced street is sampled every
 * {@link #SAMPLE_METRES} at most and each sample asks a JTS STRtree of the other vehicles' streets (in a
 * local equirectangular frame around the first node, close enough over a town for a 200 m test). O(s log m)
 * for s samples and m serviced streets.
 */
public final class ServiceOverlap {

    /** Distance within which another vehicle's street counts as crossing into this one's area. */
    public static final double RADIUS_METRES = 200;
    static final double SAMPLE_METRES = 25;
    private static final double METRES_PER_DEGREE = 111_320;

    private ServiceOverlap() {
    }

    public static double share(StreetNetwork network, List<VehicleDay> days) {
        GeometryFactory factory = new GeometryFactory();
        double lat0 = network.nodeCount() == 0 ? 0 : network.lat(0);
        double lon0 = network.nodeCount() == 0 ? 0 : network.lon(0);
        double cos = Math.cos(Math.toRadians(lat0));
        STRtree tree = new STRtree();
        List<int[]> serviced = new ArrayList<>();
        for (VehicleDay day : days) {
            for (Trip trip : day.trips()) {
                for (int i = 0; i < trip.tour().steps(); i++) {
                    if (trip.tour().service()[i]) {
                        int e = trip.tour().edges()[i];
                        LineString line = factory.createLineString(coordinates(network, e, lon0, lat0, cos));
                        line.setUserData(day.vehicle());
                        tree.insert(line.getEnvelopeInternal(), line);
                        serviced.add(new int[] {e, day.vehicle()});
                    }
                }
            }
        }
        double total = 0;
        double near = 0;
        for (int[] s : serviced) {
            Coordinate[] c = coordinates(network, s[0], lon0, lat0, cos);
            for (int p = 1; p < c.length; p++) {
                double piece = c[p - 1].distance(c[p]);
                int samples = Math.max(1, (int) Math.ceil(piece / SAMPLE_METRES));
                for (int q = 0; q < samples; q++) {
                    double f = (q + 0.5) / samples;
                    Point point = factory.createPoint(new Coordinate(c[p - 1].x + f * (c[p].x - c[p - 1].x),
                            c[p - 1].y + f * (c[p].y - c[p - 1].y)));
                    total += piece / samples;
                    if (nearOther(tree, point, s[1])) {
                        near += piece / samples;
                    }
                }
            }
        }
        return total == 0 ? 0 : near / total;
    }

    private static boolean nearOther(STRtree tree, Point point, int vehicle) {
        Envelope around = new Envelope(point.getCoordinate());
        around.expandBy(RADIUS_METRES);
        for (Object hit : tree.query(around)) {
            LineString line = (LineString) hit;
            if ((Integer) line.getUserData() != vehicle && line.isWithinDistance(point, RADIUS_METRES)) {
                return true;
            }
        }
        return false;
    }

    private static Coordinate[] coordinates(StreetNetwork network, int edge, double lon0, double lat0, double cos) {
        int n = network.pointCount(edge);
        Coordinate[] c = new Coordinate[n];
        for (int i = 0; i < n; i++) {
            c[i] = new Coordinate((network.pointLon(edge, i) - lon0) * cos * METRES_PER_DEGREE,
                    (network.pointLat(edge, i) - lat0) * METRES_PER_DEGREE);
        }
        return c;
    }
}
