package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.streetcomb.coverage.MetreStreets.street;
import static org.streetcomb.coverage.MetreStreets.track;
import static org.streetcomb.coverage.MetreStreets.tunnel;

import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Collectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;

/**
 * A street that bends back near itself (a hairpin on a hillside) must be matched on the leg the vehicle is on.
 * Each fix's candidates are the nearest point of each pass of a street near it; with only the nearest point
 * of the whole street, a fix that noise put nearer the other leg had no candidate on its own leg, and the
 * drive was read along whatever else ran there. On invented streets (invented data): a 300 m hairpin whose
 * legs run 20 m apart, joined at its ends to streets that lead away, with a tunnel between the legs joining
 * the same two ends (as under a hill road). The crew drives the hairpin at 36 km/h, a fix each second with
 * Gaussian noise of 5 m. The hairpin must be covered and the tunnel not.
 */
class HairpinTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5})
    void aHairpinIsMatchedOnTheLegDriven(long seed) {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                street("hairpin", 0, 0, 140, 0, 150, 10, 140, 20, 0, 20),
                street("south", -200, 0, 0, 0), street("north", 0, 20, -200, 20),
                tunnel("tunnel", 0, 0, 70, 10, 0, 20)));
        Random random = new Random(seed);
        double[][] path = {{-100, 0}, {0, 0}, {140, 0}, {150, 10}, {140, 20}, {0, 20}, {-100, 20}};
        double[] xyt = new double[3 * 600];
        int n = 0;
        double clock = 0;
        for (int leg = 0; leg + 1 < path.length; leg++) {
            double length = Math.hypot(path[leg + 1][0] - path[leg][0], path[leg + 1][1] - path[leg][1]);
            for (double s = 0; s < length; s += 10) {
                double f = s / length;
                xyt[3 * n] = path[leg][0] + f * (path[leg + 1][0] - path[leg][0]) + 5 * random.nextGaussian();
                xyt[3 * n + 1] = path[leg][1] + f * (path[leg + 1][1] - path[leg][1]) + 5 * random.nextGaussian();
                xyt[3 * n + 2] = clock + s / 10;
                n++;
            }
            clock += length / 10;
        }
        TrackCoverage coverage = new TrackCoverage(network, MatchSettings.defaults());
        coverage.accept(track(java.util.Arrays.copyOf(xyt, 3 * n)));
        Map<String, StreetCoverage> streets = coverage.report(0.9, false).streets().stream()
                .collect(Collectors.toMap(s -> s.feature().id(), s -> s));
        assertEquals(CoverageStatus.COVERED, streets.get("hairpin").status(), "hairpin " + streets.get("hairpin").fraction());
        assertEquals(CoverageStatus.MISSED, streets.get("tunnel").status(), "tunnel " + streets.get("tunnel").fraction());
    }
}
