package org.streetcomb.plan;

import org.streetcomb.tour.TrafficSide;

/**
 * How solved tours are made ready to drive: cut into trips for a fleet, and reordered for fewer U-turns and
 * crossing turns.
 *
 * @param side      the side of the road traffic keeps to (decides which turns cross oncoming traffic)
 * @param turnAware reorder each tour for fewer turns (same length); false keeps the order first found
 * @param fleet     vehicles and trip limits, or null for one tour per part
 */
public record Arrangement(TrafficSide side, boolean turnAware, FleetRequest fleet) {

    /** What the command line does without options: right-hand traffic, turn-aware order, no trips. */
    public static final Arrangement DEFAULT = new Arrangement(TrafficSide.RIGHT, true, null);

    /** Average speed while servicing, km/h: the fleet's, else the default. */
    public double serviceKmh() {
        return fleet == null ? FleetRequest.DEFAULT_SERVICE_KMH : fleet.serviceKmh();
    }

    /** Average speed on deadhead, km/h: the fleet's, else the default. */
    public double travelKmh() {
        return fleet == null ? FleetRequest.DEFAULT_TRAVEL_KMH : fleet.travelKmh();
    }

    public boolean trips() {
        return fleet != null && fleet.requested();
    }
}
