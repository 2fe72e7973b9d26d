package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;

/**
 * The skipped-street study (simulated data: invented drives, on the invented demo town and on a real OSM
 * extract): precision and recall of "not covered" per street against the streets the crew really skipped.
 * The drive: 20-40 km/h drawn per street, a fix every 1-5 s (drawn per fix), Gaussian noise of the stated
 * sigma east and north, and on average every 5 minutes a dropout of 2-10 s. The audit runs with the
 * default settings (sigma 10 m, doubt odds 20, no drift correction) whatever the true noise. Writes the table to
 * target/quality/coverage-*.md. The default doubt odds were chosen on seeds 1-10; docs/quality.md also
 * gives seeds 11-30, which played no part in the choice (rerun with -Dcoverage.seeds=11-30).
 */
class SkippedStreetSimulationTest {

    static final double[] SIGMAS = {5, 10, 15};
    /** The seeds to run, "first-last" (default: the ten the doubt odds were chosen on). */
    static final String SEEDS = System.getProperty("coverage.seeds", "1-10");
    /** The audit's doubt odds (default: the command's; 1 gives the most probable drive only). */
    static final double ODDS = Double.parseDouble(System.getProperty("coverage.odds",
            String.valueOf(MatchSettings.DEFAULT_DOUBT_ODDS)));
    static final double SKIP_SHARE = 0.1;

    /** The audit's drift window, seconds (default: the command's; 0 turns it off). */
    static final double DRIFT = Double.parseDouble(System.getProperty("coverage.drift-window",
            String.valueOf(MatchSettings.DEFAULT_DRIFT_WINDOW)));

    /** Correlation time of the simulated noise, seconds (default 0: independent from fix to fix). */
    static final double NOISE_MEMORY = Double.parseDouble(System.getProperty("coverage.noise-memory", "0"));

    static SimulatedDrive.Settings drive(double sigma) {
        return new SimulatedDrive.Settings(20, 40, 1, 5, sigma, 300, 2, 10).withNoiseMemory(NOISE_MEMORY);
    }

    @Test
    void demoTownMeetsTheTargetAtTenMetres() throws IOException {
        List<String> rows = study("Brackenford (invented demo town)", Path.of("fixtures/demo/brackenford.geojson"), true);
        write("demo", rows);
    }

    /**
     * Seoul (OpenStreetMap extract, fixtures/real): dense service roads and parking aisles 20 m apart and
     * dead ends under 20 m long. The target is not met here (see docs/quality.md): the floors below guard
     * against regressions at the measured level.
     */
    @Test
    void realNetworkKeepsItsRecallAndPrecisionFloor() throws IOException {
        List<String> rows = study("Yongsan, Seoul (OSM extract)", Path.of("fixtures/real/roads-seoul.geojson"), false);
        write("seoul", rows);
        String atTen = rows.get(1);
        String[] cells = atTen.split("\\|");
        double precision = Double.parseDouble(cells[9].trim());
        double recall = Double.parseDouble(cells[10].trim());
        assertTrue(recall >= 0.95 && precision >= 0.95, atTen);
    }

    static List<String> study(String name, Path layer, boolean assertTarget) {
        List<RoadFeature> lines = LayerReaders.read(layer).features();
        List<String> rows = new java.util.ArrayList<>();
        for (double sigma : SIGMAS) {
            SkippedStreetStudy.Counts total = SkippedStreetStudy.NONE;
            String[] range = SEEDS.split("-");
            long first = Long.parseLong(range[0]), last = Long.parseLong(range[1]);
            for (long seed = first; seed <= last; seed++) {
                total = total.plus(SkippedStreetStudy.run(lines, SKIP_SHARE, drive(sigma), MatchSettings.defaults().withDoubtOdds(ODDS).withDriftWindow(DRIFT), seed));
            }
            rows.add(String.format(Locale.ROOT, "| %s | %.0f | %s | %d | %d | %d | %d | %d | %.3f | %.3f | %.3f | %.3f |",
                    name, sigma, SEEDS, total.streets(), total.truePositive() + total.falseNegative(),
                    total.truePositive(), total.falsePositive(), total.falseNegative(), total.precision(),
                    total.recall(), total.precisionByLength(), total.recallByLength()));
            if (assertTarget && sigma == 10) {
                assertTrue(total.precision() >= 0.98 && total.recall() >= 0.98, rows.get(rows.size() - 1));
            }
        }
        return rows;
    }

    static void write(String name, List<String> rows) throws IOException {
        Path dir = Path.of("target/quality");
        Files.createDirectories(dir);
        Files.write(dir.resolve("coverage-" + name + ".md"), rows);
    }
}
