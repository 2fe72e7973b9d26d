package org.streetcomb;

import java.nio.file.Path;
import org.streetcomb.network.LonLat;
import org.streetcomb.plan.Arrangement;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.TrafficSide;

/** Plans of the fixtures the field-output tests share (the demo town is invented: demo data only). */
public final class FieldFixtures {

    public static final Path DEMO_TOWN = Path.of("fixtures/demo/brackenford.geojson");

    private FieldFixtures() {
    }

    public static Plan demoTown() {
        return plan(DEMO_TOWN, new LonLat(-31.2, 44.6));
    }

    /** The tours in the order first found (Hierholzer), before the turn-aware reorder, so tests can compare. */
    public static Plan plan(Path layer, LonLat depot) {
        return Planner.plan(new PlanRequest(layer, depot, 0.5, 500, false, ReadOptions.DEFAULTS,
                ServiceOptions.DEFAULTS, new Arrangement(TrafficSide.RIGHT, false, null)),
                new StageClock(StageClock.SILENT));
    }
}
