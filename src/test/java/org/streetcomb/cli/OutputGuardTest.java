package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.FolderHashes;

/**
 * Outputs never touch inputs: a command line whose output names an input (or a file that comes with one, such
 * as a shapefile's .dbf), another output, a symbolic link or a pipe is refused in one line with exit 2 before
 * anything is read or written, and every file in the folder is left byte for byte as it was.
 */
class OutputGuardTest {

    private static final Path DEMO = Path.of("fixtures/demo/brackenford.geojson");
    private static final Path DRIVE = Path.of("fixtures/demo/brackenford-drive.gpx");
    private static final Path MESA = Path.of("fixtures/shapefiles/mesa-az-stateplane-ft");

    @TempDir
    Path dir;
    Path roads;

    @BeforeEach
    void copyInputs() throws IOException {
        roads = dir.resolve("roads.geojson");
        Files.copy(DEMO, roads);
        Files.copy(DRIVE, dir.resolve("drive.gpx"));
        for (String ext : new String[] {".shp", ".shx", ".dbf", ".prj"}) {
            Files.copy(MESA.resolve("streets" + ext), dir.resolve("streets" + ext));
        }
    }

    /** Runs the command and checks the refusal: exit 2, one line holding every expected part, nothing changed. */
    private void assertClash(List<String> args, String... expected) throws IOException {
        Map<String, String> before = hashes();
        StringWriter err = new StringWriter();
        int code = Main.run(args.toArray(new String[0]), new PrintWriter(new StringWriter()), new PrintWriter(err, true));
        String message = err.toString();
        assertEquals(ExitCode.USAGE, code, message);
        assertEquals(1, message.lines().count(), message);
        for (String part : expected) {
            assertTrue(message.contains(part), () -> "expected '" + part + "' in: " + message);
        }
        assertEquals(before, hashes(), "a file in the folder was written, changed or removed");
    }

    private Map<String, String> hashes() {
        return FolderHashes.of(dir);
    }

    private String at(String name) {
        return dir.resolve(name).toString();
    }

    @Test
    void planOutIsTheInput() throws IOException {
        assertClash(List.of("plan", roads.toString(), "--out=" + roads), "--out would write over", "roads.geojson",
                "LAYER reads");
    }

    @Test
    void planOutIsTheInputByAnotherPath() throws IOException {
        // the same file through "sub/../" and through a hard link
        Files.createDirectory(dir.resolve("sub"));
        assertClash(List.of("plan", roads.toString(), "--out=" + dir.resolve("sub/../roads.geojson")), "LAYER reads");
        Path linked = dir.resolve("sub/linked.geojson");
        Files.createLink(linked, roads);
        assertClash(List.of("plan", roads.toString(), "--gpx=" + linked), "--gpx would write over", "LAYER reads");
    }

    @Test
    void outIsAShapefilesTable() throws IOException {
        assertClash(List.of("plan", at("streets.shp"), "--out=" + at("streets.dbf")), "--out would write over",
                "streets.dbf", "reads as part of streets.shp");
        assertClash(List.of("plan", at("streets.shp"), "--report=" + at("streets.prj")), "--report", "streets.prj");
        // a .cpg that does not exist yet would be read by the next run as the table's character set
        assertClash(List.of("plan", at("streets.shp"), "--directions=" + at("streets.cpg")), "--directions", "streets.cpg");
    }

    @Test
    void reportAtTheInput() throws IOException {
        assertClash(List.of("plan", roads.toString(), "--report=" + roads), "--report would write over", "LAYER reads");
        assertClash(List.of("health", roads.toString(), "--out=" + roads), "--out would write over", "LAYER reads");
    }

    @Test
    void auditGpxIsTheTrack() throws IOException {
        assertClash(List.of("audit", roads.toString(), at("drive.gpx"), "--mop-up=" + at("m.geojson"), "--gpx=" + at("drive.gpx")),
                "--gpx would write over", "drive.gpx", "TRACK reads");
        assertClash(List.of("audit", roads.toString(), at("drive.gpx"), "--mop-up-ids=" + roads), "--mop-up-ids", "LAYER reads");
    }

