package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.ExternalTool;

/**
 * Text that travels is made safe: a street name holding a spreadsheet formula and a control character, in a
 * file whose name holds a terminal escape sequence (the demo town, invented data, altered by the test).
 */
class HostileTextTest {

    private static final String FORMULA = "=HYPERLINK(\"http://example.invalid\",\"click\")";
    private static final String ESCAPE = "\u001b]0;owned\u0007";

    @TempDir
    Path dir;

    private Path hostileLayer() throws Exception {
        String demo = Files.readString(Path.of("fixtures/demo/brackenford.geojson"));
        String json = FORMULA.replace("\"", "\\\"") + "\\u0001 Street";
        assertTrue(demo.contains("\"Tallow Street\""));
        Path layer = dir.resolve("roads" + ESCAPE + ".geojson");
        Files.writeString(layer, demo.replace("\"Tallow Street\"", "\"" + json + "\""));
        return layer;
    }

    private String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    @Test
    void outputsStayValidAndInert() throws Exception {
        Path layer = hostileLayer();
        String[] result = run("plan", layer.toString(), "--gpx=" + dir.resolve("t.gpx"), "--gpx-routes",
                "--kml=" + dir.resolve("t.kml"), "--directions=" + dir.resolve("t.csv"), "--report=" + dir.resolve("r.html"));
        assertEquals(String.valueOf(ExitCode.OK), result[0], result[2]);

        // XML 1.0 section 2.2 (the Char production): no U+0001 may appear; gpsbabel (expat) refuses the GPX
        // otherwise, and GDAL's ogrinfo reads the KML back
        for (String file : new String[] {"t.gpx", "t.kml", "r.html"}) {
            String text = Files.readString(dir.resolve(file), StandardCharsets.UTF_8);
            assertFalse(text.contains("\u0001"), file);
        }
        assertTrue(Files.readString(dir.resolve("t.gpx")).contains("HYPERLINK"), "the name itself is kept");
        ExternalTool.run("gpsbabel", "-i", "gpx", "-f", dir.resolve("t.gpx").toString(), "-o", "csv", "-F", "-");
        ExternalTool.run("ogrinfo", "-ro", "-q", dir.resolve("t.kml").toString());

        // OWASP CSV injection guidance: a cell starting with = is prefixed with a single quote
        String csv = Files.readString(dir.resolve("t.csv"));
        assertTrue(csv.contains(",\"'=HYPERLINK("), csv.lines().filter(l -> l.contains("HYPERLINK")).findFirst().orElse(csv));
        assertFalse(csv.contains(",\"=HYPERLINK(") || csv.contains(",=HYPERLINK("));

        // the terminal sees the escape sequence spelled out, not acted on
        for (String printed : new String[] {result[1], result[2]}) {
            assertFalse(printed.contains("\u001b") || printed.contains("\u0007"), printed);
        }
        assertTrue(result[1].contains("roads\\x1B]0;owned\\x07.geojson"), result[1]);
    }

    @Test
    void healthPrintsNoEscapeSequence() throws Exception {
        Path layer = hostileLayer();
        String[] result = run("health", layer.toString());
        for (String printed : new String[] {result[1], result[2]}) {
            assertFalse(printed.contains("\u001b") || printed.contains("\u0007"), printed);
        }
        assertTrue((result[1] + result[2]).contains("\\x1B"), result[1] + result[2]);
    }

    /** The districts batch names each area in its progress lines: escape sequences there are shown as text. */
    @Test
    void districtProgressPrintsNoEscapeSequence() throws Exception {
        String areas = Files.readString(Path.of("fixtures/areas/baltimore-districts.geojson"))
                .replace("\"Ash District\"", "\"Ash District\\u001b]0;owned\\u0007\"");
        Path hostile = dir.resolve("areas.geojson");
        Files.writeString(hostile, areas);
        String[] result = run("districts", "fixtures/osm/baltimore.osm.pbf", hostile.toString(), "-o",
                dir.resolve("out").toString(), "--threads", "1");
        assertFalse(result[2].contains("\u001b") || result[2].contains("\u0007"), result[2]);
        assertTrue(result[2].contains("Ash District\\x1B]0;owned\\x07"), result[2]);
    }
}
