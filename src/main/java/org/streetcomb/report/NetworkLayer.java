package org.streetcomb.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.operation.linemerge.LineMerger;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;

/**
 * The street network as a map layer: one feature per street name (per feature id for unnamed streets), its
 * edges sewn into as few lines as possible with JTS's LineMerger, so a street split at every junction is
 * one thing to point at and a large network stays quick to draw.
 */
public final class NetworkLayer {

    static final String COLOUR = MapPalette.STREETS;
    /** Feature ids listed in a street's details; the rest are counted. */
    private static final int IDS_LISTED = 8;
    private static final GeometryFactory FACTORY = new GeometryFactory();

    private NetworkLayer() {
    }

    public static MapLayer of(StreetNetwork network) {
        Map<String, Street> byKey = new LinkedHashMap<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            RoadFeature source = network.feature(e);
            byKey.computeIfAbsent(streetKey(source), k -> new Street(streetName(source))).add(network, e, source);
        }
        List<MapFeature> features = new ArrayList<>();
        for (Street street : byKey.values()) {
            features.add(street.feature());
        }
        return new MapLayer("streets", "Streets", "every street of the network, as noded", MapLayer.Kind.LINES,
                MapStyle.solid(COLOUR, 2, 1), true, features);
    }

    /** Streets with the same name are one street; unnamed ones are told apart by feature id. */
    static String streetKey(RoadFeature feature) {
        return feature.name().isEmpty() ? "\u0000" + feature.id() : feature.name();
    }

    static String streetName(RoadFeature feature) {
        return feature.name().isEmpty() ? "unnamed street (feature " + feature.id() + ")" : feature.name();
    }

    /** The first few ids, and how many more there are. */
    static String idList(List<String> ids) {
        return ids.size() <= IDS_LISTED ? String.join(", ", ids)
                : String.join(", ", ids.subList(0, IDS_LISTED)) + " and " + (ids.size() - IDS_LISTED) + " more";
    }

    /** Lines sewn into as few parts as possible (JTS LineMerger), each part as lon, lat pairs. */
    static double[][] merged(List<LineString> lines) {
        LineMerger merger = new LineMerger();
        merger.add(lines);
        List<double[]> parts = new ArrayList<>();
        for (Object merged : merger.getMergedLineStrings()) {
            Coordinate[] coordinates = ((LineString) merged).getCoordinates();
            double[] part = new double[2 * coordinates.length];
            for (int k = 0; k < coordinates.length; k++) {
                part[2 * k] = coordinates[k].x;
                part[2 * k + 1] = coordinates[k].y;
            }
            parts.add(part);
        }
        return parts.toArray(new double[0][]);
    }

    /** The edge's polyline in the direction of travel, as lon, lat pairs. */
    static double[] edgePoints(StreetNetwork network, int e, boolean forward) {
        int n = network.pointCount(e);
        double[] points = new double[2 * n];
        for (int k = 0; k < n; k++) {
            int i = forward ? k : n - 1 - k;
            points[2 * k] = network.pointLon(e, i);
            points[2 * k + 1] = network.pointLat(e, i);
        }
        return points;
    }

    /** The edges of one street. */
    private static final class Street {
        final String name;
        final List<LineString> edges = new ArrayList<>();
        final List<String> ids = new ArrayList<>();
        double length;

        Street(String name) {
            this.name = name;
        }

        void add(StreetNetwork network, int e, RoadFeature source) {
            double[] points = edgePoints(network, e, true);
            Coordinate[] coordinates = new Coordinate[points.length / 2];
            for (int k = 0; k < coordinates.length; k++) {
                coordinates[k] = new Coordinate(points[2 * k], points[2 * k + 1]);
            }
            edges.add(FACTORY.createLineString(coordinates));
            if (ids.isEmpty() || !ids.get(ids.size() - 1).equals(source.id())) {
                ids.add(source.id());
            }
            length += network.length(e);
        }

        MapFeature feature() {
            Map<String, String> details = new LinkedHashMap<>();
            details.put("Feature ids", idList(ids));
            details.put("Length (m)", String.format(Locale.ROOT, "%.1f", length));
            details.put("Edges", String.valueOf(edges.size()));
            return new MapFeature(merged(edges), null, null, name, details);
        }
    }
}
