package org.streetcomb.network;

import java.util.Arrays;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import net.sf.geographiclib.GeodesicMask;

/**
 * A network with some of its edges cut into pieces at given offsets (metres along each edge's digitised
 * direction), so that part of a street can be treated differently from the rest of it.
 *
 * <p>The original nodes keep their ids; each cut adds a node, numbered after them in edge order. The pieces
 * of an edge are consecutive edge ids in digitised order, keep the edge's direction, travel, required flag
 * and source feature, and carry their part of its polyline. A cut point is placed on the geodesic of the
 * polyline segment it falls in, at the given distance from the segment's start (Karney 2013, through
 * GeographicLib), so the geodesic lengths of the pieces add up to the edge's length to within nanometres.
 * O(edges + points + cuts).
 *
 * @param network  the cut network
 * @param parent   for each piece, the edge of the original network it is part of
 * @param start    for each piece, the offset of its first point along its parent edge, metres
 * @param end      for each piece, the offset of its last point, metres
 */
public record SplitNetwork(StreetNetwork network, int[] parent, double[] start, double[] end) {

    /** Cuts closer than this to each other or to an edge's end are left out: they would make a piece of nothing. */
    public static final double SHORTEST_PIECE = 0.01;

    /**
     * @param cuts for each edge, the offsets to cut it at in increasing order, or null (or empty) to keep it whole
     */
    public static SplitNetwork of(StreetNetwork network, double[][] cuts) {
        int m = network.edgeCount();
        Builder b = new Builder(network);
        for (int e = 0; e < m; e++) {
            b.cut(e, kept(cuts[e], network.length(e)));
        }
        return b.build();
    }

    /** The first piece of an edge of the original network; its pieces are this id and the ones after it with the same parent. */
    public int firstPiece(int edge) {
        int lo = 0, hi = parent.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (parent[mid] < edge) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** The offsets at least {@link #SHORTEST_PIECE} from the ends and from the offset kept before. */
    private static double[] kept(double[] offsets, double length) {
        if (offsets == null) {
            return new double[0];
        }
        double[] out = new double[offsets.length];
        int n = 0;
        double last = 0;
        for (double d : offsets) {
            if (d - last >= SHORTEST_PIECE && length - d >= SHORTEST_PIECE) {
                out[n++] = d;
                last = d;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /** Accumulates the cut network in growing primitive arrays. */
    private static final class Builder {
        private final StreetNetwork source;
        private double[] nodeLon;
        private double[] nodeLat;
        private int nodes;
        private int[] from = new int[16];
        private int[] to = new int[16];
        private double[] length = new double[16];
        private int[] feature = new int[16];
        private int[] parent = new int[16];
        private double[] start = new double[16];
        private double[] end = new double[16];
        private int[] pointStart = new int[17];
        private double[] points = new double[64];
        private int edges;
        private int pointCount;

        Builder(StreetNetwork source) {
            this.source = source;
            int n = source.nodeCount();
            nodeLon = new double[n + 16];
            nodeLat = new double[n + 16];
            for (int v = 0; v < n; v++) {
                nodeLon[v] = source.lon(v);
                nodeLat[v] = source.lat(v);
            }
            nodes = n;
        }

        void cut(int e, double[] cuts) {
            int count = source.pointCount(e);
            int tail = source.from(e);
            double pieceStart = 0;
            double at = 0;
            int c = 0;
            int copied = 1;
            point(source.pointLon(e, 0), source.pointLat(e, 0));
            for (int k = 0; k < count - 1 && c < cuts.length; k++) {
                double lon0 = source.pointLon(e, k), lat0 = source.pointLat(e, k);
                double lon1 = source.pointLon(e, k + 1), lat1 = source.pointLat(e, k + 1);
                double step = GeodesicLength.between(lon0, lat0, lon1, lat1);
                while (c < cuts.length && cuts[c] < at + step) {
                    double lon = lon0, lat = lat0;
                    if (cuts[c] > at) {
                        GeodesicData q = Geodesic.WGS84.InverseLine(lat0, lon0, lat1, lon1, GeodesicMask.ALL)
                                .Position(cuts[c] - at, GeodesicMask.LATITUDE | GeodesicMask.LONGITUDE);
                        lon = q.lon2;
                        lat = q.lat2;
                        point(lon, lat);
                    }
                    int node = node(lon, lat);
                    piece(e, tail, node, pieceStart, cuts[c]);
                    tail = node;
                    pieceStart = cuts[c];
                    point(lon, lat);
                    c++;
                }
                point(lon1, lat1);
                at += step;
                copied = k + 2;
            }
            for (int k = copied; k < count; k++) {
                point(source.pointLon(e, k), source.pointLat(e, k));
            }
            piece(e, tail, source.to(e), pieceStart, source.length(e));
        }

        private void point(double lon, double lat) {
            if (2 * pointCount + 2 > points.length) {
                points = Arrays.copyOf(points, 2 * points.length);
            }
            points[2 * pointCount] = lon;
            points[2 * pointCount + 1] = lat;
            pointCount++;
        }

        private int node(double lon, double lat) {
            if (nodes == nodeLon.length) {
                nodeLon = Arrays.copyOf(nodeLon, 2 * nodes);
                nodeLat = Arrays.copyOf(nodeLat, 2 * nodes);
            }
            nodeLon[nodes] = lon;
            nodeLat[nodes] = lat;
            return nodes++;
        }

        /** Closes the piece whose points were added since the last one, ending at {@code head}. */
        private void piece(int e, int tail, int head, double startOffset, double endOffset) {
            if (edges == this.from.length) {
                int grown = 2 * edges;
                this.from = Arrays.copyOf(this.from, grown);
                this.to = Arrays.copyOf(this.to, grown);
                length = Arrays.copyOf(length, grown);
                feature = Arrays.copyOf(feature, grown);
                parent = Arrays.copyOf(parent, grown);
                start = Arrays.copyOf(start, grown);
                end = Arrays.copyOf(end, grown);
                pointStart = Arrays.copyOf(pointStart, grown + 1);
            }
            this.from[edges] = tail;
            this.to[edges] = head;
            feature[edges] = source.featureIndex(e);
            parent[edges] = e;
            start[edges] = startOffset;
            end[edges] = endOffset;
            pointStart[edges + 1] = pointCount;
            int first = pointStart[edges];
            length[edges] = startOffset == 0 && endOffset == source.length(e) ? source.length(e)
                    : GeodesicLength.ofPolyline(points, first, pointCount - first);
            edges++;
        }

        SplitNetwork build() {
            StreetNetwork network = new StreetNetwork(Arrays.copyOf(nodeLon, nodes), Arrays.copyOf(nodeLat, nodes),
                    Arrays.copyOf(from, edges), Arrays.copyOf(to, edges), Arrays.copyOf(length, edges),
                    Arrays.copyOf(feature, edges), Arrays.copyOf(pointStart, edges + 1),
                    Arrays.copyOf(points, 2 * pointCount), source.features());
            return new SplitNetwork(network, Arrays.copyOf(parent, edges), Arrays.copyOf(start, edges),
                    Arrays.copyOf(end, edges));
        }
    }
}
