package org.streetcomb.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.streetcomb.read.TrackSegment;

/**
 * The recorded GPS tracks as a map layer: each segment's fixes joined in the order the receiver wrote
 * them, as they were recorded (before cleaning), so a supervisor sees where the vehicle really went. Fed
 * segment by segment while an audit streams its tracks; it keeps positions only (16 bytes a fix). Above
 * {@value #MOST_FIXES_DRAWN} fixes in all, only every k-th fix (and each segment's last) is drawn, with k
 * the smallest that keeps the total under that number, so a week of tracks still opens quickly; the
 * layer's note states what was drawn.
 */
public final class TrackLines implements Consumer<TrackSegment> {

    static final String COLOUR = "#1f2a30";
    /** Fixes drawn at most, over all tracks; more are thinned by a whole-number stride. */
    static final int MOST_FIXES_DRAWN = 100_000;

    private final List<Recorded> segments = new ArrayList<>();
    private long fixes;

    @Override
    public void accept(TrackSegment segment) {
        double[] positions = new double[2 * segment.size()];
        for (int i = 0; i < segment.size(); i++) {
            positions[2 * i] = segment.lon()[i];
            positions[2 * i + 1] = segment.lat()[i];
        }
        segments.add(new Recorded(segment.file().getFileName().toString(), segment.place(), positions,
                segment.time()[0], segment.time()[segment.size() - 1]));
        fixes += segment.size();
    }

    /** Fixes seen so far. */
    public long fixes() {
        return fixes;
    }

    /** Every k-th fix is drawn; 1 when all are. */
    int stride() {
        return (int) Math.max(1, (fixes + MOST_FIXES_DRAWN - 1) / MOST_FIXES_DRAWN);
    }

    /** The layer, switched off at start (it would hide the streets' colours). */
    MapLayer layer() {
        int stride = stride();
        List<MapFeature> features = new ArrayList<>();
        long drawn = 0;
        for (Recorded segment : segments) {
            double[] line = thinned(segment.positions, stride);
            drawn += line.length / 2;
            Map<String, String> details = new LinkedHashMap<>();
            details.put("File", segment.file);
            details.put("Where in the file", segment.place);
            details.put("Fixes", String.valueOf(segment.positions.length / 2));
            if (!Double.isNaN(segment.start)) {
                details.put("First fix", time(segment.start));
            }
            if (!Double.isNaN(segment.end)) {
                details.put("Last fix", time(segment.end));
            }
            features.add(new MapFeature(new double[][] {line}, null, null, segment.file + ": " + segment.place, details));
        }
        String note = stride == 1
                ? "the fixes as recorded, joined in time order; every fix drawn"
                : String.format(Locale.ROOT, "the fixes as recorded, joined in time order; every %s fix drawn "
                        + "(%,d of %,d) to keep the page quick", ordinal(stride), drawn, fixes);
        return new MapLayer("tracks", "GPS tracks", note, MapLayer.Kind.LINES, MapStyle.solid(COLOUR, 1.5, 0.7), false,
                features);
    }

    /** Every {@code stride}-th position and the last, so the line still ends where the segment did. */
    private static double[] thinned(double[] positions, int stride) {
        int n = positions.length / 2;
        if (stride == 1 || n <= 2) {
            return n == 1 ? new double[] {positions[0], positions[1], positions[0], positions[1]} : positions;
        }
        int kept = (n - 1) / stride + 1 + ((n - 1) % stride == 0 ? 0 : 1);
        double[] out = new double[2 * kept];
        int k = 0;
        for (int i = 0; i < n; i += stride) {
            out[k++] = positions[2 * i];
            out[k++] = positions[2 * i + 1];
        }
        if ((n - 1) % stride != 0) {
            out[k++] = positions[2 * n - 2];
            out[k] = positions[2 * n - 1];
        }
        return out;
    }

    private static String ordinal(int n) {
        int lastTwo = n % 100;
        String suffix = lastTwo >= 11 && lastTwo <= 13 ? "th" : switch (n % 10) {
            case 1 -> "st";
            case 2 -> "nd";
            case 3 -> "rd";
            default -> "th";
        };
        return n + suffix;
    }

    private static String time(double seconds) {
        return Instant.ofEpochMilli(Math.round(seconds * 1000)).toString();
    }

    /** One segment as recorded. */
    private record Recorded(String file, String place, double[] positions, double start, double end) {
    }
}
