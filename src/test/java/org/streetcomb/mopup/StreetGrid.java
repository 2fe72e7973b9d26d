package org.streetcomb.mopup;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * Small invented street grids near the demo town for mop-up tests (invented data): blocks of about 120 m
 * east-west by 110 m north-south, one street line per block side, named by position.
 */
final class StreetGrid {

    static final double LON0 = -31.2;
    static final double LAT0 = 44.6;
    static final double DLON = 0.0015;
    static final double DLAT = 0.001;
    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private StreetGrid() {
    }

    /** A street line through the given longitude, latitude pairs. */
    static RoadFeature line(String id, String name, Travel travel, double... lonLat) {
        Coordinate[] c = new Coordinate[lonLat.length / 2];
        for (int i = 0; i < c.length; i++) {
            c[i] = new Coordinate(lonLat[2 * i], lonLat[2 * i + 1]);
        }
        return new RoadFeature(id, name, GEOMETRY.createLineString(c), travel, true, Map.of());
    }

    /** Two-way block sides of a grid of {@code columns} by {@code rows} junctions. */
    static List<RoadFeature> of(int columns, int rows) {
        List<RoadFeature> lines = new ArrayList<>();
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < columns; c++) {
                double lon = LON0 + c * DLON, lat = LAT0 + r * DLAT;
                if (c + 1 < columns) {
                    lines.add(line("h" + r + c, "Row " + r + " Street", Travel.BOTH, lon, lat, lon + DLON, lat));
                }
                if (r + 1 < rows) {
                    lines.add(line("v" + r + c, "Column " + c + " Road", Travel.BOTH, lon, lat, lon, lat + DLAT));
                }
            }
        }
        return lines;
    }
}
