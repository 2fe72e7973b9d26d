package org.streetcomb.check;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.PrecisionModel;
import org.streetcomb.network.StreetNetwork;

/** Builds the WGS84 locations and feature-id lists of findings from network ids. */
final class Places {

    static final GeometryFactory WGS84 = new GeometryFactory(new PrecisionModel(), 4326);

    private Places() {
    }

    static Geometry point(double lon, double lat) {
        return WGS84.createPoint(new Coordinate(lon, lat));
    }

    static Geometry node(StreetNetwork network, int node) {
        return point(network.lon(node), network.lat(node));
    }

    static LineString edge(StreetNetwork network, int e) {
        Coordinate[] coords = new Coordinate[network.pointCount(e)];
        for (int k = 0; k < coords.length; k++) {
            coords[k] = new Coordinate(network.pointLon(e, k), network.pointLat(e, k));
        }
        return WGS84.createLineString(coords);
    }

    /** One line for a single edge, else a MultiLineString. */
    static Geometry edges(StreetNetwork network, int[] edges) {
        if (edges.length == 1) {
            return edge(network, edges[0]);
        }
        LineString[] lines = new LineString[edges.length];
        for (int i = 0; i < edges.length; i++) {
            lines[i] = edge(network, edges[i]);
        }
        return WGS84.createMultiLineString(lines);
    }

    /** The distinct source-feature ids of the edges, in the order of their features in the layer. */
    static List<String> featureIds(StreetNetwork network, int... edges) {
        TreeSet<Integer> indexes = new TreeSet<>();
        for (int e : edges) {
            indexes.add(network.featureIndex(e));
        }
        Set<String> ids = new LinkedHashSet<>();
        for (int f : indexes) {
            ids.add(network.features().get(f).id());
        }
        return new ArrayList<>(ids);
    }

    static double length(StreetNetwork network, int[] edges) {
        double sum = 0;
        for (int e : edges) {
            sum += network.length(e);
        }
        return sum;
    }

    /** "features a, b, c" or "features a, b, c and 7 more", for one-line messages. */
    static String list(List<String> ids, int shown) {
        StringBuilder b = new StringBuilder(ids.size() == 1 ? "feature " : "features ");
        for (int i = 0; i < Math.min(shown, ids.size()); i++) {
            b.append(i == 0 ? "" : ", ").append(ids.get(i));
        }
        if (ids.size() > shown) {
            b.append(" and ").append(ids.size() - shown).append(" more");
        }
        return b.toString();
    }
}
