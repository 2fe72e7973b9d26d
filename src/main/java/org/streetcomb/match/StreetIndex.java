package org.streetcomb.match;

import java.util.Arrays;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds the streets near a GPS fix: for every edge with a point within the search radius, the nearest point
 * of the edge's polyline, its distance and its offset along the edge. The edges' segments sit in a JTS
 * {@link STRtree} in a {@link LocalFrame} around the network, so a query costs O(log S + k) for S segments
 * and k hits. Offsets are measured in the plane and scaled to the edge's geodesic length, so they add up
 * with {@link StreetNetwork#length}. Build once per network; queries are not thread-safe.
 */
public final class StreetIndex {

    /** The nearest points of the edges near a fix, in edge id order. */
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
    private final double[] best;
    private final double[] bestOffset;
    private final double[] bestX;
    private final double[] bestY;
    private final int[] bestStamp;
    private int stamp;
    private int[] found = new int[16];

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
        best = new double[m];
        bestOffset = new double[m];
        bestX = new double[m];
        bestY = new double[m];
        bestStamp = new int[m];
    }

    /** The plane the index works in. */
    public LocalFrame frame() {
        return frame;
    }

    /** Edges with a point within {@code radius} metres of the plane point (px, py). */
    public Hits near(double px, double py, double radius) {
        stamp++;
        int[] count = {0};
        Envelope box = new Envelope(px - radius, px + radius, py - radius, py + radius);
        tree.query(box, item -> {
            int p = (Integer) item;
            int e = edgeOfPoint(p);
            double ax = x[p], ay = y[p], bx = x[p + 1], by = y[p + 1];
            double dx = bx - ax, dy = by - ay;
            double len2 = dx * dx + dy * dy;
            double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
            double d = Math.hypot(ax + t * dx - px, ay + t * dy - py);
            if (d > radius) {
                return;
            }
            if (bestStamp[e] != stamp) {
                bestStamp[e] = stamp;
                best[e] = Double.POSITIVE_INFINITY;
                if (count[0] == found.length) {
                    found = Arrays.copyOf(found, 2 * found.length);
                }
                found[count[0]++] = e;
            }
            if (d < best[e]) {
                best[e] = d;
                bestOffset[e] = (along[p] + t * (along[p + 1] - along[p])) * scale[e];
                bestX[e] = ax + t * dx;
                bestY[e] = ay + t * dy;
            }
        });
        int k = count[0];
        int[] edges = Arrays.copyOf(found, k);
        Arrays.sort(edges);
        double[] offsets = new double[k];
        double[] distances = new double[k];
        double[] nearX = new double[k];
        double[] nearY = new double[k];
        for (int i = 0; i < k; i++) {
            offsets[i] = Math.min(bestOffset[edges[i]], network.length(edges[i]));
            distances[i] = best[edges[i]];
            nearX[i] = bestX[edges[i]];
            nearY[i] = bestY[edges[i]];
        }
        return new Hits(k, edges, offsets, distances, nearX, nearY);
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
