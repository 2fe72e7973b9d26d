package org.streetcomb.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.opentest4j.AssertionFailedError;
import org.streetcomb.cli.Main;
import org.streetcomb.coverage.MopUpStretchStudy;

/**
 * The measured figures of README.md and docs/quality.md against the commands that produce them. Figures a
 * command gives in a second are measured here, by the command a user would type (run in-process through
 * {@link Main}); figures of studies that take minutes are read from the table the study's command wrote
 * into docs/ (between markers where the command writes the page itself, see {@link GeneratedSection}),
 * and the prose that quotes them is checked against that table. Each figure is formatted at the precision
 * the page prints, so the tolerance is the page's rounding: a figure one unit off in its last digit fails,
 * as {@link #aWrongFigureIsCaught()} shows.
 *
 * <p>What is not checked here: option defaults and limits (they are the code's constants, and the options'
 * own tests hold them), figures quoted from outside sources (marked "from memory" or cited), and the
 * timing tables of docs/benchmarks.md, docs/readers.md and docs/report.md, which their scripts in docs/
 * regenerate whole.
 */
class DocFiguresTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    private static final String DRIVE = "fixtures/demo/brackenford-drive.gpx";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void demoTown() {
        JsonNode plan = json("plan", DEMO, "--depot=-31.2,44.6", "--json");
        Page readme = Page.of("README.md");
        readme.says(String.format(Locale.ROOT, "It has %d street lines that are not split at junctions",
                plan.at("/input/lines").asInt()));
        readme.says("and " + word(plan.at("/input/skipped/Point").asInt()) + " bus-stop points that the planner skips");
    }

    /** The demo town's row of the health table in docs/health-check.md (the other rows read ../shared). */
    @Test
    void demoTownHealth() {
        JsonNode health = json("health", DEMO, "--depot=-31.2,44.6", "--json");
        JsonNode counts = health.get("counts");
        Page.of("docs/health-check.md").says(String.format(Locale.ROOT, "| %s | `--depot=-31.2,44.6` | %d | %.1f | "
                        + "crossing %d (notes: the High Street), duplicate %d (turning heads drawn over themselves), dropped "
                        + "%d (%d bus-stop points) |", DEMO, health.at("/network/edges").asInt(),
                health.at("/network/length_m").asDouble() / 1000, counts.get("crossing").asInt(),
                counts.get("duplicate").asInt(), counts.get("dropped").asInt(),
                health.at("/input/features").asInt() - health.at("/input/lines").asInt()));
    }

    @Test
    void turnAwareOrder() {
        JsonNode demo = json("plan", DEMO, "--depot=-31.2,44.6", "--json");
        JsonNode turns = demo.at("/field/turns");
        Page.of("README.md").says(String.format(Locale.ROOT,
                "On the demo town the reorder takes the tour from %d to %d U-turns and from %d to %d crossing turns.",
                turns.get("plain_order_u_turns").asInt(), turns.get("u_turns").asInt(),
                turns.get("plain_order_crossing_turns").asInt(), turns.get("crossing_turns").asInt()));
        Page quality = Page.of("docs/quality.md");
        quality.says(turnRow("demo town (invented)", demo));
        quality.says(turnRow("Yongsan, Seoul (OSM, fixtures/real)",
                json("plan", "fixtures/real/roads-seoul.geojson", "--json")));
    }

    private static String turnRow(String name, JsonNode plan) {
        JsonNode t = plan.at("/field/turns");
        return String.format(Locale.ROOT, "| %s | %.3f km | %d → %d | %d → %d | %d → %d | %.1f |", name,
                plan.at("/totals/tour_m").asDouble() / 1000, t.get("plain_order_u_turns").asInt(),
                t.get("u_turns").asInt(), t.get("plain_order_crossing_turns").asInt(), t.get("crossing_turns").asInt(),
                t.get("plain_order_straight_ons").asInt(), t.get("straight_ons").asInt(),
                t.get("u_turns_per_100km").asDouble());
    }

    @Test
    void shiftSizedTrips() {
        Page.of("README.md").says(tripsSentence());
    }

    private static String tripsSentence() {
        JsonNode single = json("plan", DEMO, "--depot=-31.2,44.6", "--json");
        JsonNode trips = json("plan", DEMO, "--depot=-31.2,44.6", "--max-trip-hours", "1.5", "--json");
        double one = single.at("/totals/tour_m").asDouble();
        double all = trips.at("/totals/tour_m").asDouble();
        return String.format(Locale.ROOT, "1.5-hour trips take %d trips and %.1f km in all, %.1f %% more than the "
                        + "single tour of %.1f km", trips.at("/field/trips").size(), all / 1000, 100 * (all / one - 1),
                one / 1000);
    }

    /** README's figures for --turn-back-metres on the demo town's 1.5-hour trips. */
    @Test
    void turnBackPrice() {
        JsonNode plain = json("plan", DEMO, "--depot=-31.2,44.6", "--max-trip-hours", "1.5", "--json");
        JsonNode priced = json("plan", DEMO, "--depot=-31.2,44.6", "--max-trip-hours", "1.5", "--turn-back-metres", "400",
                "--json");
        Page.of("README.md").says(String.format(Locale.ROOT, "400 takes the U-turns outside dead ends from %d to %d for "
                        + "%.1f %% more driving", plain.at("/field/turns/u_turns_outside_dead_ends").asInt(),
                priced.at("/field/turns/u_turns_outside_dead_ends").asInt(),
                100 * (priced.at("/totals/tour_m").asDouble() / plain.at("/totals/tour_m").asDouble() - 1)));
    }

    /** The figures of the capacitated benchmark sets: README's rounded means from the table in docs/quality.md. */
    @Test
    void tripBenchmarkMeans() {
        Page quality = Page.of("docs/quality.md");
        double[] mean = new double[3];
        String[] sets = {"gdb", "val", "egl"};
        for (int s = 0; s < 3; s++) {
            List<String> row = quality.row(sets[s], "mean of ...");
            mean[s] = Page.number(row.get(row.size() - 2)); // the gap, before the milliseconds
        }
        Page.of("README.md").says(String.format(Locale.ROOT, "it comes within %.2f %%, %.2f %% and %.2f %% on average "
                + "of the best totals published", mean[0], mean[1], mean[2]));
        quality.says(String.format(Locale.ROOT, "measured %.2f %%, %.2f %% and %.2f %%", mean[0], mean[1], mean[2]));
        quality.says(String.format(Locale.ROOT, "| gdb (23) | 1.28 %% (6.18 %%) | **%.2f %%**", mean[0]));
        quality.says(String.format(Locale.ROOT, "| val (34) | 3.84 %% (9.40 %%) | **%.2f %%**", mean[1]));
        quality.says(String.format(Locale.ROOT, "| egl (12) | 4.43 %% (6.97 %%) | **%.2f %%**", mean[2]));
    }

    /** How far to trust the audit: README's percentages from the study's tables in docs/quality.md. */
    @Test
    void auditTrust() {
        Page quality = Page.of("docs/quality.md");
        List<String> heldOut = quality.row("Yongsan, Seoul (OSM extract)", "10", "11-30");
        double precision = Page.number(heldOut.get(8));
        double recall = Page.number(heldOut.get(9));
        double precisionByLength = Page.number(heldOut.get(10));
        double recallByLength = Page.number(heldOut.get(11));
        double persisting = Page.number(quality.row("Seoul", "10", "60").get(5));
        Page.of("README.md").says(String.format(Locale.ROOT, "it flags %d %% of the skipped streets (%d %% of their "
                        + "length) and %d %% of its flags are right; receiver errors that persist for a minute bring "
                        + "the latter down to %d %%", percent(recall), percent(recallByLength), percent(precision),
                percent(persisting)));
        quality.says(String.format(Locale.ROOT, "precision %.3f and recall %.3f on the held-out seeds", precision, recall));
        quality.says(String.format(Locale.ROOT, "Weighted by length, %d %% of the skipped metres are flagged and %d %% "
                + "of the flagged metres were skipped", percent(recallByLength), percent(precisionByLength)));
    }

    /** The coverage study's reading of its own tables in docs/quality.md: odds, persisting noise, drift window. */
    @Test
    void coverageStudyProse() {
        Page quality = Page.of("docs/quality.md");
        List<String> oddsOne = quality.row("1", "...");
        List<String> oddsTwenty = quality.row("20", "...");
        quality.says(String.format(Locale.ROOT, "cut the false alarms from %s to %s for %d more skipped streets passed "
                + "as driven", oddsOne.get(1), oddsTwenty.get(1), Integer.parseInt(oddsTwenty.get(2))
                - Integer.parseInt(oddsOne.get(2))));
        double shortMemory = Page.number(quality.row("Seoul", "10", "10").get(5));
        double longMemory = Page.number(quality.row("Seoul", "10", "60").get(5));
        quality.says(String.format(Locale.ROOT, "precision on the dense extract falls to %.2f–%.2f",
                Math.min(shortMemory, longMemory), Math.max(shortMemory, longMemory)));
        List<String> independentOff = quality.row("independent", "off");
        List<String> independentOn = quality.row("independent", "60 s");
        List<String> persistsOff = quality.row("persists, τ = 60 s", "off");
        List<String> persistsOn = quality.row("persists, τ = 60 s", "60 s");
        quality.says(String.format(Locale.ROOT, "It gains %d points of precision where the error persists and costs %d "
                        + "where it does not", percent(Page.number(persistsOn.get(2)) - Page.number(persistsOff.get(2))),
                percent(Page.number(independentOff.get(2)) - Page.number(independentOn.get(2)))));
    }

    /** The mop-up's savings: README and the prose of docs/quality.md against the table MopUpStretchStudy writes. */
    @Test
    void mopUpSavings() {
        String table = MopUpStretchStudy.SECTION.read(Path.of("docs/quality.md"));
        List<String> demo = tableRow(table, "Brackenford (invented demo town)");
        List<String> seoul = tableRow(table, "Yongsan, Seoul (OSM extract)");
        int service = demo.size() - 2;
        int hours = demo.size() - 1;
        Page.of("README.md").says(String.format(Locale.ROOT, "cut the service by %s and %s and the mop-up's time by %s "
                + "and %s", demo.get(service), seoul.get(service), demo.get(hours), seoul.get(hours)));
        Page.of("docs/quality.md").says(String.format(Locale.ROOT, "services %s (demo town, street segments of about "
                        + "110 m) and %s (Seoul, longer segments) less, which takes %s and %s off the mop-up's hours",
                demo.get(service), seoul.get(service), demo.get(hours), seoul.get(hours)));
    }

    /** README's worked mop-up example: the direction sheet's own lines about Sallow Lane. */
    @Test
    void mopUpExample() throws IOException {
        Path sheet = dir.resolve("mop-up.csv");
        JsonNode audit = json("audit", DEMO, DRIVE, "--depot=-31.2,44.6", "--mop-up", dir.resolve("m.geojson").toString(),
                "--directions", sheet.toString(), "--json");
        List<String> missed = new ArrayList<>();
        audit.at("/coverage/not_covered").forEach(s -> missed.add(s.get("street").asText()));
        Page readme = Page.of("README.md");
        readme.says("with " + String.join(" and ", missed.stream().sorted(java.util.Comparator.reverseOrder()).toList()) + " missed");
        List<String[]> sallow = Files.readAllLines(sheet, StandardCharsets.UTF_8).stream()
                .map(l -> l.split(",")).filter(c -> c.length > 5 && c[3].equals("Sallow Lane")).toList();
        String[] over = sallow.stream().filter(c -> c[2].startsWith("Stop service")).findFirst().orElseThrow();
        String start = sallow.stream().filter(c -> c[2].startsWith("Start service")).findFirst().orElseThrow()[2];
        readme.says(String.format(Locale.ROOT, "\"%s\" over %.0f m the crew did drive, then \"%s\"", over[2],
                Double.parseDouble(over[4]), start));
    }

    /** The message quoted in docs/quality.md for a drive from another continent is the one the tool prints. */
    @Test
    void farTrackMessage() {
        StringWriter err = new StringWriter();
        Main.run(new String[] {"audit", "fixtures/real/roads-seoul.geojson", "fixtures/gpx/around-visnjan-with-car.gpx"},
                new PrintWriter(new StringWriter(), true), new PrintWriter(err, true));
        String message = err.toString().trim();
        String quoted = message.substring(message.indexOf("none of the"), message.indexOf(": check that"));
        Page.of("docs/quality.md").says("\"" + quoted + "\"");
    }

    /** docs/benchmarks.md: the sentences on the targets quote the tables docs/bench.sh, docs/town-bench.sh and
     * docs/mixed-bench.sh print. */
    @Test
    void benchmarkProse() {
        Page bench = Page.of("docs/benchmarks.md");
        List<String> hundredK = bench.row("100,438");
        List<String> million = bench.row("997,387");
        bench.says(String.format(Locale.ROOT, "Target: 100k edges end to end under 10 s: %s (%.1f s)",
                Page.number(hundredK.get(7)) < 10 ? "met" : "not met", Page.number(hundredK.get(7))));
        bench.says(String.format(Locale.ROOT, "the %.1f GiB peak at 1M", Page.number(million.get(8).replace(",", "")) / 1024));
        // the easy grid against the run of 2026-12-02 (total 31.86 s, before the turns stage existed)
        double total = Page.number(million.get(7));
        double turns = Page.number(million.get(6));
        bench.says(String.format(Locale.ROOT, "the total is %.2f s, of which %.2f s is the turns stage", total, turns));
        bench.says(String.format(Locale.ROOT, "without it, %.2f s. Like for like, the easy grid is %s than it was",
                total - turns, total - turns <= 31.86 ? "no slower" : "slower"));
        bench.says(String.format(Locale.ROOT, "with the new stage it is %.0f %% %s", Math.abs(total / 31.86 - 1) * 100,
                total > 31.86 ? "slower" : "faster"));
        List<String> town = bench.row("3g", "1,006,034");
        List<String> town100k = bench.row("3g", "99,798");
        List<String> large100k = bench.row("16g", "99,798");
        List<String> large1m = bench.row("16g", "1,006,034");
        bench.says(String.format(Locale.ROOT, "in under 60 s and 4 GB: **%s** (%.0f s; the memory part is %s, %s MiB peak "
                + "resident with a 3 GB heap)", Page.number(town.get(9)) < 60 && Page.number(town.get(10).replace(",", "")) < 4096
                ? "met" : "not met", Page.number(town.get(9)), Page.number(town.get(10).replace(",", "")) < 4096 ? "met" : "not met",
                town.get(10)));
        bench.says(String.format(Locale.ROOT, "the solve within 3 times the network build: **%s** (%s at",
                Page.number(town.get(8)) <= 3 ? "met" : "not met", town.get(8)));
        bench.says(String.format(Locale.ROOT, "realistic 100,000 in under 5 s: the solve %s (%s s with a 3 GB heap, %s s "
                + "with 16 GB), end to end %s (%s s)", Page.number(town100k.get(7)) < 5 ? "is" : "is not", town100k.get(7),
                large100k.get(7), Page.number(town100k.get(9)) < 5 ? "is" : "is not", town100k.get(9)));
        bench.says(String.format(Locale.ROOT, "(%.0f s with 16 GB: the collector lets the heap grow to %s MiB",
                Page.number(large1m.get(9)), large1m.get(10)));
        List<String> mixed = bench.row("100,396");
        bench.says(String.format(Locale.ROOT, "(%.0f s, %s MiB peak resident with a 2 GB heap, ratio %.0f)",
                Page.number(mixed.get(2)), mixed.get(5), Page.number(mixed.get(4))));
        double small = Page.number(bench.row("29,672").get(8));
        double large = Page.number(bench.row("9,991").get(8));
        bench.says(String.format(Locale.ROOT, "the certified gaps (%.1f %% to %.1f %% where the LP ran)", small, large));
    }

    /** docs/readers.md: the summary of the shapefile table is its largest warm / GeoJSON ratio. */
    @Test
    void readerProse() {
        Page readers = Page.of("docs/readers.md");
        double worst = 0;
        for (String shapefile : new String[] {"shp-spearfish-roads-nad27-utm13n/roads.shp",
                "shp-geodanet-streets-az-stateplane-ft/streets.shp", "shp-nyc-tiger-roads-wgs84/tiger_roads.shp",
                "shp-aurich-osm-roads-dhdn-gk2/roads.shp"}) {
            worst = Math.max(worst, Page.number(readers.row(shapefile).get(5)));
        }
        readers.says(String.format(Locale.ROOT, "Warm, every shapefile is %s the target (at most %.2f times its "
                + "GeoJSON twin)", worst <= 1.5 ? "within" : "outside", worst));
        readers.says("Its 18 one-way lines become " + readers.row("roads.shp", "956").get(4) + " one-way edges");
    }

    /** docs/report.md: "under a seventh of the audit" holds for the larger audits of its table. */
    @Test
    void auditReportProse() {
        Page report = Page.of("docs/report.md");
        double worst = 0;
        for (List<String> row : List.of(report.row("grid", "9 660"), report.row("Vienna", "5 363"))) {
            worst = Math.max(worst, Math.max(Page.number(row.get(4)), Page.number(row.get(6))));
        }
        assertTrue(worst > 0, "rows of the audit report table found");
        assertTrue(worst < 1.0 / 7, "writing the report and the picture costs " + worst + " of the audit");
        report.says("on the larger audits writing the report and the picture costs under a seventh of the audit");
    }

    /** The gate can fail: the trips sentence with its kilometres one unit off in the last digit printed. */
    @Test
    void aWrongFigureIsCaught() {
        String right = tripsSentence();
        int km = right.indexOf(" km in all");
        int digit = right.charAt(km - 1) - '0';
        String wrong = right.substring(0, km - 1) + (digit + 1) % 10 + right.substring(km);
        Page misstated = Page.of("README.md").with(right, wrong);
        AssertionFailedError caught = assertThrows(AssertionFailedError.class, () -> misstated.says(right));
        assertEquals(true, caught.getMessage().contains(wrong.substring(0, km)), caught.getMessage());
    }

    private static List<String> tableRow(String table, String name) {
        for (String line : table.split("\n")) {
            if (line.startsWith("| " + name + " |")) {
                return List.of(line.substring(2, line.length() - 2).split(" \\| "));
            }
        }
        throw new AssertionFailedError("no row " + name + " in the generated table");
    }

    private static int percent(double share) {
        return (int) Math.round(100 * share);
    }

    private static String word(int n) {
        String[] words = {"no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten"};
        return n < words.length ? words[n] : Integer.toString(n);
    }

    private static JsonNode json(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        if (code != 0) {
            throw new AssertionFailedError(String.join(" ", args) + " exited " + code + ": " + err);
        }
        try {
            return JSON.readTree(out.toString());
        } catch (IOException e) {
            throw new AssertionFailedError("not JSON: " + out, e);
        }
    }
}
