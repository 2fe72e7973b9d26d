package org.streetcomb.network;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentString;
import org.streetcomb.InputError;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;

/**
 * Turns road lines into a planar {@link StreetNetwork}: every crossing and every touch becomes a node,
 * vertices and endpoints closer than the snap tolerance are joined, and zero-length pieces are dropped.
 *
 * <p>Noding is JTS's snap noding with a hash-grid index ({@link SnapGrid}), run in a {@link LocalFrame} so the tolerance is in metres.
 * It snaps vertices to vertices and to segments within the tolerance and splits lines only at true
 * nodes, so output edges are as long as the arrangement allows. Each piece keeps the direction of its
 * source line and the index of its feature; its length is then measured on the ellipsoid
 * ({@link GeodesicLength}), in parallel since that dominates the cost of this stage.
 */
public final class NetworkBuilder {

    private final double snapTolerance;

    /** @param snapToleranceMetres distance below which vertices are joined; must be positive */
    public NetworkBuilder(double snapToleranceMetres) {
        if (!(snapToleranceMetres > 0) || !Double.isFinite(snapToleranceMetres)) {
            throw new IllegalArgumentException("snap tolerance must be a positive number of metres");
        }
        this.snapTolerance = snapToleranceMetres;
    }

    /**
     * Builds the network of a layer: joined by the layer's own node ids when it has them (OpenStreetMap,
     * where ways meet only at shared nodes, so bridges and tunnels stay apart); at shared vertices only when
     * the layer asks for grade separation ({@link SharedVertexJoin}); else by noding its lines.
     */
    public StreetNetwork build(RoadLayer layer) {
        if (layer.hasTopology()) {
            return joinByNodeIds(layer.features(), SharedVertexJoin.Pieces.of(layer.features(), layer.endNodes()));
        }
        if (layer.gradeSeparation() != null) {
            return joinByNodeIds(layer.features(),
                    SharedVertexJoin.split(layer.features(), snapTolerance, layer.gradeSeparation().levelField()));
        }
        return build(layer.features(), layer.crossingLimit(), layer.source());
    }

    /** Nodes the lines with the default crossing limit. */
    public StreetNetwork build(List<RoadFeature> features) {
        return build(features, RoadLayer.AUTOMATIC_CROSSINGS, "the layer");
    }

    private StreetNetwork build(List<RoadFeature> features, long crossingLimit, Object source) {
        LocalFrame frame = LocalFrame.covering(features);
        List<SegmentString> input = new ArrayList<>(features.size());
        for (int f = 0; f < features.size(); f++) {
            LineString line = features.get(f).line();
            Coordinate[] projected = new Coordinate[line.getNumPoints()];
            for (int i = 0; i < projected.length; i++) {
                Coordinate c = line.getCoordinateN(i);
                projected[i] = new Coordinate(frame.x(c.x), frame.y(c.y));
            }
            input.add(new NodedSegmentString(projected, f));
        }
        long segments = input.stream().mapToLong(line -> line.size() - 1).sum();
        long limit = crossingLimit == 0 ? Long.MAX_VALUE - 1
                : crossingLimit > 0 ? crossingLimit : automaticCrossingLimit(segments);
        SnapGrid.Noding noding = SnapGrid.node(input, snapTolerance, limit);
        CrossingCount.Result found = noding.crossings();
        if (found.crossings() > limit) {
            // damaged geometry: refused before its noding grows to millions of pieces
            throw InputError.at(source, null, String.format(Locale.ROOT, "its lines cross each other mid-segment more "
                    + "than %d times among %d segments (the first near %.5f,%.5f), so noding would split them into "
                    + "millions of pieces; damaged geometry (zig-zags, a line drawn over and over) is the usual cause: "
                    + "check it, or use --grade-separated if lines meet only at shared vertices, or raise "
                    + "--crossing-limit (0: no limit)", limit, segments, frame.lon(found.first().x),
                    frame.lat(found.first().y)));
        }
        return assemble(noding.pieces(), frame, features);
    }

    /**
     * The default crossing limit for a layer of {@code segments} segments: 20 crossings per segment plus 10,000,
     * far above real layers (their junctions are mostly shared vertices, and the shared layers cross under one
     * time per segment). Lines that cross more often are damaged geometry (zig-zags, a line digitised over and
     * over), whose noding would take minutes and gigabytes; the noding stops when it passes the limit.
     */
    static long automaticCrossingLimit(long segments) {
        return 20 * segments + 10_000;
    }

