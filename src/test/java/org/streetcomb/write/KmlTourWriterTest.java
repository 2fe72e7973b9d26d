package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExternalTool;
import org.streetcomb.FieldFixtures;
import org.streetcomb.plan.Plan;

/**
 * The KML export read back by an independent reader, GDAL's ogrinfo (its KML driver), and compared with the
 * network's own geometry along the tour ({@link TourVertices}), not with the writer's point list.
 */
class KmlTourWriterTest {

    @TempDir
    Path folder;

    @Test
    void gdalReadsTheDepotAndEveryTourPoint() throws Exception {
        Plan plan = FieldFixtures.demoTown();
        Path kml = folder.resolve("demo.kml");
        new KmlTourWriter(0).write(kml, plan.network(), plan.depot(), plan.tours(), "Tour");
        String dump = ExternalTool.run("ogrinfo", "-ro", "-al", kml.toString());
        assertTrue(dump.contains("Feature Count: 2"), dump.substring(0, Math.min(600, dump.length())));
        assertTrue(dump.contains("POINT (-31.2 44.6"), "the depot");
        Matcher line = Pattern.compile("LINESTRING \\(([^)]*)\\)").matcher(dump);
        assertTrue(line.find(), "a tour line");
        String[] points = line.group(1).split(",");
        List<double[]> expected = TourVertices.of(plan.network(), plan.tours().get(0));
        assertEquals(expected.size(), points.length);
        for (int i = 0; i < points.length; i++) {
            String[] xy = points[i].trim().split(" ");
            assertEquals(expected.get(i)[0], Double.parseDouble(xy[0]), 1e-7, "longitude of point " + i);
            assertEquals(expected.get(i)[1], Double.parseDouble(xy[1]), 1e-7, "latitude of point " + i);
        }
        assertTrue(dump.contains("never handle a device while driving"), "caution in the description");
    }
}
