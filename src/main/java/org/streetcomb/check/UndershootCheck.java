package org.streetcomb.check;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds dead ends that stop short of another street: a node with one edge whose nearest point on a street
 * not already joined to that edge lies within {@link CheckOptions#nearMiss()} metres. Candidates come from
 * the shared spatial index of edge envelopes, so the check costs O(dead ends × log edges), not a
 * comparison of every pair. Streets meeting the dead-end edge at its other node are left out: they are
 * near a short spur by construction, and {@link OvershootCheck} covers that case. A gap between two dead
 * ends is reported once.
 */
public final class UndershootCheck implements Detector {

    /**
     * A dead end and the nearest point it misses.
     *
     * @param node       the dead-end node
     * @param edge       its only edge
     * @param targetEdge the edge it misses
     * @param targetLon  the nearest point of {@code targetEdge}, WGS84
     * @param targetLat  the nearest point of {@code targetEdge}, WGS84
     * @param metres     the gap, geodesic
     */
    public record Gap(int node, int edge, int targetEdge, double targetLon, double targetLat, double metres) {
    }

    @Override
    public List<Finding> find(CheckInput input) {
        StreetNetwork network = input.network();
        List<Finding> findings = new ArrayList<>();
        for (Gap gap : gaps(input, input.options().nearMiss())) {
            List<String> ids = Places.featureIds(network, gap.edge(), gap.targetEdge());
            String target = network.feature(gap.targetEdge()).id();
            findings.add(new Finding(FindingKind.UNDERSHOOT, Severity.WARNING,
                    Places.WGS84.createLineString(new Coordinate[] {
                        new Coordinate(network.lon(gap.node()), network.lat(gap.node())),
                        new Coordinate(gap.targetLon(), gap.targetLat())}),
                    ids, gap.metres(), "m",
                    String.format(Locale.ROOT, "the end of feature %s stops %.2f m short of feature %s",
                            network.feature(gap.edge()).id(), gap.metres(), target),
                    "extend the line to meet feature " + target + " if they join on the ground, "
                            + "or plan with --close-gaps"));
        }
        return findings;
    }

    /** Every dead end within {@code limit} metres of a street it is not joined to, by node id. */
    public List<Gap> gaps(CheckInput input, double limit) {
        StreetNetwork network = input.network();
        List<Gap> gaps = new ArrayList<>();
        Set<Long> endPairs = new HashSet<>();
        LineSegment segment = new LineSegment();
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) != 1) {
                continue;
            }
            int e = network.incidentEdge(network.incidenceStart(v));
            int w = network.other(e, v);
            Coordinate p = input.metric(network.lon(v), network.lat(v));
            Envelope search = new Envelope(p);
            search.expandBy(limit);
            int best = -1;
            double bestDistance = Double.POSITIVE_INFINITY;
            Coordinate bestPoint = null;
            for (Object item : input.edgeIndex().query(search)) {
                int c = (Integer) item;
                if (c == e || network.from(c) == w || network.to(c) == w) {
                    continue;
                }
                LineString line = input.edgeLine(c);
                for (int k = 0; k + 1 < line.getNumPoints(); k++) {
                    segment.setCoordinates(line.getCoordinateN(k), line.getCoordinateN(k + 1));
                    Coordinate q = segment.closestPoint(p);
                    double d = q.distance(p);
                    if (d < bestDistance || d == bestDistance && c < best) {
                        best = c;
                        bestDistance = d;
                        bestPoint = q;
                    }
                }
            }
            if (best < 0 || bestDistance > limit) {
                continue;
            }
            int targetNode = endAt(network, input, best, bestPoint);
            if (targetNode >= 0 && network.degree(targetNode) == 1
                    && !endPairs.add(Math.min(v, targetNode) * (long) network.nodeCount() + Math.max(v, targetNode))) {
                continue;
            }
            double lon = input.frame().lon(bestPoint.x);
            double lat = input.frame().lat(bestPoint.y);
            gaps.add(new Gap(v, e, best, lon, lat, GeodesicLength.between(network.lon(v), network.lat(v), lon, lat)));
        }
        return gaps;
    }

    /** The node of {@code edge} at {@code point}, or -1 when the point is inside the edge. */
    private static int endAt(StreetNetwork network, CheckInput input, int edge, Coordinate point) {
        LineString line = input.edgeLine(edge);
        if (point.equals2D(line.getCoordinateN(0))) {
            return network.from(edge);
        }
        return point.equals2D(line.getCoordinateN(line.getNumPoints() - 1)) ? network.to(edge) : -1;
    }
}
