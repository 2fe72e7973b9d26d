package org.streetcomb.network;

import java.util.Arrays;
import java.util.BitSet;

/** Makes the network of a subset of another network's edges, keeping node ids, geometry and features. */
public final class EdgeSelection {

    private EdgeSelection() {
    }

    /** The network without the edges set in {@code removed}; edge ids are renumbered in their order. */
    public static StreetNetwork without(StreetNetwork network, BitSet removed) {
        int m = network.edgeCount() - removed.cardinality();
        int[] from = new int[m];
        int[] to = new int[m];
        double[] length = new double[m];
        int[] feature = new int[m];
        int[] pointStart = new int[m + 1];
        double[] points = new double[16];
        int kept = 0;
        int pointCount = 0;
        for (int e = removed.nextClearBit(0); e < network.edgeCount(); e = removed.nextClearBit(e + 1)) {
            from[kept] = network.from(e);
            to[kept] = network.to(e);
            length[kept] = network.length(e);
            feature[kept] = network.featureIndex(e);
            int count = network.pointCount(e);
            if (points.length < 2 * (pointCount + count)) {
                points = Arrays.copyOf(points, Math.max(2 * points.length, 2 * (pointCount + count)));
            }
            for (int k = 0; k < count; k++) {
                points[2 * pointCount] = network.pointLon(e, k);
                points[2 * pointCount + 1] = network.pointLat(e, k);
                pointCount++;
            }
            pointStart[++kept] = pointCount;
        }
        double[] lon = new double[network.nodeCount()];
        double[] lat = new double[network.nodeCount()];
        for (int v = 0; v < lon.length; v++) {
            lon[v] = network.lon(v);
            lat[v] = network.lat(v);
        }
        return new StreetNetwork(lon, lat, from, to, length, feature, pointStart, Arrays.copyOf(points, 2 * pointCount),
                network.features());
    }
}
