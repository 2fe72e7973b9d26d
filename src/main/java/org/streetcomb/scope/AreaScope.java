package org.streetcomb.scope;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.locationtech.jts.algorithm.RobustLineIntersector;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.geom.util.GeometryTransformer;
import org.locationtech.jts.index.strtree.STRtree;
import org.streetcomb.network.EdgeSelection;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.SplitNetwork;
import org.streetcomb.network.StreetNetwork;

/**
 * Scopes a network to an area: every edge that crosses the area's boundary is cut where it crosses
 * ({@link SplitNetwork}, cut points on the geodesic), so each piece lies wholly inside or wholly outside.
 * A piece is inside when its middle point is covered by the area (boundary included: a street drawn along
 * the boundary is inside); inside pieces are serviced, unless an earlier area of the same batch covers the
 * middle point too, in which case they are only travelled. Outside pieces that come within the margin of
 * the area are kept to travel on; the rest of the network is dropped.
 *
 * <p>Cutting at the boundary, rather than giving a whole street to the area holding most of its length,
 * makes each area's service exactly the length of its streets that an independent clip (GDAL's
 * {@code ogr2ogr -clipsrc}) gives, and a tiling of areas services every street once.
 *
 * <p>Geometry tests run in a {@link LocalFrame} in metres around the area (so the margin is the same in
 * every direction); boundary crossings are found through an STR-tree of the boundary's segments and JTS's
 * robust segment intersector. O((E + B) log B) for E edge segments and B boundary segments.
 */
public final class AreaScope {

    private static final GeometryFactory PLANE = new GeometryFactory();

    private AreaScope() {
    }

    /**
     * @param network the network with a street's edges to service
     * @param inside  for each edge of {@code network}, whether it lies in the area and is serviced there
     * @param travel  for each edge, whether it lies outside (or in an earlier area) and is only travelled
     */
    public record Scoped(StreetNetwork network, boolean[] inside, boolean[] travel) {

        /** Metres of street inside the area to service. */
        public double insideLength() {
            double sum = 0;
            for (int e = 0; e < inside.length; e++) {
                sum += inside[e] ? network.length(e) : 0;
            }
            return sum;
        }
    }

    public static Scoped apply(StreetNetwork network, ServiceArea area) {
        Envelope box = area.polygon().getEnvelopeInternal();
        LocalFrame frame = LocalFrame.around((box.getMinX() + box.getMaxX()) / 2, (box.getMinY() + box.getMaxY()) / 2);
        Geometry polygon = toPlane(area.polygon(), frame);
        PreparedGeometry covering = PreparedGeometryFactory.prepare(polygon);
        Geometry reach = area.margin() > 0 ? polygon.buffer(area.margin(), 8) : polygon;
        PreparedGeometry near = PreparedGeometryFactory.prepare(reach);
        Envelope reachBox = reach.getEnvelopeInternal();
        List<PreparedGeometry> earlier = new ArrayList<>();
        for (Geometry other : area.earlier()) {
            Geometry planar = toPlane(other, frame);
            if (planar.getEnvelopeInternal().intersects(polygon.getEnvelopeInternal())) {
                earlier.add(PreparedGeometryFactory.prepare(planar));
            }
        }
        STRtree boundary = boundarySegments(polygon);

        int m = network.edgeCount();
        boolean[] candidate = new boolean[m];
        double[][] cuts = new double[m][];
        for (int e = 0; e < m; e++) {
            Envelope edgeBox = new Envelope();
            for (int k = 0; k < network.pointCount(e); k++) {
                edgeBox.expandToInclude(frame.x(network.pointLon(e, k)), frame.y(network.pointLat(e, k)));
            }
            candidate[e] = edgeBox.intersects(reachBox);
            if (candidate[e] && edgeBox.intersects(polygon.getEnvelopeInternal())) {
                cuts[e] = crossings(network, e, frame, boundary);
            }
        }
        SplitNetwork split = SplitNetwork.of(network, cuts);
        StreetNetwork pieces = split.network();
        BitSet dropped = new BitSet();
        List<Boolean> insideKept = new ArrayList<>();
        List<Boolean> travelKept = new ArrayList<>();
        for (int p = 0; p < pieces.edgeCount(); p++) {
            if (!candidate[split.parent()[p]]) {
                dropped.set(p);
                continue;
            }
            LineString line = planarLine(pieces, p, frame);
            Geometry middle = PLANE.createPoint(middle(line));
            boolean in = covering.covers(middle);
            if (!in && !near.intersects(line)) {
                dropped.set(p);
                continue;
            }
            boolean claimed = in && earlier.stream().anyMatch(g -> g.covers(middle));
            insideKept.add(in && !claimed);
            travelKept.add(!in || claimed);
        }
        StreetNetwork kept = EdgeSelection.without(pieces, dropped);
        boolean[] inside = new boolean[kept.edgeCount()];
        boolean[] travel = new boolean[kept.edgeCount()];
        for (int e = 0; e < inside.length; e++) {
            inside[e] = insideKept.get(e);
            travel[e] = travelKept.get(e);
        }
        return new Scoped(kept, inside, travel);
    }

