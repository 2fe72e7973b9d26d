package org.streetcomb.check;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineSegment;
import org.streetcomb.network.EdgeSelection;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;

/**
 * Makes the repairs a user opted into before planning, using the health check's own detectors so that a
 * repair fixes exactly what the check reports. Closing gaps extends each dead-end line by one vertex, on
 * the nearest point of the street it misses ({@link UndershootCheck}), adds that point to the missed line
 * as a vertex too (so layers joined only at shared vertices join there), and builds the network again;
 * dropping duplicates removes every edge that repeats another ({@link DuplicateCheck}). Layers with their
 * own node topology (OpenStreetMap) join only at shared node ids, so gaps in them are left for the map to
 * fix and the summary says so. Each repair made is described in one line for the plan summary.
 */
public final class NetworkRepair {

    /**
     * @param layer   the road layer after repairs
     * @param network the network after repairs
     * @param done    one line per repair made or refused
     */
    public record Result(RoadLayer layer, StreetNetwork network, List<String> done) {
    }

    private NetworkRepair() {
    }

    public static Result apply(RoadLayer layer, StreetNetwork network, double snap, RepairOptions repairs) {
        List<String> done = new ArrayList<>();
        CheckOptions options = new CheckOptions(snap, repairs.closeGaps(), 0, CheckOptions.DEFAULTS.duplicate());
        if (repairs.closeGaps() > 0 && layer.hasTopology()) {
            done.add("gaps not closed: the layer's lines join only at shared node ids, so fix them in the map data");
        } else if (repairs.closeGaps() > 0) {
            List<UndershootCheck.Gap> gaps = new UndershootCheck().gaps(new CheckInput(layer, network, options, -1),
                    repairs.closeGaps());
            if (!gaps.isEmpty()) {
                List<String> ids = Places.featureIds(network, gaps.stream().mapToInt(UndershootCheck.Gap::edge).toArray());
                done.add(String.format(Locale.ROOT, "closed %d gap%s of up to %.2f m by extending %s", gaps.size(),
                        gaps.size() == 1 ? "" : "s", gaps.stream().mapToDouble(UndershootCheck.Gap::metres).max().orElse(0),
                        Places.list(ids, 5)));
                layer = new RoadLayer(layer.source(), closed(layer.features(), network, gaps), layer.report(),
                        layer.endNodes(), layer.gradeSeparation(), layer.crossingLimit());
                network = new NetworkBuilder(snap).build(layer);
            }
        }
        if (repairs.dropDuplicates()) {
            BitSet repeats = new DuplicateCheck().duplicates(new CheckInput(layer, network, options, -1));
            if (!repeats.isEmpty()) {
                int[] edges = repeats.stream().toArray();
                done.add(String.format(Locale.ROOT, "dropped %d duplicate edge%s (%.0f m) of %s", edges.length,
                        edges.length == 1 ? "" : "s", Places.length(network, edges),
                        Places.list(Places.featureIds(network, edges), 5)));
                network = EdgeSelection.without(network, repeats);
            }
        }
        return new Result(layer, network, List.copyOf(done));
    }

    /** The lines with each gap closed: the dead end extended to the point it misses, which the missed line gains. */
    private static List<RoadFeature> closed(List<RoadFeature> features, StreetNetwork network, List<UndershootCheck.Gap> gaps) {
        List<RoadFeature> result = new ArrayList<>(features);
        for (UndershootCheck.Gap gap : gaps) {
            Coordinate target = new Coordinate(gap.targetLon(), gap.targetLat());
            Coordinate end = new Coordinate(network.lon(gap.node()), network.lat(gap.node()));
            int f = network.featureIndex(gap.edge());
            Coordinate[] coords = result.get(f).line().getCoordinates();
            boolean atStart = coords[0].distance(end) < coords[coords.length - 1].distance(end);
            result.set(f, withLine(result.get(f), atStart ? insert(coords, 0, target) : insert(coords, coords.length, target)));
            int t = network.featureIndex(gap.targetEdge());
            Coordinate[] line = result.get(t).line().getCoordinates();
            result.set(t, withLine(result.get(t), insert(line, nearestSegment(line, target) + 1, target)));
        }
        return result;
    }

    private static int nearestSegment(Coordinate[] line, Coordinate point) {
        int best = 0;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int k = 0; k + 1 < line.length; k++) {
            double d = new LineSegment(line[k], line[k + 1]).distance(point);
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best;
    }

    private static Coordinate[] insert(Coordinate[] coords, int at, Coordinate point) {
        Coordinate[] longer = new Coordinate[coords.length + 1];
        System.arraycopy(coords, 0, longer, 0, at);
        longer[at] = point;
        System.arraycopy(coords, at, longer, at + 1, coords.length - at);
        return longer;
    }

    private static RoadFeature withLine(RoadFeature feature, Coordinate[] coords) {
        return new RoadFeature(feature.id(), feature.name(), feature.line().getFactory().createLineString(coords),
                feature.travel(), feature.required(), feature.properties());
    }
}
