package org.streetcomb.network;

import java.util.List;
import org.locationtech.jts.algorithm.RobustLineIntersector;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.noding.MCIndexNoder;
import org.locationtech.jts.noding.SegmentIntersector;
import org.locationtech.jts.noding.SegmentString;

/**
 * Counts the places where a layer's lines cross in the middle of their segments, and stops at a limit: the
 * guard against geometry whose noding would explode (two zig-zag lines of a few thousand vertices can cross
 * a million times, and noding them would make millions of edges and gigabytes). Real street layers cross a
 * few times per line at most (their junctions are mostly shared vertices), so the limit in
 * {@link NetworkBuilder} is generous for them.
 *
 * <p>JTS's monotone-chain index ({@link MCIndexNoder}) finds the candidate segment pairs, and a
 * {@link RobustLineIntersector} tests each; the index asks {@link SegmentIntersector#isDone()} between chains,
 * so the count costs O(n log n + limit) time and O(n) memory, whatever the geometry would have become. The
 * network build counts during its own noding ({@link #watching}), which then stops at the limit, rather than
 * in a pass of its own: on a million streets that pass took a third of the network stage.
 */
final class CrossingCount {

    private CrossingCount() {
    }

    /** The proper crossings among {@code lines}, or a number above {@code limit} as soon as there are more. */
    static Result upTo(List<SegmentString> lines, long limit) {
        Counter counter = new Counter(limit, null);
        MCIndexNoder index = new MCIndexNoder(counter);
        index.computeNodes(lines);
        return counter.result();
    }

    /**
     * A noding's intersector that also counts the proper crossings it is shown, and declares the noding done
     * as soon as they pass {@code limit}; {@code result} gives the count once the noding has run.
     */
    static Counter watching(SegmentIntersector noding, long limit) {
        return new Counter(limit, noding);
    }

    /** The count, and the first crossing found (in the lines' plane), or null when there is none. */
    record Result(long crossings, Coordinate first) {
    }

    /** Counts proper crossings, passing every segment pair on to the noding it watches, if any. */
    static final class Counter implements SegmentIntersector {
        private final RobustLineIntersector intersector = new RobustLineIntersector();
        private final long limit;
        private final SegmentIntersector noding;
        private long crossings;
        private Coordinate first;

        private Counter(long limit, SegmentIntersector noding) {
            this.limit = limit;
            this.noding = noding;
        }

        Result result() {
            return new Result(crossings, first);
        }

        @Override
        public void processIntersections(SegmentString a, int i, SegmentString b, int j) {
            if (noding != null) {
                noding.processIntersections(a, i, b, j);
            }
            if (a == b && Math.abs(i - j) <= 1) {
                return; // neighbouring segments of one line meet at their shared vertex
            }
            Coordinate[] p = a.getCoordinates();
            Coordinate[] q = b.getCoordinates();
            intersector.computeIntersection(p[i], p[i + 1], q[j], q[j + 1]);
            if (intersector.hasIntersection() && intersector.isProper()) {
                if (first == null) {
                    first = intersector.getIntersection(0).copy();
                }
                crossings++;
            }
        }

        @Override
        public boolean isDone() {
            return crossings > limit || noding != null && noding.isDone();
        }
    }
}
