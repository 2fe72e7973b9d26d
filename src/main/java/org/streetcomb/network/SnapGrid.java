package org.streetcomb.network;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.noding.MCIndexNoder;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentString;
import org.locationtech.jts.noding.snap.SnappingIntersectionAdder;
import org.locationtech.jts.noding.snap.SnappingNoder;
import org.locationtech.jts.noding.snap.SnappingPointIndex;

/**
 * The snap points of a layer in a hash grid of cells as wide as the snap tolerance: a point snaps to the
 * nearest point already held within the tolerance, else it is added (first come, first kept, as in JTS's
 * snap noding). A lookup reads the 3 × 3 cells around the point, so it costs O(1) expected whatever the
 * order and spacing of the points.
 *
 * <p>Why not JTS's own index: {@link SnappingNoder} keeps its snap points in a KdTree, which does not
 * balance itself and splits on exact coordinates. Street layers are sorted (by street, by tile) and drawn
 * on straight lines, so many points share an x or a y; the tree grows long chains, and near a junction
 * its range queries must search both sides of every node on the same street line. On the million-edge
 * grid of docs/benchmarks.md the snapping took most of the network stage, and still about 13 s of it
 * when the tree was filled in a shuffled order (depth 45). This class plugs into JTS's noding in the
 * KdTree's place ({@link #node}), so vertices and intersections snap as JTS snaps them.
 */
final class SnapGrid extends SnappingPointIndex {

    private final double tolerance;
    private final List<Coordinate> points = new ArrayList<>();
    private int[] nextInCell = new int[16];
    // open addressing: cell (x, y) -> its last point, -1 where empty
    private long[] cellX = new long[1 << 10];
    private long[] cellY = new long[1 << 10];
    private int[] cellHead = filled(1 << 10);
    private int cells;

    SnapGrid(double tolerance) {
        super(tolerance);
        this.tolerance = tolerance;
    }

    /**
     * JTS's snap noding with this grid as its index: vertices snap in input order, then the lines are noded
     * with a monotone-chain index and their intersections snapped ({@link SnappingIntersectionAdder}, with
     * twice the tolerance as overlap, as {@link SnappingNoder} does). The pieces carry their line's data.
     * The proper crossings are counted on the way ({@link CrossingCount#watching}), and the noding stops
     * as soon as they pass {@code crossingLimit}.
     */
    static Noding node(List<SegmentString> input, double tolerance, long crossingLimit) {
        SnapGrid grid = new SnapGrid(tolerance);
        List<NodedSegmentString> snapped = new ArrayList<>(input.size());
        for (SegmentString line : input) {
            List<Coordinate> coords = new ArrayList<>(line.size());
            for (Coordinate c : line.getCoordinates()) {
                Coordinate p = grid.snap(c);
                if (coords.isEmpty() || !coords.get(coords.size() - 1).equals2D(p)) {
                    coords.add(p);
                }
            }
            snapped.add(new NodedSegmentString(coords.toArray(new Coordinate[0]), line.getData()));
        }
        CrossingCount.Counter crossings = CrossingCount.watching(new SnappingIntersectionAdder(tolerance, grid),
                crossingLimit);
        MCIndexNoder noder = new MCIndexNoder(crossings, 2 * tolerance);
        noder.computeNodes(snapped);
        @SuppressWarnings("unchecked")
        Collection<SegmentString> pieces = noder.getNodedSubstrings();
        return new Noding(pieces, crossings.result());
    }

    /** The noded pieces, and the proper crossings counted while noding (complete up to the limit). */
    record Noding(Collection<SegmentString> pieces, CrossingCount.Result crossings) {
    }

    @Override
    public Coordinate snap(Coordinate p) {
        return points.get(snapId(p));
    }

    /** The id (order of addition) of the point {@code p} snaps to, adding {@code p} if none is near. */
    int snapId(Coordinate p) {
        long cx = (long) Math.floor(p.x / tolerance);
        long cy = (long) Math.floor(p.y / tolerance);
        int best = -1;
        double bestDistance = tolerance;
        for (long x = cx - 1; x <= cx + 1; x++) {
            for (long y = cy - 1; y <= cy + 1; y++) {
                for (int q = cellHead[slot(x, y)]; q >= 0; q = nextInCell[q]) {
                    double d = p.distance(points.get(q));
                    if (d < bestDistance || d == bestDistance && (best < 0 || q < best)) {
                        best = q;
                        bestDistance = d;
                    }
                }
            }
        }
        return best >= 0 ? best : add(p, cx, cy);
    }

    /** How many points it holds. */
    int size() {
        return points.size();
    }

    /** The point of an id. */
    Coordinate point(int id) {
        return points.get(id);
    }

    private int add(Coordinate p, long cx, long cy) {
        int id = points.size();
        points.add(p);
        if (id == nextInCell.length) {
            nextInCell = Arrays.copyOf(nextInCell, 2 * id);
        }
        int s = slot(cx, cy);
        boolean newCell = cellHead[s] < 0;
        cellX[s] = cx;
        cellY[s] = cy;
        nextInCell[id] = cellHead[s];
        cellHead[s] = id;
        if (newCell && 2 * ++cells > cellHead.length) {
            grow();
        }
        return id;
    }

    /** The slot of cell (x, y): where it is held, or the empty slot where it would go (linear probing). */
    private int slot(long x, long y) {
        int mask = cellHead.length - 1;
        int s = (int) (mix(x * 0x9E3779B97F4A7C15L + y) & mask);
        while (cellHead[s] >= 0 && (cellX[s] != x || cellY[s] != y)) {
            s = (s + 1) & mask;
        }
        return s;
    }

    private void grow() {
        long[] oldX = cellX;
        long[] oldY = cellY;
        int[] oldHead = cellHead;
        cellX = new long[2 * oldHead.length];
        cellY = new long[2 * oldHead.length];
        cellHead = filled(2 * oldHead.length);
        for (int s = 0; s < oldHead.length; s++) {
            if (oldHead[s] >= 0) {
                int t = slot(oldX[s], oldY[s]);
                cellX[t] = oldX[s];
                cellY[t] = oldY[s];
                cellHead[t] = oldHead[s];
            }
        }
    }

    private static long mix(long z) { // SplitMix64's finaliser
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    private static int[] filled(int n) {
        int[] a = new int[n];
        Arrays.fill(a, -1);
        return a;
    }
}
