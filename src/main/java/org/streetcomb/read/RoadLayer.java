package org.streetcomb.read;

import java.nio.file.Path;
import java.util.List;

/**
 * The road lines read from one file, with the reader's account of what it kept and skipped.
 *
 * @param endNodes null for a geometric layer, whose lines are joined where they meet; for a layer with
 *                 its own topology (OpenStreetMap), the node ids where each line starts and ends
 *                 ({@code 2 * i} and {@code 2 * i + 1} for line i): lines join only at equal ids
 */
public record RoadLayer(Path source, List<RoadFeature> features, ReadReport report, long[] endNodes) {

    public RoadLayer(Path source, List<RoadFeature> features, ReadReport report) {
        this(source, features, report, null);
    }

    public boolean hasTopology() {
        return endNodes != null;
    }
}
