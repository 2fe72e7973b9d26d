package org.streetcomb.plan;

import java.util.List;
import org.streetcomb.network.LonLat;
import org.streetcomb.trip.TripLimit;
import org.streetcomb.trip.TripPlanner;

/**
 * How to share the depot's tour among vehicles and cut it into trips; all limits optional (null).
 *
 * @param maxKm        a trip's longest length, kilometres
 * @param maxHours     a trip's longest duration, hours at the service and travel speeds
 * @param vehicles     the number of vehicles (null: one)
 * @param shiftHours   the longest day of one vehicle, hours
 * @param capacity     what one vehicle carries, in the unit of the demand
 * @param demandField  the field holding each street's demand
 * @param demandPerKm  demand per kilometre and lane
 * @param lanesField   the field holding each street's lanes, for {@code demandPerKm}
 * @param reloadAt     places besides the depot where a vehicle may reload
 * @param serviceKmh   average speed while servicing
 * @param travelKmh    average speed on deadhead
 * @param restarts     local search restarts for the cut (null: chosen by size)
 */
public record FleetRequest(Double maxKm, Double maxHours, Integer vehicles, Double shiftHours, Double capacity,
                           String demandField, Double demandPerKm, String lanesField, List<LonLat> reloadAt,
                           double serviceKmh, double travelKmh, Integer restarts, double turnBackMetres) {

    public FleetRequest(Double maxKm, Double maxHours, Integer vehicles, Double shiftHours, Double capacity,
                        String demandField, Double demandPerKm, String lanesField, List<LonLat> reloadAt,
                        double serviceKmh, double travelKmh, Integer restarts) {
        this(maxKm, maxHours, vehicles, shiftHours, capacity, demandField, demandPerKm, lanesField, reloadAt, serviceKmh,
                travelKmh, restarts, 0);
    }

    /** Average speeds, km/h, when none are given: a slow servicing pass and town traffic (common practice, from memory). */
    public static final int DEFAULT_SERVICE_KMH = 10;
    public static final int DEFAULT_TRAVEL_KMH = 30;

    /** How far a reload point may lie from the nearest street node (as the depot's default reach). */
    public static final double RELOAD_REACH_METRES = 500;

    public FleetRequest {
        reloadAt = List.copyOf(reloadAt);
    }

    /** True when any limit, vehicle count or reload point asks for trips. */
    public boolean requested() {
        return maxKm != null || maxHours != null || vehicles != null || shiftHours != null || capacity != null
                || !reloadAt.isEmpty();
    }

    /** The limit on one trip: length or hours, with the capacity when one is given. */
    TripLimit limit() {
        TripLimit limit = maxKm != null ? TripLimit.length(maxKm * 1000)
                : maxHours != null ? TripLimit.hours(maxHours, serviceKmh, travelKmh)
                : capacity != null ? TripLimit.capacity(capacity)
                : TripLimit.length(Double.POSITIVE_INFINITY);
        return capacity != null && (maxKm != null || maxHours != null) ? limit.withCapacity(capacity) : limit;
    }

    int restartsOrAuto() {
        return restarts == null ? TripPlanner.AUTO : restarts;
    }
}
