package org.streetcomb.network;

/**
 * An equirectangular plane in metres around a centre point, used only to node lines with a tolerance in
 * metres that is the same east-west and north-south. Over a district (tens of kilometres) its scale
 * error stays well below the snap tolerance's meaning; lengths are never measured in it. Lines that
 * cross the antimeridian are not supported.
 */
record LocalFrame(double lon0, double lat0, double metresPerDegreeLon, double metresPerDegreeLat) {

    /** Mean radius of the WGS84 ellipsoid in metres (IUGG R1). */
    private static final double MEAN_RADIUS = 6_371_008.8;

    static LocalFrame around(double lon0, double lat0) {
        double perDegree = Math.PI / 180 * MEAN_RADIUS;
        return new LocalFrame(lon0, lat0, perDegree * Math.cos(Math.toRadians(lat0)), perDegree);
    }

    double x(double lon) {
        return (lon - lon0) * metresPerDegreeLon;
    }

    double y(double lat) {
        return (lat - lat0) * metresPerDegreeLat;
    }

    double lon(double x) {
        return x / metresPerDegreeLon + lon0;
    }

    double lat(double y) {
        return y / metresPerDegreeLat + lat0;
    }
}
