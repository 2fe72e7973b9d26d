package org.streetcomb.match;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.streetcomb.read.TrackSegment;

/** Cleaning rules on hand-made tracks along the equator, where 0.0001 degree of longitude is 11.1 m. */
class TrackCleanerTest {

    private static final double STEP = 0.0001;

    private static TrackSegment track(double[] lonSteps, double[] times) {
        double[] lon = new double[lonSteps.length];
        for (int i = 0; i < lon.length; i++) {
            lon[i] = lonSteps[i] * STEP;
        }
        return new TrackSegment(Path.of("t.gpx"), "track 1, segment 1", lon, new double[lon.length], times);
    }

    /** sigma 2 m: thinning only below 4 m, so 11 m steps all stay; at most 50 m/s. */
    private final TrackCleaner cleaner = new TrackCleaner(2, 50);

    @Test
    void fixesWhoseTimeDoesNotMoveForwardAreDropped() {
        TrackCleaner.Result r = cleaner.clean(track(new double[] {0, 1, 2, 3, 4}, new double[] {0, 1, 1, 0.5, 4}));
        assertEquals(2, r.backwards());
        assertEquals(1, r.runs().size());
        assertArrayEquals(new int[] {0, 1, 4}, r.runs().get(0));
    }

    @Test
    void aLoneSpikeIsDroppedAndTheTrackGoesOn() {
        // fix 2 is 100 steps (1.1 km) away for one second: 1.1 km/s, then the track is back
        TrackCleaner.Result r = cleaner.clean(track(new double[] {0, 1, 100, 3, 4}, new double[] {0, 1, 2, 3, 4}));
        assertEquals(1, r.spikes());
        assertEquals(0, r.splits());
        assertArrayEquals(new int[] {0, 1, 3, 4}, r.runs().get(0));
    }

    @Test
    void aJumpThatStaysSplitsTheTrackAndNothingJoinsTheParts() {
        TrackCleaner.Result r = cleaner.clean(track(new double[] {0, 1, 2, 500, 501, 502}, new double[] {0, 1, 2, 3, 4, 5}));
        assertEquals(1, r.splits());
        assertEquals(2, r.runs().size());
        assertArrayEquals(new int[] {0, 1, 2}, r.runs().get(0));
        assertArrayEquals(new int[] {3, 4, 5}, r.runs().get(1));
    }

    @Test
    void fixesWithinHalfASigmaOfTheLastKeptOneAreThinned() {
        // sigma 40 m: fixes 11 m apart are within 20 m of the last kept one every other time
        TrackCleaner.Result r = new TrackCleaner(40, 50).clean(track(new double[] {0, 1, 2, 3, 4}, new double[] {0, 1, 2, 3, 4}));
        assertEquals(2, r.thinned());
        assertArrayEquals(new int[] {0, 2, 4}, r.runs().get(0));
        // sigma 10 m: every fix 11 m apart is kept
        assertEquals(0, new TrackCleaner(10, 50).clean(track(new double[] {0, 1, 2, 3, 4},
                new double[] {0, 1, 2, 3, 4})).thinned());
    }

    @Test
    void theSparserRunThinsWithinTwoSigmaAsNewsonAndKrummDo() {
        TrackSegment fixes = track(new double[] {0, 1, 2, 3, 4}, new double[] {0, 1, 2, 3, 4});
        assertArrayEquals(new int[] {0, 2, 4}, TrackCleaner.sparser(fixes, new int[] {0, 1, 2, 3, 4}, 20));
    }

    @Test
    void untimedFixesPassTheTimeAndSpeedChecks() {
        double[] none = {Double.NaN, Double.NaN, Double.NaN};
        TrackCleaner.Result r = cleaner.clean(track(new double[] {0, 100, 200}, none));
        assertEquals(0, r.spikes() + r.splits() + r.backwards());
        assertArrayEquals(new int[] {0, 1, 2}, r.runs().get(0));
    }
}
