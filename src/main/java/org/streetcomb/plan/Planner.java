package org.streetcomb.plan;

import org.streetcomb.timing.StageClock;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.NoTourError;
import org.streetcomb.check.NetworkRepair;
import org.streetcomb.check.OneWayTrapCheck;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.network.Components;
import org.streetcomb.network.DepotPlacement;
import org.streetcomb.network.LonLat;
import org.locationtech.jts.geom.Coordinate;
import org.streetcomb.scope.AreaScope;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.CirculationSearch;
import org.streetcomb.solve.PostmanVariants;
import org.streetcomb.solve.ReachabilityCheck;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * The planning pipeline: read, build the network, repair, scope to the service area, place the depot, solve,
 * order the tours, cut them into a fleet's trips and reorder them for fewer turns. The command line, the
 * districts batch and the audit's mop-up all plan through here, so a Java caller gets the command line's tours.
 */
public final class Planner {

    private Planner() {
    }

    public static Plan plan(PlanRequest request, StageClock clock) {
        return plan(request, RepairOptions.NONE, clock);
    }

    /** Plans after making the repairs asked for; each repair made is listed among the plan's warnings. */
    public static Plan plan(PlanRequest request, RepairOptions repairs, StageClock clock) {
        RoadLayer layer = clock.time("read", () -> LayerReaders.read(request.input(), request.readOptions()));
        StreetNetwork built = clock.time("network", () -> new NetworkBuilder(request.snapTolerance()).build(layer));
        return plan(request, layer, built, repairs, clock);
    }

    /**
     * Plans on a layer already read and its network already built (a batch of areas plans many times on
     * one network); the request's input names the layer in messages.
     */
    public static Plan plan(PlanRequest request, RoadLayer layer, StreetNetwork built, RepairOptions repairs,
                            StageClock clock) {
        List<String> warnings = new ArrayList<>();
        NetworkRepair.Result repaired = repairs.equals(RepairOptions.NONE)
                ? new NetworkRepair.Result(layer, built, List.of())
                : clock.time("repair", () -> NetworkRepair.apply(layer, built, request.snapTolerance(), repairs));
        repaired.done().forEach(done -> warnings.add("repaired: " + done));
        StreetNetwork whole = repaired.network();
        if (whole.edgeCount() == 0) {
            throw new NoTourError(request.input() + ": no street of positive length after noding");
        }
        ServiceArea area = request.service().area();
        AreaScope.Scoped scoped = area == null ? null : clock.time("scope", () -> AreaScope.apply(whole, area));
        StreetNetwork network = scoped == null ? whole : scoped.network();
        if (scoped != null && scoped.insideLength() == 0) {
            throw new NoTourError(request.input().getFileName() + ": no street to service inside the area " + area.label());
        }
        Components components = Components.of(network);
        LonLat near = area == null ? DepotPlacement.firstPoint(repaired.layer().features().get(0))
                : interiorPoint(area);
        NearestNode.Hit depot = DepotPlacement.place(network, near, request.depot(), request.maxDepotDistance(),
                request.input());
        if (components.count() > 1) {
            warnings.add(request.depotOnly()
                    ? String.format(Locale.ROOT, "the network has %d separate parts: only the depot's part is planned "
                      + "(%.2f km of %.2f km)", components.count(), components.length(components.of(depot.node())) / 1000,
                      network.totalLength() / 1000)
                    : String.format(Locale.ROOT, "the network has %d separate parts: one tour is planned for each",
                      components.count()));
        }
        // with a cost field the solvers minimise cost: they see each edge's cost as its length
        StreetNetwork weighted = network.hasCosts() ? network.weightedByCost() : network;
        PostmanProblem asked = PostmanSetup.problem(request, weighted, components, depot.node(),
                scoped == null ? null : scoped.inside(), warnings);
        PostmanProblem problem;
        try {
            problem = ReachabilityCheck.check(asked, request.input().getFileName().toString(),
                    request.service().leaveOutCutOff(), warnings);
        } catch (NoTourError cutOff) {
            throw OneWayTrapCheck.explain(cutOff, network, request.input());
        }
        Augmentation heuristic = clock.time("solve", () -> PostmanVariants.solve(problem));
        double prove = request.service().proveSeconds();
        Augmentation augmentation = prove <= 0 ? heuristic
                : clock.time("prove", () -> CirculationSearch.improve(problem, heuristic, prove, clock::note));
        List<Tour> tours = clock.time("order", () -> TourPlanner.tours(problem, components, augmentation));
        if (tours.get(0).steps() == 0) {
            warnings.add("the depot's tour is empty: nothing it can reach and leave again needs servicing; give a "
                    + "--depot on the main network (the health command lists one-way traps)");
        }
        Plan solved = new Plan(request, layer.report(), network, components, depot.node(),
                request.depot() != null ? depot.distance() : 0, augmentation, tours, List.copyOf(warnings),
                leftOut(asked, problem));
        return TourArrangement.apply(solved, request.arrangement(), clock);
    }

    /** The edges the asked problem needs and the solved one does not: those one-way streets cut off. */
    private static int[] leftOut(PostmanProblem asked, PostmanProblem solved) {
        return java.util.stream.IntStream.range(0, asked.network().edgeCount())
                .filter(e -> asked.demand().needs(e) && !solved.demand().needs(e)).toArray();
    }

    private static LonLat interiorPoint(ServiceArea area) {
        Coordinate c = area.polygon().getInteriorPoint().getCoordinate();
        return new LonLat(c.x, c.y);
    }
}
