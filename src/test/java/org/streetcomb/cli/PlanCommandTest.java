package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.ExitCode;
import org.streetcomb.network.GeodesicLength;

/** The plan command end to end: summaries, the written tour, and bad input. */
class PlanCommandTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    /** One exit-code rule: every command's --help lists the codes the README's table gives, in the same words' sense. */
    @Test
    void everyHelpStatesTheExitCodesOfTheReadme() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        for (String command : new String[] {"plan", "health", "audit", "districts"}) {
            Run help = run(command, "--help");
            assertEquals(ExitCode.OK, help.code());
            for (int code = 0; code <= 4; code++) {
                assertTrue(help.out().matches("(?s).*\\n\\s+" + code + "\\s+\\S.*"), command + " --help lists exit code " + code);
                assertTrue(readme.contains("| " + code + " | "), "README's table lists exit code " + code);
            }
            assertTrue(help.out().replaceAll("\\s+", " ").contains("value not a number or out of range"), command + ": bad values exit 2");
        }
        Run bad = run("plan", DEMO, "--snap", "abc");
        assertEquals(ExitCode.USAGE, bad.code(), "a value that is not a number is exit 2, as README says");
        Run unfit = run("plan", DEMO, "--depot=10,10");
        assertEquals(ExitCode.BAD_INPUT, unfit.code(), "a depot far from every street is exit 3, as README says");
    }

    @Test
    void demoTourIsOneClosedLineFromTheDepotWhoseLengthMatchesTheSummary() throws IOException {
        Path tour = dir.resolve("tour.geojson");
        Run run = run("plan", DEMO, "--depot=-31.2,44.6", "--out", tour.toString(), "--json", "--steps");
        assertEquals(ExitCode.OK, run.code(), run.err());
        JsonNode summary = new ObjectMapper().readTree(run.out());
        JsonNode written = new ObjectMapper().readTree(tour.toFile());

        JsonNode first = written.get("features").get(0);
        JsonNode coords = first.get("geometry").get("coordinates");
        assertEquals("LineString", first.get("geometry").get("type").asText());
        // closed at the depot (the town yard corner)
        assertEquals(-31.2, coords.get(0).get(0).asDouble(), 1e-7);
        assertEquals(44.6, coords.get(0).get(1).asDouble(), 1e-7);
        assertEquals(coords.get(0), coords.get(coords.size() - 1));
        // its geodesic length (recomputed from the written, rounded coordinates) is the summary's
        double length = 0;
        for (int i = 1; i < coords.size(); i++) {
            assertFalse(coords.get(i).equals(coords.get(i - 1)), "no repeated consecutive points");
            length += GeodesicLength.between(coords.get(i - 1).get(0).asDouble(), coords.get(i - 1).get(1).asDouble(),
                    coords.get(i).get(0).asDouble(), coords.get(i).get(1).asDouble());
        }
        assertEquals(summary.get("totals").get("tour_m").asDouble(), length, 0.05,
                "rounding to 7 decimals moves points by at most 1 cm");
        assertEquals(summary.get("totals").get("tour_m").asDouble(), first.get("properties").get("length_m").asDouble(), 1e-3);
        // service + deadhead = tour, and the service is the whole network (every street once)
        JsonNode totals = summary.get("totals");
        assertEquals(totals.get("tour_m").asDouble(), totals.get("service_m").asDouble() + totals.get("deadhead_m").asDouble(), 2e-3);
        assertEquals(summary.get("network").get("length_m").asDouble(), totals.get("service_m").asDouble(), 1e-3);
        // one feature per step after the tour feature
        assertEquals(1 + summary.get("tours").get(0).get("steps").asInt(), written.get("features").size());
        for (String coordinate : coords.toString().split("[\\[\\],]")) {
            if (coordinate.contains(".")) {
                assertTrue(coordinate.length() - coordinate.indexOf('.') - 1 <= 7, "at most 7 decimals: " + coordinate);
            }
        }
    }

    @Test
    void sameInputGivesByteIdenticalOutput() throws IOException {
        Path a = dir.resolve("a.geojson");
        Path b = dir.resolve("b.geojson");
        assertEquals(ExitCode.OK, run("plan", DEMO, "-q", "--steps", "--out", a.toString()).code());
        assertEquals(ExitCode.OK, run("plan", DEMO, "-q", "--steps", "--out", b.toString()).code());
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "malformed JSON      | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",  | line 1, column",
        "points only         | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"Point\",\"coordinates\":[1,2]}}]} | no road lines kept among 1 features (skipped: {Point=1})",
        "empty collection    | {\"type\":\"FeatureCollection\",\"features\":[]} | no features",
        "latitude too big    | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[1,2],[3,95]]}}]} | line 1 (feature 0), position 2: latitude 95.0 outside [-90, 90]",
        "longitude too big   | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[181,2],[3,5]]}}]} | position 1: longitude 181.0 outside [-180, 180]",
        "NaN coordinate      | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[NaN,2],[3,5]]}}]} | malformed JSON",
        "not a collection    | {\"type\":\"Topology\"} | top-level type is \"Topology\"",
        "text position       | {\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[\"a\",2],[3,5]]}}]} | position 1: a position must be an array [longitude, latitude]"})
    void badLayersGiveOneLineNamingTheFileAndNoOutput(String title, String content, String expected) throws IOException {
        Path layer = dir.resolve("bad.geojson");
        Files.writeString(layer, content);
        Path out = dir.resolve("tour.geojson");

        Run run = run("plan", layer.toString(), "--out", out.toString());

        assertEquals(ExitCode.BAD_INPUT, run.code(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains(layer.toString()), run.err());
        assertTrue(run.err().contains(expected), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertFalse(Files.exists(out));
        try (var left = Files.list(dir)) {
            assertEquals(1, left.count(), "only the input remains: no partial output");
        }
    }

    @Test
    void theDefaultDepotLiesOnTheMainNetworkAndEveryTourDrivesSomething() throws IOException {
        // Aguascalientes OSM extract (fixtures/osm, ODbL): its first point lies on a one-way street cut at
        // the extract's edge, from which almost nothing can be reached and left again (common practice:
        // a depot must be inside the strongly connected part of the network it serves)
        Run run = run("plan", "fixtures/osm/aguascalientes.osm.pbf", "--leave-out-cut-off", "--json", "-q");
        assertEquals(ExitCode.OK, run.code(), run.err());
        JsonNode summary = new ObjectMapper().readTree(run.out());
        JsonNode tours = summary.get("tours");
        for (int t = 0; t < tours.size(); t++) {
            assertTrue(tours.get(t).get("steps").asInt() > 0, "tour " + (t + 1) + " drives something");
        }
        assertTrue(summary.get("totals").get("service_m").asDouble() > 0.5 * summary.get("network").get("length_m").asDouble(),
                "the depot's tour serves most of the network: " + summary.get("totals"));
    }

    @Test
    void missingFileIsBadInput() {
        Run run = run("plan", dir.resolve("nowhere.geojson").toString());
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("nowhere.geojson: no such file"), run.err());
    }

    @Test
    void depotFarFromTheNetworkIsBadInput() {
        Run run = run("plan", DEMO, "--depot=-30.0,44.6");
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("from the nearest street node"), run.err());
    }

    @Test
    void malformedDepotIsAUsageError() {
        Run run = run("plan", DEMO, "--depot=44.6");
        assertEquals(ExitCode.USAGE, run.code());
        assertTrue(run.err().contains("expected LON,LAT"), run.err());
    }

    @Test
    void helpAndVersionWork() {
        assertEquals(ExitCode.OK, run("--version").code());
        Run help = run("plan", "--help");
        assertEquals(ExitCode.OK, help.code());
        assertTrue(help.out().contains("--depot"));
        assertTrue(help.out().contains("obey traffic law"));
    }
}
