package org.streetcomb.trip;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.streetcomb.FieldFixtures;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourValidator;

/**
 * Trips on the demo town (invented data): each a valid closed walk from the depot within the limit, every
 * street serviced exactly once over all trips, and for k vehicles a longest trip no shorter than the
 * bounds any k trips must respect (a trip to the farthest street and back; the service shared by k).
 */
class TripPlannerTest {

    private static Plan plan;
    private static StreetNetwork network;

    @BeforeAll
    static void demoTown() {
        plan = FieldFixtures.demoTown();
        network = plan.network();
    }

    @Test
    void tripsFitTheLengthLimitAndServiceEveryStreetOnce() {
        double limit = 10_000;
        TripPlanner.Result result = new TripPlanner(network, plan.depot(),
                new TripPlanner.Settings(TripLimit.length(limit), 0, 2, 7)).plan(plan.tours().get(0), null);
        assertTrue(result.trips().size() >= Math.ceil(plan.tourLength() / limit), "enough trips for the length");
        checkTrips(result.trips());
        for (Trip trip : result.trips()) {
            assertFalse(trip.overLimit());
            assertTrue(trip.length() <= limit + 1e-6, "trip of " + trip.length() + " m");
        }
        assertTrue(result.length() >= plan.tourLength() - 1e-6, "trips cannot beat the optimal single tour");
    }

    /**
     * A price on turning back in the street (--turn-back-metres) makes the trips take fewer U-turns where a
     * street goes on, at some length, and every trip stays valid and within its limit; turning back at a
     * dead end stays free (TurnCounts' definition).
     */
    @Test
    void pricingUTurnsTakesFewerOfThemWithinTheLimit() {
        double limit = 12_000;
        org.streetcomb.tour.EdgeBearings bearings = org.streetcomb.tour.EdgeBearings.of(network);
        int[] outside = new int[2];
        double[] length = new double[2];
        double[] metres = {0, 400};
        for (int k = 0; k < 2; k++) {
            TripPlanner.Result result = new TripPlanner(network, plan.depot(),
                    new TripPlanner.Settings(TripLimit.length(limit), 0, 2, 7, metres[k])).plan(plan.tours().get(0), null);
            checkTrips(result.trips());
            for (Trip trip : result.trips()) {
                assertFalse(trip.overLimit());
                outside[k] += org.streetcomb.tour.TurnCounts.of(network, bearings, org.streetcomb.tour.TrafficSide.RIGHT,
                        trip.tour()).uTurnsOutsideDeadEnds();
            }
            length[k] = result.length();
        }
        assertTrue(outside[1] < outside[0], "U-turns outside dead ends " + outside[0] + " -> " + outside[1]);
        assertTrue(length[1] >= length[0] - 1e-6, "the detours cost length");
    }

    @Test
    void vehiclesShareTheWorkAndTheLongestTripRespectsTheBounds() {
        int k = 3;
        TripPlanner.Result result = new TripPlanner(network, plan.depot(),
                new TripPlanner.Settings(TripLimit.length(Double.POSITIVE_INFINITY), k, 2, 7)).plan(plan.tours().get(0), null);
        assertTrue(result.trips().size() <= k);
        checkTrips(result.trips());
        double longest = result.trips().stream().mapToDouble(Trip::length).max().orElseThrow();
        assertTrue(longest >= network.totalLength() / k - 1e-6, "k trips share at least the service");
        assertTrue(longest >= farthestStreetRoundTrip() - 1e-6, "some trip reaches the farthest street");
        assertTrue(longest < plan.tourLength(), "sharing shortens the longest trip");
    }

    @Test
    void aStreetLongerThanTheLimitBecomesATripOfItsOwnAndIsFlagged() {
        TripPlanner.Result result = new TripPlanner(network, plan.depot(),
                new TripPlanner.Settings(TripLimit.length(100), 0, 0, 7)).plan(plan.tours().get(0), null);
        checkTrips(result.trips());
        for (Trip trip : result.trips()) {
            long services = countServices(trip.tour());
            assertTrue(!trip.overLimit() || services == 1, "only single-street trips may exceed the limit");
            assertTrue(trip.length() <= 100 + 1e-6 || trip.overLimit());
        }
        assertTrue(result.trips().stream().anyMatch(Trip::overLimit), "the demo town has streets beyond 100 m round trips");
    }

    private static void checkTrips(List<Trip> trips) {
        int[] serviced = new int[network.edgeCount()];
        for (Trip trip : trips) {
            Tour tour = trip.tour();
            assertEquals(plan.depot(), tour.start());
            int[] mustCover = new int[0];
            assertEquals(List.of(), TourValidator.problems(network, tour, mustCover));
            assertEquals(tour.length(network), trip.length(), 1e-6);
            for (int i = 0; i < tour.steps(); i++) {
                if (tour.service()[i]) {
                    serviced[tour.edges()[i]]++;
                }
            }
        }
        for (int e = 0; e < serviced.length; e++) {
            assertEquals(1, serviced[e], "edge " + e + " serviced once");
        }
    }

    private static long countServices(Tour tour) {
        long n = 0;
        for (boolean s : tour.service()) {
            n += s ? 1 : 0;
        }
        return n;
    }

    private static double farthestStreetRoundTrip() {
        DijkstraSearch search = new DijkstraSearch(network);
        search.start(plan.depot());
        while (search.next() >= 0) {
            // settle every node
        }
        double worst = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            double a = search.distance(network.from(e));
            double b = search.distance(network.to(e));
            worst = Math.max(worst, a + network.length(e) + b);
        }
        return worst;
    }
}
