package org.streetcomb.check;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.network.EdgeSelection;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.ReadReport;
import org.streetcomb.read.RoadFeature;

/**
 * Makes the repairs a user opted into before planning, using the health check's own detectors so that a
 * repair fixes exactly what the check reports. Closing gaps extends each dead-end line by one vertex, on
 * the nearest point of the street it misses ({@link UndershootCheck}), and builds the network again so the
 * new end is noded; dropping duplicates removes every edge that repeats another ({@link DuplicateCheck}).
 * Each repair made is described in one line for the plan summary.
 */
public final class NetworkRepair {

    /**
     * @param features the road lines after repairs
     * @param network  the network after repairs
     * @param done     one line per repair made
     */
    public record Result(List<RoadFeature> features, StreetNetwork network, List<String> done) {
    }

    private NetworkRepair() {
    }

    public static Result apply(List<RoadFeature> features, ReadReport read, StreetNetwork network, double snap,
                               RepairOptions repairs) {
        List<String> done = new ArrayList<>();
        CheckOptions options = new CheckOptions(snap, repairs.closeGaps(), 0, CheckOptions.DEFAULTS.duplicate());
        if (repairs.closeGaps() > 0) {
            List<UndershootCheck.Gap> gaps = new UndershootCheck().gaps(new CheckInput(features, read, network, options, -1),
                    repairs.closeGaps());
            if (!gaps.isEmpty()) {
                List<String> ids = Places.featureIds(network, gaps.stream().mapToInt(UndershootCheck.Gap::edge).toArray());
                done.add(String.format(Locale.ROOT, "closed %d gap%s of up to %.2f m by extending %s", gaps.size(),
                        gaps.size() == 1 ? "" : "s", gaps.stream().mapToDouble(UndershootCheck.Gap::metres).max().orElse(0),
                        Places.list(ids, 5)));
                features = extended(features, network, gaps);
                network = new NetworkBuilder(snap).build(features);
            }
        }
        if (repairs.dropDuplicates()) {
            BitSet repeats = new DuplicateCheck().duplicates(new CheckInput(features, read, network, options, -1));
            if (!repeats.isEmpty()) {
                int[] edges = repeats.stream().toArray();
                done.add(String.format(Locale.ROOT, "dropped %d duplicate edge%s (%.0f m) of %s", edges.length,
                        edges.length == 1 ? "" : "s", Places.length(network, edges),
                        Places.list(Places.featureIds(network, edges), 5)));
                network = EdgeSelection.without(network, repeats);
            }
        }
        return new Result(features, network, List.copyOf(done));
    }

    /** The features with each gap's dead end extended to the point it misses. */
    private static List<RoadFeature> extended(List<RoadFeature> features, StreetNetwork network, List<UndershootCheck.Gap> gaps) {
        List<RoadFeature> result = new ArrayList<>(features);
        for (UndershootCheck.Gap gap : gaps) {
            int f = network.featureIndex(gap.edge());
            RoadFeature feature = result.get(f);
            LineString line = feature.line();
            Coordinate end = new Coordinate(network.lon(gap.node()), network.lat(gap.node()));
            Coordinate[] coords = line.getCoordinates();
            boolean atStart = coords[0].distance(end) < coords[coords.length - 1].distance(end);
            Coordinate[] longer = new Coordinate[coords.length + 1];
            Coordinate target = new Coordinate(gap.targetLon(), gap.targetLat());
            if (atStart) {
                longer[0] = target;
                System.arraycopy(coords, 0, longer, 1, coords.length);
            } else {
                System.arraycopy(coords, 0, longer, 0, coords.length);
                longer[coords.length] = target;
            }
            result.set(f, new RoadFeature(feature.id(), feature.name(), line.getFactory().createLineString(longer),
                    feature.travel(), feature.required(), feature.properties()));
        }
        return result;
    }
}
