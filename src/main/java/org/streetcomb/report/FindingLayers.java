package org.streetcomb.report;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.streetcomb.check.Finding;
import org.streetcomb.check.FindingKind;
import org.streetcomb.check.Severity;

/**
 * The health check's findings as map layers: lines (streets cut off, duplicates) and points (near misses,
 * crossings), coloured by kind ({@link MapPalette#FINDING_KINDS}) and grouped by kind so each kind can be shown
 * alone; the severity is in each finding's details and in the group's title. Findings with no place (features
 * the reader dropped) are in the summary only.
 */
public final class FindingLayers {


    private FindingLayers() {
    }

    public static List<MapLayer> of(List<Finding> findings) {
        List<MapFeature> lines = new ArrayList<>();
        List<MapFeature> points = new ArrayList<>();
        for (Finding finding : findings) {
            Geometry place = finding.location();
            if (place == null || place.isEmpty()) {
                continue;
            }
            List<double[]> parts = new ArrayList<>();
            for (int i = 0; i < place.getNumGeometries(); i++) {
                Geometry part = place.getGeometryN(i);
                if (part instanceof Point point) {
                    points.add(feature(finding, new double[][] {{point.getX(), point.getY()}}));
                } else {
                    parts.add(flat(part instanceof Polygon polygon ? polygon.getExteriorRing().getCoordinates()
                            : part.getCoordinates()));
                }
            }
            if (!parts.isEmpty()) {
                lines.add(feature(finding, parts.toArray(new double[0][])));
            }
        }
        return List.of(
                new MapLayer("finding-lines", "Findings on streets", "streets a finding is about, in the colour of its kind",
                        MapLayer.Kind.LINES, MapStyle.solid(MapPalette.ARROWS, 6, 0.85), true, lines),
                new MapLayer("finding-points", "Findings at places", "places a finding is about, in the colour of its kind",
                        MapLayer.Kind.POINTS, MapStyle.solid(MapPalette.ARROWS, 12, 1), true, points));
    }

    /** One group per kind found, in the order reports list kinds, in the kind's colour, titled with its worst severity. */
    public static List<MapGroup> groups(List<Finding> findings) {
        Map<FindingKind, int[]> counts = new EnumMap<>(FindingKind.class);
        Map<FindingKind, Severity> worst = new EnumMap<>(FindingKind.class);
        for (Finding finding : findings) {
            counts.computeIfAbsent(finding.kind(), k -> new int[1])[0]++;
            worst.merge(finding.kind(), finding.severity(), (a, b) -> a.compareTo(b) <= 0 ? a : b);
        }
        List<MapGroup> groups = new ArrayList<>();
        counts.forEach((kind, n) -> groups.add(new MapGroup(kind.code().replace('_', '-'),
                String.format(Locale.ROOT, "%s (%d, %s)", kind.code().replace('_', ' '), n[0], worst.get(kind).code()),
                colour(kind))));
        return groups;
    }

    private static MapFeature feature(Finding finding, double[][] parts) {
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Kind", finding.kind().code().replace('_', ' '));
        details.put("Severity", finding.severity().code());
        details.put("Features", String.join(", ", finding.featureIds()));
        details.put("Measured", String.format(Locale.ROOT, "%.2f %s", finding.value(), finding.unit()));
        details.put("What to do", finding.fix());
        return new MapFeature(parts, finding.kind().code().replace('_', '-'), colour(finding.kind()),
                finding.problem(), details);
    }

    static String colour(FindingKind kind) {
        return MapPalette.FINDING_KINDS.get(kind.ordinal());
    }

    private static double[] flat(Coordinate[] coordinates) {
        double[] part = new double[2 * coordinates.length];
        for (int k = 0; k < coordinates.length; k++) {
            part[2 * k] = coordinates[k].x;
            part[2 * k + 1] = coordinates[k].y;
        }
        return part;
    }
}
