package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.cli.Main;

/**
 * The plan states its scope: the tour GeoJSON keeps what the plan asked for, and {@code audit --plan} measures
 * against it as it does with the options repeated. Monaco (OpenStreetMap, fixtures/benchmarks/mixed-osm,
 * NOTICE), planned with the streets one-way streets cut off left out and the depot's part only. GDAL, where
 * installed, still reads the tour GeoJSON as one line (a foreign member is ignored, RFC 7946 section 6.1).
 */
class ScopeRecordTest {

    private static final String LAYER = "fixtures/benchmarks/mixed-osm/monaco.osm.pbf";

    @TempDir
    Path folder;

    @Test
    void auditWithThePlanMeasuresWhatThePlanAskedFor() throws Exception {
        String tour = folder.resolve("tour.geojson").toString();
        String gpx = folder.resolve("tour.gpx").toString();
        assertEquals(ExitCode.OK, run("plan", LAYER, "--leave-out-cut-off", "--depot-part-only", "--out", tour,
                "--gpx", gpx, "-q"));
        JsonNode withPlan = json("audit", LAYER, gpx, "--plan", tour, "--json", "-q");
        JsonNode withOptions = json("audit", LAYER, gpx, "--leave-out-cut-off", "--depot-part-only", "--json", "-q");
        assertEquals(withOptions.get("coverage"), withPlan.get("coverage"));
        assertTrue(withPlan.at("/coverage/streets/left_out_of_the_plan").asInt() > 0, withPlan.toString());
        if (new ProcessBuilder("sh", "-c", "command -v ogrinfo").start().waitFor() == 0) {
            Process info = new ProcessBuilder("ogrinfo", "-so", "-al", tour).redirectErrorStream(true).start();
            String text = new String(info.getInputStream().readAllBytes());
            assertEquals(0, info.waitFor(), text);
            assertTrue(text.contains("Feature Count: 1"), text);
        } else {
            assertTrue(System.getenv("STREETCOMB_CI") == null, "ogrinfo is missing on CI");
        }
    }

    @Test
    void aFileWithoutAScopeIsRefusedInOneLine() {
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"audit", LAYER, "fixtures/demo/brackenford-drive.gpx", "--plan",
            "fixtures/demo/brackenford.geojson"}, new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(ExitCode.BAD_INPUT, code, err.toString());
        assertTrue(err.toString().contains("holds no plan scope"), err.toString());
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
    }

    private static int run(String... args) {
        return Main.run(args, new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
    }

    private static JsonNode json(String... args) throws Exception {
        StringWriter out = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        return new ObjectMapper().readTree(out.toString());
    }
}
