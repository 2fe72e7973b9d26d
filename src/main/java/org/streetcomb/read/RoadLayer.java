package org.streetcomb.read;

import java.nio.file.Path;
import java.util.List;

/**
 * The road lines read from one file, with the reader's account of what it kept and skipped.
 *
 * @param endNodes        null for a geometric layer, whose lines are joined where they meet; for a layer
 *                        with its own topology (OpenStreetMap), the node ids where each line starts and
 *                        ends ({@code 2 * i} and {@code 2 * i + 1} for line i): lines join only at equal ids
 * @param gradeSeparation null to join a geometric layer wherever its lines cross or touch; else join
 *                        only at shared vertices, honouring the level field if it names one
 * @param crossingLimit   most crossings in the middle of segments that noding may split at:
 *                        {@link #AUTOMATIC_CROSSINGS} for the default, 0 for no limit
 */
public record RoadLayer(Path source, List<RoadFeature> features, ReadReport report, long[] endNodes,
                        GradeSeparation gradeSeparation, long crossingLimit) {

    /** The default crossing limit: generous for real street layers, see {@code NetworkBuilder}. */
    public static final long AUTOMATIC_CROSSINGS = -1;

    /** @param levelField attribute giving each line's level (z-level, layer), or null */
    public record GradeSeparation(String levelField) {
    }

    public RoadLayer(Path source, List<RoadFeature> features, ReadReport report) {
        this(source, features, report, null, null, AUTOMATIC_CROSSINGS);
    }

    public RoadLayer(Path source, List<RoadFeature> features, ReadReport report, long[] endNodes) {
        this(source, features, report, endNodes, null, AUTOMATIC_CROSSINGS);
    }

    public boolean hasTopology() {
        return endNodes != null;
    }

    /** This layer, to be joined only at shared vertices. */
    public RoadLayer gradeSeparated(String levelField) {
        return new RoadLayer(source, features, report, endNodes, new GradeSeparation(levelField), crossingLimit);
    }

    /** This layer, noded with at most {@code limit} crossings (0: no limit). */
    public RoadLayer withCrossingLimit(long limit) {
        return new RoadLayer(source, features, report, endNodes, gradeSeparation, limit);
    }
}
