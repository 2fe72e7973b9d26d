package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/**
 * Reload places from a point layer plan the same day as the same places given one by one with --reload-at
 * (the demo town's salt barn, invented data; a one-tonne load so trips must reload), and a layer feature
 * that is not a point is refused by its id.
 */
class ReloadPointsTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    private static final String[] DAY = {"plan", DEMO, "--depot=-31.2,44.6", "--max-trip-hours", "3",
        "--capacity", "1", "--demand-per-km", "0.14", "--json", "-q"};

    @TempDir
    Path dir;

    private static String[] with(String... more) {
        String[] args = java.util.Arrays.copyOf(DAY, DAY.length + more.length);
        System.arraycopy(more, 0, args, DAY.length, more.length);
        return args;
    }

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    @Test
    void aPointLayerPlansAsTheSamePlacesGivenOneByOne() throws IOException {
        Path barns = dir.resolve("barns.geojson");
        Files.writeString(barns, "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"id\":\"barn\","
                + "\"properties\":{\"name\":\"Salt barn\"},\"geometry\":{\"type\":\"Point\",\"coordinates\":[-31.182,44.607]}}]}");
        String[] byOption = run(with("--reload-at=-31.182,44.607"));
        String[] byLayer = run(with("--reload-points", barns.toString()));
        assertEquals("0", byLayer[0], byLayer[2]);
        ObjectMapper json = new ObjectMapper();
        assertEquals(json.readTree(byOption[1]).at("/field/trips"), json.readTree(byLayer[1]).at("/field/trips"));
        assertTrue(json.readTree(byLayer[1]).at("/field/trips").toString().contains("\"ends_at\":\"reload 1\""),
                "some trip reloads at the barn");
    }

    @Test
    void aFeatureThatIsNotAPointIsRefusedByItsId() throws IOException {
        Path mixed = dir.resolve("mixed.geojson");
        Files.writeString(mixed, "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"id\":\"yard\","
                + "\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[-31.18,44.6],[-31.19,44.6]]}}]}");
        String[] r = run(with("--reload-points", mixed.toString()));
        assertEquals(String.valueOf(ExitCode.BAD_INPUT), r[0]);
        assertTrue(r[2].startsWith("streetcomb: " + mixed + ": feature yard: a LineString: --reload-points takes a layer of points"),
                r[2]);
    }
}
