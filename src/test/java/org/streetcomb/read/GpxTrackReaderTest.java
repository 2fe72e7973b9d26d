package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.InputError;

/** The GPX track reader against GDAL's GPX driver on real recordings, and on hostile or broken files. */
class GpxTrackReaderTest {

    /** Real car drive, GPX 1.1 from a Garmin unit (gpxpy test data, Apache-2.0; see NOTICE). */
    private static final Path CAR = Path.of("fixtures/gpx/around-visnjan-with-car.gpx");
    /** Real walk, GPX 1.0 written by GPSBabel, 8 tracks and 7 waypoints (gpxpy test data, Apache-2.0). */
    private static final Path WALK = Path.of("fixtures/gpx/cerknicko-jezero.gpx");

    @TempDir
    Path dir;

    private static List<TrackSegment> read(Path file, int window) {
        List<TrackSegment> segments = new ArrayList<>();
        new GpxTrackReader(window).read(file, segments::add);
        return segments;
    }

    @Test
    void carDriveHasGdalsPointCountFirstAndLastTimeAndLastPosition() {
        List<TrackSegment> segments = read(CAR, GpxTrackReader.DEFAULT_WINDOW);
        assertEquals(1, segments.size());
        TrackSegment s = segments.get(0);
        String count = Gdal.ogrinfo(CAR.toString(), "-sql", "SELECT COUNT(*) AS n FROM track_points");
        assertEquals((int) Gdal.number(count, "n"), s.size());
        String last = Gdal.ogrinfo(CAR.toString(), "-sql",
                "SELECT time FROM track_points WHERE track_seg_point_id = " + (s.size() - 1));
        Matcher point = Pattern.compile("POINT \\(([-0-9.]+) ([-0-9.]+)\\)").matcher(last);
        assertTrue(point.find(), last);
        assertEquals(Double.parseDouble(point.group(1)), s.lon()[s.size() - 1], 1e-9);
        assertEquals(Double.parseDouble(point.group(2)), s.lat()[s.size() - 1], 1e-9);
        // the times GDAL prints for the first and last fix (2020/12/18 06:15:50+00 and 06:24:24+00)
        assertEquals(Instant.parse("2020-12-18T06:15:50Z").getEpochSecond(), s.time()[0], 1e-6);
        assertEquals(Instant.parse("2020-12-18T06:24:24Z").getEpochSecond(), s.time()[s.size() - 1], 1e-6);
    }

    @Test
    void walkInGpx10HasGdalsTrackPointAndWaypointCounts() {
        List<TrackSegment> segments = new ArrayList<>();
        GpxContents contents = new GpxTrackReader().read(WALK, segments::add);
        int points = segments.stream().mapToInt(TrackSegment::size).sum();
        assertEquals((int) Gdal.number(Gdal.ogrinfo(WALK.toString(), "-sql", "SELECT COUNT(*) AS n FROM track_points"), "n"), points);
        assertEquals((int) Gdal.number(Gdal.ogrinfo(WALK.toString(), "-sql", "SELECT COUNT(*) AS n FROM tracks"), "n"),
                contents.tracks());
        assertEquals((int) Gdal.number(Gdal.ogrinfo(WALK.toString(), "-sql", "SELECT COUNT(*) AS n FROM waypoints"), "n"),
                contents.waypoints());
        assertEquals(points, contents.points());
    }

    @Test
    void eachSegmentNamesItsTrackAsGdalReadsItAndNotAWaypointsName() {
        // the walk has 8 named tracks and 7 named waypoints (GDAL: tracks and waypoints layers)
        List<String> names = new ArrayList<>();
        Matcher name = Pattern.compile("name \\(String\\) = (.*)").matcher(
                Gdal.ogrinfo(WALK.toString(), "-sql", "SELECT name FROM tracks"));
        while (name.find()) {
            names.add(name.group(1).strip());
        }
        assertEquals(8, names.size(), names.toString());
        List<TrackSegment> segments = read(WALK, GpxTrackReader.DEFAULT_WINDOW);
        Pattern place = Pattern.compile("track (\\d+) \\((.*)\\), segment \\d+");
        List<String> seen = new ArrayList<>();
        for (TrackSegment segment : segments) {
            Matcher m = place.matcher(segment.place());
            assertTrue(m.matches(), segment.place());
            assertEquals(names.get(Integer.parseInt(m.group(1)) - 1), m.group(2), segment.place());
            if (!seen.contains(m.group(2))) {
                seen.add(m.group(2));
            }
        }
        // the first track's one segment holds no fix, so it is not handed on
        assertEquals(names.subList(1, names.size()), seen, "every other track's segments carry its name, in order");
    }

