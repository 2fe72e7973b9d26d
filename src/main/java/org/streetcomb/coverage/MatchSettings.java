package org.streetcomb.coverage;

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
 */
public record MatchSettings(double sigma, double radius, double beta, double maxGap, double maxSpeed) {

    public static final double DEFAULT_SIGMA = 10;
    public static final double DEFAULT_RADIUS = 50;
    public static final double DEFAULT_BETA = 5;
    public static final double DEFAULT_MAX_GAP = 300;
    /** 200 km/h: faster than any road vehicle on a service round, slower than a receiver's jump. */
    public static final double DEFAULT_MAX_SPEED = 200 / 3.6;

    public static MatchSettings defaults() {
        return new MatchSettings(DEFAULT_SIGMA, DEFAULT_RADIUS, DEFAULT_BETA, DEFAULT_MAX_GAP, DEFAULT_MAX_SPEED);
    }

    public MatchSettings {
        if (!(sigma > 0) || !(radius > 0) || !(beta > 0) || !(maxGap > 0) || !(maxSpeed > 0)
                || !Double.isFinite(sigma + radius + beta + maxGap + maxSpeed)) {
            throw new IllegalArgumentException("matching parameters must be positive and finite");
        }
    }
}
