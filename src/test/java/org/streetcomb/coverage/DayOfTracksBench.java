package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;
import org.streetcomb.plan.Audit;
import org.streetcomb.plan.AuditRequest;
import org.streetcomb.plan.DriveAudit;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.streetcomb.network.Components;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.GpxTrackReader;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * Benchmark, not a unit test (run it on purpose, see docs/benchmarks.md): the audit of a day of tracks, a
 * simulated 8 h drive at one fix per second round the demo town (invented data), timed against streaming
 * the same GPX file through the reader alone in the same run.
 */
class DayOfTracksBench {

    @Test
    @EnabledIfSystemProperty(named = "streetcomb.bench", matches = ".+")
    void auditADayOfTracks() throws IOException {
        Path layer = Path.of("fixtures/demo/brackenford.geojson");
        StreetNetwork network = new NetworkBuilder(0.5).build(LayerReaders.read(layer).features());
        int depot = NearestNode.of(network, -31.2, 44.6).node();
        List<Tour> tour = TourPlanner.tours(network, Components.of(network), UndirectedPostman.solve(network), depot, false);
        List<Tour> day = new ArrayList<>(Collections.nCopies(7, tour.get(0)));
        // 7 rounds of 37 km at 20-40 km/h: about 8.5 hours; one fix a second
        List<TrackSegment> segments = SimulatedDrive.drive(network, day,
                new SimulatedDrive.Settings(20, 40, 1, 1, 10, 300, 2, 10), 1, SimulatedDrive.START);
        Path dir = Files.createDirectories(Path.of("target/bench"));
        Path gpx = dir.resolve("day-of-tracks.gpx");
        SimulatedDrive.writeGpx(gpx, segments, true);
        int fixes = segments.stream().mapToInt(TrackSegment::size).sum();
        double hours = segments.stream().mapToDouble(s -> s.time()[s.size() - 1] - s.time()[0]).sum() / 3600;

        int[] read = {0};
        new GpxTrackReader().read(gpx, s -> read[0] += s.size());
        read[0] = 0;
        long t0 = System.nanoTime();
        // the second pass is timed, so both runs are measured with the reader compiled
        new GpxTrackReader().read(gpx, s -> read[0] += s.size());
        double readSeconds = (System.nanoTime() - t0) / 1e9;

        long t1 = System.nanoTime();
        Audit audit = DriveAudit.run(new AuditRequest(layer, List.of(gpx), 0.5, MatchSettings.defaults(), 0.9, false,
                ReadOptions.DEFAULTS), new StageClock(StageClock.SILENT));
        double auditSeconds = (System.nanoTime() - t1) / 1e9;
        String line = String.format(Locale.ROOT, "day of tracks: %d fixes over %.1f h, %.1f MB of GPX; reading alone %.2f s; "
                + "audit %.2f s (%.1f x reading); %.1f %% of the town covered", fixes, hours, Files.size(gpx) / 1e6,
                readSeconds, auditSeconds, auditSeconds / readSeconds,
                100 * audit.coverage().driven() / audit.coverage().needed());
        System.out.println(line);
        Files.writeString(dir.resolve("day-of-tracks.txt"), line + "\n");
        assertTrue(read[0] == fixes && audit.coverage().driven() > 0);
    }
}