    @Test
    void longSegmentsArriveInWindowsThatShareTheirBoundaryFix() throws IOException {
        Path file = write("<gpx><trk><trkseg>" + points(7) + "</trkseg><trkseg>" + points(1) + "</trkseg></trk></gpx>");
        List<TrackSegment> windows = read(file, 3);
        // 7 fixes in windows of 3 sharing ends: 0-2, 2-4, 4-6; then the one-fix segment
        assertEquals(4, windows.size());
        assertEquals(List.of(3, 3, 3, 1), windows.stream().map(TrackSegment::size).toList());
        assertEquals(windows.get(0).lon()[2], windows.get(1).lon()[0]);
        assertEquals(windows.get(1).lon()[2], windows.get(2).lon()[0]);
        assertEquals(6 * 0.001, windows.get(2).lon()[2], 1e-12);
        assertTrue(Double.isNaN(windows.get(3).time()[0]), "a fix without <time> has no time");
    }

    @Test
    void aDoctypeWithAnExternalEntityIsRefusedBeforeAnythingIsRead() throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "do not read");
        Path file = write("<?xml version=\"1.0\"?>\n<!DOCTYPE gpx [<!ENTITY x SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<gpx><trk><name>&x;</name><trkseg>" + points(2) + "</trkseg></trk></gpx>");
        InputError e = assertThrows(InputError.class, () -> read(file, 10));
        assertTrue(e.getMessage().startsWith(file + ": line 2: "), e.getMessage());
        assertTrue(e.getMessage().contains("DOCTYPE"), e.getMessage());
        assertTrue(!e.getMessage().contains("do not read"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "''|empty file",
        "this is not xml|not well-formed XML",
        "<kml><Document/></kml>|root element is <kml>",
        "<gpx><trk><trkseg><trkpt lon=\"10\"/></trkseg></trk></gpx>|without a lat attribute",
        "<gpx><trk><trkseg><trkpt lat=\"95\" lon=\"10\"/></trkseg></trk></gpx>|lat=\"95\" is outside [-90, 90]",
        "<gpx><trk><trkseg><trkpt lat=\"x\" lon=\"10\"/></trkseg></trk></gpx>|lat=\"x\" is not a number",
        "<gpx><trk><trkseg><trkpt lat=\"1\" lon=\"10\"><time>yesterday</time></trkpt></trkseg></trk></gpx>|is not an ISO 8601",
        "<gpx><trk><trkpt lat=\"1\" lon=\"10\"/></trk></gpx>|outside a <trkseg>",
        "<gpx><trk><trkseg><trkpt lat=\"1\" lon=\"10\"></trkseg></trk></gpx>|not well-formed XML",
    })
    void brokenFilesGiveOneLineNamingTheFile(String content, String expected) throws IOException {
        Path file = write(content);
        InputError e = assertThrows(InputError.class, () -> read(file, 10));
        assertTrue(e.getMessage().startsWith(file.toString() + ": "), e.getMessage());
        assertTrue(e.getMessage().contains(expected), e.getMessage());
        assertEquals(1, e.getMessage().lines().count(), e.getMessage());
    }

    private static String points(int n) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            b.append("<trkpt lat=\"45.0\" lon=\"").append(i * 0.001).append("\"></trkpt>");
        }
        return b.toString();
    }

    private Path write(String content) throws IOException {
        Path file = Files.createTempFile(dir, "track", ".gpx");
        Files.writeString(file, content);
        return file;
    }
}
