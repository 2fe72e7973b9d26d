package org.streetcomb.trip;

/**
 * What one trip may use, as a linear measure of the trip: {@code perServiceMetre * service length +
 * perDeadheadMetre * deadhead length + perDemand * demand <= max}. A limit on trip length, on trip
 * duration at given service and travel speeds, and a vehicle's capacity (the capacitated arc-routing
 * problem) are all of this form.
 */
public record TripLimit(double perServiceMetre, double perDeadheadMetre, double perDemand, double max) {

    public static TripLimit length(double maxMetres) {
        return new TripLimit(1, 1, 0, maxMetres);
    }

    /** Duration in hours at a service speed and a travel speed, in km/h. */
    public static TripLimit hours(double maxHours, double serviceKmh, double travelKmh) {
        return new TripLimit(1 / (1000 * serviceKmh), 1 / (1000 * travelKmh), 0, maxHours);
    }

    public static TripLimit capacity(double capacity) {
        return new TripLimit(0, 0, 1, capacity);
    }

    double use(double service, double deadhead, double demand) {
        return perServiceMetre * service + perDeadheadMetre * deadhead + perDemand * demand;
    }

    boolean allows(double service, double deadhead, double demand) {
        return use(service, deadhead, demand) <= max * (1 + 1e-12);
    }
}
