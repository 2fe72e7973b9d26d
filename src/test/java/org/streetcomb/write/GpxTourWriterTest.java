package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.SchemaFactory;
import javax.xml.validation.Validator;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExternalTool;
import org.streetcomb.FieldFixtures;
import org.streetcomb.plan.Plan;
import org.streetcomb.tour.Direction;
import org.streetcomb.tour.Directions;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.TrafficSide;

/**
 * The GPX export checked against the GPX 1.1 schema (TopoGrafix, bundled in test resources) and read back
 * by two independent readers, GDAL's ogrinfo and gpsbabel, which must count the same points we wrote.
 */
class GpxTourWriterTest {

    private static final int TRACK_LIMIT = 150;
    private static final int ROUTE_LIMIT = 40;

    @TempDir
    static Path folder;
    private static Plan plan;
    private static Path gpx;
    private static GpxTourWriter.Written written;
    private static int tourPoints;
    private static int turnLines;

    @BeforeAll
    static void writeDemoTown() {
        plan = FieldFixtures.demoTown();
        EdgeBearings bearings = EdgeBearings.of(plan.network());
        List<List<Direction>> sheets = new ArrayList<>();
        sheets.add(Directions.of(plan.network(), bearings, TrafficSide.RIGHT, plan.tours().get(0)));
        turnLines = sheets.get(0).size();
        tourPoints = TourPoints.of(plan.network(), plan.tours().get(0), 2).size();
        gpx = folder.resolve("demo.gpx");
        written = new GpxTourWriter(new GpxLimits(2, TRACK_LIMIT, ROUTE_LIMIT, true))
                .write(gpx, plan.network(), plan.depot(), plan.tours(), sheets, "Tour");
    }

    @Test
    void validatesAgainstTheGpx11Schema() throws Exception {
        SchemaFactory factory = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
        factory.setProperty(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        factory.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        Validator validator = factory.newSchema(getClass().getResource("gpx-1.1.xsd")).newValidator();
        validator.validate(new StreamSource(gpx.toFile()));
    }

    @Test
    void splitsLongTracksAndRoutesIntoPartsThatShareTheirEnds() throws IOException {
        String text = Files.readString(gpx);
        List<Integer> perTrack = counts(text, "trk", "trkpt");
        List<Integer> perRoute = counts(text, "rte", "rtept");
        assertEquals(GpxTourWriter.parts(tourPoints, TRACK_LIMIT), perTrack.size());
        assertEquals(GpxTourWriter.parts(turnLines, ROUTE_LIMIT), perRoute.size());
        assertTrue(perTrack.size() > 1 && perRoute.size() > 1, "the demo town must need several parts at these limits");
        perTrack.forEach(n -> assertTrue(n <= TRACK_LIMIT, "track of " + n + " points"));
        perRoute.forEach(n -> assertTrue(n <= ROUTE_LIMIT, "route of " + n + " points"));
        // consecutive parts overlap by one point, so the parts add up to the tour's points plus the seams
        assertEquals(tourPoints + perTrack.size() - 1, perTrack.stream().mapToInt(Integer::intValue).sum());
        assertEquals(turnLines + perRoute.size() - 1, perRoute.stream().mapToInt(Integer::intValue).sum());
        assertEquals(written.trackPoints(), perTrack.stream().mapToInt(Integer::intValue).sum());
        assertTrue(text.contains("never handle a device while driving"), "caution in the descriptions");
    }

    @Test
    void gdalReadsTheSamePointCounts() throws Exception {
        String summary = ExternalTool.run("ogrinfo", "-ro", "-so", "-al", gpx.toString());
        assertEquals(written.trackPoints(), featureCount(summary, "track_points"));
        assertEquals(written.routePoints(), featureCount(summary, "route_points"));
        assertEquals(written.tracks(), featureCount(summary, "tracks"));
        assertEquals(written.routes(), featureCount(summary, "routes"));
        assertEquals(written.waypoints(), featureCount(summary, "waypoints"));
    }

    @Test
    void gpsbabelReadsTheSamePointCounts() throws Exception {
        String copy = ExternalTool.run("gpsbabel", "-i", "gpx", "-f", gpx.toString(), "-o", "gpx", "-F", "-");
        assertEquals(written.trackPoints(), occurrences(copy, "<trkpt "));
        assertEquals(written.routePoints(), occurrences(copy, "<rtept "));
        assertEquals(written.waypoints(), occurrences(copy, "<wpt "));
        assertEquals(written.tracks(), occurrences(copy, "<trk>"));
    }

    @Test
    void partsCoverEveryPointWithOneSharedPointPerSeam() {
        for (int limit = 2; limit <= 12; limit++) {
            for (int points = 1; points <= 60; points++) {
                int parts = GpxTourWriter.parts(points, limit);
                int lastStart = (parts - 1) * (limit - 1);
                assertTrue(lastStart + limit >= points, points + " points, limit " + limit);
                assertTrue(parts == 1 || lastStart < points - 1, "no empty last part: " + points + "/" + limit);
            }
        }
    }

    private static List<Integer> counts(String text, String parent, String child) {
        List<Integer> counts = new ArrayList<>();
        Matcher m = Pattern.compile("<" + parent + ">(.*?)</" + parent + ">", Pattern.DOTALL).matcher(text);
        while (m.find()) {
            counts.add(occurrences(m.group(1), "<" + child + " "));
        }
        return counts;
    }

    private static int occurrences(String text, String token) {
        int n = 0;
        for (int i = text.indexOf(token); i >= 0; i = text.indexOf(token, i + 1)) {
            n++;
        }
        return n;
    }

    static int featureCount(String ogrSummary, String layer) {
        Matcher m = Pattern.compile("Layer name: " + Pattern.quote(layer) + "\\R(?:.*\\R)*?Feature Count: (\\d+)")
                .matcher(ogrSummary);
        assertTrue(m.find(), "layer " + layer + " in\n" + ogrSummary);
        return Integer.parseInt(m.group(1));
    }
}
