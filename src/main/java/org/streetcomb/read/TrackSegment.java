package org.streetcomb.read;

import java.nio.file.Path;

/**
 * A run of recorded GPS fixes in the order the receiver wrote them (one GPX track segment, or one window of
 * a very long segment). Positions are WGS84 degrees; times are seconds since 1970-01-01T00:00Z, or NaN for
 * a fix without a time.
 *
 * @param file   the GPX file it came from
 * @param place  where in the file, for messages and maps ("track 1 (Monday round), segment 2"); the track's name
 *               is text from the file, so whoever shows it must escape it
 * @param lon    longitudes
 * @param lat    latitudes
 * @param time   times in seconds, NaN where the fix has none
 */
public record TrackSegment(Path file, String place, double[] lon, double[] lat, double[] time) {

    public int size() {
        return lon.length;
    }

    public boolean timed(int i) {
        return !Double.isNaN(time[i]);
    }
}
