package org.streetcomb.network;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;

/**
 * Lengths of polylines on the WGS84 ellipsoid, as the sum of the geodesic distances between consecutive
 * points. Uses Karney's algorithm (C. F. F. Karney, "Algorithms for geodesics", J. Geodesy 87, 2013,
 * doi:10.1007/s00190-012-0578-z) through GeographicLib, accurate to about 15 nanometres.
 */
public final class GeodesicLength {

    private GeodesicLength() {
    }

    /** Geodesic distance in metres between two points given as longitude, latitude in degrees. */
    public static double between(double lon1, double lat1, double lon2, double lat2) {
        return Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2, GeodesicMask.DISTANCE).s12;
    }

    /** Length in metres of the polyline packed as lon0, lat0, lon1, lat1, ... from point {@code first} on. */
    static double ofPolyline(double[] lonLat, int first, int count) {
        double sum = 0;
        for (int i = first; i < first + count - 1; i++) {
            sum += between(lonLat[2 * i], lonLat[2 * i + 1], lonLat[2 * i + 2], lonLat[2 * i + 3]);
        }
        return sum;
    }
}
