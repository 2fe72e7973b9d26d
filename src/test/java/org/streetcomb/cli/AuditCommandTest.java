package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.ExternalTool;
import org.streetcomb.coverage.SimulatedDrive;
import org.streetcomb.network.Components;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.TourPlanner;

/**
 * The audit command end to end on a simulated drive of the demo town (invented data) that skips two known
 * streets, its outputs read back by GDAL, and bad tracks.
 */
class AuditCommandTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    /** The README's example drive: this simulation, bundled. */
    private static final String BUNDLED = "fixtures/demo/brackenford-drive.gpx";
    /** Harrow Close (a cul-de-sac with a turning head) and Sallow Lane (a through street). */
    private static final Set<String> SKIPPED = Set.of("bf-044", "bf-005");

    @TempDir
    static Path dir;
    static Path drive;
    static Path dayOne;
    static Path dayTwo;
    static Path untimed;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @BeforeAll
    static void simulateTheDrive() throws IOException {
        List<RoadFeature> lines = LayerReaders.read(Path.of(DEMO)).features();
        StreetNetwork driven = new NetworkBuilder(0.5).build(lines.stream().filter(f -> !SKIPPED.contains(f.id())).toList());
        int depot = NearestNode.of(driven, -31.2, 44.6).node();
        var tours = TourPlanner.tours(driven, Components.of(driven), UndirectedPostman.solve(driven), depot, false);
        List<TrackSegment> segments = SimulatedDrive.drive(driven, tours,
                new SimulatedDrive.Settings(20, 40, 1, 5, 10, 300, 2, 10), 7, SimulatedDrive.START);
        drive = dir.resolve("drive.gpx");
        SimulatedDrive.writeGpx(drive, segments, true);
        untimed = dir.resolve("untimed.gpx");
        SimulatedDrive.writeGpx(untimed, segments, false);
        // the same drive over two days: split the one segment in two files
        TrackSegment s = segments.get(0);
        int half = s.size() / 2;
        dayOne = dir.resolve("day1.gpx");
        dayTwo = dir.resolve("day2.gpx");
        SimulatedDrive.writeGpx(dayOne, List.of(slice(s, 0, half + 1)), true);
        SimulatedDrive.writeGpx(dayTwo, List.of(slice(s, half, s.size())), true);
    }

    private static TrackSegment slice(TrackSegment s, int from, int to) {
        return new TrackSegment(s.file(), s.place(), java.util.Arrays.copyOfRange(s.lon(), from, to),
                java.util.Arrays.copyOfRange(s.lat(), from, to), java.util.Arrays.copyOfRange(s.time(), from, to));
    }

    @Test
    void theBundledDemoDriveIsThisSimulation() throws IOException {
        Path bundled = Path.of(BUNDLED);
        if (System.getProperty("streetcomb.write-fixtures") != null) {
            Files.copy(drive, bundled, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        assertEquals(Files.readString(drive), Files.readString(bundled),
                "regenerate with: mvn -q test -Dtest=AuditCommandTest -Dstreetcomb.write-fixtures=1");
    }

    @Test
    void findsTheSkippedStreetsAndWritesLayersThatGdalReads() throws IOException, InterruptedException {
        Path streets = dir.resolve("streets.geojson");
        Path missed = dir.resolve("missed.geojson");
        Run r = run("audit", DEMO, BUNDLED, "--json", "--streets-out", streets.toString(),
                "--missed-out", missed.toString());
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode summary = new ObjectMapper().readTree(r.out());
        List<String> notCovered = new ArrayList<>();
        summary.at("/coverage/not_covered").forEach(n -> notCovered.add(n.get("feature_id").asText()));
        assertEquals(SKIPPED, Set.copyOf(notCovered), r.out());
        assertEquals(2, summary.at("/coverage/streets/missed").asInt(), r.out());

        // GDAL reads both layers: one feature per street line, one per missed part
        String streetInfo = ExternalTool.run("ogrinfo", "-ro", "-so", "-al", streets.toString());
        assertEquals(45, featureCount(streetInfo), streetInfo);
        String missedInfo = ExternalTool.run("ogrinfo", "-ro", "-so", "-al", missed.toString());
        assertEquals(summary.at("/coverage/missed_parts").asInt(), featureCount(missedInfo), missedInfo);
        // the missed parts add up to the summary's missed length (GDAL's own geodesic length, to 0.1 %)
        String length = ExternalTool.run("ogrinfo", "-ro", "-q", missed.toString(), "-dialect", "SQLite", "-sql",
                "SELECT SUM(ST_Length(geometry, 1)) AS m FROM missed");
        Matcher m = Pattern.compile("m \\(Real\\) = ([0-9.]+)").matcher(length);
        assertTrue(m.find(), length);
        assertEquals(summary.at("/coverage/missed_m").asDouble(), Double.parseDouble(m.group(1)),
                1e-3 * summary.at("/coverage/missed_m").asDouble());
        JsonNode written = new ObjectMapper().readTree(streets.toFile());
        for (JsonNode f : written.get("features")) {
            String id = f.at("/properties/feature_id").asText();
            assertEquals(SKIPPED.contains(id) ? "missed" : "covered", f.at("/properties/status").asText(), id);
        }
    }

    @Test
    void twoDaysInTwoFilesGiveTheSameCoverageAsOneAndSoDoesTheUntimedTrack() throws IOException {
        JsonNode one = new ObjectMapper().readTree(run("audit", DEMO, drive.toString(), "--json").out());
        JsonNode two = new ObjectMapper().readTree(run("audit", DEMO, dayOne.toString(), dayTwo.toString(), "--json").out());
        assertEquals(2, two.at("/tracks/files").size());
        assertEquals(one.at("/coverage/not_covered"), two.at("/coverage/not_covered"));
        assertEquals(one.at("/coverage/driven_m").asDouble(), two.at("/coverage/driven_m").asDouble(), 5.0);
        JsonNode noTimes = new ObjectMapper().readTree(run("audit", DEMO, untimed.toString(), "--json").out());
        assertEquals(one.at("/tracks/points"), noTimes.at("/tracks/untimed_points"));
        assertEquals(one.at("/coverage/not_covered").size(), noTimes.at("/coverage/not_covered").size());
    }

    @Test
    void theMopUpTourServicesTheMissedStreetsAndDrivingItCompletesTheRound() throws IOException, InterruptedException {
        Path mopUp = dir.resolve("mop-up.geojson");
        Path gpx = dir.resolve("mop-up.gpx");
        Run r = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--mop-up", mopUp.toString(),
                "--gpx", gpx.toString(), "--json");
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode summary = new ObjectMapper().readTree(r.out());
        assertTrue(summary.at("/mop_up/planned").asBoolean(), r.out());
        assertFalse(summary.at("/mop_up/open").asBoolean());
        // the tour services at least the skipped streets and no more than what the audit found missed
        double skippedLength = 0;
        for (JsonNode street : summary.at("/coverage/not_covered")) {
            skippedLength += street.get("needed_m").asDouble() - street.get("driven_m").asDouble();
        }
        double service = summary.at("/mop_up/service_m").asDouble();
        assertTrue(service >= 0.9 * skippedLength && service <= summary.at("/coverage/missed_m").asDouble(), r.out());
        // gpsbabel reads the GPX of the mop-up as a GPS unit would
        String babel = ExternalTool.run("gpsbabel", "-i", "gpx", "-f", gpx.toString(), "-x", "nuketypes,waypoints,routes",
                "-o", "csv", "-F", "-");
        assertEquals(summary.at("/mop_up/field/gpx/track_points").asInt(), babel.lines().filter(l -> !l.isBlank()).count());

        // drive the mop-up (simulated, like the first drive) and audit both drives: nothing is left
        var audit = org.streetcomb.plan.DriveAudit.run(new org.streetcomb.plan.AuditRequest(Path.of(DEMO),
                List.of(drive), 0.5, org.streetcomb.match.MatchSettings.defaults(), 0.9, false,
                org.streetcomb.read.ReadOptions.DEFAULTS), new org.streetcomb.timing.StageClock(org.streetcomb.timing.StageClock.SILENT));
        StreetNetwork network = audit.coverage().network();
        int depot = NearestNode.of(network, -31.2, 44.6).node();
        var planned = org.streetcomb.mopup.MopUpPlanner.plan(audit.coverage(), depot, depot, "demo");
        Path second = dir.resolve("mop-up-drive.gpx");
        SimulatedDrive.writeGpx(second, SimulatedDrive.drive(planned.network(), planned.tours(),
                new SimulatedDrive.Settings(20, 40, 1, 5, 10, 300, 2, 10), 8, SimulatedDrive.START + 86_400), true);
        Run after = run("audit", DEMO, drive.toString(), second.toString(), "--json", "--mop-up", dir.resolve("none.geojson").toString());
        JsonNode done = new ObjectMapper().readTree(after.out());
        assertEquals(0, done.at("/coverage/not_covered").size(), after.out());
        assertFalse(done.at("/mop_up/planned").asBoolean(), after.out());
        assertFalse(Files.exists(dir.resolve("none.geojson")), "no tour file when there is nothing to mop up");
    }

    @Test
    void aMopUpFromWhereTheCrewIsEndsAtTheDepotAndTheIdsFileFeedsThePlanner() throws IOException {
        Path ids = dir.resolve("ids.txt");
        // start at the far (north-east) end of the town
        Run r = run("audit", DEMO, drive.toString(), "--depot=-31.2,44.6", "--start=-31.183,44.6068",
                "--mop-up", dir.resolve("open.geojson").toString(), "--mop-up-ids", ids.toString(), "--json");
        assertEquals(ExitCode.OK, r.code(), r.err());
        JsonNode summary = new ObjectMapper().readTree(r.out());
        assertTrue(summary.at("/mop_up/open").asBoolean(), r.out());
        JsonNode tour = new ObjectMapper().readTree(dir.resolve("open.geojson").toFile()).at("/features/0/geometry/coordinates");
        assertEquals(-31.2, tour.get(tour.size() - 1).get(0).asDouble(), 1e-6, "ends at the depot");
        assertEquals(44.6, tour.get(tour.size() - 1).get(1).asDouble(), 1e-6);
        assertTrue(Math.abs(tour.get(0).get(0).asDouble() + 31.183) < 0.001, "starts where the crew is");

        assertEquals(Set.copyOf(SKIPPED), Set.copyOf(Files.readAllLines(ids).stream().filter(l -> !l.startsWith("#")).toList()));
        Run plan = run("plan", DEMO, "--depot=-31.2,44.6", "--service-ids", ids.toString(), "--json");
        assertEquals(ExitCode.OK, plan.code(), plan.err());
        JsonNode planned = new ObjectMapper().readTree(plan.out());
        // whole streets: the planner services the full length of both skipped streets
        double skippedLength = 0;
        for (JsonNode street : summary.at("/coverage/not_covered")) {
            skippedLength += street.get("needed_m").asDouble();
        }
        assertEquals(skippedLength, planned.at("/totals/service_m").asDouble(), 0.01, plan.out());
    }

    @Test
    void aTrackFarFromTheLayerIsRefusedWithOneLine() {
        // a real car drive in Istria (gpxpy test data) against the invented town in the Atlantic
        Path streets = dir.resolve("far-streets.geojson");
        Run r = run("audit", DEMO, "fixtures/gpx/around-visnjan-with-car.gpx", "--streets-out", streets.toString());
        assertEquals(ExitCode.BAD_INPUT, r.code());
        assertTrue(r.err().contains("no track point could be placed on a street of brackenford.geojson"), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertFalse(Files.exists(streets), "no output after an error");
    }

    @Test
    void tracksFarApartAreEachPlacedByName() {
        // two real drives (gpxpy test data: Istria, Croatia, and the Cerknica lake, Slovenia) about 60 km
        // apart: the message gives each file's place, never their midpoint, where neither drive was
        Run r = run("audit", DEMO, "fixtures/gpx/around-visnjan-with-car.gpx", "fixtures/gpx/cerknicko-jezero.gpx");
        assertEquals(ExitCode.BAD_INPUT, r.code());
        assertTrue(r.err().contains("around-visnjan-with-car.gpx 13.7"), r.err());
        assertTrue(r.err().contains("cerknicko-jezero.gpx 14.3"), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
    }

    /**
     * Tracks on a street that show no drive get a message that says why, never "no point lies within 50 m":
     * a receiver standing still, a clock running backwards, a single fix. Each names the file (hostile
     * corpus, issue 14; the fixes lie on Tallow Street's first vertex and along it, invented demo data).
     */
    @Test
    void tracksThatShowNoDriveAreToldTruthfully() throws IOException {
        double[] from = {-31.2, 44.6};
        double[] to = {-31.19, 44.6};
        StringBuilder still = new StringBuilder();
        StringBuilder backwards = new StringBuilder();
        for (int i = 0; i < 60; i++) {
            still.append(fix(from[0], from[1], i));
            backwards.append(fix(from[0] + (to[0] - from[0]) * i / 59, from[1], 59 - i));
        }
        String[][] cases = {
            {"still.gpx", still.toString(), "59 lie within half a sigma of the fix before"},
            {"backwards.gpx", backwards.toString(), "59 have a time that does not move forward"},
            {"single.gpx", fix(from[0], from[1], 0), "a single point is too few"}};
        for (String[] c : cases) {
            Path gpx = dir.resolve(c[0]);
            Files.writeString(gpx, "<?xml version=\"1.0\"?><gpx version=\"1.1\" creator=\"test\" "
                    + "xmlns=\"http://www.topografix.com/GPX/1/1\"><trk><trkseg>" + c[1] + "</trkseg></trk></gpx>");
            Run r = run("audit", DEMO, gpx.toString());
            assertEquals(ExitCode.BAD_INPUT, r.code(), r.err());
            assertTrue(r.err().startsWith("streetcomb: " + c[0] + ": no drive along a street"), r.err());
            assertTrue(r.err().contains(c[2]), r.err());
            assertFalse(r.err().contains("within 50 m"), r.err());
            assertEquals(1, r.err().lines().count(), r.err());
        }
    }

    private static String fix(double lon, double lat, int minute) {
        return String.format(java.util.Locale.ROOT, "<trkpt lat=\"%.7f\" lon=\"%.7f\"><time>2026-01-01T10:%02d:00Z</time></trkpt>",
                lat, lon, minute);
    }

    @Test
    void aGpxWithADoctypeIsRefusedAndNothingIsWritten() throws IOException {
        Path bad = dir.resolve("entity.gpx");
        Files.writeString(bad, "<?xml version=\"1.0\"?>\n<!DOCTYPE gpx [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>\n"
                + "<gpx><trk><name>&x;</name></trk></gpx>\n");
        Path streets = dir.resolve("doctype-streets.geojson");
        Run r = run("audit", DEMO, drive.toString(), bad.toString(), "--streets-out", streets.toString());
        assertEquals(ExitCode.BAD_INPUT, r.code());
        assertEquals("streetcomb: " + bad + ": line 2: the file declares a DOCTYPE: refused, GPX needs none "
                + "(entities could read local files)", r.err().strip());
        assertFalse(Files.exists(streets));
    }

    @Test
    void emptyTracksAndBadOptionsAreRefused() throws IOException {
        Path empty = dir.resolve("empty.gpx");
        Files.writeString(empty, "");
        Run e = run("audit", DEMO, empty.toString());
        assertEquals(ExitCode.BAD_INPUT, e.code());
        assertTrue(e.err().contains("empty file"), e.err());
        Path noPoints = dir.resolve("nopoints.gpx");
        Files.writeString(noPoints, "<gpx version=\"1.1\"><trk><trkseg/></trk></gpx>");
        Run n = run("audit", DEMO, noPoints.toString());
        assertEquals(ExitCode.BAD_INPUT, n.code());
        assertTrue(n.err().contains("no track points"), n.err());
        assertEquals(ExitCode.USAGE, run("audit", DEMO, drive.toString(), "--covered-at", "1.5").code());
        assertEquals(ExitCode.USAGE, run("audit", DEMO, drive.toString(), "--gps-sigma", "0").code());
        Run odds = run("audit", DEMO, drive.toString(), "--doubt-odds", "0.5");
        assertEquals(ExitCode.USAGE, odds.code());
        assertTrue(odds.err().contains("--doubt-odds must be 1 or more"), odds.err());
        // a usage mistake is named in one line with a pointer to the help, not the whole option list (common practice)
        assertEquals(2, odds.err().strip().lines().count(), odds.err());
        assertTrue(odds.err().contains("streetcomb audit --help"), odds.err());
        assertEquals(ExitCode.USAGE, run("audit", DEMO).code());
    }

    private static int featureCount(String ogrinfo) {
        Matcher m = Pattern.compile("Feature Count: (\\d+)").matcher(ogrinfo);
        assertTrue(m.find(), ogrinfo);
        return Integer.parseInt(m.group(1));
    }
}
