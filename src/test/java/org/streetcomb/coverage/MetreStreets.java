package org.streetcomb.coverage;

import java.nio.file.Path;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.read.Travel;

/**
 * Invented streets for matcher tests, drawn in metres east and north of an invented point in the
 * Atlantic (31° W, 44.5° N), converted on a sphere of the mean Earth radius: accurate to well under a
 * metre over the few kilometres these tests span.
 */
final class MetreStreets {

    static final double LON = -31.0;
    static final double LAT = 44.5;
    /** Degrees of longitude and latitude per metre east and north. */
    static final double M_LON = 1 / (Math.PI / 180 * 6_371_008.8 * Math.cos(Math.toRadians(LAT)));
    static final double M_LAT = 1 / (Math.PI / 180 * 6_371_008.8);
    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private MetreStreets() {
    }

    /** A timed track through the metre points (east, north, seconds, east, north, seconds, ...). */
    static TrackSegment track(double... xyt) {
        int n = xyt.length / 3;
        double[] lon = new double[n], lat = new double[n], time = new double[n];
        for (int i = 0; i < n; i++) {
            lon[i] = LON + xyt[3 * i] * M_LON;
            lat[i] = LAT + xyt[3 * i + 1] * M_LAT;
            time[i] = SimulatedDrive.START + xyt[3 * i + 2];
        }
        return new TrackSegment(Path.of("simulated.gpx"), "invented", lon, lat, time);
    }

    /** A two-way street through the metre points (east, north, east, north, ...). */
    static RoadFeature street(String id, double... xy) {
        return street(id, Travel.BOTH, xy);
    }

    /** A two-way street through the metre points, tagged as a tunnel (OpenStreetMap's tunnel=yes). */
    static RoadFeature tunnel(String id, double... xy) {
        RoadFeature open = street(id, xy);
        return new RoadFeature(id, id, open.line(), Travel.BOTH, true, Map.of("tunnel", "yes"));
    }

    /** A street of the given travel through the metre points (east, north, east, north, ...). */
    static RoadFeature street(String id, Travel travel, double... xy) {
        Coordinate[] c = new Coordinate[xy.length / 2];
        for (int i = 0; i < c.length; i++) {
            c[i] = new Coordinate(LON + xy[2 * i] * M_LON, LAT + xy[2 * i + 1] * M_LAT);
        }
        return new RoadFeature(id, id, GEOMETRY.createLineString(c), travel, true, Map.of());
    }
}
