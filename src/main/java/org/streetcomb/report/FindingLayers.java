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
 * crossings), coloured by severity, grouped by kind so each kind can be shown alone. Findings with no
 * place (features the reader dropped) are in the summary only.
 */
public final class FindingLayers {

    private static final Map<Severity, String> COLOURS = new EnumMap<>(Map.of(
            Severity.BLOCKING, "#b3261e", Severity.WARNING, "#e8590c", Severity.NOTE, "#5f3dc4"));

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
                new MapLayer("finding-lines", "Findings on streets", "streets a finding is about, coloured by severity",
                        MapLayer.Kind.LINES, MapStyle.solid(COLOURS.get(Severity.WARNING), 6, 0.8), true, lines),
                new MapLayer("finding-points", "Findings at places", "places a finding is about, coloured by severity",
                        MapLayer.Kind.POINTS, MapStyle.solid(COLOURS.get(Severity.WARNING), 12, 1), true, points));
    }

    /** One group per kind found, in the order reports list kinds, coloured by the kind's worst severity. */
    public static List<MapGroup> groups(List<Finding> findings) {
        Map<FindingKind, int[]> counts = new EnumMap<>(FindingKind.class);
        Map<FindingKind, Severity> worst = new EnumMap<>(FindingKind.class);
        for (Finding finding : findings) {
            counts.computeIfAbsent(finding.kind(), k -> new int[1])[0]++;
            worst.merge(finding.kind(), finding.severity(), (a, b) -> a.compareTo(b) <= 0 ? a : b);
        }
        List<MapGroup> groups = new ArrayList<>();
        counts.forEach((kind, n) -> groups.add(new MapGroup(kind.code().replace('_', '-'),
                String.format(Locale.ROOT, "%s (%d)", kind.code().replace('_', ' '), n[0]), COLOURS.get(worst.get(kind)))));
        return groups;
    }

    private static MapFeature feature(Finding finding, double[][] parts) {
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Kind", finding.kind().code().replace('_', ' '));
        details.put("Severity", finding.severity().code());
        details.put("Features", String.join(", ", finding.featureIds()));
        details.put("Measured", String.format(Locale.ROOT, "%.2f %s", finding.value(), finding.unit()));
        details.put("What to do", finding.fix());
        return new MapFeature(parts, finding.kind().code().replace('_', '-'), COLOURS.get(finding.severity()),
                finding.problem(), details);
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
