package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/** The report options on the plan command: bad values fail before any work, files land where asked. */
class ReportOptionsTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";

    @TempDir
    Path folder;

    @Test
    void pictureHasTheSizeAskedForAndTheSummaryNamesBothFiles() throws Exception {
        Path png = folder.resolve("plan.png");
        Path html = folder.resolve("plan.html");
        Run run = run("plan", DEMO, "--depot=-31.2,44.6", "--quicklook", png.toString(), "--quicklook-size", "640x480",
                "--report", html.toString());
        assertEquals(ExitCode.OK, run.code, run.err);
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(640, image.getWidth());
        assertEquals(480, image.getHeight());
        assertTrue(run.out.contains("Report    " + html), run.out);
        assertTrue(run.out.contains("Picture   " + png + " (640x480 pixels)"), run.out);
        String page = Files.readString(html);
        assertTrue(page.contains("data-key=\"report.picture_size\">640x480<"), "the page's summary has the report section");
    }

    @Test
    void badPictureSizeIsACommandLineErrorAndWritesNothing() {
        Path png = folder.resolve("plan.png");
        Run run = run("plan", DEMO, "--quicklook", png.toString(), "--quicklook-size", "12x9000");
        assertEquals(ExitCode.USAGE, run.code);
        assertTrue(run.err.contains("--quicklook-size must be WIDTHxHEIGHT from 200x150 to 8000x8000"), run.err);
        assertFalse(Files.exists(png));
    }

    @Test
    void basemapMustBeAnHttpTileTemplate() {
        Run run = run("plan", DEMO, "--report", folder.resolve("r.html").toString(), "--basemap", "file:///etc/{z}/{x}/{y}");
        assertEquals(ExitCode.USAGE, run.code);
        assertTrue(run.err.contains("--basemap"), run.err);
        Run noPlaceholders = run("plan", DEMO, "--report", folder.resolve("r.html").toString(), "--basemap",
                "https://tiles.example.org/tile.png");
        assertEquals(ExitCode.USAGE, noPlaceholders.code);
        assertTrue(noPlaceholders.err.contains("{z}, {x} and {y}"), noPlaceholders.err);
    }

    @Test
    void reportInAMissingFolderIsBadInputNamingTheFile() {
        Path html = folder.resolve("no-such-folder").resolve("r.html");
        Run run = run("plan", DEMO, "--depot=-31.2,44.6", "--report", html.toString());
        assertEquals(ExitCode.BAD_INPUT, run.code);
        assertTrue(run.err.contains(html.toString()), run.err);
        assertFalse(run.err.contains("\tat "), "no stack trace: " + run.err);
    }

    /**
     * Reproducible outputs (issue 14): the same inputs and options give the same report and picture byte for
     * byte, for each command that draws one; stage times stay in the printed summary and --json only.
     */
    @Test
    void theSameRunGivesTheSameReportByteForByte() throws Exception {
        String[][] commands = {
            {"plan", DEMO, "--depot=-31.2,44.6", "--max-trip-km", "12", "-q"},
            {"audit", DEMO, "fixtures/demo/brackenford-drive.gpx", "--depot=-31.2,44.6", "--mop-up",
                folder.resolve("mop-up.geojson").toString(), "-q"},
            {"health", DEMO, "-q"}};
        for (String[] command : commands) {
            byte[][] first = null;
            for (int run = 0; run < 2; run++) {
                Path html = folder.resolve(command[0] + ".html");
                Path png = folder.resolve(command[0] + ".png");
                String[] args = java.util.stream.Stream.concat(java.util.Arrays.stream(command),
                        java.util.stream.Stream.of("--report", html.toString(), "--quicklook", png.toString()))
                        .toArray(String[]::new);
                Run r = run(args);
                assertTrue(r.code == ExitCode.OK || r.code == ExitCode.NO_TOUR, r.err);
                byte[][] written = {Files.readAllBytes(html), Files.readAllBytes(png)};
                if (first == null) {
                    first = written;
                    Files.delete(html);
                    Files.delete(png);
                } else {
                    org.junit.jupiter.api.Assertions.assertArrayEquals(first[0], written[0], command[0] + " report");
                    org.junit.jupiter.api.Assertions.assertArrayEquals(first[1], written[1], command[0] + " picture");
                    assertFalse(new String(written[0], java.nio.charset.StandardCharsets.UTF_8).contains("seconds."),
                            "no stage times in the report");
                }
            }
        }
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    private record Run(int code, String out, String err) {
    }
}
