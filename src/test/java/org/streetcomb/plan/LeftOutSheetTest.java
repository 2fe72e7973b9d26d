package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.write.GpxLimits;

/**
 * The direction sheet lists the streets the plan left out, so a crew knows they are not forgotten: on Monaco
 * (OpenStreetMap, fixtures/benchmarks/mixed-osm, NOTICE) with the streets one-way streets cut off left out,
 * every left-out feature appears once on the sheet (HTML and CSV), with the plan's left-out kilometres.
 */
class LeftOutSheetTest {

    @TempDir
    Path folder;

    @Test
    void everyLeftOutStreetIsOnTheSheet() throws Exception {
        Plan plan = Planner.plan(new PlanRequest(Path.of("fixtures/benchmarks/mixed-osm/monaco.osm.pbf"), null, 0.5,
                500, true, ReadOptions.DEFAULTS, new ServiceOptions(KerbMode.ONE_PASS, null, null, true)),
                RepairOptions.NONE, new StageClock(StageClock.SILENT));
        Set<String> features = new HashSet<>();
        double metres = 0;
        for (int e : plan.leftOut()) {
            features.add(plan.network().feature(e).id());
            metres += plan.network().length(e);
        }
        assertTrue(features.size() > 10, "Monaco's extract edge cuts streets off");
        Path html = folder.resolve("sheet.html");
        Path csv = folder.resolve("sheet.csv");
        for (Path sheet : List.of(html, csv)) {
            PlanFiles.write(plan, new FieldFiles(null, false, null, new GpxLimits(2, 10_000, 250, false), null, sheet),
                    new StageClock(StageClock.SILENT));
        }
        String page = Files.readString(html);
        assertTrue(page.contains(String.format(java.util.Locale.ROOT, "Left out: %d streets, %.2f km",
                features.size(), metres / 1000)), page.substring(Math.max(0, page.indexOf("Left out") - 10)));
        long rows = Files.readAllLines(csv).stream().filter(l -> l.startsWith("left out,")).count();
        assertEquals(features.size(), rows);
        for (String id : features) {
            assertTrue(page.contains(">" + id + "<"), id);
        }
    }
}
