package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/** The plan options for one-way streets, both kerbs, a subset of streets and open routes, end to end. */
class ServiceOptionsCommandTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";

    @TempDir
    Path dir;

    private static JsonNode json(PlanCommandTest.Run run) throws IOException {
        assertEquals(ExitCode.OK, run.code(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void bothKerbsOfATwoWayTownIsExactlyTwiceItsLength() throws IOException {
        // common practice: each street once each way balances every node, so no deadhead is needed
        JsonNode s = json(PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--both-kerbs", "--json"));
        double network = s.get("network").get("length_m").asDouble();
        assertEquals(2 * network, s.get("totals").get("tour_m").asDouble(), 0.01);
        assertEquals(0, s.get("totals").get("deadhead_m").asDouble(), 0.01);
        assertTrue(s.get("method").asText().startsWith("directed postman, exact"));
        assertEquals(0, s.get("totals").get("gap").asDouble(), 1e-9);
    }

    @Test
    void oneWayResidentialStreetsGiveAMixedPlanWithABoundBelowIt() throws IOException {
        JsonNode s = json(PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--oneway-field=class",
                "--oneway-forward=residential", "--json"));
        assertTrue(s.get("method").asText().startsWith("mixed postman"), s.get("method").asText());
        double tour = s.get("totals").get("tour_m").asDouble();
        double bound = s.get("totals").get("lower_bound_m").asDouble();
        assertTrue(bound > s.get("network").get("length_m").asDouble() && bound <= tour, bound + " vs " + tour);
        assertEquals(tour / bound - 1, s.get("totals").get("gap").asDouble(), 1e-5);
    }

    @Test
    void onlyListedStreetsAreServiced() throws IOException {
        Path ids = dir.resolve("ids.txt");
        Files.writeString(ids, "# two streets\nbf-003\nbf-020\nno-such-street\n");
        JsonNode s = json(PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--service-ids", ids.toString(),
                "--json"));
        assertTrue(s.get("method").asText().startsWith("undirected rural postman"), s.get("method").asText());
        assertTrue(s.get("totals").get("service_m").asDouble() < 0.1 * s.get("network").get("length_m").asDouble());
        assertTrue(s.get("warnings").toString().contains("1 of the 3 ids"), s.get("warnings").toString());
    }

    @Test
    void openRouteEndsWhereAsked() throws IOException {
        Path tour = dir.resolve("tour.geojson");
        PlanCommandTest.Run run = PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--end=-31.1888321,44.6008024",
                "--out", tour.toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        JsonNode coords = new ObjectMapper().readTree(tour.toFile()).get("features").get(0).get("geometry")
                .get("coordinates");
        JsonNode last = coords.get(coords.size() - 1);
        assertEquals(-31.1888321, last.get(0).asDouble(), 1e-7);
        assertEquals(44.6008024, last.get(1).asDouble(), 1e-7);
    }

    @Test
    void streetsCutOffByOneWaysAreNamedAndTheExitCodeSaysNoTour() {
        Path tour = dir.resolve("tour.geojson");
        PlanCommandTest.Run run = PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--oneway-field=class",
                "--oneway-forward=main", "--out", tour.toString());
        assertEquals(ExitCode.NO_TOUR, run.code());
        assertTrue(run.err().contains("bf-033"), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(Files.exists(tour));
        PlanCommandTest.Run leftOut = PlanCommandTest.run("plan", DEMO, "--depot=-31.2,44.6", "--oneway-field=class",
                "--oneway-forward=main", "--leave-out-cut-off");
        assertEquals(ExitCode.OK, leftOut.code(), leftOut.err());
        assertTrue(leftOut.out().contains("bf-033"), leftOut.out());
    }

    @Test
    void badServiceOptionsAreRefusedClearly() {
        PlanCommandTest.Run missing = PlanCommandTest.run("plan", DEMO, "--service-ids", dir.resolve("none.txt").toString());
        assertEquals(ExitCode.BAD_INPUT, missing.code());
        assertTrue(missing.err().contains("none.txt"), missing.err());
        PlanCommandTest.Run farEnd = PlanCommandTest.run("plan", DEMO, "--end=-30.0,44.6");
        assertEquals(ExitCode.BAD_INPUT, farEnd.code());
        assertTrue(farEnd.err().startsWith("streetcomb: end -30.0000000,44.6000000"), farEnd.err());
        PlanCommandTest.Run twice = PlanCommandTest.run("plan", DEMO, "--one-way-twice");
        assertEquals(ExitCode.USAGE, twice.code());
    }

    @Test
    void idsMatchingNoStreetAreNamedAsSuch() throws IOException {
        // once "no street is marked to be serviced", which did not say why
        Path ids = dir.resolve("ids.txt");
        Files.writeString(ids, "no-such-street\nnor-this\n");
        PlanCommandTest.Run run = PlanCommandTest.run("plan", DEMO, "--service-ids", ids.toString());
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("ids.txt: none of its 2 ids matches a feature id of brackenford.geojson "
                + "(for example 'no-such-street'; the layer's ids look like 'bf-"), run.err());
    }

    @Test
    void idFilesThatAreNotUtf8TextAreRefusedInWords() throws IOException {
        // UTF-16 (as some editors save) and binary files once gave "(Input length = 1)"
        Path utf16 = dir.resolve("utf16.txt");
        Files.writeString(utf16, "bf-001\n", java.nio.charset.StandardCharsets.UTF_16);
        Path latin = dir.resolve("latin.txt");
        Files.write(latin, new byte[] {'b', 'f', (byte) 0xE9, '\n'});
        Path empty = Files.writeString(dir.resolve("empty.txt"), "# nothing yet\n");
        String[][] cases = {{utf16.toString(), "utf16.txt: byte 3: not a text file of ids"},
            {latin.toString(), "latin.txt: not UTF-8 text"}, {empty.toString(), "empty.txt: holds no street ids"}};
        for (String[] c : cases) {
            PlanCommandTest.Run run = PlanCommandTest.run("plan", DEMO, "--service-ids", c[0]);
            assertEquals(ExitCode.BAD_INPUT, run.code(), run.err());
            assertEquals(1, run.err().lines().count(), run.err());
            assertTrue(run.err().contains(c[1]), run.err());
        }
    }
}
