package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExternalTool;
import org.streetcomb.FieldFixtures;
import org.streetcomb.plan.Plan;

/** The KML export read back by an independent reader, GDAL's ogrinfo (its KML driver). */
class KmlTourWriterTest {

    @TempDir
    Path folder;

    @Test
    void gdalReadsTheDepotAndEveryTourPoint() throws Exception {
        Plan plan = FieldFixtures.demoTown();
        Path kml = folder.resolve("demo.kml");
        new KmlTourWriter(2).write(kml, plan.network(), plan.depot(), plan.tours(), "Tour");
        String dump = ExternalTool.run("ogrinfo", "-ro", "-al", kml.toString());
        assertTrue(dump.contains("Feature Count: 2"), dump.substring(0, Math.min(600, dump.length())));
        assertTrue(dump.contains("POINT (-31.2 44.6"), "the depot");
        Matcher line = Pattern.compile("LINESTRING \\(([^)]*)\\)").matcher(dump);
        assertTrue(line.find(), "a tour line");
        int points = line.group(1).split(",").length;
        assertEquals(TourPoints.of(plan.network(), plan.tours().get(0), 2).size(), points);
        assertTrue(dump.contains("never handle a device while driving"), "caution in the description");
    }
}
