package org.streetcomb.coverage;

import java.util.List;
import org.streetcomb.network.StreetNetwork;

/**
 * What the tracks covered of a network.
 *
 * @param network    the network the tracks were matched to
 * @param streets    every street line with at least one edge, in layer order
 * @param missed     the stretches of required streets not driven, by edge and offset
 * @param wrongWayParts the stretches of one-way streets driven against their direction, by edge and offset
 * @param mopUp      for each edge, whether a mop-up tour must service it: a required edge of a street that
 *                   is not covered, itself driven less than the threshold
 * @param threshold  the share of a street that counts as covered, 0..1
 * @param bothKerbs  whether both directions of each two-way street were required
 */
public record CoverageReport(StreetNetwork network, List<StreetCoverage> streets, List<MissedPart> missed,
                             List<WrongWayPart> wrongWayParts,
                             boolean[] mopUp, double threshold, boolean bothKerbs) {

    /** Metres that had to be driven over all required streets. */
    public double needed() {
        return streets.stream().filter(s -> s.status() != CoverageStatus.NOT_REQUIRED).mapToDouble(StreetCoverage::needed).sum();
    }

    /** Metres of that which were driven. */
    public double driven() {
        return streets.stream().filter(s -> s.status() != CoverageStatus.NOT_REQUIRED).mapToDouble(StreetCoverage::driven).sum();
    }

    /** Metres of one-way streets driven against their direction. */
    public double wrongWay() {
        return streets.stream().mapToDouble(StreetCoverage::wrongWay).sum();
    }

    /** Metres listed as missed parts. */
    public double missedLength() {
        return missed.stream().mapToDouble(MissedPart::length).sum();
    }

    public long count(CoverageStatus status) {
        return streets.stream().filter(s -> s.status() == status).count();
    }
}
