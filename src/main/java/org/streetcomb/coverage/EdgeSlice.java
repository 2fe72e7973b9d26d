package org.streetcomb.coverage;

import java.util.Arrays;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.network.StreetNetwork;

/**
 * The part of an edge's polyline between two offsets (metres along its digitised direction), as packed
 * longitude/latitude pairs. Offsets are located by geodesic length along the polyline and interpolated
 * linearly within a segment, which over a street segment of a few hundred metres is exact to millimetres.
 */
public final class EdgeSlice {

    private EdgeSlice() {
    }

    /** Points from offset {@code from} to offset {@code to}; reversed when {@code reverse} is set. */
    public static double[] of(StreetNetwork network, int edge, double from, double to, boolean reverse) {
        int n = network.pointCount(edge);
        double[] out = new double[2 * (n + 2)];
        int size = 0;
        double at = 0;
        for (int k = 0; k < n - 1; k++) {
            double lon0 = network.pointLon(edge, k), lat0 = network.pointLat(edge, k);
            double lon1 = network.pointLon(edge, k + 1), lat1 = network.pointLat(edge, k + 1);
            double step = GeodesicLength.between(lon0, lat0, lon1, lat1);
            double next = at + step;
            if (size == 0 && from <= next) {
                double t = step > 0 ? (from - at) / step : 0;
                out[size++] = lon0 + t * (lon1 - lon0);
                out[size++] = lat0 + t * (lat1 - lat0);
            }
            if (size > 0) {
                if (to <= next || k == n - 2) {
                    double t = step > 0 ? Math.min(1, (to - at) / step) : 1;
                    out[size++] = lon0 + t * (lon1 - lon0);
                    out[size++] = lat0 + t * (lat1 - lat0);
                    break;
                }
                out[size++] = lon1;
                out[size++] = lat1;
            }
            at = next;
        }
        double[] points = Arrays.copyOf(out, size);
        if (reverse) {
            for (int i = 0, j = size - 2; i < j; i += 2, j -= 2) {
                double lon = points[i], lat = points[i + 1];
                points[i] = points[j];
                points[i + 1] = points[j + 1];
                points[j] = lon;
                points[j + 1] = lat;
            }
        }
        return points;
    }
}
