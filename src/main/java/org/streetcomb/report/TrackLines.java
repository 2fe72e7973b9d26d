package org.streetcomb.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.streetcomb.read.TrackSegment;

/**
 * The recorded GPS tracks as a map layer: each segment's fixes joined in the order the receiver wrote
 * them, as they were recorded (before cleaning), so a supervisor sees where the vehicle really went. Fed
 * segment by segment while an audit streams its tracks. It keeps every k-th fix of the whole recording
 * (and each segment's first and last), doubling k whenever more than {@value #MOST_FIXES_DRAWN} would be
 * kept, so memory and the page stay bounded however long the tracks are, as the audit's streaming promises;
 * the layer's note states what was drawn.
 */
public final class TrackLines implements Consumer<TrackSegment> {

    static final String COLOUR = MapPalette.TRACKS;
    /** Fixes drawn at most, over all tracks; more are thinned by a whole-number stride. */
    static final int MOST_FIXES_DRAWN = 100_000;

    private final List<Recorded> segments = new ArrayList<>();
    private long fixes;
    private long kept;
    private long stride = 1;

    @Override
    public void accept(TrackSegment segment) {
        int n = segment.size();
        Recorded recorded = new Recorded(segment.file().getFileName().toString(), segment.place(), n, segment.time()[0],
                segment.time()[n - 1]);
        for (int i = 0; i < n; i++) {
            if (i == 0 || i == n - 1 || (fixes + i) % stride == 0) {
                recorded.add(segment.lon()[i], segment.lat()[i], fixes + i);
            }
        }
        segments.add(recorded);
        fixes += n;
        kept += recorded.size;
        // more segments than the cap can hold keep only their ends: then doubling would not help
        while (kept > MOST_FIXES_DRAWN && stride < fixes) {
            stride *= 2;
            kept = 0;
            for (Recorded r : segments) {
                r.keepEvery(stride);
                kept += r.size;
            }
        }
    }

    /** Fixes seen so far. */
    public long fixes() {
        return fixes;
    }

    /** The layer, switched off at start (it would hide the streets' colours). */
    MapLayer layer() {
        List<MapFeature> features = new ArrayList<>();
        for (Recorded segment : segments) {
            double[] line = segment.size == 1 ? new double[] {segment.positions[0], segment.positions[1],
                segment.positions[0], segment.positions[1]} : Arrays.copyOf(segment.positions, 2 * segment.size);
            Map<String, String> details = new LinkedHashMap<>();
            details.put("File", segment.file);
            details.put("Where in the file", segment.place);
            details.put("Fixes", String.valueOf(segment.fixes));
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
                        + "(%,d of %,d) to keep the page quick", ordinal(stride), kept, fixes);
        return new MapLayer("tracks", "GPS tracks", note, MapLayer.Kind.LINES, MapStyle.solid(COLOUR, 1.5, 0.7), false,
                features);
    }

    private static String ordinal(long n) {
        long lastTwo = n % 100;
        String suffix = lastTwo >= 11 && lastTwo <= 13 ? "th" : switch ((int) (n % 10)) {
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

    /** The fixes kept of one segment: positions and their index in the whole recording. */
    private static final class Recorded {
        final String file;
        final String place;
        final int fixes;
        final double start;
        final double end;
        double[] positions = new double[16];
        long[] index = new long[8];
        int size;

        Recorded(String file, String place, int fixes, double start, double end) {
            this.file = file;
            this.place = place;
            this.fixes = fixes;
            this.start = start;
            this.end = end;
        }

        void add(double lon, double lat, long at) {
            if (size == index.length) {
                index = Arrays.copyOf(index, 2 * size);
                positions = Arrays.copyOf(positions, 4 * size);
            }
            positions[2 * size] = lon;
            positions[2 * size + 1] = lat;
            index[size++] = at;
        }

        /** Drops the fixes not on the coarser stride, keeping the segment's first and last. */
        void keepEvery(long stride) {
            int k = 0;
            for (int i = 0; i < size; i++) {
                if (i == 0 || i == size - 1 || index[i] % stride == 0) {
                    positions[2 * k] = positions[2 * i];
                    positions[2 * k + 1] = positions[2 * i + 1];
                    index[k++] = index[i];
                }
            }
            size = k;
        }
    }
}
