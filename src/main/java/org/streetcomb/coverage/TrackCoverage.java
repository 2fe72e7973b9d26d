package org.streetcomb.coverage;

import org.streetcomb.match.DrivenIntervals;
import org.streetcomb.match.HmmMapMatcher;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.match.MatchTally;
import org.streetcomb.match.StreetIndex;
import org.streetcomb.match.TrackCleaner;
import org.streetcomb.match.TurningPockets;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;

/**
 * Accumulates the coverage of a network from track segments fed one at a time: each is cleaned
 * ({@link TrackCleaner}), matched ({@link HmmMapMatcher}; twice when its noise is estimated, see
 * {@link #trackSigma}) and its driven stretches recorded, then dropped,
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
    private final StreetIndex index;
    private final double driftWindow;
    private final double sigma;
    private final boolean sigmaFromTrack;
    /** Newson &amp; Krumm's factor from a median absolute deviation to a Gaussian's standard deviation. */
    static final double MAD_TO_SIGMA = 1.4826;
    /** Fewer matched fixes than this give too loose an estimate of the noise: the configured sigma is kept. */
    static final int MIN_FIXES_FOR_SIGMA = 30;
    /**
     * The smallest noise estimated, metres: a lane's offset from the centreline is about this much whatever
     * the receiver (common practice: lanes are about 3 m wide).
     */
    static final double MIN_SIGMA = 3;
    /**
     * Drift estimates made in turn, each from the match of the fixes the previous one corrected: a first
     * match misled by the drift (along two parallel streets) biases the first estimate towards zero.
     */
    static final int DRIFT_PASSES = 2;

    /** The drift is estimated from fixes this many sigmas apart (Newson &amp; Krumm's thinning). */
    static final double DRIFT_THIN_SIGMAS = 2;

    /** A dead-end structure up to this many sigmas across is a turning pocket, credited whole once entered. */
    static final double POCKET_SIGMAS = 4;

    public TrackCoverage(StreetNetwork network, MatchSettings settings) {
        this.network = network;
        this.cleaner = new TrackCleaner(settings.sigma(), settings.maxSpeed());
        this.index = new StreetIndex(network);
        this.driftWindow = settings.driftWindow();
        this.sigma = settings.sigma();
        this.sigmaFromTrack = settings.estimateSigma();
        this.pockets = TurningPockets.of(network, index.frame(), POCKET_SIGMAS * settings.sigma());
        this.matcher = new HmmMapMatcher(network, index, settings, TurningPockets.nodes(network, pockets));
        this.driven = new DrivenIntervals(network);
    }

    public void accept(TrackSegment segment) {
        TrackCleaner.Result cleaned = cleaner.clean(segment);
        tally.addCleaned(segment.size(), cleaned);
        List<int[]> runs = cleaned.runs();
        List<TrackSegment> corrected = new ArrayList<>();
        for (int[] run : runs) {
            TrackSegment c = segment;
            for (int pass = 0; driftWindow > 0 && pass < DRIFT_PASSES; pass++) {
                c = withoutDrift(c, run);
            }
            corrected.add(c);
        }
        double noise = sigmaFromTrack ? trackSigma(corrected, runs) : sigma;
        for (int r = 0; r < runs.size(); r++) {
            matcher.match(corrected.get(r), runs.get(r), noise, driven, tally);
        }
    }

    /**
     * The GPS noise of one track segment, estimated as Newson &amp; Krumm do (2009, section 4): 1.4826 times
     * the median distance of the fixes from where a first match (at the configured sigma) puts them, a
     * robust estimate of a Gaussian's standard deviation; the configured sigma where fewer than
     * {@value #MIN_FIXES_FOR_SIGMA} fixes are matched, and never below {@value #MIN_SIGMA} m.
     */
    private double trackSigma(List<TrackSegment> segments, List<int[]> runs) {
        double[] distance = new double[runs.stream().mapToInt(run -> run.length).sum()];
        int count = 0;
        for (int r = 0; r < runs.size(); r++) {
            double[][] residual = matcher.residuals(segments.get(r), runs.get(r), sigma);
            for (int i : runs.get(r)) {
                if (!Double.isNaN(residual[0][i])) {
                    distance[count++] = Math.hypot(residual[0][i], residual[1][i]);
                }
            }
        }
        if (count < MIN_FIXES_FOR_SIGMA) {
            return sigma;
        }
        Arrays.sort(distance, 0, count);
        double median = count % 2 == 1 ? distance[count / 2] : (distance[count / 2 - 1] + distance[count / 2]) / 2;
        double estimate = Math.max(MIN_SIGMA, MAD_TO_SIGMA * median);
        tally.sigmaEstimated(estimate);
        return estimate;
    }

    /** Counts so far. */
    /**
     * The segment with each fix of the run moved back by the receiver's drift: the mean offset, over the
     * fixes within the drift window of it, of the fixes from where a first, plain match puts them. GPS
     * errors persist (multipath, atmosphere), and a lasting offset of 10 m makes a drive along one of two
     * streets 20 m apart fit the other; over a minute the matched streets run in enough directions for
     * their mean offset to show the drift, while noise that does not persist averages out. Timeless
     * segments are left as they are.
     */
    private TrackSegment withoutDrift(TrackSegment segment, int[] run) {
        for (int i : run) {
            if (!segment.timed(i)) {
                return segment;
            }
        }
        double[][] residual = matcher.residuals(segment, TrackCleaner.sparser(segment, run, DRIFT_THIN_SIGMAS * sigma), sigma);
        double[] lon = segment.lon().clone();
        double[] lat = segment.lat().clone();
        LocalFrame frame = index.frame();
        int lo = 0, hi = 0;
        double sx = 0, sy = 0;
        int count = 0;
        for (int r = 0; r < run.length; r++) {
            double t = segment.time()[run[r]];
            while (hi < run.length && segment.time()[run[hi]] <= t + driftWindow) {
                int i = run[hi++];
                if (!Double.isNaN(residual[0][i])) {
                    sx += residual[0][i];
                    sy += residual[1][i];
                    count++;
                }
            }
            while (segment.time()[run[lo]] < t - driftWindow) {
                int i = run[lo++];
                if (!Double.isNaN(residual[0][i])) {
                    sx -= residual[0][i];
                    sy -= residual[1][i];
                    count--;
                }
            }
            if (count > 0) {
                int i = run[r];
                double x = frame.x(lon[i]) - sx / count;
                double y = frame.y(lat[i]) - sy / count;
                lon[i] = frame.lon(x);
                lat[i] = frame.lat(y);
            }
        }
        return new TrackSegment(segment.file(), segment.place(), lon, lat, segment.time());
    }

    public MatchTally tally() {
        return tally;
    }

    /** Coverage per street of everything accepted; call once, after the last segment. */
    public CoverageReport report(double threshold, boolean bothKerbs) {
        return report(threshold, bothKerbs, null);
    }

    /** As {@link #report(double, boolean)}, counting only the required edges in {@code scope} (null: all). */
    public CoverageReport report(double threshold, boolean bothKerbs, boolean[] scope) {
        driven.merge();
        TurningPockets.credit(network, pockets, driven);
        driven.merge();
        return StreetCoverageAccounting.account(network, driven, threshold, bothKerbs, scope);
    }
}
