package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentString;
import org.streetcomb.ExitCode;
import org.streetcomb.InputError;
import org.streetcomb.TestNetworks;
import org.streetcomb.cli.Main;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadReport;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;

/**
 * The guard against geometry whose noding explodes. Reference: k straight horizontal lines across k straight
 * vertical ones cross exactly k * k times, and noding them gives 2k(k + 1) edges (elementary geometry); the
 * pathological case is two zig-zag lines of 2,000 vertices (a 100 kB file)
 * crossing about four million times, which must be refused in seconds with one line naming the file (hostile corpus, issue 14).
 */
class CrossingLimitTest {

    private static final int K = 30;

    @TempDir
    Path dir;

    private static List<RoadFeature> lattice() {
        List<RoadFeature> lines = new ArrayList<>();
        double step = 0.001;
        for (int i = 1; i <= K; i++) {
            lines.add(TestNetworks.line("h" + i, 0, i * step, (K + 1) * step, i * step));
            lines.add(TestNetworks.line("v" + i, i * step, 0, i * step, (K + 1) * step));
        }
        return lines;
    }

    private static RoadLayer layer(List<RoadFeature> lines, long limit) {
        return new RoadLayer(Path.of("lattice.geojson"), lines, new ReadReport(lines.size(), lines.size(),
                java.util.Map.of(), 0, java.util.Map.of(), ReadReport.WGS84), null, null, limit);
    }

    @Test
    void aLatticeIsNodedUpToItsLimitAndRefusedBelowIt() {
        StreetNetwork noded = new NetworkBuilder(0.5).build(layer(lattice(), K * K));
        assertEquals(2 * K * (K + 1), noded.edgeCount(), "k*k crossings split 2k lines into 2k(k+1) edges");
        InputError refused = assertThrows(InputError.class,
                () -> new NetworkBuilder(0.5).build(layer(lattice(), K * K - 1)));
        assertTrue(refused.getMessage().startsWith("lattice.geojson: its lines cross each other mid-segment more than "
                + (K * K - 1) + " times"), refused.getMessage());
        assertEquals(2 * K * (K + 1), new NetworkBuilder(0.5).build(layer(lattice(), 0)).edgeCount(), "0: no limit");
    }

    /**
     * README's figures: the densest real layer of fixtures/ (open data, NOTICE) crosses mid-segment at most
     * 0.014 times per segment, and the zig-zag pair about four million times.
     */
    @Test
    void readmeFiguresOfCrossings() throws IOException {
        double densest = 0;
        for (String layer : new String[] {"fixtures/real/roads-seoul.geojson", "fixtures/shapefiles/aurich-dhdn-gk2/roads.shp",
                "fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp", "fixtures/shapefiles/spearfish-nad27-utm13n/roads.shp"}) {
            List<SegmentString> lines = segments(LayerReaders.read(Path.of(layer)).features());
            long segments = lines.stream().mapToLong(l -> l.size() - 1).sum();
            densest = Math.max(densest, CrossingCount.upTo(lines, Long.MAX_VALUE - 1).crossings() / (double) segments);
        }
        String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
        assertTrue(readme.contains(String.format(Locale.ROOT, "cross at most %.3f times per segment", densest)),
                "README's densest real layer: " + densest);
        long zigzag = CrossingCount.upTo(segments(LayerReaders.read(zigzag(dir)).features()), Long.MAX_VALUE - 1).crossings();
        assertTrue(zigzag > 3_900_000 && zigzag < 4_100_000, "about four million: " + zigzag);
        assertTrue(readme.contains("crossing each other about four million times"));
    }

    private static List<SegmentString> segments(List<RoadFeature> features) {
        LocalFrame frame = LocalFrame.covering(features);
        List<SegmentString> lines = new ArrayList<>();
        for (RoadFeature f : features) {
            Coordinate[] c = f.line().getCoordinates();
            Coordinate[] p = new Coordinate[c.length];
            for (int i = 0; i < c.length; i++) {
                p[i] = new Coordinate(frame.x(c[i].x), frame.y(c[i].y));
            }
            lines.add(new NodedSegmentString(p, null));
        }
        return lines;
    }

    /** Two zig-zag lines of 2,000 vertices over the same 0.01-degree square, written as GeoJSON (100 kB). */
    private static Path zigzag(Path dir) throws IOException {
        int n = 2000;
        StringBuilder a = new StringBuilder();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            String sep = i == 0 ? "" : ",";
            a.append(sep).append(String.format(Locale.ROOT, "[%.7f,%.7f]", -31.2 + 0.01 * i / n, 44.6 + (i % 2) * 0.01));
            b.append(sep).append(String.format(Locale.ROOT, "[%.7f,%.7f]", -31.2 + (i % 2) * 0.01, 44.6 + 0.01 * i / n));
        }
        Path file = dir.resolve("zigzag.geojson");
        Files.writeString(file, "{\"type\":\"FeatureCollection\",\"features\":["
                + "{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[" + a + "]}},"
                + "{\"type\":\"Feature\",\"properties\":{},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[" + b + "]}}]}");
        return file;
    }

    @Test
    void twoZigZagLinesAreRefusedInSecondsNamingTheFile() throws IOException {
        Path file = zigzag(dir);
        StringWriter err = new StringWriter();
        int code = assertTimeoutPreemptively(Duration.ofSeconds(20), () -> Main.run(new String[] {"plan", file.toString()},
                new PrintWriter(new StringWriter(), true), new PrintWriter(err, true)));
        assertEquals(ExitCode.BAD_INPUT, code, err.toString());
        assertTrue(err.toString().startsWith("streetcomb: " + file + ": its lines cross each other mid-segment"), err.toString());
        assertEquals(1, err.toString().lines().count());
    }
}
