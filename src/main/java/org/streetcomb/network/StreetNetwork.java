package org.streetcomb.network;

import java.util.List;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * A planar, routable street network held in primitive arrays indexed by int ids, so a million edges take
 * a few hundred megabytes rather than gigabytes of boxed graph objects.
 *
 * <p>Nodes have ids 0..nodeCount-1 and WGS84 positions. Edges have ids 0..edgeCount-1; edge {@code e} runs
 * from {@link #from} to {@link #to} in the direction its source line was digitised, has a geodesic length
 * in metres, permitted directions of travel, a required flag, the index of its source feature, and its own
 * polyline (longitude/latitude pairs, packed). Incident edges of each node are kept in compressed
 * adjacency arrays. Instances are immutable; build them with {@link NetworkBuilder}.
 */
public final class StreetNetwork {

    /** {@code Travel.values()} copies the array on every call; edge travel is read in every search step. */
    private static final Travel[] TRAVEL = Travel.values();

    private final double[] nodeLon;
    private final double[] nodeLat;
    private final int[] edgeFrom;
    private final int[] edgeTo;
    private final double[] edgeLength;
    private final int[] edgeFeature;
    private final byte[] edgeTravel;
    private final boolean[] edgeRequired;
    private final int[] pointStart;
    private final double[] points;
    private final List<RoadFeature> features;
    private final int[] adjacencyStart;
    private final int[] adjacentEdges;
    private final double[] edgeCost;

    StreetNetwork(double[] nodeLon, double[] nodeLat, int[] edgeFrom, int[] edgeTo, double[] edgeLength,
                  int[] edgeFeature, int[] pointStart, double[] points, List<RoadFeature> features) {
        this.nodeLon = nodeLon;
        this.nodeLat = nodeLat;
        this.edgeFrom = edgeFrom;
        this.edgeTo = edgeTo;
        this.edgeLength = edgeLength;
        this.edgeFeature = edgeFeature;
        this.pointStart = pointStart;
        this.points = points;
        this.features = List.copyOf(features);
        int m = edgeFrom.length;
        this.edgeTravel = new byte[m];
        this.edgeRequired = new boolean[m];
        for (int e = 0; e < m; e++) {
            RoadFeature f = features.get(edgeFeature[e]);
            edgeTravel[e] = (byte) f.travel().ordinal();
            edgeRequired[e] = f.required();
        }
        this.adjacencyStart = new int[nodeLon.length + 1];
        for (int e = 0; e < m; e++) {
            adjacencyStart[edgeFrom[e] + 1]++;
            adjacencyStart[edgeTo[e] + 1]++;
        }
        for (int v = 0; v < nodeLon.length; v++) {
            adjacencyStart[v + 1] += adjacencyStart[v];
        }
        this.adjacentEdges = new int[2 * m];
        int[] fill = adjacencyStart.clone();
        for (int e = 0; e < m; e++) {
            adjacentEdges[fill[edgeFrom[e]]++] = e;
            adjacentEdges[fill[edgeTo[e]]++] = e;
        }
        this.edgeCost = features.stream().anyMatch(RoadFeature::hasCost) ? shareCosts() : null;
    }

    /** Each feature's cost shared among its edges in proportion to their lengths. */
    private double[] shareCosts() {
        double[] featureLength = new double[features.size()];
        int[] featureEdges = new int[features.size()];
        for (int e = 0; e < edgeFrom.length; e++) {
            featureLength[edgeFeature[e]] += edgeLength[e];
            featureEdges[edgeFeature[e]]++;
        }
        double[] cost = new double[edgeFrom.length];
        for (int e = 0; e < cost.length; e++) {
            int f = edgeFeature[e];
            double whole = features.get(f).hasCost() ? features.get(f).cost() : 0;
            cost[e] = featureLength[f] > 0 ? whole * edgeLength[e] / featureLength[f] : whole / featureEdges[f];
        }
        return cost;
    }

    /**
     * A network given as an abstract graph (a benchmark instance, say) rather than as geometry: edge
     * {@code e} joins nodes {@code from[e]} and {@code to[e]} with the given length, and carries its
     * feature's travel and required flags. Nodes are drawn on a small circle at 0,0 so that every edge
     * still has a polyline for output.
     */
    public static StreetNetwork ofGraph(int nodeCount, int[] from, int[] to, double[] length, List<RoadFeature> features) {
        double[] lon = new double[nodeCount];
        double[] lat = new double[nodeCount];
        for (int v = 0; v < nodeCount; v++) {
            lon[v] = 0.01 * Math.cos(2 * Math.PI * v / nodeCount);
            lat[v] = 0.01 * Math.sin(2 * Math.PI * v / nodeCount);
        }
        int m = from.length;
        int[] pointStart = new int[m + 1];
        double[] points = new double[4 * m];
        int[] feature = new int[m];
        for (int e = 0; e < m; e++) {
            pointStart[e + 1] = 2 * (e + 1);
            points[4 * e] = lon[from[e]];
            points[4 * e + 1] = lat[from[e]];
            points[4 * e + 2] = lon[to[e]];
            points[4 * e + 3] = lat[to[e]];
            feature[e] = e;
        }
        return new StreetNetwork(lon, lat, from.clone(), to.clone(), length.clone(), feature, pointStart, points, features);
    }

    public int nodeCount() {
        return nodeLon.length;
    }

    public int edgeCount() {
        return edgeFrom.length;
    }

    public double lon(int node) {
        return nodeLon[node];
    }

    public double lat(int node) {
        return nodeLat[node];
    }

    public int from(int edge) {
        return edgeFrom[edge];
    }

    public int to(int edge) {
        return edgeTo[edge];
    }

    /** The end of {@code edge} that is not {@code node} (the same node for a loop). */
    public int other(int edge, int node) {
        return edgeFrom[edge] == node ? edgeTo[edge] : edgeFrom[edge];
    }

    /** Geodesic length in metres on the WGS84 ellipsoid. */
    public double length(int edge) {
        return edgeLength[edge];
    }

    public Travel travel(int edge) {
        return TRAVEL[edgeTravel[edge]];
    }

    public boolean required(int edge) {
        return edgeRequired[edge];
    }

    public RoadFeature feature(int edge) {
        return features.get(edgeFeature[edge]);
    }

    /** Index of the edge's source feature in {@link #features()}. */
    public int featureIndex(int edge) {
        return edgeFeature[edge];
    }

    public List<RoadFeature> features() {
        return features;
    }

    /** Number of edge ends at {@code node}: a loop counts twice. */
    public int degree(int node) {
        return adjacencyStart[node + 1] - adjacencyStart[node];
    }

    /** Incident edges of {@code node} are {@code incidentEdge(i)} for i in [incidenceStart, incidenceEnd). */
    public int incidenceStart(int node) {
        return adjacencyStart[node];
    }

    public int incidenceEnd(int node) {
        return adjacencyStart[node + 1];
    }

    public int incidentEdge(int i) {
        return adjacentEdges[i];
    }

    public int pointCount(int edge) {
        return pointStart[edge + 1] - pointStart[edge];
    }

    /** Longitude of point {@code i} of the edge's polyline, in digitised order. */
    public double pointLon(int edge, int i) {
        return points[2 * (pointStart[edge] + i)];
    }

    public double pointLat(int edge, int i) {
        return points[2 * (pointStart[edge] + i) + 1];
    }

    /** Whether the layer gave each street a cost (a cost field) to use as its weight. */
    public boolean hasCosts() {
        return edgeCost != null;
    }

    /** The edge's share of its street's cost, in the layer's cost units; 0 when the layer has no costs. */
    public double cost(int edge) {
        return edgeCost == null ? 0 : edgeCost[edge];
    }

    /**
     * The same network with each edge's cost as its length, for solvers that minimise length: the tours
     * they make then minimise total cost. Edge and node ids are the same as this network's.
     */
    public StreetNetwork weightedByCost() {
        if (edgeCost == null) {
            throw new IllegalStateException("the network has no costs");
        }
        return new StreetNetwork(nodeLon, nodeLat, edgeFrom, edgeTo, edgeCost.clone(), edgeFeature, pointStart, points,
                features);
    }

    public double totalLength() {
        double sum = 0;
        for (double l : edgeLength) {
            sum += l;
        }
        return sum;
    }
}
