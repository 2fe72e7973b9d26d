package org.streetcomb.check;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.algorithm.RobustLineIntersector;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.noding.MCIndexNoder;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentIntersector;
import org.locationtech.jts.noding.SegmentString;
import org.streetcomb.read.RoadFeature;

/**
 * Finds lines that cross where neither has a vertex: a proper intersection in JTS's sense, a single point
 * inside a segment of each. In a layer whose junctions are shared vertices (OpenStreetMap and most
 * council layers) such a crossing is a bridge, a tunnel, or a junction someone forgot to draw. Unless
 * the layer is read with its own topology or with grade separation, the planner joins lines wherever they
 * cross, so a bridge becomes a junction that cannot be driven: the finding is a warning when either line
 * is tagged as a bridge, tunnel or layer, a note otherwise. The
 * measured value is the crossing angle (0-90 degrees). Candidate segment pairs come from JTS's
 * {@link MCIndexNoder} (monotone chains in an STRtree), run on the lines as read, in metres.
 */
final class CrossingCheck implements Detector {

    private record Crossing(int first, int second, Coordinate at, double angle) {
    }

    @Override
    public List<Finding> find(CheckInput input) {
        List<RoadFeature> features = input.features();
        List<SegmentString> lines = new ArrayList<>(features.size());
        for (int f = 0; f < features.size(); f++) {
            lines.add(new NodedSegmentString(input.metricLine(features.get(f)).getCoordinates(), f));
        }
        List<Crossing> crossings = new ArrayList<>();
        new MCIndexNoder(new ProperCrossings(crossings)).computeNodes(lines);
        crossings.sort(Comparator.comparingInt(Crossing::first).thenComparingInt(Crossing::second)
                .thenComparingDouble(c -> c.at().x).thenComparingDouble(c -> c.at().y));
        List<Finding> findings = new ArrayList<>();
        for (Crossing c : crossings) {
            RoadFeature a = features.get(c.first());
            RoadFeature b = features.get(c.second());
            double lon = input.frame().lon(c.at().x);
            double lat = input.frame().lat(c.at().y);
            String tagged = levelTag(a) != null ? levelTag(a) : levelTag(b);
            String pair = a.id().equals(b.id()) ? "feature " + a.id() + " crosses itself"
                    : "features " + a.id() + " and " + b.id() + " cross";
            findings.add(new Finding(FindingKind.CROSSING, tagged != null ? Severity.WARNING : Severity.NOTE,
                    Places.point(lon, lat), a.id().equals(b.id()) ? List.of(a.id()) : List.of(a.id(), b.id()), c.angle(), "degrees",
                    String.format(Locale.ROOT, "%s at %.0f degrees with no shared vertex%s", pair, c.angle(),
                            tagged != null ? " (" + tagged + ")" : ""),
                    input.joinsCrossings()
                            ? "the planner joins them here: if one passes over the other, plan with --grade-separated "
                              + "(and --level-field); if they meet, add a shared vertex"
                            : "the planner keeps them apart: if they meet on the ground, add a shared vertex"));
        }
        return findings;
    }

    /** The bridge, tunnel or layer tag of a feature ("bridge=yes"), or null. */
    private static String levelTag(RoadFeature feature) {
        Map<String, String> p = feature.properties();
        for (String key : List.of("bridge", "tunnel")) {
            String value = p.getOrDefault(key, "no").trim();
            if (!value.isEmpty() && !value.equalsIgnoreCase("no") && !value.equals("0")) {
                return key + "=" + value;
            }
        }
        String layer = p.getOrDefault("layer", "0").trim();
        return layer.isEmpty() || layer.equals("0") ? null : "layer=" + layer;
    }

    /** Collects intersections that are a single point interior to both segments. */
    private static final class ProperCrossings implements SegmentIntersector {
        private final RobustLineIntersector intersector = new RobustLineIntersector();
        private final List<Crossing> found;

        ProperCrossings(List<Crossing> found) {
            this.found = found;
        }

        @Override
        public void processIntersections(SegmentString s0, int i0, SegmentString s1, int i1) {
            Coordinate a0 = s0.getCoordinate(i0);
            Coordinate a1 = s0.getCoordinate(i0 + 1);
            Coordinate b0 = s1.getCoordinate(i1);
            Coordinate b1 = s1.getCoordinate(i1 + 1);
            intersector.computeIntersection(a0, a1, b0, b1);
            if (!intersector.isProper()) {
                return;
            }
            int f0 = (Integer) s0.getData();
            int f1 = (Integer) s1.getData();
            double angle = Math.toDegrees(Math.abs(Math.atan2(a1.y - a0.y, a1.x - a0.x) - Math.atan2(b1.y - b0.y, b1.x - b0.x)));
            angle = angle % 180;
            found.add(new Crossing(Math.min(f0, f1), Math.max(f0, f1), intersector.getIntersection(0),
                    Math.min(angle, 180 - angle)));
        }

        @Override
        public boolean isDone() {
            return false;
        }
    }
}
