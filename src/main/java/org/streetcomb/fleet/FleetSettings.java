package org.streetcomb.fleet;

import java.util.List;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripLimit;

/**
 * What a fleet's day may use.
 *
 * @param vehicles   vehicles sharing the streets, each in an area of its own
 * @param tripLimit  what one trip from the depot may use (hours, kilometres or load); unbounded for one trip per vehicle
 * @param shiftHours the most hours one vehicle's trips may take together, or infinity
 * @param serviceKmh average speed while servicing
 * @param travelKmh  average speed on deadhead
 * @param restarts   search effort of the trip cutting ({@link org.streetcomb.trip.TripPlanner.Settings#restarts()})
 * @param seed       seed of the randomised search
 * @param reloads    network nodes besides the depot where a vehicle may reload between trips (a salt barn, a tip)
 */
public record FleetSettings(int vehicles, TripLimit tripLimit, double shiftHours, double serviceKmh, double travelKmh,
                            int restarts, long seed, List<Integer> reloads, double turnBackMetres) {

    public FleetSettings(int vehicles, TripLimit tripLimit, double shiftHours, double serviceKmh, double travelKmh,
                         int restarts, long seed, List<Integer> reloads) {
        this(vehicles, tripLimit, shiftHours, serviceKmh, travelKmh, restarts, seed, reloads, 0);
    }

    public FleetSettings {
        if (vehicles < 1) {
            throw new IllegalArgumentException("at least one vehicle");
        }
        reloads = List.copyOf(reloads);
    }

    /** Settings with the depot as the only reload point. */
    public FleetSettings(int vehicles, TripLimit tripLimit, double shiftHours, double serviceKmh, double travelKmh,
                         int restarts, long seed) {
        this(vehicles, tripLimit, shiftHours, serviceKmh, travelKmh, restarts, seed, List.of());
    }

    /** Hours a trip takes at the service and travel speeds. */
    public double hours(Trip trip) {
        return trip.service() / (1000 * serviceKmh) + trip.deadhead() / (1000 * travelKmh);
    }
}
