package org.streetcomb.coverage;

import org.streetcomb.read.RoadFeature;

/**
 * The coverage of one street line of the layer.
 *
 * @param feature   the street line
 * @param length    its length in the network, metres
 * @param needed    metres that must be driven: its length, or twice it when both kerbs of a two-way street
 *                  must be passed
 * @param driven    metres of {@code needed} that were driven (in a permitted, required direction)
 * @param wrongWay  metres of a one-way street driven against its direction (not counted in {@code driven})
 * @param status    covered, partly, missed, or not required
 */
public record StreetCoverage(RoadFeature feature, double length, double needed, double driven, double wrongWay,
                             CoverageStatus status) {

    /** Share of {@code needed} that was driven, 0..1. */
    public double fraction() {
        return needed > 0 ? Math.min(1, driven / needed) : 1;
    }
}
