package org.streetcomb.tour;

/**
 * How sharply a driver turns from one street into the next, by the change of heading. The bands are
 * common practice in turn-by-turn directions: up to 20 degrees is carrying straight on, up to 45 a bear,
 * up to 135 a turn, up to 165 a sharp turn, beyond that (or driving straight back along the same street)
 * a U-turn.
 */
public enum TurnKind {
    CONTINUE, BEAR, TURN, SHARP, U_TURN;

    /**
     * @param angle    signed change of heading in degrees
     * @param reversal the next traversal drives back along the same edge
     */
    public static TurnKind of(double angle, boolean reversal) {
        double a = Math.abs(angle);
        if (reversal || a > 165) {
            return U_TURN;
        }
        if (a <= 20) {
            return CONTINUE;
        }
        if (a <= 45) {
            return BEAR;
        }
        return a <= 135 ? TURN : SHARP;
    }
}