    @Test
    void twoOutputsNameOneFile() throws IOException {
        assertClash(List.of("plan", roads.toString(), "--out=" + at("x"), "--gpx=" + at("x")), "--out and --gpx both write");
        // with several vehicles --gpx tour.gpx writes tour-vehicle-1.gpx, the file --kml names
        assertClash(List.of("plan", roads.toString(), "--gpx=" + at("tour.gpx"), "--kml=" + at("tour-vehicle-1.gpx")),
                "--gpx and --kml both write");
    }

    @Test
    void inputNamedLikeAPerVehicleOutput() throws IOException {
        Files.copy(DEMO, dir.resolve("tour-vehicle-2.geojson"));
        assertClash(List.of("plan", at("tour-vehicle-2.geojson"), "--out=" + at("tour.geojson")), "--out would write over",
                "tour-vehicle-2.geojson");
    }

    @Test
    void crsFileIsAnInput() throws IOException {
        assertClash(List.of("plan", at("streets.shp"), "--crs=" + at("streets.prj"), "--out=" + at("streets.prj")),
                "--out would write over", "streets.prj");
    }

    @Test
    void districtsFolderHoldingAnInput() throws IOException {
        Path out = Files.createDirectory(dir.resolve("areas-out"));
        Path old = Files.createDirectory(out.resolve("001-north"));
        Files.copy(DEMO, old.resolve("tour.geojson"));
        assertClash(List.of("districts", old.resolve("tour.geojson").toString(), roads.toString(), "--out=" + out),
                "--out would write over", "ROADS reads");
        Files.copy(DEMO, out.resolve("summary.csv"));
        assertClash(List.of("districts", roads.toString(), out.resolve("summary.csv").toString(), "--out=" + out),
                "--out would write over", "summary.csv", "AREAS reads");
        assertClash(List.of("districts", roads.toString(), roads.toString(), "--out=" + roads), "is not a folder");
    }

    @Test
    void outAtASymbolicLinkIsRefusedAndLeftALink() throws IOException {
        Path target = dir.resolve("elsewhere.geojson");
        Files.writeString(target, "{}");
        Path link = Files.createSymbolicLink(dir.resolve("link.geojson"), target);
        assertClash(List.of("plan", roads.toString(), "--out=" + link), "--out", "is a symbolic link");
        assertTrue(Files.isSymbolicLink(link));
    }

    @Test
    void outAtAPipeIsRefused() throws Exception {
        Path fifo = dir.resolve("pipe.geojson");
        Process mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assertEquals(0, mkfifo.waitFor(), "mkfifo (coreutils) is needed for this case");
        assertClash(List.of("plan", roads.toString(), "--out=" + fifo), "--out", "is not a plain file (a pipe or device)");
        assertClash(List.of("plan", roads.toString(), "--out=" + dir), "--out", "is not a plain file (a folder)");
    }

    @Test
    void missingReportFolderLeavesNoOtherOutput() throws IOException {
        // the GeoJSON, GPX, KML and CSV were once written before the missing folder was found
        Map<String, String> before = hashes();
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"plan", roads.toString(), "--out=" + at("t.geojson"), "--gpx=" + at("t.gpx"),
            "--kml=" + at("t.kml"), "--directions=" + at("t.csv"), "--report=" + at("missing/r.html")},
                new PrintWriter(new StringWriter()), new PrintWriter(err, true));
        assertEquals(ExitCode.BAD_INPUT, code, err.toString());
        assertEquals(1, err.toString().lines().count(), err.toString());
        assertTrue(err.toString().contains("r.html: cannot write: folder " + at("missing") + " does not exist (given as --report)"),
                err.toString());
        assertEquals(before, hashes());
    }

    @Test
    void outputsBesideTheInputArePlanned() throws IOException {
        StringWriter err = new StringWriter();
        List<String> args = new ArrayList<>(List.of("plan", roads.toString(), "--out=" + at("tour.geojson"),
                "--gpx=" + at("tour.gpx")));
        int code = Main.run(args.toArray(new String[0]), new PrintWriter(new StringWriter()), new PrintWriter(err, true));
        assertEquals(ExitCode.OK, code, err.toString());
        assertTrue(Files.size(dir.resolve("tour.gpx")) > 0);
        assertFalse(err.toString().contains("would write over"));
        assertArrayEquals(Files.readAllBytes(DEMO), Files.readAllBytes(roads));
    }
}
