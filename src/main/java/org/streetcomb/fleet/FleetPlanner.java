package org.streetcomb.fleet;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripPlanner;

/**
 * Plans a fleet's day from the depot's tour: cluster first, route second. The tour's services are shared
 * among the vehicles by a sweep around the depot ({@link SweepSectors}, Gillett &amp; Miller 1974), so each
 * vehicle works a wedge of its own; each vehicle's services, in the tour's order, are then cut into trips
 * that fit the trip limit by {@link TripPlanner} (a split and memetic search over that vehicle's services
 * only), and its trips are driven one after the other from the depot.
 *
 * <p>The sweep balances an estimate of each vehicle's hours. The first estimate is the service time alone;
 * each of {@link #BALANCING_ROUNDS} quick rounds (trips cut without search) then scales every service's
 * weight by the ratio of its sector's planned hours to its estimate, so a sector far from the depot, with
 * more deadhead per street, is given fewer streets. The final round cuts with the full search effort.
 * O(rounds * trip planning).
 */
public final class FleetPlanner {

    /** Quick re-balancing rounds before the final one (1 and 2 were tried on Aurich; 2 evened the hours better). */
    static final int BALANCING_ROUNDS = 2;

    private final StreetNetwork network;
    private final int depot;
    private final FleetSettings settings;
    private final TripPlanner trips;
    /** Trips that may start and end at reload points, or null without any. */
    private final TripPlanner viaReloads;

    public FleetPlanner(StreetNetwork network, int depot, FleetSettings settings) {
        this.network = network;
        this.depot = depot;
        this.settings = settings;
        TripPlanner.Settings cut = new TripPlanner.Settings(settings.tripLimit(), 0, settings.restarts(), settings.seed(),
                settings.turnBackMetres());
        this.trips = new TripPlanner(network, depot, cut);
        this.viaReloads = settings.reloads().isEmpty() ? null : new TripPlanner(network, depot, cut,
                settings.reloads().stream().mapToInt(Integer::intValue).toArray());
    }

    /** This planner, telling {@code listener} of the trip search's progress, vehicle by vehicle. */
    public FleetPlanner withProgress(Consumer<String> listener) {
        trips.withProgress(listener);
        if (viaReloads != null) {
            viaReloads.withProgress(message -> listener.accept("via reload points: " + message));
        }
        return this;
    }

