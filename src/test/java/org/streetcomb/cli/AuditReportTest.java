package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/**
 * The report options on the audit command, on the bundled simulated drive of the demo town (invented data):
 * what the map's wrong-way layer adds up to, and bad report options and paths behaving as they do for plan.
 */
class AuditReportTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    private static final String DRIVE = "fixtures/demo/brackenford-drive.gpx";
    private static final Pattern DATA = Pattern.compile("<script type=\"application/json\" id=\"report-data\">(.*?)</script>",
            Pattern.DOTALL);

    @TempDir
    Path folder;

    @Test
    void wrongWayStretchesOnTheMapAddUpToTheSummarysWrongWayMetres() throws Exception {
        // the drive followed the two-way town; read its residential streets as one-way and some were driven against
        Path html = folder.resolve("wrong-way.html");
        Path png = folder.resolve("wrong-way.png");
        Run r = run("audit", DEMO, DRIVE, "--oneway-field=class", "--oneway-forward=residential", "--report",
                html.toString(), "--quicklook", png.toString(), "--quicklook-size", "800x600", "--json", "--quiet");
        assertEquals(ExitCode.OK, r.code, r.err);
        JsonNode summary = new ObjectMapper().readTree(r.out);
        double wrongWay = summary.at("/coverage/wrong_way_m").asDouble();
        assertTrue(wrongWay > 1000, r.out);
        Matcher m = DATA.matcher(Files.readString(html, StandardCharsets.UTF_8));
        assertTrue(m.find());
        JsonNode data = new ObjectMapper().readTree(m.group(1));
        double drawn = 0;
        int stretches = 0;
        for (JsonNode layer : data.get("layers")) {
            if (layer.get("id").asText().equals("wrong-way")) {
                for (JsonNode feature : layer.get("features")) {
                    stretches++;
                    for (JsonNode row : feature.get("d")) {
                        drawn += row.get(0).asText().equals("Length (m)") ? row.get(1).asDouble() : 0;
                    }
                }
            }
        }
        // each stretch's length is shown rounded to 0.1 m
        assertTrue(stretches > 0);
        assertEquals(wrongWay, drawn, 0.05 * stretches + 0.001);
        assertEquals(800, ImageIO.read(png.toFile()).getWidth());
        assertTrue(r.out.contains("\"picture_size\" : \"800x600\""), "the summary names the picture: " + r.out);
    }

    @Test
    void reportInAMissingFolderIsBadInputNamingTheFileAndNothingElseIsWritten() {
        Path html = folder.resolve("no-such-folder").resolve("audit.html");
        Path png = folder.resolve("audit.png");
        Run r = run("audit", DEMO, DRIVE, "--report", html.toString(), "--quicklook", png.toString(), "--quiet");
        assertEquals(ExitCode.BAD_INPUT, r.code);
        assertEquals(1, r.err.strip().lines().count(), r.err);
        assertTrue(r.err.contains(html.toString()), r.err);
        assertFalse(Files.exists(png), "no picture after the report failed");
        assertEquals("", r.out, "no summary after an error");
    }

    @Test
    void badPictureSizeIsACommandLineErrorBeforeAnyWork() {
        Path png = folder.resolve("audit.png");
        Path streets = folder.resolve("streets.geojson");
        Run r = run("audit", DEMO, DRIVE, "--quicklook", png.toString(), "--quicklook-size", "12x9000", "--streets-out",
                streets.toString());
        assertEquals(ExitCode.USAGE, r.code);
        assertTrue(r.err.contains("--quicklook-size must be WIDTHxHEIGHT from 200x150 to 8000x8000"), r.err);
        assertFalse(Files.exists(png));
        assertFalse(Files.exists(streets), "nothing is written when an option is wrong");
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
