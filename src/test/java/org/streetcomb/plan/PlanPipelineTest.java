package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.cli.Main;
import org.streetcomb.network.LonLat;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.write.GpxLimits;

/**
 * One planning pipeline: a Java caller of {@link Planner} and {@link PlanFiles} gets byte for byte the files the
 * command line writes for the same request, trips and turn-aware order included (the command line only parses,
 * calls and formats). Demo data: the invented town in fixtures/demo.
 */
class PlanPipelineTest {

    private static final Path DEMO = Path.of("fixtures/demo/brackenford.geojson");
    private static final LonLat DEPOT = new LonLat(-31.2, 44.6);

    @TempDir
    Path folder;

    @Test
    void javaCallerWritesTheCommandLinesFiles() throws Exception {
        Path cli = Files.createDirectory(folder.resolve("cli"));
        Path java = Files.createDirectory(folder.resolve("java"));
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", DEMO.toString(), "--depot=-31.2,44.6", "--max-trip-km", "8",
            "--traffic-side", "left", "--out", cli.resolve("tour.geojson").toString(),
            "--gpx", cli.resolve("tour.gpx").toString(), "--directions", cli.resolve("sheet.csv").toString(),
            "--kml", cli.resolve("tour.kml").toString(), "-q"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());

        FleetRequest trips = new FleetRequest(8.0, null, null, null, null, null, null, null, List.of(), 10, 30, null);
        PlanRequest request = new PlanRequest(DEMO, DEPOT, 0.5, 500, false, ReadOptions.DEFAULTS,
                ServiceOptions.DEFAULTS, new Arrangement(TrafficSide.LEFT, true, trips));
        StageClock clock = new StageClock(StageClock.SILENT);
        Plan plan = Planner.plan(request, RepairOptions.NONE, clock);
        assertNotNull(plan.arranged().fleet(), "the trips are planned by the pipeline, not by the command line");
        PlanFiles.write(plan, new FieldFiles(java.resolve("tour.geojson"), false, java.resolve("tour.gpx"),
                new GpxLimits(2, GpxLimits.DEFAULT_TRACK_POINTS, GpxLimits.DEFAULT_ROUTE_POINTS, false),
                java.resolve("tour.kml"), java.resolve("sheet.csv"), true), clock);

        for (String name : List.of("tour.geojson", "tour.gpx", "sheet.csv", "tour.kml")) {
            assertArrayEquals(Files.readAllBytes(cli.resolve(name)), Files.readAllBytes(java.resolve(name)), name);
        }
    }
}
