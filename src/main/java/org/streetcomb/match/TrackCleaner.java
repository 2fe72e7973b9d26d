package org.streetcomb.match;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.read.TrackSegment;

/**
 * Cleans a track segment before map matching and splits it where it cannot be trusted to be continuous.
 *
 * <ul>
 *   <li>A fix whose time is not after the last kept fix's (a clock going backwards, a repeated fix) is
 *       dropped.</li>
 *   <li>A fix that implies a speed above the limit from the last kept fix (after allowing
 *       {@value #NOISE_SIGMAS} sigma for noise) is dropped when the fix after it
 *       is within the limit again (a lone spike); otherwise the segment is split there (the receiver jumped,
 *       or time was lost), and nothing is credited across the split.</li>
 *   <li>A fix within half the GPS noise of the last kept fix is dropped ({@link #THIN_SIGMAS}): while the
 *       vehicle stands, such fixes carry only noise. Newson &amp; Krumm (2009, section 4) thin within twice
 *       the noise, which also drops the fixes that show a short street was driven.</li>
 * </ul>
 * Fixes without times pass the time and speed checks. O(n) per segment.
 */
public final class TrackCleaner {

    /** What cleaning did to a segment: the runs to match (fix indices in order) and the counts dropped. */
    public record Result(List<int[]> runs, int backwards, int spikes, int splits, int thinned) {
    }

    /**
     * Two fixes may lie this many sigmas farther apart than the vehicle moved (three sigmas each way), so
     * noise alone never reads as an impossible speed.
     */
    static final double NOISE_SIGMAS = 6;

    /**
     * A fix this many sigmas or less from the last kept one is dropped. Newson &amp; Krumm thin within 2 sigma;
     * that drops the very fixes that show a short street was driven (dual carriageway links, roundabout
     * pieces, the 10-20 m connectors of real junctions), and the matcher's signed-step charge already makes
     * the backward steps of a standing vehicle's noise cheap. Measured in docs/quality.md ("Thinning").
     */
    static final double THIN_SIGMAS = Double.parseDouble(System.getProperty("streetcomb.thinSigmas", "0.5"));

    private final double thinWithin;
    private final double maxSpeed;
    private final double noiseAllowance;

    /**
     * @param sigma     GPS noise (standard deviation) in metres
     * @param maxSpeed  the highest believable speed in metres per second
     */
    public TrackCleaner(double sigma, double maxSpeed) {
        this.thinWithin = THIN_SIGMAS * sigma;
        this.maxSpeed = maxSpeed;
        this.noiseAllowance = NOISE_SIGMAS * sigma;
    }

    public Result clean(TrackSegment segment) {
        int n = segment.size();
        List<int[]> runs = new ArrayList<>();
        int[] run = new int[n];
        int size = 0;
        int backwards = 0, spikes = 0, splits = 0, thinned = 0;
        int last = -1;
        double lastTime = Double.NaN;
        for (int i = 0; i < n; i++) {
            if (segment.timed(i) && !Double.isNaN(lastTime) && !(segment.time()[i] > lastTime)) {
                backwards++;
                continue;
            }
            if (last >= 0) {
                double step = distance(segment, last, i);
                if (step < thinWithin) {
                    thinned++;
                    continue;
                }
                if (tooFast(segment, last, i, step)) {
                    int next = nextForward(segment, i, lastTime);
                    if (next >= 0 && !tooFast(segment, last, next, distance(segment, last, next))) {
                        spikes++;
                        continue;
                    }
                    splits++;
                    runs.add(Arrays.copyOf(run, size));
                    size = 0;
                }
            }
            run[size++] = i;
            last = i;
            if (segment.timed(i)) {
                lastTime = segment.time()[i];
            }
        }
        runs.add(Arrays.copyOf(run, size));
        runs.removeIf(r -> r.length < 2);
        return new Result(List.copyOf(runs), backwards, spikes, splits, thinned);
    }

    private boolean tooFast(TrackSegment segment, int a, int b, double distance) {
        if (!segment.timed(a) || !segment.timed(b)) {
            return false;
        }
        double seconds = segment.time()[b] - segment.time()[a];
        return distance > maxSpeed * seconds + noiseAllowance;
    }

    /** The next fix after {@code i} whose time is after {@code since}, or -1. */
    private static int nextForward(TrackSegment segment, int i, double since) {
        for (int j = i + 1; j < segment.size(); j++) {
            if (!segment.timed(j) || Double.isNaN(since) || segment.time()[j] > since) {
                return j;
            }
        }
        return -1;
    }

    /**
     * The fixes of a run at least {@code within} metres from the last one kept, as Newson &amp; Krumm thin
     * (the drift estimate is made on such a sparser run: its first match must not be led along a parallel
     * street by fixes that follow the drift closely).
     */
    public static int[] sparser(TrackSegment segment, int[] run, double within) {
        int[] kept = new int[run.length];
        int n = 0;
        for (int i : run) {
            if (n == 0 || distance(segment, kept[n - 1], i) >= within) {
                kept[n++] = i;
            }
        }
        return Arrays.copyOf(kept, n);
    }

    private static double distance(TrackSegment segment, int a, int b) {
        return GeodesicLength.between(segment.lon()[a], segment.lat()[a], segment.lon()[b], segment.lat()[b]);
    }
}
