package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.cli.Main;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.write.GpxLimits;

/**
 * The mop-up goes through the cut-off: on Monaco (OpenStreetMap, fixtures/benchmarks/mixed-osm, NOTICE) the
 * streets one-way streets cut off at the extract's edge are missed by any legal drive; audited without the
 * plan's scope, the mop-up names them as left out and plans the rest, instead of refusing (exit 4). The
 * mop-up GPX is read back by gpsbabel where it is installed (an outside GPX 1.1 reader).
 */
class MopUpThroughCutOffTest {

    @TempDir
    Path folder;

    @Test
    void theCutOffStreetsAreNamedAndTheRestIsPlanned() throws Exception {
        Path layer = Path.of("fixtures/benchmarks/mixed-osm/monaco.osm.pbf");
        Plan plan = Planner.plan(new PlanRequest(layer, null, 0.5, 500, true, ReadOptions.DEFAULTS,
                new ServiceOptions(KerbMode.ONE_PASS, null, null, true)), RepairOptions.NONE,
                new StageClock(StageClock.SILENT));
        Path drive = folder.resolve("tour.gpx");
        PlanFiles.write(plan, new FieldFiles(null, false, drive, new GpxLimits(2, GpxLimits.DEFAULT_TRACK_POINTS,
                GpxLimits.DEFAULT_ROUTE_POINTS, false), null, null), new StageClock(StageClock.SILENT));
        Path mopUp = folder.resolve("mop-up.gpx");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"audit", layer.toString(), drive.toString(), "--gpx", mopUp.toString(), "-q"},
                new PrintWriter(out), new PrintWriter(err));
        assertEquals(ExitCode.OK, code, err.toString());
        assertTrue(out.toString().contains("mop-up: left out, as one-way streets cut them off"), out.toString());
        assertTrue(Files.size(mopUp) > 0);
        if (new ProcessBuilder("sh", "-c", "command -v gpsbabel").start().waitFor() == 0) {
            Process read = new ProcessBuilder("gpsbabel", "-i", "gpx", "-f", mopUp.toString(), "-o", "gpx", "-F",
                    "/dev/null").redirectErrorStream(true).start();
            assertEquals(0, read.waitFor(), new String(read.getInputStream().readAllBytes()));
        } else {
            assertTrue(System.getenv("STREETCOMB_CI") == null, "gpsbabel is missing on CI");
        }
    }
}