    private static StreetNetwork assemble(Collection<SegmentString> pieces, LocalFrame frame, List<RoadFeature> features) {
        Map<Coordinate, Integer> nodeIds = new HashMap<>();
        List<Coordinate> nodes = new ArrayList<>();
        int[] from = new int[pieces.size()];
        int[] to = new int[pieces.size()];
        int[] feature = new int[pieces.size()];
        int[] pointStart = new int[pieces.size() + 1];
        double[] points = new double[16];
        int edges = 0;
        int pointCount = 0;
        for (SegmentString piece : pieces) {
            Coordinate[] coords = withoutRepeats(piece.getCoordinates());
            if (coords.length < 2) {
                continue;
            }
            from[edges] = nodeIds.computeIfAbsent(coords[0], c -> addNode(nodes, c));
            to[edges] = nodeIds.computeIfAbsent(coords[coords.length - 1], c -> addNode(nodes, c));
            feature[edges] = (Integer) piece.getData();
            if (points.length < 2 * (pointCount + coords.length)) {
                points = Arrays.copyOf(points, Math.max(2 * points.length, 2 * (pointCount + coords.length)));
            }
            for (Coordinate c : coords) {
                points[2 * pointCount] = frame.lon(c.x);
                points[2 * pointCount + 1] = frame.lat(c.y);
                pointCount++;
            }
            pointStart[++edges] = pointCount;
        }
        double[] nodeLon = new double[nodes.size()];
        double[] nodeLat = new double[nodes.size()];
        for (int v = 0; v < nodes.size(); v++) {
            nodeLon[v] = frame.lon(nodes.get(v).x);
            nodeLat[v] = frame.lat(nodes.get(v).y);
        }
        final double[] packed = points;
        final int[] starts = pointStart;
        double[] length = IntStream.range(0, edges).parallel()
                .mapToDouble(e -> GeodesicLength.ofPolyline(packed, starts[e], starts[e + 1] - starts[e]))
                .toArray();
        return new StreetNetwork(nodeLon, nodeLat, Arrays.copyOf(from, edges), Arrays.copyOf(to, edges),
                length, Arrays.copyOf(feature, edges), Arrays.copyOf(pointStart, edges + 1),
                Arrays.copyOf(points, 2 * pointCount), features);
    }

    /** One edge per piece, from the node of its start id to the node of its end id (nodes in id order). */
    private static StreetNetwork joinByNodeIds(List<RoadFeature> features, SharedVertexJoin.Pieces pieces) {
        long[] endNodes = pieces.endNodes();
        long[] ids = Arrays.stream(endNodes).sorted().distinct().toArray();
        int m = pieces.lines().size();
        double[] nodeLon = new double[ids.length];
        double[] nodeLat = new double[ids.length];
        int[] from = new int[m];
        int[] to = new int[m];
        int[] pointStart = new int[m + 1];
        for (int e = 0; e < m; e++) {
            pointStart[e + 1] = pointStart[e] + pieces.lines().get(e).length / 2;
        }
        double[] points = new double[2 * pointStart[m]];
        for (int e = 0; e < m; e++) {
            double[] line = pieces.lines().get(e);
            System.arraycopy(line, 0, points, 2 * pointStart[e], line.length);
            from[e] = Arrays.binarySearch(ids, endNodes[2 * e]);
            to[e] = Arrays.binarySearch(ids, endNodes[2 * e + 1]);
            nodeLon[from[e]] = line[0];
            nodeLat[from[e]] = line[1];
            nodeLon[to[e]] = line[line.length - 2];
            nodeLat[to[e]] = line[line.length - 1];
        }
        double[] length = IntStream.range(0, m).parallel()
                .mapToDouble(e -> GeodesicLength.ofPolyline(points, pointStart[e], pointStart[e + 1] - pointStart[e]))
                .toArray();
        return new StreetNetwork(nodeLon, nodeLat, from, to, length, pieces.feature(), pointStart, points, features);
    }

    private static int addNode(List<Coordinate> nodes, Coordinate c) {
        nodes.add(c);
        return nodes.size() - 1;
    }

    private static Coordinate[] withoutRepeats(Coordinate[] coords) {
        List<Coordinate> kept = new ArrayList<>(coords.length);
        for (Coordinate c : coords) {
            if (kept.isEmpty() || !kept.get(kept.size() - 1).equals2D(c)) {
                kept.add(c);
            }
        }
        return kept.toArray(new Coordinate[0]);
    }
}
