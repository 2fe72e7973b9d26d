package org.streetcomb.network;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.read.RoadFeature;

/**
 * Puts the depot on the network node nearest the requested position, refusing one too far away. Without a
 * requested position, the depot is the node nearest the layer's first point among the nodes of the
 * largest set of streets that can all reach each other (the largest strongly connected component, by
 * street length): a layer's first line is often a stray piece or, in an OpenStreetMap extract, a one-way
 * street cut at the edge, and a depot there could serve almost nothing.
 */
public final class DepotPlacement {

    private DepotPlacement() {
    }

    /**
     * @param requested   the depot position, or null for the default described above
     * @param maxDistance metres the nearest node may lie from the requested position
     * @param file        the layer, named in the error
     * @return the depot node and its distance from the requested position, or null for a network without edges
     * @throws InputError when the nearest node is farther than {@code maxDistance}
     */
    public static NearestNode.Hit place(StreetNetwork network, List<RoadFeature> features, LonLat requested,
                                        double maxDistance, Path file) {
        return place(network, firstPoint(features.get(0)), requested, maxDistance, file);
    }

    /**
     * @param near without a requested position, the depot is the node of the largest strongly connected
     *             component nearest this point (the layer's first point, or the middle of a service area)
     */
    public static NearestNode.Hit place(StreetNetwork network, LonLat near, LonLat requested, double maxDistance,
                                        Path file) {
        if (requested == null) {
            return insideLargestStrongComponent(network, near);
        }
        LonLat position = requested;
        NearestNode.Hit depot = NearestNode.of(network, position.lon(), position.lat());
        if (depot != null && depot.distance() > maxDistance) {
            throw new InputError(String.format(Locale.ROOT,
                    "depot %.7f,%.7f is %.0f m from the nearest street node of %s (limit %.0f m): check the order "
                    + "longitude,latitude or raise the limit", position.lon(), position.lat(), depot.distance(),
                    file.getFileName(), maxDistance));
        }
        return depot;
    }

    private static NearestNode.Hit insideLargestStrongComponent(StreetNetwork network, LonLat near) {
        StrongComponents strong = StrongComponents.of(network, new TravelArcs(network));
        double[] length = new double[strong.count()];
        for (int e = 0; e < network.edgeCount(); e++) {
            int c = strong.of(network.from(e));
            if (c >= 0 && c == strong.of(network.to(e))) {
                length[c] += network.length(e);
            }
        }
        int largest = 0;
        for (int c = 1; c < length.length; c++) {
            if (length[c] > length[largest]) {
                largest = c;
            }
        }
        final int chosen = largest;
        return NearestNode.of(network, near.lon(), near.lat(), v -> strong.of(v) == chosen);
    }

    public static LonLat firstPoint(RoadFeature feature) {
        var c = feature.line().getCoordinateN(0);
        return new LonLat(c.x, c.y);
    }
}
