package org.streetcomb.match;

/**
 * The parameters of map matching.
 *
 * @param sigma     standard deviation of GPS position noise, metres (Newson &amp; Krumm's sigma_z)
 * @param radius    streets farther than this from a fix are not considered for it, metres
 * @param beta      scale of the transition law, metres: how much a route may differ from the straight line
 *                  between fixes before it becomes improbable (Newson &amp; Krumm's beta)
 * @param maxGap    the longest route credited between two consecutive fixes, metres; a longer gap (a
 *                  dropout) splits the match and the road in between counts as not driven
 * @param maxSpeed  the highest believable speed, metres per second, for timed fixes
 * @param doubtOdds a drive over the streets is believable when the most probable drive is at most this many
 *                  times more probable; the stretches of every believable drive are credited (1: the most
 *                  probable drive only, as Newson &amp; Krumm's Viterbi path)
 * @param driftWindow seconds over which the receiver's slowly varying error (drift) is estimated and taken
 *                  out before the final match (0: not taken out)
 * @param estimateSigma whether each track segment's noise is estimated from a first match at {@code sigma}
 *                  and used in its place (Newson &amp; Krumm's median rule; see {@code TrackCoverage})
 */
public record MatchSettings(double sigma, double radius, double beta, double maxGap, double maxSpeed,
                            double doubtOdds, double driftWindow, boolean estimateSigma) {

    public static final double DEFAULT_SIGMA = 10;
    public static final double DEFAULT_RADIUS = 50;
    public static final double DEFAULT_BETA = 5;
    public static final double DEFAULT_MAX_GAP = 300;
    /** 200 km/h: faster than any road vehicle on a service round, slower than a receiver's jump. */
    public static final double DEFAULT_MAX_SPEED = 200 / 3.6;

    /**
     * Odds of 20 to 1: with fixes every few seconds at 10 m noise they credit streets a vehicle passed in a
     * dropout or between two fixes, yet not a street 20 m beside the one driven (docs/quality.md has the
     * study behind the choice).
     */
    public static final double DEFAULT_DOUBT_ODDS = 20;

    /**
     * Off: on noise that does not persist, taking out an estimated drift costs a little precision; where
     * the receiver's error persists (for a minute, say) a window of 60 s gains more (docs/quality.md).
     */
    public static final double DEFAULT_DRIFT_WINDOW = 0;

    /**
     * On: receivers differ (3 m for a good one under open sky, 10 m and more in street canyons), and an
     * emission law as wide as the noise tells two streets 10 m apart best (docs/quality.md has the study).
     */
    public static final boolean DEFAULT_ESTIMATE_SIGMA = true;

    public MatchSettings withDoubtOdds(double odds) {
        return new MatchSettings(sigma, radius, beta, maxGap, maxSpeed, odds, driftWindow, estimateSigma);
    }

    public MatchSettings withDriftWindow(double seconds) {
        return new MatchSettings(sigma, radius, beta, maxGap, maxSpeed, doubtOdds, seconds, estimateSigma);
    }

    public MatchSettings withSigma(double metres, boolean fromTrack) {
        return new MatchSettings(metres, radius, beta, maxGap, maxSpeed, doubtOdds, driftWindow, fromTrack);
    }

    /** The natural log of {@link #doubtOdds}: how much log-probability a believable drive may lose. */
    public double margin() {
        return Math.log(doubtOdds);
    }

    public static MatchSettings defaults() {
        return new MatchSettings(DEFAULT_SIGMA, DEFAULT_RADIUS, DEFAULT_BETA, DEFAULT_MAX_GAP, DEFAULT_MAX_SPEED,
                DEFAULT_DOUBT_ODDS, DEFAULT_DRIFT_WINDOW, DEFAULT_ESTIMATE_SIGMA);
    }

    public MatchSettings {
        if (!(sigma > 0) || !(radius > 0) || !(beta > 0) || !(maxGap > 0) || !(maxSpeed > 0)
                || !(doubtOdds >= 1) || !(driftWindow >= 0)
                || !Double.isFinite(sigma + radius + beta + maxGap + maxSpeed + doubtOdds + driftWindow)) {
            throw new IllegalArgumentException("matching parameters must be finite, positive (the drift window may be 0), and the odds at least 1");
        }
    }
}
