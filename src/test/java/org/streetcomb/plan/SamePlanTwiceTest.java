package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.cli.Main;

/**
 * The same input gives the same plan on any machine and under any load (DEVELOPERS.md, determinism): the mixed
 * postman's LP bound stops on a work budget, not on a clock, so a plan made while another thread keeps a core busy
 * is byte for byte the plan made without it. Instance: the Baltimore window of fixtures/benchmarks/mixed-osm
 * (OpenStreetMap, ODbL; see NOTICE), 546 streets with 156 one-way, where the LP runs hundreds of cuts.
 */
class SamePlanTwiceTest {

    private static final Path LAYER = Path.of("fixtures/benchmarks/mixed-osm/baltimore-window.osm.pbf");

    @TempDir
    Path folder;

    @Test
    void samePlanWithAndWithoutABusyThread() throws Exception {
        String quiet = plan("quiet");
        AtomicBoolean busy = new AtomicBoolean(true);
        Thread spinner = new Thread(() -> {
            double x = 1;
            while (busy.get()) {
                x = Math.sqrt(x + 1);
            }
        });
        spinner.setDaemon(true);
        spinner.start();
        String loaded;
        try {
            loaded = plan("loaded");
        } finally {
            busy.set(false);
            spinner.join();
        }
        assertEquals(quiet, loaded, "summary (stage times masked)");
        assertArrayEquals(Files.readAllBytes(folder.resolve("quiet/tour.geojson")),
                Files.readAllBytes(folder.resolve("loaded/tour.geojson")), "tour GeoJSON");
    }

    /** Plans the layer through the command line; returns the --json summary without its stage times. */
    private String plan(String run) throws IOException {
        Path output = Files.createDirectory(folder.resolve(run)).resolve("tour.geojson");
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", LAYER.toString(), "--leave-out-cut-off", "--json", "-q",
            "--out", output.toString()}, new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        return out.toString().replaceAll("(?s)\"seconds\" : \\{[^}]*}", "\"seconds\" : {}").replace(run, "RUN");
    }
}
