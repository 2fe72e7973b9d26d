package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Geodesic distances on the WGS84 ellipsoid against published worked examples, to 1 mm. */
class GeodesicLengthTest {

    @Test
    void flindersPeakToBuninyong() {
        // T. Vincenty (1975), "Direct and inverse solutions of geodesics on the ellipsoid", Survey Review 23,
        // the Flinders Peak - Buninyong line as worked by Geoscience Australia: 54 972.271 m (from memory).
        double lat1 = -(37 + 57 / 60.0 + 3.72030 / 3600);
        double lon1 = 144 + 25 / 60.0 + 29.52440 / 3600;
        double lat2 = -(37 + 39 / 60.0 + 10.15610 / 3600);
        double lon2 = 143 + 55 / 60.0 + 35.38390 / 3600;
        assertEquals(54_972.271, GeodesicLength.between(lon1, lat1, lon2, lat2), 0.001);
    }

    @Test
    void johnFKennedyToLondonHeathrow() {
        // GeographicLib documentation example (C. F. F. Karney): 40.6N 73.8W to 51.6N 0.5W is
        // 5 551 759.400 m (from memory; also listed in the verified-libraries note of this workplace).
        assertEquals(5_551_759.400, GeodesicLength.between(-73.8, 40.6, -0.5, 51.6), 0.001);
    }

    @Test
    void oneDegreeAlongTheEquatorIsTheSemiMajorAxisTimesTheAngle() {
        // WGS84 semi-major axis a = 6 378 137 m (NIMA TR8350.2): along the equator a geodesic is an arc
        // of the equatorial circle, so 1 degree measures a * pi / 180.
        double expected = 6_378_137 * Math.PI / 180;
        assertEquals(expected, GeodesicLength.ofPolyline(new double[] {10, 0, 10.5, 0, 11, 0}, 0, 3), 0.001);
    }
}
