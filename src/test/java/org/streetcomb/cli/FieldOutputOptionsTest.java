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
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

class FieldOutputOptionsTest {

    @TempDir
    Path folder;

    @Test
    void demoTownWritesEveryFieldFileFromTheReadmeCommand() throws Exception {
        Path gpx = folder.resolve("tour.gpx");
        Path kml = folder.resolve("tour.kml");
        Path csv = folder.resolve("directions.csv");
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--depot=-31.2,44.6",
            "--gpx", gpx.toString(), "--kml", kml.toString(), "--directions", csv.toString(), "--gpx-routes"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        assertTrue(out.toString().contains("U-turns"), out.toString());
        assertTrue(Files.size(gpx) > 0 && Files.size(kml) > 0);
        String sheet = Files.readString(csv);
        assertTrue(sheet.startsWith("\"Caution: Plans are advice"), "the caution heads the sheet");
        assertTrue(sheet.contains("\r\ntour,step,instruction,street,distance_m,cumulative_m,pass,elapsed_min,feature_id\r\n"));
    }

    @Test
    void tripsFromTheReadmeCommandFitTheShift() {
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--depot=-31.2,44.6",
            "--max-trip-hours", "1.5", "--trip-restarts", "2", "--json"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        String json = out.toString();
        assertTrue(json.contains("\"trips\""), json);
        assertFalse(json.contains("\"over_limit\" : true"), "every trip fits 1.5 h");
    }

    /**
     * On real streets with one-way restrictions (central Vienna, OpenStreetMap; fixtures/benchmarks/mixed-osm,
     * see NOTICE) the mixed postman's tour is reordered and cut into trips without driving a one-way street
     * the wrong way: every tour and trip is checked by TourValidator, which fails the run (exit 1) otherwise.
     */
    @Test
    void oneWayStreetsSurviveTheReorderAndTheTrips() throws Exception {
        String[] base = {"plan", "fixtures/benchmarks/mixed-osm/vienna-a.geojson", "--leave-out-cut-off",
            "--depot-part-only", "--json"};
        JsonNode plain = runJson(base, "--plain-order");
        JsonNode ordered = runJson(base);
        assertEquals(plain.at("/totals/tour_m").decimalValue(), ordered.at("/totals/tour_m").decimalValue());
        assertTrue(ordered.at("/field/turns/u_turns").asInt() <= plain.at("/field/turns/u_turns").asInt());
        JsonNode trips = runJson(base, "--max-trip-km", "5", "--trip-restarts", "1");
        assertTrue(trips.at("/field/trips").size() >= 2, trips.toString());
        for (JsonNode trip : trips.at("/field/trips")) {
            assertTrue(trip.get("length_m").asDouble() <= 5000 || trip.get("over_limit").asBoolean());
        }
    }

    /**
     * Two vehicles with 5 km trips and a quarter-hour shift on central Vienna (OpenStreetMap, one-way streets;
     * every trip checked by TourValidator or the run fails): the JSON groups the trips by vehicle, the hours
     * over the shift are each vehicle's hours beyond it, and the text says the fleet falls short and by how much.
     */
    @Test
    void aFleetOfTwoGroupsItsTripsByVehicleAndSaysWhenTheShiftIsTooShort() throws Exception {
        String[] base = {"plan", "fixtures/benchmarks/mixed-osm/vienna-a.geojson", "--leave-out-cut-off",
            "--depot-part-only", "--vehicles", "2", "--max-trip-km", "5", "--shift-hours", "0.25", "--trip-restarts", "1"};
        JsonNode fleet = runJson(base, "--json").at("/field");
        assertEquals(2, fleet.at("/vehicles").size(), fleet.toString());
        double over = 0;
        int trips = 0;
        for (JsonNode vehicle : fleet.at("/vehicles")) {
            over += Math.max(0, vehicle.get("hours").asDouble() - 0.25);
            trips += vehicle.get("trips").asInt();
        }
        assertEquals(trips, fleet.at("/trips").size());
        // a U-turn away from a dead end is still a U-turn: the counts nest
        assertTrue(fleet.at("/turns/u_turns_outside_dead_ends").asInt() <= fleet.at("/turns/u_turns").asInt());
        assertEquals(over, fleet.at("/hours_over_shift").asDouble(), 0.002);
        assertTrue(over > 0, "central Vienna takes more than two quarter-hour shifts");
        for (JsonNode trip : fleet.at("/trips")) {
            assertTrue(trip.get("length_m").asDouble() <= 5000 || trip.get("over_limit").asBoolean());
        }
        StringWriter out = new StringWriter();
        assertEquals(ExitCode.OK, Main.run(base, new PrintWriter(out), new PrintWriter(new StringWriter())));
        assertTrue(out.toString().contains("cannot cover the network within a 0.25 h shift"), out.toString());
        assertTrue(out.toString().contains("another vehicle's streets within 200 m"), out.toString());
    }

    /** Load options on bad input: one line naming the file, the feature and the field, exit 3, nothing written. */
    @Test
    void aDemandFieldThatIsNotANumberOrALanesFieldNoStreetHasIsRefused() {
        Path gpx = folder.resolve("load.gpx");
        for (String[] load : List.of(new String[] {"--demand-field", "name"}, new String[] {"--demand-per-km", "0.14",
            "--lanes-field", "lanes"})) {
            List<String> args = new java.util.ArrayList<>(List.of("plan", "fixtures/demo/brackenford.geojson",
                    "--depot=-31.2,44.6", "--capacity", "6", "--gpx", gpx.toString()));
            args.addAll(List.of(load));
            StringWriter err = new StringWriter();
            int code = Main.run(args.toArray(String[]::new), new PrintWriter(new StringWriter()), new PrintWriter(err));
            assertEquals(ExitCode.BAD_INPUT, code, err.toString());
            String message = err.toString().strip();
            assertFalse(message.contains("\n") || message.contains("\tat "), message);
            assertTrue(message.contains("brackenford.geojson") && message.contains(load[load.length - 2].equals("--lanes-field")
                    ? "lanes" : "name"), message);
            assertFalse(Files.exists(gpx));
        }
    }

    private static JsonNode runJson(String[] base, String... more) throws Exception {
        String[] args = java.util.stream.Stream.concat(java.util.Arrays.stream(base), java.util.Arrays.stream(more))
                .toArray(String[]::new);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        assertEquals(ExitCode.OK, code, err.toString());
        return new ObjectMapper().readTree(out.toString());
    }

    @Test
    void directionSheetWithAnUnknownExtensionIsRefusedBeforePlanning() {
        Path sheet = folder.resolve("directions.txt");
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--directions", sheet.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(ExitCode.USAGE, code);
        assertTrue(err.toString().contains(".csv or .html"), err.toString());
        assertFalse(Files.exists(sheet));
    }
}
