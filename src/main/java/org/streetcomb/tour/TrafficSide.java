package org.streetcomb.tour;

/**
 * The side of the road traffic keeps to. A turn across the oncoming lane (a crossing turn) is to the left
 * where traffic keeps right, and to the right where it keeps left.
 */
public enum TrafficSide {
    RIGHT, LEFT;

    /** Whether a turn with this signed angle (positive to the right) crosses the oncoming lane. */
    public boolean crosses(double angle) {
        return this == RIGHT ? angle < 0 : angle > 0;
    }
}
