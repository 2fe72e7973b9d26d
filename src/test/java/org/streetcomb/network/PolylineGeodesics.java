package org.streetcomb.network;

import net.sf.geographiclib.Geodesic;

/**
 * Reference lengths for tests: an edge's polyline measured segment by segment with GeographicLib's geodesic
 * inverse (Karney 2013), independently of {@link GeodesicLength} and of how the edge was made.
 */
public final class PolylineGeodesics {

    private PolylineGeodesics() {
    }

    public static double length(StreetNetwork network, int edge) {
        double sum = 0;
        for (int k = 0; k + 1 < network.pointCount(edge); k++) {
            sum += Geodesic.WGS84.Inverse(network.pointLat(edge, k), network.pointLon(edge, k),
                    network.pointLat(edge, k + 1), network.pointLon(edge, k + 1)).s12;
        }
        return sum;
    }
}
