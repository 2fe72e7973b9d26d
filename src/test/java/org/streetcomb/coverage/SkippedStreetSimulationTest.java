package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;

class SkippedStreetSimulationTest {

    private static final SimulatedDrive.Settings TOWN = new SimulatedDrive.Settings(20, 40, 1, 5, 10, 180, 3, 12);

    @Test
    void explore() {
        List<RoadFeature> demo = LayerReaders.read(Path.of("fixtures/demo/brackenford.geojson")).features();
        double beta = Double.parseDouble(System.getProperty("beta", "5"));
        double dropEvery = Double.parseDouble(System.getProperty("drop", "180"));
        for (double sigma : new double[] {5, 10, 15}) {
            SimulatedDrive.Settings s = new SimulatedDrive.Settings(20, 40, 1, 5, sigma, dropEvery, 2, Double.parseDouble(System.getProperty("dmax", "10")));
            SkippedStreetStudy.Counts total = SkippedStreetStudy.NONE;
            for (long seed = 1; seed <= 5; seed++) {
                SkippedStreetStudy.Counts c = SkippedStreetStudy.run(demo, 0.1, s, new MatchSettings(10, 50, beta, 300, 200 / 3.6), seed);
                System.out.println(sigma + " " + seed + " " + c);
                total = total.plus(c);
            }
            System.out.printf(Locale.ROOT, "sigma %.0f precision %.3f recall %.3f%n", sigma, total.precision(), total.recall());
        }
        assertTrue(true);
    }
}
