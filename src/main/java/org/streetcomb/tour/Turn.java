package org.streetcomb.tour;

/**
 * One transition between consecutive traversals of a tour, as a driver meets it.
 *
 * @param angle    signed change of heading in degrees, positive to the right
 * @param kind     how sharp the turn is
 * @param crossing whether it crosses the oncoming lane (a left turn where traffic keeps right); never set
 *                 for a U-turn, which is counted on its own
 */
public record Turn(double angle, TurnKind kind, boolean crossing) {

    /** The turn from one traversal into the next at the node they share. */
    public static Turn between(EdgeBearings bearings, TrafficSide side, int inEdge, boolean inForward,
                               int outEdge, boolean outForward) {
        double angle = bearings.turnAngle(inEdge, inForward, outEdge, outForward);
        TurnKind kind = TurnKind.of(angle, inEdge == outEdge && inForward != outForward);
        boolean crossing = (kind == TurnKind.TURN || kind == TurnKind.SHARP) && side.crosses(angle);
        return new Turn(angle, kind, crossing);
    }

    /**
     * What the turn costs the driver, in rough seconds lost: a U-turn far outweighs any turn, and a
     * crossing turn (waiting for a gap in oncoming traffic) outweighs a turn to the kerb side. The
     * weights are common practice in arc routing with turn penalties; only their order matters to the
     * ordering, and the fraction of the angle breaks ties toward the straighter way.
     */
    public double cost() {
        double base = switch (kind) {
            case CONTINUE -> 0;
            case BEAR -> 2;
            case TURN -> crossing ? 12 : 5;
            case SHARP -> crossing ? 18 : 9;
            case U_TURN -> 60;
        };
        return base + Math.abs(angle) / 180;
    }
}
