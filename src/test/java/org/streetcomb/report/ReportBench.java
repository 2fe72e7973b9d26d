package org.streetcomb.report;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.LonLat;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.timing.StageClock;

/**
 * Benchmark of the HTML report and PNG quick look (run by docs/report-bench.sh, not by the tests): writes both
 * for the demo town and for a generated grid town of about 100 000 edges (every block its own feature, the
 * worst case for drawing), then opens each report in headless Chromium three times. Prints file sizes,
 * write times as ratios to the time the plan itself took, and browser load times as ratios to the demo's.
 */
public final class ReportBench {

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "target/report-bench");
        int side = args.length > 1 ? Integer.parseInt(args[1]) : 224;
        Files.createDirectories(folder);
        Path grid = folder.resolve("grid.geojson");
        writeGrid(grid, side);
        Result demo = write(Path.of("fixtures/demo/brackenford.geojson"), new LonLat(-31.2, 44.6), folder, "demo");
        Result large = write(grid, null, folder, "grid");
        try (HeadlessChromium chromium = HeadlessChromium.start(Files.createTempDirectory(folder, "profile"))) {
            load(chromium, demo);
            load(chromium, large);
        }
        System.out.println();
        for (Result r : List.of(demo, large)) {
            System.out.println(r.summary(demo));
        }
    }

    /** A square grid of {@code side} x {@code side} junctions 80 m apart, one feature per block face. */
    static void writeGrid(Path file, int side) throws Exception {
        double lat0 = 44.0;
        double lon0 = -33.0;
        double dLat = 80 / 111_195.0;
        double dLon = 80 / (111_195.0 * Math.cos(Math.toRadians(lat0)));
        try (JsonGenerator json = new JsonFactory().createGenerator(Files.newOutputStream(file), JsonEncoding.UTF8)) {
            json.writeStartObject();
            json.writeStringField("type", "FeatureCollection");
            json.writeArrayFieldStart("features");
            for (int r = 0; r < side; r++) {
                for (int c = 0; c + 1 < side; c++) {
                    block(json, "Row " + r + " Street", lon0 + c * dLon, lat0 + r * dLat, lon0 + (c + 1) * dLon, lat0 + r * dLat);
                    block(json, "Column " + r + " Avenue", lon0 + r * dLon, lat0 + c * dLat, lon0 + r * dLon, lat0 + (c + 1) * dLat);
                }
            }
            json.writeEndArray();
            json.writeEndObject();
        }
    }

    private static void block(JsonGenerator json, String name, double x0, double y0, double x1, double y1) throws Exception {
        json.writeStartObject();
        json.writeStringField("type", "Feature");
        json.writeObjectFieldStart("properties");
        json.writeStringField("name", name);
        json.writeEndObject();
        json.writeObjectFieldStart("geometry");
        json.writeStringField("type", "LineString");
        json.writeArrayFieldStart("coordinates");
        json.writeArray(new double[] {x0, y0}, 0, 2);
        json.writeArray(new double[] {x1, y1}, 0, 2);
        json.writeEndArray();
        json.writeEndObject();
        json.writeEndObject();
    }

    private static Result write(Path layer, LonLat depot, Path folder, String name) {
        long t0 = System.nanoTime();
        Plan plan = Planner.plan(new PlanRequest(layer, depot, 0.5, 500, false), new StageClock(StageClock.SILENT));
        long t1 = System.nanoTime();
        MapReport report = new MapReport("Plan: " + name, PlanLayers.of(plan), PlanLayers.groups(plan),
                new ObjectMapper().createObjectNode().put("edges", plan.network().edgeCount()), List.of(), List.of("Drive safely."),
                null, 1);
        Path html = folder.resolve(name + ".html");
        new HtmlReportWriter().write(html, report);
        long t2 = System.nanoTime();
        Path png = folder.resolve(name + ".png");
        new QuickLookPng(1200, 800).write(png, report);
        long t3 = System.nanoTime();
        return new Result(name, plan.network().edgeCount(), html, png, (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9);
    }

    private static void load(HeadlessChromium chromium, Result result) throws Exception {
        load(chromium, result.html, result.loads, result.allLayers);
    }

    /**
     * Opens the report as often as {@code loads} is long, timing each load to the first screenshot into
     * {@code loads} and switching every layer on and drawing again into {@code allLayers}.
     */
    static void load(HeadlessChromium chromium, Path html, double[] loads, double[] allLayers) throws Exception {
        for (int i = 0; i < loads.length; i++) {
            long t0 = System.nanoTime();
            chromium.open(html);
            chromium.screenshot();
            loads[i] = (System.nanoTime() - t0) / 1e9;
            long t1 = System.nanoTime();
            chromium.eval("document.querySelectorAll('input[data-layer]').forEach(b => { if (!b.checked) b.click(); })");
            chromium.screenshot();
            allLayers[i] = (System.nanoTime() - t1) / 1e9;
            if (!chromium.problems().isEmpty()) {
                throw new IllegalStateException(html + ": " + chromium.problems());
            }
        }
    }

    static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }

    /** Measurements of one report. */
    private static final class Result {
        final String name;
        final int edges;
        final Path html;
        final Path png;
        final double planSeconds;
        final double htmlSeconds;
        final double pngSeconds;
        final double[] loads = new double[3];
        final double[] allLayers = new double[3];

        Result(String name, int edges, Path html, Path png, double planSeconds, double htmlSeconds, double pngSeconds) {
            this.name = name;
            this.edges = edges;
            this.html = html;
            this.png = png;
            this.planSeconds = planSeconds;
            this.htmlSeconds = htmlSeconds;
            this.pngSeconds = pngSeconds;
        }

        double load() {
            return median(loads);
        }

        String summary(Result reference) throws Exception {
            return String.format(Locale.ROOT,
                    "%s: %d edges; plan %.2f s; HTML %.1f MB written in %.2f s (%.2f x plan); PNG %.0f kB in %.2f s (%.2f x plan); "
                    + "browser load to first screenshot, median of 3: %.2f s (%.1f x demo); every layer switched on and "
                    + "drawn again: %.2f s",
                    name, edges, planSeconds, Files.size(html) / 1e6, htmlSeconds, htmlSeconds / planSeconds,
                    Files.size(png) / 1e3, pngSeconds, pngSeconds / planSeconds, load(), load() / reference.load(), median(allLayers));
        }
    }
}
