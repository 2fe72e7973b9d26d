package org.streetcomb.coverage;

import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;

/**
 * Accumulates the coverage of a network from track segments fed one at a time: each is cleaned
 * ({@link TrackCleaner}), matched ({@link HmmMapMatcher}) and its driven stretches recorded, then dropped,
 * so any number of tracks can stream through. Turning pockets ({@link TurningPockets}) up to
 * {@value #POCKET_SIGMAS} sigma across that the matched path entered count as driven whole. Not thread-safe.
 */
public final class TrackCoverage {

    private final StreetNetwork network;
    private final TrackCleaner cleaner;
    private final HmmMapMatcher matcher;
    private final DrivenIntervals driven;
    private final MatchTally tally = new MatchTally();
    private final List<int[]> pockets;

    /** A dead-end structure up to this many sigmas across is a turning pocket, credited whole once entered. */
    static final double POCKET_SIGMAS = 4;

    public TrackCoverage(StreetNetwork network, MatchSettings settings) {
        this.network = network;
        this.cleaner = new TrackCleaner(settings.sigma(), settings.maxSpeed());
        StreetIndex index = new StreetIndex(network);
        this.pockets = TurningPockets.of(network, index.frame(), POCKET_SIGMAS * settings.sigma());
        this.matcher = new HmmMapMatcher(network, index, settings, TurningPockets.nodes(network, pockets));
        this.driven = new DrivenIntervals(network);
    }

    public void accept(TrackSegment segment) {
        tally.fixes += segment.size();
        TrackCleaner.Result cleaned = cleaner.clean(segment);
        tally.backwards += cleaned.backwards();
        tally.spikes += cleaned.spikes();
        tally.splits += cleaned.splits();
        tally.thinned += cleaned.thinned();
        for (int[] run : cleaned.runs()) {
            matcher.match(segment, run, driven, tally);
        }
    }

    /** Counts so far. */
    public MatchTally tally() {
        return tally;
    }

    /** Coverage per street of everything accepted; call once, after the last segment. */
    public CoverageReport report(double threshold, boolean bothKerbs) {
        driven.merge();
        TurningPockets.credit(network, pockets, driven);
        driven.merge();
        return StreetCoverageAccounting.account(network, driven, threshold, bothKerbs);
    }
}
