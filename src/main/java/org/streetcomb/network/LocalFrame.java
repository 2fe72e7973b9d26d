package org.streetcomb.network;

import java.util.List;
import org.locationtech.jts.geom.Envelope;
import org.streetcomb.read.RoadFeature;

/**
 * An equirectangular plane in metres around a centre point, used to node lines and simplify them with a
 * tolerance in metres that is the same east-west and north-south, and to find streets near GPS fixes. Over
 * a district (tens of kilometres) its scale error stays well below the tolerances it serves; lengths are
 * never measured in it. Lines that cross the antimeridian are not supported.
 */
public record LocalFrame(double lon0, double lat0, double metresPerDegreeLon, double metresPerDegreeLat) {

    /** Mean radius of the WGS84 ellipsoid in metres (IUGG R1). */
    private static final double MEAN_RADIUS = 6_371_008.8;

    /** A frame centred on the bounding box of the features. O(number of features). */
    public static LocalFrame covering(List<RoadFeature> features) {
        Envelope box = new Envelope();
        for (RoadFeature f : features) {
            box.expandToInclude(f.line().getEnvelopeInternal());
        }
        return centredOn(box);
    }

    /** A frame centred on the bounding box of the network's nodes. O(nodes). */
    public static LocalFrame covering(StreetNetwork network) {
        Envelope box = new Envelope();
        for (int v = 0; v < network.nodeCount(); v++) {
            box.expandToInclude(network.lon(v), network.lat(v));
        }
        return centredOn(box);
    }

    private static LocalFrame centredOn(Envelope box) {
        return box.isNull() ? around(0, 0) : around((box.getMinX() + box.getMaxX()) / 2, (box.getMinY() + box.getMaxY()) / 2);
    }

    public static LocalFrame around(double lon0, double lat0) {
        double perDegree = Math.PI / 180 * MEAN_RADIUS;
        return new LocalFrame(lon0, lat0, perDegree * Math.cos(Math.toRadians(lat0)), perDegree);
    }

    public double x(double lon) {
        return (lon - lon0) * metresPerDegreeLon;
    }

    public double y(double lat) {
        return (lat - lat0) * metresPerDegreeLat;
    }

    public double lon(double x) {
        return x / metresPerDegreeLon + lon0;
    }

    public double lat(double y) {
        return y / metresPerDegreeLat + lat0;
    }
}
