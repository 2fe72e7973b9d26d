package org.streetcomb.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.read.RoadFeature;

/**
 * Finds lines the planner cannot use as drawn: lines of zero length (every point the same), lines no
 * longer than the snap tolerance (noding collapses them into a junction), and lines that double back on
 * themselves (two consecutive segments within one degree of opposite directions, a spike that adds a
 * there-and-back to the tour). Measured on the lines as read, in metres; O(vertices).
 */
final class DegenerateCheck implements Detector {

    /** Consecutive segments turning by more than 179 degrees are a spike. */
    private static final double SPIKE_COSINE = -Math.cos(Math.toRadians(1));

    @Override
    public List<Finding> find(CheckInput input) {
        List<Finding> findings = new ArrayList<>();
        double snap = input.options().snap();
        for (RoadFeature feature : input.features()) {
            LineString line = input.metricLine(feature);
            Coordinate first = feature.line().getCoordinateN(0);
            double length = line.getLength();
            if (length == 0) {
                findings.add(finding(feature, first, 0, "feature " + feature.id() + " has zero length (all its points are the same)",
                        "delete feature " + feature.id() + " or redraw it"));
            } else if (length <= snap) {
                findings.add(finding(feature, first, length, String.format(Locale.ROOT,
                        "feature %s is %.2f m long, within the %.2f m snap: it collapses into a junction", feature.id(), length, snap),
                        "delete feature " + feature.id() + " unless it is a real street, then redraw it at its true length"));
            } else {
                spike(feature, line).ifPresent(findings::add);
            }
        }
        return findings;
    }

    private static Optional<Finding> spike(RoadFeature feature, LineString line) {
        for (int k = 1; k + 1 < line.getNumPoints(); k++) {
            Coordinate a = line.getCoordinateN(k - 1);
            Coordinate b = line.getCoordinateN(k);
            Coordinate c = line.getCoordinateN(k + 1);
            double ab = a.distance(b);
            double bc = b.distance(c);
            if (ab == 0 || bc == 0) {
                continue;
            }
            double cosine = ((b.x - a.x) * (c.x - b.x) + (b.y - a.y) * (c.y - b.y)) / (ab * bc);
            if (cosine < SPIKE_COSINE) {
                double spike = Math.min(ab, bc);
                return Optional.of(finding(feature, feature.line().getCoordinateN(k), spike, String.format(Locale.ROOT,
                        "feature %s doubles back on itself at vertex %d (a %.1f m spike)", feature.id(), k + 1, spike),
                        "remove vertex " + (k + 1) + " of feature " + feature.id() + " or the spike before it"));
            }
        }
        return Optional.empty();
    }

    private static Finding finding(RoadFeature feature, Coordinate at, double value, String problem, String fix) {
        return new Finding(FindingKind.DEGENERATE, Severity.WARNING, Places.point(at.x, at.y), List.of(feature.id()),
                value, "m", problem, fix);
    }
}
