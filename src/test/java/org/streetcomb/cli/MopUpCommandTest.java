package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.streetcomb.ExitCode;
import org.streetcomb.plan.Audit;
import org.streetcomb.plan.AuditRequest;
import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.plan.DriveAudit;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.MissedPart;
import org.streetcomb.mopup.MopUpPlanner;
import org.streetcomb.coverage.SimulatedDrive;
import org.streetcomb.network.Components;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.TourPlanner;

/**
 * The mop-up of a simulated drive of the demo town (invented data) in which the crew skipped two streets,
 * turned back 400 m short of the end of Ferrule Street, and stopped recording half way along Orchard Ring's
 * long south-east arc, near the end of the round: it services the missed stretches rather than whole
 * streets, from where the crew is or in shift-sized trips from the depot, and driving it completes the round.
 */
class MopUpCommandTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    /** Linnet Close (a cul-de-sac) and Cobbler's Row's short end; Ferrule Street is driven only in part. */
    private static final Set<String> SKIPPED = Set.of("bf-036", "bf-008");
    private static final String TRUNCATED = "bf-010";
    private static final double DRIVEN_SHARE = 0.6;
    /** Where the recording stops: the middle of Orchard Ring's 1.2 km arc between junctions. */
    private static final double[] STOPPED_AT = {-31.1834067, 44.5994968};
    private static final SimulatedDrive.Settings DRIVE = new SimulatedDrive.Settings(20, 40, 1, 5, 10, 300, 2, 10);

    @TempDir
    static Path dir;
    static Path drive;

    static AuditCommandTest.Run run(String... args) {
        return AuditCommandTest.run(args);
    }

    @BeforeAll
    static void simulateTheDrive() throws IOException {
        List<RoadFeature> driven = new ArrayList<>();
        for (RoadFeature f : LayerReaders.read(Path.of(DEMO)).features()) {
            if (f.id().equals(TRUNCATED)) {
                LengthIndexedLine line = new LengthIndexedLine(f.line());
                driven.add(new RoadFeature(f.id(), f.name(), (LineString) line.extractLine(0, DRIVEN_SHARE * f.line().getLength()),
                        f.travel(), f.required(), f.properties()));
            } else if (!SKIPPED.contains(f.id())) {
                driven.add(f);
            }
        }
        StreetNetwork network = new NetworkBuilder(0.5).build(driven);
        int depot = NearestNode.of(network, -31.2, 44.6).node();
        var tours = TourPlanner.tours(network, Components.of(network), UndirectedPostman.solve(network), depot, false);
        drive = dir.resolve("drive.gpx");
        List<TrackSegment> segments = SimulatedDrive.drive(network, tours, DRIVE, 11, SimulatedDrive.START);
        SimulatedDrive.writeGpx(drive, List.of(stoppedAt(segments.get(0), STOPPED_AT[0], STOPPED_AT[1])), true);
    }

    /** The segment up to its fix nearest the given point: the recording stops there, part of the way along a street. */
    private static TrackSegment stoppedAt(TrackSegment s, double lon, double lat) {
        int n = 0;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < s.size(); i++) {
            double d = GeodesicLength.between(lon, lat, s.lon()[i], s.lat()[i]);
            if (d < best) {
                best = d;
                n = i + 1;
            }
        }
        return new TrackSegment(s.file(), s.place(), Arrays.copyOf(s.lon(), n), Arrays.copyOf(s.lat(), n),
                Arrays.copyOf(s.time(), n));
    }

    private static Audit audit(Path... tracks) {
        return DriveAudit.run(new AuditRequest(Path.of(DEMO), List.of(tracks), 0.5, MatchSettings.defaults(), 0.9, false,
                ReadOptions.DEFAULTS), new StageClock(StageClock.SILENT));
    }

    /** Metres missed on the edges flagged for mop-up, from the audit's own list of missed parts. */
    private static double missedOnFlaggedEdges(CoverageReport report) {
        return report.missed().stream().filter(p -> report.mopUp()[p.edge()]).mapToDouble(MissedPart::length).sum();
    }

    /** Metres of the flagged edges themselves: what a mop-up of whole edges services. */
    private static double flaggedEdges(CoverageReport report) {
        double sum = 0;
        for (int e = 0; e < report.network().edgeCount(); e++) {
            sum += report.mopUp()[e] ? report.network().length(e) : 0;
        }
        return sum;
    }

    @Test
    void theMopUpServicesTheMissedStretchesAndDrivingItLeavesNothingMissed() throws IOException {
        Path mopUp = dir.resolve("mop-up.geojson");
        Path sheet = dir.resolve("mop-up.csv");
        AuditCommandTest.Run r = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--mop-up", mopUp.toString(),
                "--directions", sheet.toString(), "--json");
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode summary = new ObjectMapper().readTree(r.out());
        List<String> notCovered = new ArrayList<>();
        summary.at("/coverage/not_covered").forEach(n -> notCovered.add(n.get("feature_id").asText()));
        assertTrue(notCovered.containsAll(Set.of("bf-036", "bf-008", TRUNCATED)), r.out());

        Audit first = audit(drive);
        CoverageReport report = first.coverage();
        double missed = missedOnFlaggedEdges(report);
        double service = summary.at("/mop_up/service_m").asDouble();
        // the service is the missed stretches, plus at most one merge gap per missed part for driven slivers
        long parts = report.missed().stream().filter(p -> report.mopUp()[p.edge()]).count();
        assertTrue(service >= missed - 0.01 && service <= missed + parts * 20, service + " vs missed " + missed);
        assertTrue(service < flaggedEdges(report) - 300, "less than servicing the flagged edges whole, Orchard Ring's "
                + "driven half among them: " + service + " vs " + flaggedEdges(report));

        // the tour's steps and the sheet tell service from deadhead per stretch, and where on Ferrule Street service starts
        JsonNode features = new ObjectMapper().readTree(mopUp.toFile()).get("features");
        double stepService = 0;
        boolean ferruleService = false;
        for (int i = 1; i < features.size(); i++) {
            JsonNode p = features.get(i).get("properties");
            if (p.get("pass").asText().equals("service")) {
                stepService += p.get("length_m").asDouble();
                ferruleService |= p.get("feature_id").asText().equals(TRUNCATED);
            }
        }
        assertEquals(service, stepService, 0.01);
        assertTrue(ferruleService, "Ferrule Street's missed end is serviced");
        String csv = Files.readString(sheet);
        assertTrue(java.util.regex.Pattern.compile("(Start|Stop) service \\d+ m along Orchard Ring").matcher(csv).find(), csv);

        // drive the mop-up (simulated like the first drive) and audit both drives: nothing is left
        int depot = NearestNode.of(report.network(), -31.2, 44.6).node();
        MopUpPlanner.MopUp planned = MopUpPlanner.plan(report, depot, depot, "demo");
        Path second = dir.resolve("mop-up-drive.gpx");
        SimulatedDrive.writeGpx(second, SimulatedDrive.drive(planned.network(), planned.tours(), DRIVE, 12,
                SimulatedDrive.START + 86_400), true);
        Audit after = audit(drive, second);
        var t = planned.tours().get(0); var pn = planned.network();
        assertEquals(0, after.coverage().streets().stream()
                .filter(s -> s.status() != org.streetcomb.coverage.CoverageStatus.COVERED
                        && s.status() != org.streetcomb.coverage.CoverageStatus.NOT_REQUIRED).count());
        assertEquals(null, MopUpPlanner.plan(after.coverage(), depot, depot, "demo"), "nothing left to mop up");
    }

    @Test
    void anOpenMopUpStartsNearestTheCrewAndEndsAtTheDepot() throws IOException {
        Path open = dir.resolve("open.geojson");
        Path sheet = dir.resolve("open.csv");
        AuditCommandTest.Run r = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--start=-31.183,44.6068",
                "--mop-up", open.toString(), "--directions", sheet.toString(), "--json");
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode summary = new ObjectMapper().readTree(r.out());
        assertTrue(summary.at("/mop_up/open").asBoolean());
        StreetNetwork network = audit(drive).coverage().network();
        NearestNode.Hit crew = NearestNode.of(network, -31.183, 44.6068);
        JsonNode line = new ObjectMapper().readTree(open.toFile()).at("/features/0/geometry/coordinates");
        assertEquals(network.lon(crew.node()), line.get(0).get(0).asDouble(), 1e-7, "starts at the node nearest the crew");
        assertEquals(network.lat(crew.node()), line.get(0).get(1).asDouble(), 1e-7);
        assertEquals(-31.2, line.get(line.size() - 1).get(0).asDouble(), 1e-6, "ends at the depot");
        assertEquals(44.6, line.get(line.size() - 1).get(1).asDouble(), 1e-6);
        CoverageReport report = audit(drive).coverage();
        assertTrue(summary.at("/mop_up/service_m").asDouble() >= missedOnFlaggedEdges(report) - 0.01, r.out());
        List<String> rows = Files.readAllLines(sheet);
        assertTrue(rows.get(rows.size() - 1).contains("Arrive at the end of the route"), rows.get(rows.size() - 1));
    }

    @Test
    void shiftSizedTripsEachLeaveAndReturnToTheDepotAndTogetherServiceEverything() throws IOException {
        JsonNode whole = new ObjectMapper().readTree(run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6",
                "--mop-up", dir.resolve("whole.geojson").toString(), "--json").out());
        Path trips = dir.resolve("trips.geojson");
        double limitKm = Math.ceil(whole.at("/mop_up/length_m").asDouble() / 1000 / 2);
        AuditCommandTest.Run r = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--mop-up", trips.toString(),
                "--max-trip-km", Double.toString(limitKm), "--json");
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode features = new ObjectMapper().readTree(trips.toFile()).get("features");
        double service = 0;
        int count = 0;
        for (JsonNode f : features) {
            if (!f.at("/properties/step").isMissingNode()) {
                continue;
            }
            count++;
            JsonNode line = f.at("/geometry/coordinates");
            for (JsonNode end : List.of(line.get(0), line.get(line.size() - 1))) {
                assertEquals(-31.2, end.get(0).asDouble(), 1e-6, "each trip starts and ends at the depot");
                assertEquals(44.6, end.get(1).asDouble(), 1e-6);
            }
            service += f.at("/properties/service_m").asDouble();
        }
        assertTrue(count >= 2, r.out());
        assertEquals(whole.at("/mop_up/service_m").asDouble(), service, 0.01, "the trips service what the single tour does");

        // a crew that may turn back where a stretch ends mid-street drives no farther and services the same
        JsonNode turning = new ObjectMapper().readTree(run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6",
                "--mop-up", dir.resolve("turning.geojson").toString(), "--mop-up-turn-back", "--json").out());
        assertTrue(turning.at("/mop_up/length_m").asDouble() <= whole.at("/mop_up/length_m").asDouble() + 0.01);
        assertEquals(whole.at("/mop_up/service_m").asDouble(), turning.at("/mop_up/service_m").asDouble(), 0.01);

        AuditCommandTest.Run refused = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--start=-31.183,44.6068",
                "--mop-up", dir.resolve("refused.geojson").toString(), "--max-trip-km", "5");
        assertEquals(ExitCode.USAGE, refused.code());
        assertTrue(refused.err().contains("--start cannot be combined with the trip options"), refused.err());
        assertFalse(Files.exists(dir.resolve("refused.geojson")));
    }
}
