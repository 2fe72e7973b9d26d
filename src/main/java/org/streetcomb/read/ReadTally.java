package org.streetcomb.read;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** Collects a reader's kept lines and its counts of what it skipped, then makes the {@link RoadLayer}. */
final class ReadTally {

    private final List<RoadFeature> lines = new ArrayList<>();
    private final Map<String, Integer> skipped = new TreeMap<>();
    private final Map<String, Integer> notes = new TreeMap<>();
    private int features;
    private int oneWay;

    /** Counts a feature of the layer and returns its 1-based number. */
    int feature() {
        return ++features;
    }

    int features() {
        return features;
    }

    void skip(String reason) {
        skipped.merge(reason, 1, Integer::sum);
    }

    void note(String what) {
        notes.merge(what, 1, Integer::sum);
    }

    void keep(RoadFeature line) {
        lines.add(line);
        if (line.travel().oneWay()) {
            oneWay++;
        }
    }

    boolean isEmpty() {
        return lines.isEmpty();
    }

    String skippedText() {
        return skipped.toString();
    }

    RoadLayer layer(Path file, String sourceCrs) {
        return layer(file, sourceCrs, null);
    }

    /** @param endNodes for a layer with its own topology, the start and end node ids of each line */
    RoadLayer layer(Path file, String sourceCrs, long[] endNodes) {
        return new RoadLayer(file, List.copyOf(lines),
                new ReadReport(features, lines.size(), skipped, oneWay, notes, sourceCrs), endNodes);
    }
}
