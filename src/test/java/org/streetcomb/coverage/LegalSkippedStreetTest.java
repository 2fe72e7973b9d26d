package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.match.MatchSettings;

/**
 * The skipped-street study on real networks with one-way streets and dual carriageways (OpenStreetMap
 * windows of Monaco, Andorra la Vella, Baltimore and Vienna, fixtures/benchmarks/mixed-osm, NOTICE; the
 * drives are simulated, see {@link LegalSkippedStreetStudy}): 15 streets skipped per seed, a fix each second,
 * Gaussian noise of 5 and 10 m, a dropout of 2-10 s every 5 minutes on average, the audit at its defaults.
 * A study, not part of the default suite (about a minute): run it with {@code -Dcoverage.legal=true}
 * ({@code -Dcoverage.seeds=11-30} for the held-out seeds; the matcher's settings were chosen on 1-10). It
 * writes its rows to target/quality/legal-*.md, fails when docs/quality.md does not show the same rows, and
 * then gates at the targets of issue 13: precision and recall of "not covered" at least 0.97 at 5 m and
 * 0.95 at 10 m, and wrong-way metres at most 0.05 % of the metres driven. The targets are not met yet
 * (docs/quality.md), so the study fails there.
 */
@EnabledIfSystemProperty(named = "coverage.legal", matches = "true")
class LegalSkippedStreetTest {

    static final String SEEDS = System.getProperty("coverage.seeds", "1-10");
    static final int SKIPS = 15;
    static final double WRONG_WAY_SHARE = 0.0005;

    @ParameterizedTest(name = "{0}")
    @CsvSource({"monaco.osm.pbf", "andorra-vella.osm.pbf", "baltimore-window.osm.pbf", "vienna-b.geojson"})
    void skippedStreetsAreFoundOnLegalDrives(String file) throws IOException {
        List<String> rows = new ArrayList<>();
        List<double[]> figures = study(Path.of("fixtures/benchmarks/mixed-osm", file), file, rows);
        Files.createDirectories(Path.of("target/quality"));
        Files.write(Path.of("target/quality/legal-" + file.replaceAll("\\..*", "") + ".md"), rows);
        String docs = Files.readString(Path.of("docs/quality.md"));
        for (String row : rows) {
            assertTrue(docs.contains(row), "docs/quality.md does not show this row of the study: " + row);
        }
        for (double[] f : figures) {
            double target = f[0] == 5 ? 0.97 : 0.95;
            assertTrue(f[1] >= target && f[2] >= target, file + " at " + f[0] + " m: precision " + f[1] + ", recall "
                    + f[2] + " (target " + target + ")");
            assertTrue(f[3] <= 100 * WRONG_WAY_SHARE, file + ": wrong-way " + f[3] + " % of the metres driven");
        }
    }

    /** One table row per noise level added to {@code rows}; returns {sigma, precision, recall, wrong-way %} each. */
    static List<double[]> study(Path layer, String name, List<String> rows) {
        List<double[]> figures = new ArrayList<>();
        String[] range = SEEDS.split("-");
        long first = Long.parseLong(range[0]);
        long last = Long.parseLong(range[range.length - 1]);
        for (double sigma : new double[] {5, 10}) {
            SkippedStreetStudy.Counts total = SkippedStreetStudy.NONE;
            double driven = 0;
            double wrong = 0;
            SimulatedDrive.Settings drive = new SimulatedDrive.Settings(20, 40, 1, 1, sigma, 300, 2, 10);
            for (long seed = first; seed <= last; seed++) {
                LegalSkippedStreetStudy.Run run = LegalSkippedStreetStudy.run(layer, SKIPS, drive,
                        MatchSettings.defaults().withDoubtOdds(Double.parseDouble(System.getProperty("coverage.odds", "20"))), seed);
                total = total.plus(run.counts());
                driven += run.drivenM();
                wrong += run.wrongWayM();
            }
            String row = String.format(Locale.ROOT,
                    "| %s | %.0f | %s | %d | %d | %d | %d | %d | %.3f | %.3f | %.3f | %.3f | %.3f |", name, sigma, SEEDS,
                    total.streets(), total.truePositive() + total.falseNegative(), total.truePositive(),
                    total.falsePositive(), total.falseNegative(), total.precision(), total.recall(),
                    total.precisionByLength(), total.recallByLength(), 100 * wrong / driven);
            System.out.println(row);
            rows.add(row);
            figures.add(new double[] {sigma, total.precision(), total.recall(), 100 * wrong / driven});
        }
        return figures;
    }
}
