package org.streetcomb.tour;

import org.streetcomb.network.StreetNetwork;

/**
 * How many U-turns, crossing turns and straight-ons a driver meets on a tour, counted at every
 * transition between consecutive steps (the start and the final arrival are not turns), with the same
 * counts per 100 km of tour so tours of different lengths compare.
 *
 * @param uTurns        transitions that reverse direction
 * @param crossingTurns turns and sharp turns across the oncoming lane
 * @param straightOns   transitions that carry on within 20 degrees of straight
 * @param transitions   all transitions counted
 * @param cost          the sum of {@link Turn#cost()} over the transitions
 * @param lengthKm      tour length in kilometres
 * @param uTurnsOutsideDeadEnds U-turns at a node where another street goes on (a dead end, degree 1, can
 *                      only be left by turning back; a turning head drawn as a loop has degree 2 and counts)
 */
public record TurnCounts(int uTurns, int crossingTurns, int straightOns, int transitions, double cost,
                         double lengthKm, int uTurnsOutsideDeadEnds) {

    public static TurnCounts of(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
        int u = 0;
        int outside = 0;
        int crossing = 0;
        int straight = 0;
        double cost = 0;
        int[] edges = tour.edges();
        boolean[] forward = tour.forward();
        for (int i = 1; i < edges.length; i++) {
            Turn turn = Turn.between(bearings, side, edges[i - 1], forward[i - 1], edges[i], forward[i]);
            cost += turn.cost();
            switch (turn.kind()) {
                case U_TURN -> {
                    u++;
                    outside += network.degree(tour.exit(network, i - 1)) > 1 ? 1 : 0;
                }
                case CONTINUE -> straight++;
                default -> crossing += turn.crossing() ? 1 : 0;
            }
        }
        return new TurnCounts(u, crossing, straight, Math.max(0, edges.length - 1), cost, tour.length(network) / 1000,
                outside);
    }

    /** Adds the counts of two tours. */
    public TurnCounts plus(TurnCounts other) {
        return new TurnCounts(uTurns + other.uTurns, crossingTurns + other.crossingTurns,
                straightOns + other.straightOns, transitions + other.transitions, cost + other.cost,
                lengthKm + other.lengthKm, uTurnsOutsideDeadEnds + other.uTurnsOutsideDeadEnds);
    }

    public static TurnCounts none() {
        return new TurnCounts(0, 0, 0, 0, 0, 0, 0);
    }

    public double per100Km(int count) {
        return lengthKm == 0 ? 0 : 100 * count / lengthKm;
    }

    /** Whether this is worse for a driver than {@code other}: more U-turns, then more crossing turns, then higher cost. */
    public boolean worseThan(TurnCounts other) {
        if (uTurns != other.uTurns) {
            return uTurns > other.uTurns;
        }
        if (crossingTurns != other.crossingTurns) {
            return crossingTurns > other.crossingTurns;
        }
        return cost > other.cost + 1e-9;
    }
}
