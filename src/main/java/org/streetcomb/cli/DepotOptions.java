package org.streetcomb.cli;

import org.streetcomb.network.DepotPlacement;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadLayer;
import picocli.CommandLine.Option;

/** Where the depot is, for commands that check reachability from it. */
final class DepotOptions {

    @Option(names = "--depot", paramLabel = "LON,LAT", converter = LonLatConverter.class,
            description = "The depot, as longitude,latitude in degrees (WGS84); streets are checked for a legal "
                    + "route from and back to it. Default: as planning does, a node of the largest strongly connected set "
                    + "of streets.")
    LonLat position;

    @Option(names = "--depot-reach", paramLabel = "METRES", defaultValue = "500",
            description = "Refuse a depot farther than this from the nearest street node (default: ${DEFAULT-VALUE} m).")
    double reach;

    /** The depot node on the network, or -1 for a network without edges. */
    int node(RoadLayer layer, StreetNetwork network) {
        NearestNode.Hit hit = DepotPlacement.place(network, layer.features(), position, reach, layer.source());
        return hit == null ? -1 : hit.node();
    }
}
