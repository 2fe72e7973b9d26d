package org.streetcomb.trip;

import org.streetcomb.tour.Tour;

/**
 * One trip: a closed walk from the depot that services some streets.
 *
 * @param tour      the walk, starting and ending at the depot
 * @param length    metres driven
 * @param service   metres driven servicing
 * @param demand    capacity used
 * @param overLimit the trip exceeds the limit because one street alone does
 */
public record Trip(Tour tour, double length, double service, double demand, boolean overLimit) {

    public double deadhead() {
        return length - service;
    }

    public double deadheadShare() {
        return length == 0 ? 0 : deadhead() / length;
    }
}
