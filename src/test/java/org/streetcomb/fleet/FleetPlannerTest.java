package org.streetcomb.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.streetcomb.FieldFixtures;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourValidator;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripLimit;
import org.streetcomb.trip.TripPlanner;

/**
 * A fleet's day on the demo town (invented data, demo only): every trip a valid closed walk from the depot
 * ({@link TourValidator}: continuous, each street driven only its permitted way) within the trip limit,
 * every street the tour services serviced exactly as often over the whole fleet, each vehicle's hours the
 * sum of its trips' hours, and the shortfall against the shift the hours beyond it.
 */
class FleetPlannerTest {

    private static Plan plan;
    private static StreetNetwork network;

    @BeforeAll
    static void demoTown() {
        plan = FieldFixtures.demoTown();
        network = plan.network();
    }

    @Test
    void everyTripIsValidAndTheFleetServicesEveryStreetOnce() {
        FleetSettings settings = new FleetSettings(3, TripLimit.hours(0.5, 10, 30), 1.0, 10, 30, 1, 7);
        Fleet fleet = new FleetPlanner(network, plan.depot(), settings).plan(plan.tours().get(0), null);
        assertEquals(3, fleet.vehicles().size());
        int[] serviced = new int[network.edgeCount()];
        double over = 0;
        for (VehicleDay day : fleet.vehicles()) {
            double hours = 0;
            for (Trip trip : day.trips()) {
                Tour tour = trip.tour();
                assertEquals(plan.depot(), tour.start());
                assertEquals(plan.depot(), tour.end(network), "each trip returns to the depot");
                assertEquals(List.of(), TourValidator.problems(network, tour, new int[0]));
                assertTrue(settings.hours(trip) <= 0.5 + 1e-9 || trip.overLimit(), "trip within 0.5 h");
                hours += settings.hours(trip);
                for (int i = 0; i < tour.steps(); i++) {
                    if (tour.service()[i]) {
                        serviced[tour.edges()[i]]++;
                    }
                }
            }
            assertEquals(hours, day.hours(), 1e-9);
            over += Math.max(0, hours - 1.0);
        }
        assertEquals(over, fleet.hoursOverShift(), 1e-9);
        int[] expected = new int[network.edgeCount()];
        Tour tour = plan.tours().get(0);
        for (int i = 0; i < tour.steps(); i++) {
            if (tour.service()[i] && network.required(tour.edges()[i])) {
                expected[tour.edges()[i]]++;
            }
        }
        for (int e = 0; e < serviced.length; e++) {
            assertEquals(expected[e], serviced[e], "edge " + e + " serviced as often as the tour services it");
        }
    }

    /**
     * The areas interleave less than trips cut from the one tour at proportional places (Frederickson, Hecht &amp;
     * Kim 1978, as {@link TripPlanner} does for k vehicles), the cut the fleet replaced; overlap as defined in
     * {@link ServiceOverlap}.
     */
    @Test
    void sweptAreasInterleaveLessThanTheTourCutIntoPieces() {
        Fleet swept = new FleetPlanner(network, plan.depot(),
                new FleetSettings(2, TripLimit.length(Double.POSITIVE_INFINITY), Double.POSITIVE_INFINITY, 10, 30, 0, 7))
                .plan(plan.tours().get(0), null);
        TripPlanner.Result pieces = new TripPlanner(network, plan.depot(),
                new TripPlanner.Settings(TripLimit.length(Double.POSITIVE_INFINITY), 2, 0, 7)).plan(plan.tours().get(0), null);
        List<VehicleDay> cut = List.of(new VehicleDay(1, List.of(pieces.trips().get(0)), 0),
                new VehicleDay(2, List.of(pieces.trips().get(1)), 0));
        double cutOverlap = ServiceOverlap.share(network, cut);
        assertTrue(swept.overlapShare() < cutOverlap, swept.overlapShare() + " against " + cutOverlap);
        assertEquals(1, swept.vehicles().get(0).trips().size(), "no trip limit: one trip per vehicle");
    }

    /**
     * Load and reloads: a rate per kilometre (0.14 t/km, a common-practice order of magnitude for salt on a
     * two-lane road) and a capacity of 0.6 t; every trip carries at most its capacity, the first trip of each
     * vehicle leaves the depot, each next one leaves from where the one before ended (the depot or the reload
     * point), the last returns to the depot, and the fleet still services every street as the tour does.
     */
    @Test
    void tripsCarryAtMostTheCapacityAndChainThroughTheReloadPoint() {
        double[] demand = StreetDemand.of(network, null, 0.14, null, FieldFixtures.DEMO_TOWN);
        double total = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            assertEquals(0.14 * network.length(e) / 1000, demand[e], 1e-12);
            total += network.required(e) ? demand[e] : 0;
        }
        int reload = org.streetcomb.network.NearestNode.of(network, -31.182, 44.607).node();
        for (int vehicles = 1; vehicles <= 2; vehicles++) {
            FleetSettings settings = new FleetSettings(vehicles, TripLimit.capacity(0.6), Double.POSITIVE_INFINITY, 10, 30,
                    1, 7, List.of(reload));
            Fleet fleet = new FleetPlanner(network, plan.depot(), settings).plan(plan.tours().get(0), demand);
            double carried = 0;
            int[] serviced = new int[network.edgeCount()];
            for (VehicleDay day : fleet.vehicles()) {
                int at = plan.depot();
                for (int t = 0; t < day.trips().size(); t++) {
                    Trip trip = day.trips().get(t);
                    Tour tour = trip.tour();
                    assertEquals(at, tour.start(), "a trip leaves from where the one before ended");
                    at = tour.end(network);
                    assertTrue(at == plan.depot() || at == reload, "trips end at the depot or the reload point");
                    assertTrue(trip.demand() <= 0.6 + 1e-9, "load " + trip.demand());
                    assertEquals(List.of(), TourValidator.problems(network, tour,
                            org.streetcomb.solve.ServiceDemand.everyEdge(network), new int[0], at));
                    carried += trip.demand();
                    for (int i = 0; i < tour.steps(); i++) {
                        if (tour.service()[i]) {
                            serviced[tour.edges()[i]]++;
                        }
                    }
                }
                assertEquals(plan.depot(), at, "the day ends at the depot");
            }
            assertEquals(total, carried, 1e-6, "the load spread is the streets' demand");
            for (int e = 0; e < network.edgeCount(); e++) {
                assertEquals(network.required(e) ? 1 : 0, serviced[e], "edge " + e);
            }
        }
    }
}
