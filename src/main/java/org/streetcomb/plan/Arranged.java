package org.streetcomb.plan;

import java.util.List;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.trip.Trip;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.tour.TurnCounts;

/**
 * What arranging the tours did.
 *
 * @param side     the side of the road traffic keeps to
 * @param turnAware whether the tours were reordered for fewer turns
 * @param asFound  the turns of the tours (or trips) in the order first found
 * @param asDriven the turns of the tours as planned to be driven
 * @param fleet    the fleet's day, or null when no trips were asked for
 * @param trips    the fleet's trips as driven (reordered), vehicle by vehicle; empty without a fleet
 */
public record Arranged(TrafficSide side, boolean turnAware, TurnCounts asFound, TurnCounts asDriven, Fleet fleet,
                       List<Trip> trips) {

    public Arranged {
        trips = List.copyOf(trips);
    }
}
