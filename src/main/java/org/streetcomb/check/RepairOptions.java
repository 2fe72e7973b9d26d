package org.streetcomb.check;

/**
 * Repairs the user asks for when planning; none is made unless asked, and each one made is listed in the
 * plan summary.
 *
 * @param closeGaps      extend dead ends that stop at most this many metres short of another street to meet
 *                       it (0: off)
 * @param dropDuplicates plan each duplicated stretch of street once
 */
public record RepairOptions(double closeGaps, boolean dropDuplicates) {

    public static final RepairOptions NONE = new RepairOptions(0, false);
}
