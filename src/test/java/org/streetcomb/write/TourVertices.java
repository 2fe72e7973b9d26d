package org.streetcomb.write;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/**
 * The test oracle for the track exports: a tour's vertices straight from the network's stored geometry, each
 * step's points in driving order, a junction shared by the steps it joins and a point equal to the one before
 * it dropped (common practice for a polyline). Written here, not taken from the writers' own point list, so
 * what GDAL and gpsbabel read back is compared with the network itself.
 */
final class TourVertices {

    private TourVertices() {
    }

    /** Longitude, latitude pairs of the tour's vertices without simplification. */
    static List<double[]> of(StreetNetwork network, Tour tour) {
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            int count = network.pointCount(e);
            for (int k = 0; k < count; k++) {
                int p = tour.forward()[i] ? k : count - 1 - k;
                double[] point = {network.pointLon(e, p), network.pointLat(e, p)};
                double[] last = points.isEmpty() ? null : points.get(points.size() - 1);
                if (last == null || last[0] != point[0] || last[1] != point[1]) {
                    points.add(point);
                }
            }
        }
        return points;
    }
}
