package org.streetcomb.network;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.read.RoadFeature;

/** Puts the depot on the network node nearest the requested position, refusing one too far away. */
public final class DepotPlacement {

    private DepotPlacement() {
    }

    /**
     * @param requested   the depot position, or null for the first point of the first road line
     * @param maxDistance metres the nearest node may lie from the requested position
     * @param file        the layer, named in the error
     * @return the depot node and its distance from the requested position, or null for a network without edges
     * @throws InputError when the nearest node is farther than {@code maxDistance}
     */
    public static NearestNode.Hit place(StreetNetwork network, List<RoadFeature> features, LonLat requested,
                                        double maxDistance, Path file) {
        LonLat position = requested != null ? requested : firstPoint(features.get(0));
        NearestNode.Hit depot = NearestNode.of(network, position.lon(), position.lat());
        if (depot != null && depot.distance() > maxDistance) {
            throw new InputError(String.format(Locale.ROOT,
                    "depot %.7f,%.7f is %.0f m from the nearest street node of %s (limit %.0f m): check the order "
                    + "longitude,latitude or raise the limit", position.lon(), position.lat(), depot.distance(),
                    file.getFileName(), maxDistance));
        }
        return depot;
    }

    private static LonLat firstPoint(RoadFeature feature) {
        var c = feature.line().getCoordinateN(0);
        return new LonLat(c.x, c.y);
    }
}
