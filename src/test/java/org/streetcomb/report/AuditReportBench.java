package org.streetcomb.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.streetcomb.plan.Audit;
import org.streetcomb.plan.AuditRequest;
import org.streetcomb.plan.DriveAudit;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.SimulatedDrive;
import org.streetcomb.network.Components;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.TourPlanner;

/**
 * Benchmark of the audit report (run by docs/audit-report-bench.sh, not by the tests): for each layer, a
 * simulated drive (invented data: the postman tour of the layer without a seeded 10 % of its street lines,
 * one-way streets driven either way,
 * 20-40 km/h, a fix every 1-5 s, 10 m noise, short dropouts) is written as GPX and audited; then the audit's
 * HTML report and PNG quick look are written and the report is opened in headless Chromium three times.
 * Prints file sizes, write times as ratios to the audit's own time, and load times as ratios to the first
 * layer's. With no layer given: the demo town and a generated grid town of 70 x 70 junctions.
 */
public final class AuditReportBench {

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "target/audit-report-bench");
        Files.createDirectories(folder);
        List<Path> layers = new ArrayList<>();
        for (int i = 1; i < args.length; i++) {
            layers.add(Path.of(args[i]));
        }
        if (layers.isEmpty()) {
            Path grid = folder.resolve("grid.geojson");
            ReportBench.writeGrid(grid, 70);
            layers.add(Path.of("fixtures/demo/brackenford.geojson"));
            layers.add(grid);
        }
        List<Result> results = new ArrayList<>();
        for (Path layer : layers) {
            results.add(write(layer, folder));
        }
        try (HeadlessChromium chromium = HeadlessChromium.start(Files.createTempDirectory(folder, "profile"))) {
            for (Result result : results) {
                ReportBench.load(chromium, result.html(), result.loads(), result.allLayers());
            }
        }
        System.out.println();
        for (Result r : results) {
            System.out.println(r.summary(results.get(0)));
        }
    }

    private static Result write(Path layer, Path folder) throws Exception {
        String name = layer.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        List<RoadFeature> lines = LayerReaders.read(layer).features();
        Random random = new Random(1);
        // the simulated crew drives one-way streets either way: the audit shows that as wrong-way stretches
        List<RoadFeature> driven = lines.stream().filter(f -> random.nextDouble() >= 0.1)
                .map(f -> new RoadFeature(f.id(), f.name(), f.line(), Travel.BOTH, true, Map.of())).toList();
        StreetNetwork network = new NetworkBuilder(0.5).build(driven);
        // small separate parts are left undriven: a recording of a few seconds may hold no fix at all
        var tours = TourPlanner.tours(network, Components.of(network), UndirectedPostman.solve(network), 0, false).stream()
                .filter(t -> t.length(network) > 1000).toList();
        Path gpx = folder.resolve(name + "-drive.gpx");
        SimulatedDrive.writeGpx(gpx, SimulatedDrive.drive(network, tours,
                new SimulatedDrive.Settings(20, 40, 1, 5, 10, 300, 2, 10), 7, SimulatedDrive.START), true);

        TrackLines tracks = new TrackLines();
        long t0 = System.nanoTime();
        Audit audit = DriveAudit.run(new AuditRequest(layer, List.of(gpx), 0.5, MatchSettings.defaults(), 0.9, false,
                ReadOptions.DEFAULTS), new StageClock(StageClock.SILENT), tracks);
        long t1 = System.nanoTime();
        MapReport report = new MapReport("Coverage: " + name, CoverageLayers.of(audit.coverage(), tracks), List.of(),
                new ObjectMapper().createObjectNode().put("edges", audit.coverage().network().edgeCount()), List.of(),
                List.of("Check doubtful streets on the ground."), null, 1);
        Path html = folder.resolve(name + "-audit.html");
        new HtmlReportWriter().write(html, report);
        long t2 = System.nanoTime();
        Path png = folder.resolve(name + "-audit.png");
        new QuickLookPng(1200, 800).write(png, report);
        long t3 = System.nanoTime();
        return new Result(name, audit.coverage().network().edgeCount(), audit.tally().fixes(), html, png,
                (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9);
    }

    /** Measurements of one audit report. */
    private record Result(String name, int edges, int fixes, Path html, Path png, double auditSeconds, double htmlSeconds,
                          double pngSeconds, double[] loads, double[] allLayers) {

        Result(String name, int edges, int fixes, Path html, Path png, double auditSeconds, double htmlSeconds,
               double pngSeconds) {
            this(name, edges, fixes, html, png, auditSeconds, htmlSeconds, pngSeconds, new double[3], new double[3]);
        }

        String summary(Result reference) throws Exception {
            return String.format(Locale.ROOT,
                    "%s: %d edges, %d fixes; audit %.2f s; HTML %.2f MB written in %.2f s (%.2f x audit); PNG %.0f kB "
                    + "in %.2f s (%.2f x audit); browser load to first screenshot, median of 3: %.2f s (%.1f x %s); "
                    + "every layer switched on and drawn again: %.2f s",
                    name, edges, fixes, auditSeconds, Files.size(html) / 1e6, htmlSeconds, htmlSeconds / auditSeconds,
                    Files.size(png) / 1e3, pngSeconds, pngSeconds / auditSeconds, ReportBench.median(loads),
                    ReportBench.median(loads) / ReportBench.median(reference.loads), reference.name, ReportBench.median(allLayers));
        }
    }
}
