package org.streetcomb.network;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.stream.IntStream;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.read.RoadFeature;

/**
 * Grade separation for geometric layers: lines meet only where they share a vertex (an end, or an
 * interior vertex, within the snap tolerance), never where their segments merely cross, so an overpass
 * drawn across a street without a common vertex stays apart from it.
 *
 * <p>With a level field (a z-level or OSM-style layer attribute), lines at different levels do not meet
 * at a shared interior vertex either; they still meet where either line ends, because a bridge or a
 * ramp joins the network at its ends. Vertices are clustered within the snap
 * tolerance ({@link SnapGrid}) in a {@link LocalFrame}, in input order, so the result is deterministic. Each line is cut at
 * its junction vertices; the pieces carry the cluster ids of their ends for {@link NetworkBuilder}.
 */
final class SharedVertexJoin {

    /** The pieces: polylines as lon/lat pairs, the feature each came from, and the node ids of their ends. */
    record Pieces(List<double[]> lines, int[] feature, long[] endNodes) {

        /** The lines of a layer that is already cut at its junctions, one piece per feature. */
        static Pieces of(List<RoadFeature> features, long[] endNodes) {
            List<double[]> lines = new ArrayList<>(features.size());
            for (RoadFeature f : features) {
                Coordinate[] coords = f.line().getCoordinates();
                double[] xy = new double[2 * coords.length];
                for (int i = 0; i < coords.length; i++) {
                    xy[2 * i] = coords[i].x;
                    xy[2 * i + 1] = coords[i].y;
                }
                lines.add(xy);
            }
            return new Pieces(lines, IntStream.range(0, features.size()).toArray(), endNodes);
        }
    }

    private SharedVertexJoin() {
    }

    static Pieces split(List<RoadFeature> features, double snapMetres, String levelField) {
        LocalFrame frame = LocalFrame.covering(features);
        SnapGrid grid = new SnapGrid(snapMetres);
        int[][] cluster = new int[features.size()][];
        for (int f = 0; f < features.size(); f++) {
            LineString line = features.get(f).line();
            int[] ids = new int[line.getNumPoints()];
            int n = 0;
            for (int i = 0; i < ids.length; i++) {
                Coordinate c = line.getCoordinateN(i);
                int id = grid.snapId(new Coordinate(frame.x(c.x), frame.y(c.y)));
                if (n == 0 || ids[n - 1] != id) { // vertices joined by the snap collapse into one
                    ids[n++] = id;
                }
            }
            cluster[f] = Arrays.copyOf(ids, n);
        }
        // per cluster: how many line ends use it, and the one level of its interior uses (or a conflict)
        int[] ends = new int[grid.size()];
        int[] uses = new int[grid.size()];
        String[] level = new String[grid.size()];
        boolean[] mixed = new boolean[grid.size()];
        for (int f = 0; f < features.size(); f++) {
            String lv = levelField == null ? null : features.get(f).properties().getOrDefault(levelField, "");
            for (int i = 0; i < cluster[f].length; i++) {
                int k = cluster[f][i];
                if (i == 0 || i == cluster[f].length - 1) {
                    ends[k]++;
                }
                if (uses[k]++ > 0 && !Objects.equals(level[k], lv)) {
                    mixed[k] = true;
                }
                level[k] = lv;
            }
        }
        List<double[]> lines = new ArrayList<>();
        List<Integer> from = new ArrayList<>();
        List<Long> endNodes = new ArrayList<>();
        for (int f = 0; f < features.size(); f++) {
            int[] ids = cluster[f];
            int start = 0;
            for (int i = 1; i < ids.length; i++) {
                boolean junction = i == ids.length - 1 || (uses[ids[i]] > 1 && (ends[ids[i]] > 0 || !mixed[ids[i]]));
                if (junction) {
                    double[] piece = new double[2 * (i - start + 1)];
                    for (int j = start; j <= i; j++) {
                        Coordinate c = grid.point(ids[j]);
                        piece[2 * (j - start)] = frame.lon(c.x);
                        piece[2 * (j - start) + 1] = frame.lat(c.y);
                    }
                    lines.add(piece);
                    from.add(f);
                    endNodes.add((long) ids[start]);
                    endNodes.add((long) ids[i]);
                    start = i;
                }
            }
        }
        return new Pieces(lines, from.stream().mapToInt(Integer::intValue).toArray(),
                endNodes.stream().mapToLong(Long::longValue).toArray());
    }
}
