package org.streetcomb.tour;

import java.util.stream.IntStream;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;
import org.streetcomb.network.StreetNetwork;

/**
 * The compass headings of every edge at its two ends, from the geometry: the geodesic azimuth (Karney
 * 2013, GeographicLib) from the end node to the first vertex at least {@value #REACH_METRES} m along the
 * edge, or to the far end when the edge is shorter. Measuring over a few metres rather than the first
 * segment keeps a digitising kink at a junction from passing for a turn. O(total vertices) to build.
 */
public final class EdgeBearings {

    /** How far along an edge its heading at a junction is measured (common practice: a car length or two). */
    static final double REACH_METRES = 10;

    /** [2e] leaving the from-node along the edge; [2e + 1] leaving the to-node back along it; degrees. */
    private final double[] leaving;

    private EdgeBearings(double[] leaving) {
        this.leaving = leaving;
    }

    public static EdgeBearings of(StreetNetwork network) {
        double[] leaving = new double[2 * network.edgeCount()];
        // a few geodesic inverses per edge: on a million edges, seconds that the cores share
        IntStream.range(0, network.edgeCount()).parallel().forEach(e -> {
            leaving[2 * e] = fromEnd(network, e, true);
            leaving[2 * e + 1] = fromEnd(network, e, false);
        });
        return new EdgeBearings(leaving);
    }

    private static double fromEnd(StreetNetwork network, int e, boolean fromStart) {
        int count = network.pointCount(e);
        int first = fromStart ? 0 : count - 1;
        int last = fromStart ? count - 1 : 0;
        int step = fromStart ? 1 : -1;
        double lon0 = network.pointLon(e, first);
        double lat0 = network.pointLat(e, first);
        int target = first;
        double along = 0;
        // the distance decides only where to stop short of the far end, so the last step is not measured
        for (int k = first + step; k != last; k += step) {
            target = k;
            along += Geodesic.WGS84.Inverse(network.pointLat(e, k - step), network.pointLon(e, k - step),
                    network.pointLat(e, k), network.pointLon(e, k), GeodesicMask.DISTANCE).s12;
            if (along >= REACH_METRES) {
                break;
            }
        }
        if (along < REACH_METRES) {
            target = last;
        }
        double lat = network.pointLat(e, target);
        double lon = network.pointLon(e, target);
        if (lat == lat0 && lon == lon0) {
            return 0;
        }
        return Geodesic.WGS84.Inverse(lat0, lon0, lat, lon, GeodesicMask.AZIMUTH).azi1;
    }

    /** Heading in degrees when setting off along {@code edge} in the given direction. */
    public double leaving(int edge, boolean forward) {
        return leaving[2 * edge + (forward ? 0 : 1)];
    }

    /** Heading in degrees when arriving at the end of {@code edge} driven in the given direction. */
    public double arriving(int edge, boolean forward) {
        return leaving[2 * edge + (forward ? 1 : 0)] + 180;
    }

    /**
     * The signed change of heading from arriving by one traversal to leaving by the next, in (-180, 180]
     * degrees: positive to the right (clockwise), negative to the left.
     */
    public double turnAngle(int inEdge, boolean inForward, int outEdge, boolean outForward) {
        double delta = leaving(outEdge, outForward) - arriving(inEdge, inForward);
        delta = delta % 360;
        if (delta > 180) {
            delta -= 360;
        } else if (delta <= -180) {
            delta += 360;
        }
        return delta;
    }
}
