package org.streetcomb.check;

/**
 * Thresholds of the health check, all in metres.
 *
 * @param snap       line ends and vertices closer than this are joined when the network is built (as in
 *                   planning); lines shorter than this collapse
 * @param nearMiss   a dead end within this distance of another street, but not joined to it, is an undershoot
 * @param stub       a dead-end piece at most this long past a junction is an overshoot
 * @param duplicate  two edges between the same junctions whose geometries are within this distance of each
 *                   other (discrete Hausdorff distance) are duplicates
 */
public record CheckOptions(double snap, double nearMiss, double stub, double duplicate) {

    /** Defaults: the planner's 0.5 m snap; digitising slips of a few metres (common practice). */
    public static final CheckOptions DEFAULTS = new CheckOptions(0.5, 3, 3, 1);
}
