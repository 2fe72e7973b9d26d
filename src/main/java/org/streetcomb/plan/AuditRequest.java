package org.streetcomb.plan;

import org.streetcomb.match.MatchSettings;

import java.nio.file.Path;
import java.util.List;
import org.streetcomb.read.ReadOptions;

/**
 * What to check.
 *
 * @param layer          the road layer
 * @param tracks         GPX files of the drive, in any order
 * @param snapTolerance  vertices closer than this many metres are joined when the network is built
 * @param matching       map-matching parameters
 * @param threshold      share of a street's need that counts as covered, in (0, 1]
 * @param bothKerbs      each two-way street must be driven once in each direction
 * @param readOptions    how to read the layer
 * @param scope          what the plan asked for, or null to audit every street the layer requires
 */
public record AuditRequest(Path layer, List<Path> tracks, double snapTolerance, MatchSettings matching,
                           double threshold, boolean bothKerbs, ReadOptions readOptions, PlanScope scope) {

    public AuditRequest {
        tracks = List.copyOf(tracks);
    }

    public AuditRequest(Path layer, List<Path> tracks, double snapTolerance, MatchSettings matching,
                        double threshold, boolean bothKerbs, ReadOptions readOptions) {
        this(layer, tracks, snapTolerance, matching, threshold, bothKerbs, readOptions, null);
    }
}
