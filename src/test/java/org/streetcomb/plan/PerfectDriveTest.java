package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.coverage.SimulatedDrive;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Direction;
import org.streetcomb.tour.Directions;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.write.GpxLimits;
import org.streetcomb.write.GpxTourWriter;

/**
 * A perfect drive audits perfect: a plan of a real network with one-way streets (OpenStreetMap windows of
 * Monaco and Vienna, fixtures/benchmarks/mixed-osm, NOTICE), with the streets one-way streets cut off left
 * out and only the depot's part planned, is audited in the same scope against its own GPX and against a
 * timed drive along it (a fix each second, no noise, simulated). The tour obeys every one-way street
 * (TourValidator checks it), so any wrong-way metre or street not covered is the audit's error. The gates
 * are issue 13's target: 100 % of the plan's scope (to the 0.1 % the summary shows), no street missed or
 * partly covered, zero wrong-way metres.
 */
class PerfectDriveTest {

    @TempDir
    Path folder;

    @ParameterizedTest(name = "{0}")
    @CsvSource({"monaco.osm.pbf", "vienna-b.geojson"})
    void theTourAndAOneHertzDriveAlongItAuditPerfect(String file) throws IOException {
        Path layer = Path.of("fixtures/benchmarks/mixed-osm", file);
        ServiceOptions service = new ServiceOptions(KerbMode.ONE_PASS, null, null, true);
        Plan plan = Planner.plan(new PlanRequest(layer, null, 0.5, 500, true, ReadOptions.DEFAULTS, service),
                new StageClock(StageClock.SILENT));
        Path gpx = folder.resolve("tour.gpx");
        EdgeBearings bearings = EdgeBearings.of(plan.network());
        List<List<Direction>> sheets = new ArrayList<>();
        plan.tours().forEach(t -> sheets.add(Directions.of(plan.network(), bearings, TrafficSide.RIGHT, t)));
        new GpxTourWriter(new GpxLimits(2, GpxLimits.DEFAULT_TRACK_POINTS, GpxLimits.DEFAULT_ROUTE_POINTS, true))
                .write(gpx, plan.network(), plan.depot(), plan.tours(), sheets, "Tour");
        Path timed = folder.resolve("drive.gpx");
        SimulatedDrive.writeGpx(timed, SimulatedDrive.drive(plan.network(), plan.tours(),
                new SimulatedDrive.Settings(20, 40, 1, 1, 0, 0, 0, 0), 1, SimulatedDrive.START), true);
        PlanScope scope = new PlanScope(null, 500, true, service);
        for (Path track : List.of(timed, gpx)) {
            Audit audit = DriveAudit.run(new AuditRequest(layer, List.of(track), 0.5, MatchSettings.defaults(),
                    0.9, false, ReadOptions.DEFAULTS, scope), new StageClock(StageClock.SILENT));
            CoverageReport report = audit.coverage();
            String what = file + ", " + track.getFileName();
            // Monaco's extract has highways tagged tunnel=yes (osmium tags-filter w/tunnel finds 68); Vienna's has none
            assertEquals(file.startsWith("monaco"), audit.warnings().stream().anyMatch(w -> w.contains("run in tunnels")),
                    what + ": the caution about tunnels");
            assertEquals(0, report.wrongWay(), what + ": wrong-way metres");
            assertEquals(0, report.count(CoverageStatus.MISSED) + report.count(CoverageStatus.PARTLY),
                    what + ": streets missed or partly covered");
            assertTrue(report.driven() >= 0.9995 * report.needed(), what + ": share of the scope driven");
            System.out.printf(Locale.ROOT, "%s: %.1f %% of the plan's scope, %d streets missed or partly, %d left out%n",
                    what, 100 * report.driven() / report.needed(),
                    report.count(CoverageStatus.MISSED) + report.count(CoverageStatus.PARTLY),
                    report.count(CoverageStatus.LEFT_OUT));
        }
    }
}
