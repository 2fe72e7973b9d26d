package org.streetcomb.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.read.CarplibInstance;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * The network of a CARPLIB benchmark instance: node i of the file becomes node i-1, each edge keeps its
 * cost as its length and its required flag, and its feature id is "(u,v)" as in the file.
 */
public final class CarplibNetwork {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private CarplibNetwork() {
    }

    public static StreetNetwork of(CarplibInstance instance) {
        int m = instance.edges().size();
        int[] from = new int[m];
        int[] to = new int[m];
        double[] length = new double[m];
        List<RoadFeature> features = new ArrayList<>(m);
        for (int e = 0; e < m; e++) {
            CarplibInstance.Edge edge = instance.edges().get(e);
            from[e] = edge.u() - 1;
            to[e] = edge.v() - 1;
            length[e] = edge.cost();
            var line = GEOMETRY.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(0, 0)});
            features.add(new RoadFeature("(" + edge.u() + "," + edge.v() + ")", "", line, Travel.BOTH,
                    edge.required(), Map.of()));
        }
        return StreetNetwork.ofGraph(instance.vertices(), from, to, length, features);
    }
}
