package org.streetcomb.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.fleet.FleetPlanner;
import org.streetcomb.fleet.FleetSettings;
import org.streetcomb.fleet.StreetDemand;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TurnAwareOrder;
import org.streetcomb.tour.TurnCounts;
import org.streetcomb.trip.Trip;

/**
 * The last planning stages, after the solve: the fleet's day (vehicles, trips, reloads) cut from the depot's
 * tour, then every tour or trip reordered for fewer U-turns and crossing turns at the same length. Both the
 * command line and Java callers reach it through {@link Planner}, so they get the same tours.
 */
final class TourArrangement {

    private TourArrangement() {
    }

    static Plan apply(Plan solved, Arrangement how, StageClock clock) {
        Fleet fleet = how.trips() ? clock.time("trips", () -> fleet(solved, how.fleet(), clock)) : null;
        Plan cut = fleet == null ? solved : solved.withTours(fleet.trips().stream().map(Trip::tour).toList());
        return clock.time("turns", () -> {
            EdgeBearings bearings = EdgeBearings.of(cut.network());
            TurnCounts asFound = counts(cut, bearings, how, cut.tours());
            List<Tour> driven = cut.tours();
            if (how.turnAware()) {
                driven = new ArrayList<>();
                for (Tour tour : cut.tours()) {
                    driven.add(TurnAwareOrder.of(cut.network(), bearings, how.side(), tour));
                }
            }
            List<Trip> trips = new ArrayList<>();
            if (fleet != null) {
                List<Trip> found = fleet.trips();
                for (int t = 0; t < driven.size(); t++) {
                    Trip trip = found.get(t);
                    trips.add(new Trip(driven.get(t), trip.length(), trip.service(), trip.demand(), trip.overLimit()));
                }
            }
            return cut.arranged(driven, new Arranged(how.side(), how.turnAware(), asFound,
                    counts(cut, bearings, how, driven), fleet, trips));
        });
    }

    private static TurnCounts counts(Plan plan, EdgeBearings bearings, Arrangement how, List<Tour> tours) {
        TurnCounts counts = TurnCounts.none();
        for (Tour tour : tours) {
            counts = counts.plus(TurnCounts.of(plan.network(), bearings, how.side(), tour));
        }
        return counts;
    }

    /** The fleet's day planned over the plan's single tour from the depot. */
    private static Fleet fleet(Plan plan, FleetRequest request, StageClock clock) {
        if (plan.tours().size() != 1 || plan.tours().get(0).start() != plan.depot()) {
            throw new InputError(plan.request().input() + ": trips must start at the depot, but the network has "
                    + plan.components().count() + " separate parts: add --depot-part-only to cut the depot's part "
                    + "into trips");
        }
        double[] demand = request.capacity() == null ? null : StreetDemand.of(plan.network(), request.demandField(),
                request.demandPerKm() == null ? 0 : request.demandPerKm(), request.lanesField(),
                plan.request().input());
        List<Integer> reloads = new ArrayList<>();
        int part = plan.components().of(plan.depot());
        for (LonLat at : request.reloadAt()) {
            NearestNode.Hit hit = NearestNode.of(plan.network(), at.lon(), at.lat(),
                    node -> plan.components().of(node) == part);
            if (hit.node() < 0 || hit.distance() > FleetRequest.RELOAD_REACH_METRES) {
                throw new InputError(String.format(Locale.ROOT, "reload place %s,%s (--reload-at or --reload-points): no street node of the depot's part "
                        + "within %.0f m; give a place on the network", at.lon(), at.lat(),
                        FleetRequest.RELOAD_REACH_METRES));
            }
            reloads.add(hit.node());
        }
        FleetSettings settings = new FleetSettings(request.vehicles() == null ? 1 : request.vehicles(),
                request.limit(), request.shiftHours() == null ? Double.POSITIVE_INFINITY : request.shiftHours(),
                request.serviceKmh(), request.travelKmh(), request.restartsOrAuto(), 1, reloads, request.turnBackMetres());
        FleetPlanner planner = new FleetPlanner(plan.network(), plan.depot(), settings);
        if (request.restarts() != null && request.restarts() > 0) {
            planner.withProgress(clock::note);
        }
        return planner.plan(plan.tours().get(0), demand);
    }
}
