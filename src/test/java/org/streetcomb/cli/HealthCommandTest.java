package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/**
 * The health command end to end on the planted fixture (invented data): summary, JSON, the findings
 * GeoJSON and the exit codes. The GeoJSON is checked against RFC 7946's Feature and geometry members.
 */
class HealthCommandTest {

    @TempDir
    Path folder;

    /** A --crs that disagrees with the .prj is said in health's summary too, not only in plan's (issue 14). */
    @Test
    void aCrsThatOverridesThePrjIsNoted() {
        StringWriter stdout = new StringWriter();
        int code = Main.run(new String[] {"health", "fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp", "--crs",
                "EPSG:26912"}, new PrintWriter(stdout), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code);
        assertTrue(stdout.toString().contains("Note      1 x --crs EPSG:26912 overrides the .prj"), stdout.toString());
    }

    @Test
    void writesFindingsAsGeoJsonAndExitsZeroWithoutBlockingFindings() throws Exception {
        Path out = folder.resolve("findings.geojson");
        StringWriter stdout = new StringWriter();
        int code = Main.run(new String[] {"health", "fixtures/check/planted.geojson", "--out", out.toString()},
                new PrintWriter(stdout), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code);
        assertTrue(stdout.toString().contains("undershoot: 1"), stdout.toString());
        JsonNode collection = new ObjectMapper().readTree(out.toFile());
        assertEquals("FeatureCollection", collection.get("type").asText());
        assertEquals(9, collection.get("features").size());
        for (JsonNode feature : collection.get("features")) {
            assertEquals("Feature", feature.get("type").asText());
            JsonNode geometry = feature.get("geometry");
            String kind = feature.get("properties").get("kind").asText();
            if (kind.equals("dropped")) {
                assertTrue(geometry.isNull());
            } else {
                assertTrue(geometry.get("coordinates").isArray(), kind);
            }
        }
        assertFalse(collection.has("crs"), "RFC 7946 has no crs member");
    }

    @Test
    void jsonSummaryCountsEachKind() throws Exception {
        StringWriter stdout = new StringWriter();
        Main.run(new String[] {"health", "fixtures/check/planted.geojson", "--json"}, new PrintWriter(stdout),
                new PrintWriter(new StringWriter()));
        JsonNode summary = new ObjectMapper().readTree(stdout.toString());
        assertEquals(2, summary.get("counts").get("degenerate").asInt());
        assertEquals(1, summary.get("counts").get("crossing").asInt());
        assertFalse(summary.get("blocking").asBoolean());
        assertEquals(9, summary.get("findings").size());
    }

    @Test
    void oneWayTrapIsBlockingAndExitsFour() {
        StringWriter stdout = new StringWriter();
        int code = Main.run(new String[] {"health", "fixtures/check/oneway-trap.geojson"}, new PrintWriter(stdout),
                new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.NO_TOUR, code);
        assertTrue(stdout.toString().contains("can be entered but not left"), stdout.toString());
    }

    @Test
    void planningALayerWithATrapGivesTheTrapMessage() {
        StringWriter stderr = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/check/oneway-trap.geojson"}, new PrintWriter(new StringWriter()),
                new PrintWriter(stderr));
        assertEquals(ExitCode.NO_TOUR, code);
        assertTrue(stderr.toString().contains("One-way trap: 1 street edge (60 m) can be entered but not left"), stderr.toString());
        assertTrue(stderr.toString().contains("feature trap"), stderr.toString());
        assertEquals(1, stderr.toString().lines().count(), "one line, no stack trace");
    }

    @Test
    void planSummaryListsEveryRepairMade() {
        StringWriter stdout = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/check/planted.geojson", "--close-gaps", "2", "--drop-duplicates"},
                new PrintWriter(stdout), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code);
        assertTrue(stdout.toString().contains("repaired: closed 1 gap of up to 1.51 m by extending feature undershoot"),
                stdout.toString());
        assertTrue(stdout.toString().contains("repaired: dropped 1 duplicate edge (100 m) of feature duplicate"),
                stdout.toString());
    }

    @Test
    void unreadableLayerIsBadInputWithoutOutput() {
        Path out = folder.resolve("findings.geojson");
        StringWriter stderr = new StringWriter();
        int code = Main.run(new String[] {"health", "no-such-layer.geojson", "--out", out.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(stderr));
        assertEquals(ExitCode.BAD_INPUT, code);
        assertTrue(stderr.toString().contains("no-such-layer.geojson: no such file"), stderr.toString());
        assertFalse(Files.exists(out));
    }
}
