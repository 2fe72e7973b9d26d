package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
 * by two independent readers, GDAL's ogrinfo and gpsbabel. Expected points come from the readers and the
 * network's own geometry ({@link TourVertices}), never from the writer's point list.
 */
class GpxTourWriterTest {

    private static final int TRACK_LIMIT = 150;
    private static final int ROUTE_LIMIT = 40;

    @TempDir
    static Path folder;
    private static Plan plan;
    private static Path gpx;
    private static Path unsimplified;
    private static Path unsplit;
    private static GpxTourWriter.Written written;
    private static int turnLines;

    @BeforeAll
    static void writeDemoTown() {
        plan = FieldFixtures.demoTown();
        EdgeBearings bearings = EdgeBearings.of(plan.network());
        List<List<Direction>> sheets = new ArrayList<>();
        sheets.add(Directions.of(plan.network(), bearings, TrafficSide.RIGHT, plan.tours().get(0)));
        turnLines = sheets.get(0).size();
        gpx = folder.resolve("demo.gpx");
        written = new GpxTourWriter(new GpxLimits(2, TRACK_LIMIT, ROUTE_LIMIT, true))
                .write(gpx, plan.network(), plan.depot(), plan.tours(), sheets, "Tour");
        unsimplified = folder.resolve("every-vertex.gpx");
        new GpxTourWriter(new GpxLimits(0, GpxLimits.DEFAULT_TRACK_POINTS, GpxLimits.DEFAULT_ROUTE_POINTS, false))
                .write(unsimplified, plan.network(), plan.depot(), plan.tours(), sheets, "Tour");
        unsplit = folder.resolve("one-part.gpx");
        new GpxTourWriter(new GpxLimits(2, GpxLimits.DEFAULT_TRACK_POINTS, GpxLimits.DEFAULT_ROUTE_POINTS, true))
                .write(unsplit, plan.network(), plan.depot(), plan.tours(), sheets, "Tour");
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
    void gdalReadsEveryVertexOfTheTourWhenNothingIsSimplified() throws Exception {
        // reference: the network's stored geometry walked along the tour; GPX coordinates carry 7 decimals
        List<double[]> expected = TourVertices.of(plan.network(), plan.tours().get(0));
        List<double[]> read = points(ExternalTool.run("ogrinfo", "-ro", unsimplified.toString(), "track_points"));
        assertEquals(expected.size(), read.size());
        for (int i = 0; i < read.size(); i++) {
            assertEquals(expected.get(i)[0], read.get(i)[0], 1e-7, "longitude of point " + i);
            assertEquals(expected.get(i)[1], read.get(i)[1], 1e-7, "latitude of point " + i);
        }
    }

    @Test
    void simplifiedTrackKeepsTourVerticesInDrivingOrder() throws Exception {
        // Douglas-Peucker keeps a subset of the vertices (D. Douglas, T. Peucker, Cartographica 10, 1973), so the
        // track GDAL reads back is a subsequence of the tour's vertices that starts and ends where the tour does
        List<double[]> vertices = TourVertices.of(plan.network(), plan.tours().get(0));
        List<double[]> read = points(ExternalTool.run("ogrinfo", "-ro", unsimplified.toString(), "track_points"));
        List<double[]> simplified = points(ExternalTool.run("ogrinfo", "-ro", gpx.toString(), "track_points"));
        assertTrue(simplified.size() < read.size(), "the 2 m tolerance drops points on the demo town");
        int at = 0;
        for (double[] p : simplified) {
            while (at < vertices.size() && !(Math.abs(vertices.get(at)[0] - p[0]) <= 1e-7
                    && Math.abs(vertices.get(at)[1] - p[1]) <= 1e-7)) {
                at++;
            }
            assertTrue(at < vertices.size(), "track point " + p[0] + " " + p[1] + " is not a later tour vertex");
        }
    }

    @Test
    void splitsLongTracksAndRoutesIntoPartsThatShareTheirEnds() throws Exception {
        // the parts as GDAL reads them: each within its limit, every part but the last full, consecutive parts
        // sharing one point, and joined at their seams the same points GDAL reads from the file written in one part
        List<List<double[]>> tracks = lines(ExternalTool.run("ogrinfo", "-ro", gpx.toString(), "tracks"));
        List<List<double[]>> routes = lines(ExternalTool.run("ogrinfo", "-ro", gpx.toString(), "routes"));
        List<List<double[]>> whole = lines(ExternalTool.run("ogrinfo", "-ro", unsplit.toString(), "tracks"));
        List<List<double[]>> wholeRoute = lines(ExternalTool.run("ogrinfo", "-ro", unsplit.toString(), "routes"));
        assertTrue(tracks.size() > 1 && routes.size() > 1, "the demo town must need several parts at these limits");
        assertEquals(1, whole.size());
        assertEquals(turnLines, wholeRoute.get(0).size(), "one route point per direction sheet line");
        assertSplit(tracks, TRACK_LIMIT, whole.get(0));
        assertSplit(routes, ROUTE_LIMIT, wholeRoute.get(0));
        assertTrue(Files.readString(gpx).contains("never handle a device while driving"), "caution in the descriptions");
    }

    @Test
    void theWritersTallyMatchesWhatGdalReads() throws Exception {
        String summary = ExternalTool.run("ogrinfo", "-ro", "-so", "-al", gpx.toString());
        assertEquals(featureCount(summary, "track_points"), written.trackPoints());
        assertEquals(featureCount(summary, "route_points"), written.routePoints());
        assertEquals(featureCount(summary, "tracks"), written.tracks());
        assertEquals(featureCount(summary, "routes"), written.routes());
        assertEquals(featureCount(summary, "waypoints"), written.waypoints());
    }

    @Test
    void gpsbabelReadsWhatGdalReads() throws Exception {
        String summary = ExternalTool.run("ogrinfo", "-ro", "-so", "-al", gpx.toString());
        String copy = ExternalTool.run("gpsbabel", "-i", "gpx", "-f", gpx.toString(), "-o", "gpx", "-F", "-");
        assertEquals(featureCount(summary, "track_points"), occurrences(copy, "<trkpt "));
        assertEquals(featureCount(summary, "route_points"), occurrences(copy, "<rtept "));
        assertEquals(featureCount(summary, "waypoints"), occurrences(copy, "<wpt "));
        assertEquals(featureCount(summary, "tracks"), occurrences(copy, "<trk>"));
    }

    private static void assertSplit(List<List<double[]>> parts, int limit, List<double[]> whole) {
        List<double[]> joined = new ArrayList<>(parts.get(0));
        for (int p = 0; p < parts.size(); p++) {
            List<double[]> part = parts.get(p);
            assertTrue(part.size() <= limit, "part of " + part.size() + " points");
            assertTrue(p == parts.size() - 1 || part.size() == limit, "part " + p + " not full");
            if (p > 0) {
                assertArrayEquals(parts.get(p - 1).get(parts.get(p - 1).size() - 1), part.get(0), 0,
                        "part " + p + " starts where the one before ends");
                joined.addAll(part.subList(1, part.size()));
            }
        }
        assertEquals(whole.size(), joined.size());
        for (int i = 0; i < whole.size(); i++) {
            assertArrayEquals(whole.get(i), joined.get(i), 0, "point " + i);
        }
    }

    /** Points of an ogrinfo listing, in file order. */
    private static List<double[]> points(String listing) {
        List<double[]> points = new ArrayList<>();
        Matcher m = Pattern.compile("POINT \\(([-0-9.eE]+) ([-0-9.eE]+)").matcher(listing);
        while (m.find()) {
            points.add(new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))});
        }
        return points;
    }

    /** Each line feature's points of an ogrinfo listing (LINESTRING or one-part MULTILINESTRING). */
    private static List<List<double[]>> lines(String listing) {
        List<List<double[]>> lines = new ArrayList<>();
        Matcher m = Pattern.compile("LINESTRING \\(+([^)]*)\\)").matcher(listing);
        while (m.find()) {
            List<double[]> line = new ArrayList<>();
            for (String pair : m.group(1).split(",")) {
                String[] xy = pair.trim().split(" ");
                line.add(new double[] {Double.parseDouble(xy[0]), Double.parseDouble(xy[1])});
            }
            lines.add(line);
        }
        return lines;
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
