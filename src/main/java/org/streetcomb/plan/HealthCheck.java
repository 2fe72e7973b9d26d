package org.streetcomb.plan;

import java.nio.file.Path;
import java.util.List;
import org.streetcomb.check.CheckInput;
import org.streetcomb.check.CheckOptions;
import org.streetcomb.check.Finding;
import org.streetcomb.check.HealthReport;
import org.streetcomb.check.NetworkCheck;
import org.streetcomb.network.DepotPlacement;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.timing.StageClock;

/** The health check's pipeline: read, build the network, place the depot, run every detector. */
public final class HealthCheck {

    /**
     * What to check.
     *
     * @param input       the road layer
     * @param readOptions how to read it
     * @param options     the detectors' thresholds and the snap tolerance
     * @param depot       the depot position, or null for the default
     * @param depotReach  the depot may lie at most this many metres from the nearest street node
     */
    public record Request(Path input, ReadOptions readOptions, CheckOptions options, LonLat depot, double depotReach) {
    }

    private HealthCheck() {
    }

    public static HealthReport run(Request request, StageClock clock) {
        RoadLayer roads = clock.time("read", () -> LayerReaders.read(request.input(), request.readOptions()));
        StreetNetwork network = clock.time("network",
                () -> new NetworkBuilder(request.options().snap()).build(roads));
        NearestNode.Hit hit = DepotPlacement.place(network, roads.features(), request.depot(), request.depotReach(),
                roads.source());
        int depot = hit == null ? -1 : hit.node();
        List<Finding> findings = clock.time("check", () ->
                NetworkCheck.run(new CheckInput(roads, network, request.options(), depot)));
        return new HealthReport(request.input(), roads.report(), network, depot, request.options(), findings);
    }
}
