package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * The exact shortest walk that meets a service demand, from a start node to an end node (the same node for
 * a closed tour): Dijkstra's algorithm over the states (node, service passes made so far). Each pass the
 * demand asks for is one bit: along an edge, against it, or in either direction; driving an edge makes
 * the first pass of that edge still missing that the direction can make (a pass in its own direction
 * first, then an either-way pass), which loses nothing as passes of one kind are interchangeable. Exact for
 * every kerb mode, and small enough for up to about 14 passes on small grids. Test-only reference; the
 * grids are invented.
 */
final class ExhaustiveWalk {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private ExhaustiveWalk() {
    }

    /** Length of the shortest walk driving every required edge once in a permitted direction, or infinity. */
    static double shortest(StreetNetwork network, boolean[] required, int start, int end) {
        return shortest(network, ServiceDemand.of(network, required, KerbMode.ONE_PASS), start, end);
    }

    /** Length of the shortest walk making every service pass of {@code demand}, or infinity when none exists. */
    static double shortest(StreetNetwork network, ServiceDemand demand, int start, int end) {
        int m = network.edgeCount();
        int[][] alongBits = new int[m][];
        int[][] againstBits = new int[m][];
        int[][] eitherBits = new int[m][];
        int bits = 0;
        for (int e = 0; e < m; e++) {
            alongBits[e] = new int[demand.along()[e]];
            againstBits[e] = new int[demand.against()[e]];
            eitherBits[e] = new int[demand.either()[e]];
            for (int[] kind : new int[][] {alongBits[e], againstBits[e], eitherBits[e]}) {
                for (int k = 0; k < kind.length; k++) {
                    kind[k] = 1 << bits++;
                }
            }
        }
        int full = (1 << bits) - 1;
        double[][] best = new double[network.nodeCount()][1 << bits];
        for (double[] row : best) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        PriorityQueue<double[]> queue = new PriorityQueue<>((x, y) -> Double.compare(x[0], y[0]));
        best[start][0] = 0;
        queue.add(new double[] {0, start, 0});
        while (!queue.isEmpty()) {
            double[] s = queue.poll();
            int v = (int) s[1];
            int mask = (int) s[2];
            if (s[0] > best[v][mask]) {
                continue;
            }
            if (v == end && mask == full) {
                return s[0];
            }
            for (int i = network.incidenceStart(v); i < network.incidenceEnd(v); i++) {
                int e = network.incidentEdge(i);
                boolean forward = network.from(e) == v;
                Travel travel = network.travel(e);
                if (forward ? travel == Travel.BACKWARD : travel == Travel.FORWARD) {
                    continue;
                }
                int w = network.other(e, v);
                int pass = firstMissing(forward ? alongBits[e] : againstBits[e], mask);
                int next = mask | (pass != 0 ? pass : firstMissing(eitherBits[e], mask));
                double d = s[0] + network.length(e);
                if (d < best[w][next]) {
                    best[w][next] = d;
                    queue.add(new double[] {d, w, next});
                }
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    /** The first of the passes not yet made, or 0 when all are. */
    private static int firstMissing(int[] passes, int mask) {
        for (int bit : passes) {
            if ((mask & bit) == 0) {
                return bit;
            }
        }
        return 0;
    }

    /**
     * Block sides of a grid about 100 m square; {@code oneWayShare} of them one-way, half in each
     * digitised direction.
     */
    static List<RoadFeature> grid(int columns, int rows, double oneWayShare, Random random) {
        List<RoadFeature> lines = new ArrayList<>();
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < columns; c++) {
                if (c + 1 < columns) {
                    lines.add(line("h" + r + c, random, oneWayShare, c, r, c + 1, r));
                }
                if (r + 1 < rows) {
                    lines.add(line("v" + r + c, random, oneWayShare, c, r, c, r + 1));
                }
            }
        }
        return lines;
    }

    private static RoadFeature line(String id, Random random, double oneWayShare, int c0, int r0, int c1, int r1) {
        double u = random.nextDouble();
        Travel travel = u < oneWayShare / 2 ? Travel.FORWARD : u < oneWayShare ? Travel.BACKWARD : Travel.BOTH;
        Coordinate[] c = {new Coordinate(-31.2 + 0.0013 * c0, 44.6 + 0.0009 * r0),
            new Coordinate(-31.2 + 0.0013 * c1, 44.6 + 0.0009 * r1)};
        return new RoadFeature(id, id, GEOMETRY.createLineString(c), travel, true, Map.of());
    }
}
