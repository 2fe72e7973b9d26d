package org.streetcomb.plan;

import java.util.List;
import org.streetcomb.mopup.MopUpPlanner;
import org.streetcomb.network.Components;
import org.streetcomb.network.DepotPlacement;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.timing.StageClock;

/**
 * The mop-up after an audit as a {@link Plan}: the missed stretches solved by {@link MopUpPlanner}, then cut
 * into trips and ordered for driving by the same stage as every plan ({@link TourArrangement}).
 */
public final class MopUpPlanning {

    /** The mop-up plan and the solver's account of it (start and end node, method). */
    public record Result(Plan plan, MopUpPlanner.MopUp planned) {
    }

    private MopUpPlanning() {
    }

    /** Plans the mop-up of an audit; null when every required street is covered. */
    public static Result plan(Audit audit, MopUpRequest request, StageClock clock) {
        AuditRequest asked = audit.request();
        StreetNetwork audited = audit.coverage().network();
        NearestNode.Hit depot = DepotPlacement.place(audited, audited.features(), request.depot(),
                request.depotReach(), asked.layer());
        int first = request.start() == null ? depot.node()
                : DepotPlacement.place(audited, audited.features(), request.start(), request.depotReach(),
                        asked.layer()).node();
        MopUpPlanner.MopUp planned = clock.time("mop-up", () -> MopUpPlanner.plan(audit.coverage(), depot.node(),
                first, request.turnBack(), asked.layer().getFileName().toString()));
        if (planned == null) {
            return null;
        }
        StreetNetwork network = planned.network();
        PlanRequest as = new PlanRequest(asked.layer(), request.depot(), asked.snapTolerance(), request.depotReach(),
                false, asked.readOptions(), ServiceOptions.DEFAULTS, request.arrangement());
        Plan solved = new Plan(as, audit.read(), network, Components.of(network), depot.node(),
                request.depot() == null ? 0 : depot.distance(), planned.augmentation(), planned.tours(), List.of());
        return new Result(TourArrangement.apply(solved, request.arrangement(), clock), planned);
    }
}
