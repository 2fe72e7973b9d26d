package org.streetcomb.trip;

/**
 * What one trip may use: a linear measure of the trip, {@code perServiceMetre * service length +
 * perDeadheadMetre * deadhead length + perDemand * demand <= max}, and a vehicle capacity the trip's demand
 * may not exceed. A limit on trip length, on trip duration at given service and travel speeds, and a
 * vehicle's capacity (the capacitated arc-routing problem) are all of the first form; a gritter's run
 * limited both in hours and by the salt it carries needs both.
 */
public record TripLimit(double perServiceMetre, double perDeadheadMetre, double perDemand, double max, double capacity) {

    public TripLimit(double perServiceMetre, double perDeadheadMetre, double perDemand, double max) {
        this(perServiceMetre, perDeadheadMetre, perDemand, max, Double.POSITIVE_INFINITY);
    }

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

    /** This limit with a vehicle capacity as well. */
    public TripLimit withCapacity(double load) {
        return new TripLimit(perServiceMetre, perDeadheadMetre, perDemand, max, load);
    }

    double use(double service, double deadhead, double demand) {
        return perServiceMetre * service + perDeadheadMetre * deadhead + perDemand * demand;
    }

    boolean allows(double service, double deadhead, double demand) {
        return use(service, deadhead, demand) <= max * (1 + 1e-12) && demand <= capacity * (1 + 1e-12);
    }

    /**
     * How far a trip is beyond the limit, in units of the linear measure: its overrun plus its demand beyond
     * the capacity scaled to the measure (a trip twice over its capacity counts as one a whole measure over).
     */
    double excess(double service, double deadhead, double demand) {
        double over = Math.max(0, use(service, deadhead, demand) - max);
        if (capacity < Double.POSITIVE_INFINITY && demand > capacity) {
            double scale = max < Double.POSITIVE_INFINITY ? max / capacity : 1;
            over += (demand - capacity) * scale;
        }
        return over;
    }
}