    /**
     * @param tour          a tour from the depot servicing the streets to share
     * @param demandPerEdge what servicing each edge uses of a vehicle's capacity, or null
     */
    public Fleet plan(Tour tour, double[] demandPerEdge) {
        if (tour.start() != depot) {
            throw new IllegalArgumentException("the tour must start at the depot");
        }
        int k = settings.vehicles();
        List<Integer> steps = new ArrayList<>();
        for (int i = 0; i < tour.steps(); i++) {
            if (tour.service()[i] && network.required(tour.edges()[i])) {
                steps.add(i);
            }
        }
        int n = steps.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] weight = new double[n];
        double lat0 = Math.toRadians(network.lat(depot));
        for (int s = 0; s < n; s++) {
            int e = tour.edges()[steps.get(s)];
            x[s] = ((network.lon(network.from(e)) + network.lon(network.to(e))) / 2 - network.lon(depot)) * Math.cos(lat0);
            y[s] = (network.lat(network.from(e)) + network.lat(network.to(e))) / 2 - network.lat(depot);
            weight[s] = network.length(e) / (1000 * settings.serviceKmh());
        }
        int[] sector = SweepSectors.assign(x, y, weight, k);
        if (k > 1) {
            for (int round = 0; round < BALANCING_ROUNDS; round++) {
                List<VehicleDay> days = days(tour, demandPerEdge, steps, sector, 0);
                double[] estimate = new double[k];
                for (int s = 0; s < n; s++) {
                    estimate[sector[s]] += weight[s];
                }
                for (int s = 0; s < n; s++) {
                    weight[s] *= days.get(sector[s]).hours() / Math.max(1e-12, estimate[sector[s]]);
                }
                sector = SweepSectors.assign(x, y, weight, k);
            }
        }
        boolean[] improved = {true};
        List<VehicleDay> days = days(tour, demandPerEdge, steps, sector, settings.restarts(), improved);
        if (viaReloads != null && days.stream().anyMatch(day -> day.trips().size() > 1)) {
            List<VehicleDay> reloading = days(tour, demandPerEdge, steps, sector, settings.restarts(), improved, viaReloads)
                    .stream().map(this::chained).toList();
            List<VehicleDay> better = new ArrayList<>();
            for (int v = 0; v < k; v++) {
                better.add(reloading.get(v).hours() < days.get(v).hours() - 1e-9 ? reloading.get(v) : days.get(v));
            }
            days = better;
        }
        return new Fleet(days, settings, k > 1 ? ServiceOverlap.share(network, days) : 0, improved[0]);
    }

    /**
     * A vehicle's trips driven one after the other: the first leaves the depot, each next one leaves from the
     * home (depot or reload point) where the one before ended, and the last returns to the depot; a trip whose
     * start or end moves is driven again by shortest paths between its services (and flagged if it no longer
     * fits the limit).
     */
    private VehicleDay chained(VehicleDay day) {
        List<Trip> chained = new ArrayList<>();
        int at = depot;
        double hours = 0;
        List<Trip> ordered = inChainOrder(day.trips());
        for (int k = 0; k < ordered.size(); k++) {
            Trip trip = ordered.get(k);
            int to = k == ordered.size() - 1 ? depot : trip.tour().end(network);
            if (trip.tour().start() != at || trip.tour().end(network) != to) {
                trip = viaReloads.redriven(trip, at, to);
            }
            chained.add(trip);
            hours += settings.hours(trip);
            at = to;
        }
        return new VehicleDay(day.vehicle(), chained, hours);
    }

    /**
     * The trips in an order that lets each leave from where the one before ended: from the depot, always the
     * next trip that starts at the current home (ties by the order cut), else the first; trips ending at the
     * depot are kept for last where there is a choice. O(trips^2).
     */
    private List<Trip> inChainOrder(List<Trip> trips) {
        List<Trip> left = new ArrayList<>(trips);
        List<Trip> order = new ArrayList<>();
        int at = depot;
        while (!left.isEmpty()) {
            Trip pick = null;
            for (Trip t : left) {
                boolean startsHere = t.tour().start() == at;
                boolean endsAway = t.tour().end(network) != depot || left.size() == 1;
                if (startsHere && (endsAway || pick == null)) {
                    pick = t;
                    if (endsAway) {
                        break;
                    }
                }
            }
            if (pick == null) {
                pick = left.get(0);
            }
            left.remove(pick);
            order.add(pick);
            at = pick.tour().end(network);
        }
        return order;
    }

    private List<VehicleDay> days(Tour tour, double[] demand, List<Integer> steps, int[] sector, int restarts) {
        return days(tour, demand, steps, sector, restarts, new boolean[1]);
    }

    private List<VehicleDay> days(Tour tour, double[] demand, List<Integer> steps, int[] sector, int restarts,
                                  boolean[] improved) {
        return days(tour, demand, steps, sector, restarts, improved, trips);
    }

    private List<VehicleDay> days(Tour tour, double[] demand, List<Integer> steps, int[] sector, int restarts,
                                  boolean[] improved, TripPlanner trips) {
        int[] sectorOfStep = new int[tour.steps()];
        Arrays.fill(sectorOfStep, -1);
        for (int s = 0; s < steps.size(); s++) {
            sectorOfStep[steps.get(s)] = sector[s];
        }
        List<VehicleDay> days = new ArrayList<>();
        for (int v = 0; v < settings.vehicles(); v++) {
            int mine = v;
            TripPlanner.Result result = trips.plan(tour, demand, step -> sectorOfStep[step] == mine, restarts);
            if (result.tasks() > 0) {
                improved[0] &= result.improved();
            }
            double hours = 0;
            for (Trip trip : result.trips()) {
                hours += settings.hours(trip);
            }
            days.add(new VehicleDay(v + 1, result.trips(), hours));
        }
        return days;
    }
}
