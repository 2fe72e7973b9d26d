package org.streetcomb.match;

import java.util.Arrays;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds the streets near a GPS fix: for every edge with a point within the search radius, the nearest point
 * of each of the edge's passes near the fix (a local minimum of the distance along the polyline), its
 * distance and its offset along the edge. The edges' segments sit in a JTS
 * {@link STRtree} in a {@link LocalFrame} around the network, so a query costs O(log S + k) for S segments
 * and k hits. Offsets are measured in the plane and scaled to the edge's geodesic length, so they add up
 * with {@link StreetNetwork#length}. Build once per network; queries are not thread-safe.
 */
public final class StreetIndex {

    /** The nearest points of the edges near a fix, in edge id order (an edge twice where it passes twice). */
    public record Hits(int count, int[] edge, double[] offset, double[] distance, double[] nearX, double[] nearY) {
    }

    private final StreetNetwork network;
    private final LocalFrame frame;
    private final STRtree tree = new STRtree();
    private final double[] x;
    private final double[] y;
    /** Planar distance from the edge's first point to each of its points. */
    private final double[] along;
    private final int[] firstPoint;
    private final double[] scale;
    /** The segments found by the last query: packed start point, position on it (0-1), distance. */
    private int[] segment = new int[64];
    private double[] segmentT = new double[64];
    private double[] segmentD = new double[64];
    /**
     * Two nearest points of one edge are separate passes when the line between them runs at least this many
     * metres farther from the fix than either: less is the wobble of a digitised line.
     */
    static final double SEPARATE_PASSES = 2;

    public StreetIndex(StreetNetwork network) {
        this.network = network;
        this.frame = LocalFrame.covering(network);
        int m = network.edgeCount();
        firstPoint = new int[m + 1];
        for (int e = 0; e < m; e++) {
            firstPoint[e + 1] = firstPoint[e] + network.pointCount(e);
        }
        int points = firstPoint[m];
        x = new double[points];
        y = new double[points];
        along = new double[points];
        scale = new double[m];
        for (int e = 0; e < m; e++) {
            int p0 = firstPoint[e];
            for (int k = 0; k < network.pointCount(e); k++) {
                x[p0 + k] = frame.x(network.pointLon(e, k));
                y[p0 + k] = frame.y(network.pointLat(e, k));
                if (k > 0) {
                    along[p0 + k] = along[p0 + k - 1] + Math.hypot(x[p0 + k] - x[p0 + k - 1], y[p0 + k] - y[p0 + k - 1]);
                    tree.insert(new Envelope(x[p0 + k - 1], x[p0 + k], y[p0 + k - 1], y[p0 + k]), p0 + k - 1);
                }
            }
            double planar = along[firstPoint[e + 1] - 1];
            scale[e] = planar > 0 ? network.length(e) / planar : 0;
        }
        tree.build();
    }

    /** The plane the index works in. */
    public LocalFrame frame() {
        return frame;
    }

    /**
     * The nearest point of each pass of an edge within {@code radius} metres of the plane point (px, py):
     * one hit for most edges, one per leg where an edge bends back near itself (a hairpin, a loop), since
     * a fix on one leg is not explained by the nearest point of the other.
     */
    public Hits near(double px, double py, double radius) {
        int[] count = {0};
        Envelope box = new Envelope(px - radius, px + radius, py - radius, py + radius);
        tree.query(box, item -> {
            int p = (Integer) item;
            double ax = x[p], ay = y[p], bx = x[p + 1], by = y[p + 1];
            double dx = bx - ax, dy = by - ay;
            double len2 = dx * dx + dy * dy;
            double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
            double d = Math.hypot(ax + t * dx - px, ay + t * dy - py);
            if (d > radius) {
                return;
            }
            int n = count[0]++;
            if (n == segment.length) {
                segment = Arrays.copyOf(segment, 2 * n);
                segmentT = Arrays.copyOf(segmentT, 2 * n);
                segmentD = Arrays.copyOf(segmentD, 2 * n);
            }
            segment[n] = p;
            segmentT[n] = t;
            segmentD[n] = d;
        });
        int n = count[0];
        // segments are packed edge after edge, so segment order is edge order, then order along the edge
        long[] keys = new long[n];
        for (int i = 0; i < n; i++) {
            keys[i] = (long) segment[i] << 32 | i;
        }
        Arrays.sort(keys);
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = (int) keys[i];
        }
        Hits hits = new Hits(0, new int[n], new double[n], new double[n], new double[n], new double[n]);
        int k = 0;
        int kept = -1;
        double bump = 0;
        for (int r = 0; r < n; r++) {
            int i = order[r];
            int p = segment[i];
            int e = edgeOfPoint(p);
            boolean joinsPrevious = r > 0 && segment[order[r - 1]] == p - 1 && edgeOfPoint(p - 1) == e;
            boolean joinsNext = r + 1 < n && segment[order[r + 1]] == p + 1 && edgeOfPoint(p + 1) == e;
            if (kept >= 0 && hits.edge()[kept] == e) {
                bump = joinsPrevious ? Math.max(bump, segmentD[i]) : Double.POSITIVE_INFINITY;
            }
            boolean minimum = (!joinsPrevious || segmentD[order[r - 1]] > segmentD[i])
                    && (!joinsNext || segmentD[order[r + 1]] >= segmentD[i]);
            if (!minimum) {
                continue;
            }
            double offset = Math.min((along[p] + segmentT[i] * (along[p + 1] - along[p])) * scale[e], network.length(e));
            double nx = x[p] + segmentT[i] * (x[p + 1] - x[p]);
            double ny = y[p] + segmentT[i] * (y[p + 1] - y[p]);
            boolean newPass = kept < 0 || hits.edge()[kept] != e
                    || bump >= Math.max(hits.distance()[kept], segmentD[i]) + SEPARATE_PASSES;
            if (!newPass && segmentD[i] >= hits.distance()[kept]) {
                continue;
            }
            int at = newPass ? k++ : kept;
            hits.edge()[at] = e;
            hits.offset()[at] = offset;
            hits.distance()[at] = segmentD[i];
            hits.nearX()[at] = nx;
            hits.nearY()[at] = ny;
            kept = at;
            bump = segmentD[i];
        }
        return new Hits(k, hits.edge(), hits.offset(), hits.distance(), hits.nearX(), hits.nearY());
    }

    private int edgeOfPoint(int p) {
        int e = Arrays.binarySearch(firstPoint, p);
        if (e >= 0) {
            // several edges cannot start at the same packed index: every edge has at least two points
            return e;
        }
        return -e - 2;
    }

}