    /** Offsets in metres (geodesic, along the edge) where the edge crosses the boundary, increasing. */
    private static double[] crossings(StreetNetwork network, int e, LocalFrame frame, STRtree boundary) {
        List<Double> offsets = new ArrayList<>();
        RobustLineIntersector intersector = new RobustLineIntersector();
        double at = 0;
        for (int k = 0; k + 1 < network.pointCount(e); k++) {
            double lon0 = network.pointLon(e, k), lat0 = network.pointLat(e, k);
            double lon1 = network.pointLon(e, k + 1), lat1 = network.pointLat(e, k + 1);
            Coordinate a = new Coordinate(frame.x(lon0), frame.y(lat0));
            Coordinate b = new Coordinate(frame.x(lon1), frame.y(lat1));
            double step = GeodesicLength.between(lon0, lat0, lon1, lat1);
            double planar = a.distance(b);
            @SuppressWarnings("unchecked")
            List<Coordinate[]> near = boundary.query(new Envelope(a, b));
            List<Double> fractions = new ArrayList<>();
            for (Coordinate[] s : near) {
                intersector.computeIntersection(a, b, s[0], s[1]);
                for (int i = 0; i < intersector.getIntersectionNum(); i++) {
                    fractions.add(planar > 0 ? intersector.getIntersection(i).distance(a) / planar : 0);
                }
            }
            fractions.sort(null);
            for (double f : fractions) {
                offsets.add(at + f * step);
            }
            at += step;
        }
        double[] out = offsets.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        // SplitNetwork measures the whole edge by its stored length; keep the offsets inside it
        double length = network.length(e);
        return Arrays.stream(out).map(d -> Math.min(d, length)).toArray();
    }

    private static STRtree boundarySegments(Geometry polygon) {
        STRtree tree = new STRtree();
        Geometry rings = polygon.getBoundary();
        for (int g = 0; g < rings.getNumGeometries(); g++) {
            Coordinate[] c = rings.getGeometryN(g).getCoordinates();
            for (int i = 0; i + 1 < c.length; i++) {
                tree.insert(new Envelope(c[i], c[i + 1]), new Coordinate[] {c[i], c[i + 1]});
            }
        }
        tree.build();
        return tree;
    }

    private static LineString planarLine(StreetNetwork network, int e, LocalFrame frame) {
        Coordinate[] c = new Coordinate[network.pointCount(e)];
        for (int k = 0; k < c.length; k++) {
            c[k] = new Coordinate(frame.x(network.pointLon(e, k)), frame.y(network.pointLat(e, k)));
        }
        return PLANE.createLineString(c);
    }

    /** The point halfway along the line. */
    private static Coordinate middle(LineString line) {
        double half = line.getLength() / 2;
        Coordinate[] c = line.getCoordinates();
        for (int i = 0; i + 1 < c.length; i++) {
            double step = c[i].distance(c[i + 1]);
            if (half <= step && step > 0) {
                double f = half / step;
                return new Coordinate(c[i].x + f * (c[i + 1].x - c[i].x), c[i].y + f * (c[i + 1].y - c[i].y));
            }
            half -= step;
        }
        return c[c.length - 1];
    }

    private static Geometry toPlane(Geometry lonLat, LocalFrame frame) {
        return new GeometryTransformer() {
            @Override
            protected org.locationtech.jts.geom.CoordinateSequence transformCoordinates(
                    org.locationtech.jts.geom.CoordinateSequence coords, Geometry parent) {
                Coordinate[] out = new Coordinate[coords.size()];
                for (int i = 0; i < out.length; i++) {
                    out[i] = new Coordinate(frame.x(coords.getX(i)), frame.y(coords.getY(i)));
                }
                return PLANE.getCoordinateSequenceFactory().create(out);
            }
        }.transform(lonLat);
    }
}
