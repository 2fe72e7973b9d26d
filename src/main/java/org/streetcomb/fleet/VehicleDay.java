package org.streetcomb.fleet;

import java.util.List;
import org.streetcomb.trip.Trip;

/**
 * One vehicle's trips in the order it drives them, each from the depot and back.
 *
 * @param vehicle the vehicle's number, from 1
 * @param trips   its trips in order
 * @param hours   the hours the trips take together
 */
public record VehicleDay(int vehicle, List<Trip> trips, double hours) {

    public VehicleDay {
        trips = List.copyOf(trips);
    }

    public double length() {
        return trips.stream().mapToDouble(Trip::length).sum();
    }

    public double service() {
        return trips.stream().mapToDouble(Trip::service).sum();
    }
}
