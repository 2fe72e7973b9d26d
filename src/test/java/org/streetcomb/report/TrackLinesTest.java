package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.streetcomb.read.TrackSegment;

/** The tracks layer: every fix while the tracks are small, a stated stride when they are large. */
class TrackLinesTest {

    @Test
    void smallTracksAreDrawnWithEveryFix() {
        TrackLines tracks = new TrackLines();
        tracks.accept(segment(5, "track 1 (Monday), segment 1"));
        MapLayer layer = tracks.layer();
        assertEquals(10, layer.features().get(0).parts()[0].length);
        assertTrue(layer.note().endsWith("every fix drawn"), layer.note());
        assertEquals("day.gpx: track 1 (Monday), segment 1", layer.features().get(0).label());
        assertEquals("2026-03-02T07:00:00Z", layer.features().get(0).details().get("First fix"));
    }

    @Test
    void largeTracksAreThinnedToAStatedStrideKeepingEachSegmentsEnds() {
        TrackLines tracks = new TrackLines();
        int[] sizes = {150_001, 60_000, 40_000, 7};
        for (int size : sizes) {
            tracks.accept(segment(size, "track 1, segment 1"));
        }
        MapLayer layer = tracks.layer();
        Matcher note = Pattern.compile("every (\\d+)(st|nd|rd|th) fix drawn \\(([0-9,]+) of ([0-9,]+)\\)").matcher(layer.note());
        assertTrue(note.find(), layer.note());
        int stride = Integer.parseInt(note.group(1));
        assertEquals(Arrays.stream(sizes).sum(), Long.parseLong(note.group(4).replace(",", "")));
        long drawn = 0;
        long offset = 0;
        for (int s = 0; s < sizes.length; s++) {
            double[] line = layer.features().get(s).parts()[0];
            drawn += line.length / 2;
            // each drawn line starts at the segment's first fix and ends at its last
            assertEquals(0.0, line[0]);
            assertEquals((sizes[s] - 1) * 1e-6, line[line.length - 2], 1e-12);
            // in between, the fixes on the stated stride of the whole recording (fix i lies at i millionths of a degree)
            long previous = 0;
            for (int k = 2; k + 2 < line.length; k += 2) {
                long i = Math.round(line[k] / 1e-6);
                assertEquals(0, (offset + i) % stride, "fix " + i + " of segment " + s);
                assertEquals(stride, k == 2 ? stride : i - previous, "no fix on the stride left out");
                previous = i;
            }
            offset += sizes[s];
        }
        assertEquals(drawn, Long.parseLong(note.group(3).replace(",", "")), "the note counts what is drawn");
        assertTrue(drawn <= TrackLines.MOST_FIXES_DRAWN, "drawn " + drawn);
        assertTrue(drawn > TrackLines.MOST_FIXES_DRAWN / 4, "thinned no more than needed: " + drawn);
    }

    /** A straight track of {@code n} fixes a second apart, 1e-6 degree of longitude apart (invented). */
    private static TrackSegment segment(int n, String place) {
        double[] lon = new double[n];
        double[] lat = new double[n];
        double[] time = new double[n];
        for (int i = 0; i < n; i++) {
            lon[i] = i * 1e-6;
            lat[i] = 44.6;
            time[i] = 1_772_434_800 + i;
        }
        return new TrackSegment(Path.of("/tmp/day.gpx"), place, lon, lat, time);
    }
}
