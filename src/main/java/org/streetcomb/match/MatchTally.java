package org.streetcomb.match;

/** Running counts of what happened to the fixes of all tracks during cleaning and matching. */
public final class MatchTally {
    int fixes;
    int backwards;
    int spikes;
    int splits;
    int thinned;
    int offNetwork;
    int matched;
    int breaks;
    int chains;
    int sigmaSegments;
    double sigmaLow = Double.POSITIVE_INFINITY;
    double sigmaHigh;

    /** Records the GPS noise estimated for one track segment, metres. */
    public void sigmaEstimated(double metres) {
        sigmaSegments++;
        sigmaLow = Math.min(sigmaLow, metres);
        sigmaHigh = Math.max(sigmaHigh, metres);
    }

    /** Track segments whose GPS noise was estimated from their own fixes. */
    public int sigmaSegments() {
        return sigmaSegments;
    }

    /** The lowest noise estimated for a segment, metres (infinite when none was). */
    public double sigmaLow() {
        return sigmaLow;
    }

    /** The highest noise estimated for a segment, metres (0 when none was). */
    public double sigmaHigh() {
        return sigmaHigh;
    }

    /** Counts a segment of {@code fixes} fixes and what cleaning it removed or split. */
    public void addCleaned(int fixes, TrackCleaner.Result cleaned) {
        this.fixes += fixes;
        backwards += cleaned.backwards();
        spikes += cleaned.spikes();
        splits += cleaned.splits();
        thinned += cleaned.thinned();
    }

    /** Fixes read from the tracks. */
    public int fixes() {
        return fixes;
    }

    /** Fixes dropped because their time was not after the fix before. */
    public int backwards() {
        return backwards;
    }

    /** Lone fixes dropped because they implied an impossible speed there and back. */
    public int spikes() {
        return spikes;
    }

    /** Places where a track jumped at an impossible speed and was split. */
    public int splits() {
        return splits;
    }

    /** Fixes dropped because they lay within half the GPS noise of the fix before (standing or crawling). */
    public int thinned() {
        return thinned;
    }

    /** Fixes with no street within the search radius. */
    public int offNetwork() {
        return offNetwork;
    }

    /** Fixes placed on a street as part of a matched stretch of at least two fixes. */
    public int matched() {
        return matched;
    }

    /** Places where no believable route joined two consecutive fixes, so the match was split. */
    public int breaks() {
        return breaks;
    }

    /** Matched stretches (runs of fixes joined by routes). */
    public int chains() {
        return chains;
    }
}
