package org.streetcomb.plan;

import java.nio.file.Path;
import org.streetcomb.network.LonLat;
import org.streetcomb.read.ReadOptions;

/**
 * What to plan.
 *
 * @param input             the road layer
 * @param depot             depot position, or null for the default (the first
 *                          point of the first road line in the file)
 * @param snapTolerance     vertices closer than this many metres are joined
 * @param maxDepotDistance  the depot may lie at most this many metres from the nearest network node
 * @param depotOnly         plan only the connected component that holds the depot
 * @param readOptions       how to read the layer
 * @param service           which streets need which passes, and where the depot's tour ends
 * @param arrangement       how the solved tours are cut into trips and ordered for driving
 */
public record PlanRequest(Path input, LonLat depot, double snapTolerance, double maxDepotDistance,
                          boolean depotOnly, ReadOptions readOptions, ServiceOptions service, Arrangement arrangement) {

    public PlanRequest(Path input, LonLat depot, double snapTolerance, double maxDepotDistance, boolean depotOnly,
                       ReadOptions readOptions, ServiceOptions service) {
        this(input, depot, snapTolerance, maxDepotDistance, depotOnly, readOptions, service, Arrangement.DEFAULT);
    }

    public PlanRequest(Path input, LonLat depot, double snapTolerance, double maxDepotDistance, boolean depotOnly,
                       ReadOptions readOptions) {
        this(input, depot, snapTolerance, maxDepotDistance, depotOnly, readOptions, ServiceOptions.DEFAULTS);
    }

    public PlanRequest(Path input, LonLat depot, double snapTolerance, double maxDepotDistance, boolean depotOnly) {
        this(input, depot, snapTolerance, maxDepotDistance, depotOnly, ReadOptions.DEFAULTS);
    }
}
