package org.streetcomb.fleet;

import java.util.List;
import org.streetcomb.trip.Trip;

/**
 * A fleet's day: each vehicle's trips, and how the plan meets the limits.
 *
 * @param vehicles     every vehicle's day, vehicle 1 first (a vehicle with nothing to do has no trips)
 * @param settings     what the day was planned for
 * @param overlapShare share of the service length that has another vehicle's streets within
 *                     {@link ServiceOverlap#RADIUS_METRES} (0 for one vehicle)
 * @param improved     whether the trips were improved by local search (small enough for the distance table)
 */
public record Fleet(List<VehicleDay> vehicles, FleetSettings settings, double overlapShare, boolean improved) {

    public Fleet {
        vehicles = List.copyOf(vehicles);
    }

    public double shiftHours() {
        return settings.shiftHours();
    }

    /** All trips, vehicle by vehicle, in driving order. */
    public List<Trip> trips() {
        return vehicles.stream().flatMap(v -> v.trips().stream()).toList();
    }

    public double length() {
        return vehicles.stream().mapToDouble(VehicleDay::length).sum();
    }

    public double longestHours() {
        return vehicles.stream().mapToDouble(VehicleDay::hours).max().orElse(0);
    }

    /** Hours beyond the shift, summed over the vehicles that exceed it (0 when the fleet covers the network). */
    public double hoursOverShift() {
        return vehicles.stream().mapToDouble(v -> Math.max(0, v.hours() - shiftHours())).sum();
    }

    /** Whether some trip exceeds the trip limit, or some vehicle the shift. */
    public boolean overLimits() {
        return hoursOverShift() > 1e-9 || trips().stream().anyMatch(Trip::overLimit);
    }
}
