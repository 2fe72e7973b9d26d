package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.streetcomb.coverage.MetreStreets.street;
import static org.streetcomb.coverage.MetreStreets.track;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;

/**
 * The audit estimates each track segment's GPS noise as Newson &amp; Krumm (2009, section 4) do: 1.4826 times
 * the median distance of the fixes from the matched street. Checked against the noise drawn into an invented
 * drive (invented data; the reference is the sigma we drew): 2 km of straight street at 36 km/h, a fix each
 * second with Gaussian noise of the given sigma east and north. Along a straight street only the noise across
 * it shows, which is Gaussian with that sigma, so the estimate must land within its sampling error (about
 * 1.36 sigma / sqrt(200), 10 %; the gate allows 20 %). Below 3 m the estimate stops (a lane's offset from the
 * centreline alone is about that).
 */
class SigmaEstimateTest {

    @ParameterizedTest(name = "sigma {0} m, seed {1}")
    @CsvSource({"5, 1", "5, 2", "10, 1", "15, 1", "15, 2", "1, 1"})
    void theNoiseOfATrackIsEstimatedFromItsFixes(double sigma, long seed) {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(street("long", 0, 0, 2000, 0)));
        Random random = new Random(seed);
        double[] xyt = new double[3 * 200];
        for (int i = 0; i < 200; i++) {
            xyt[3 * i] = 5 + 10 * i + sigma * random.nextGaussian();
            xyt[3 * i + 1] = sigma * random.nextGaussian();
            xyt[3 * i + 2] = i;
        }
        TrackCoverage coverage = new TrackCoverage(network, MatchSettings.defaults());
        coverage.accept(track(xyt));
        double expected = Math.max(3, sigma);
        assertEquals(1, coverage.tally().sigmaSegments());
        assertEquals(expected, coverage.tally().sigmaLow(), 0.2 * expected);
    }
}
