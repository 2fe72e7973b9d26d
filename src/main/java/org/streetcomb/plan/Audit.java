package org.streetcomb.plan;

import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.match.MatchTally;

import java.util.List;
import org.streetcomb.read.ReadReport;

/**
 * The result of checking recorded tracks against a road layer.
 *
 * @param request   what was asked
 * @param read      the reader's account of the layer
 * @param files     what each GPX file gave, in the order given
 * @param tally     counts over all fixes: cleaned, matched, split
 * @param coverage  coverage per street and the missed parts
 * @param warnings  things the user should know, one line each
 */
public record Audit(AuditRequest request, ReadReport read, List<TrackFileResult> files, MatchTally tally,
                    CoverageReport coverage, List<String> warnings) {
}
