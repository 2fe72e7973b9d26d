package org.streetcomb.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * The map of a district batch: every area's outline, planned ones apart from failed ones, each with its
 * figures on click, so a manager sees the whole authority's run on one page.
 */
public final class DistrictIndexLayers {

    /**
     * One area of the batch.
     *
     * @param polygon its outline in longitude/latitude, or null when it was not a polygon
     * @param figures what the page shows on click, in order (service km, deadhead km, left out km, folder, reason)
     */
    public record Area(String label, boolean planned, Geometry polygon, Map<String, String> figures) {
    }

    private DistrictIndexLayers() {
    }

    public static List<MapLayer> of(List<Area> areas) {
        List<MapFeature> planned = new ArrayList<>();
        List<MapFeature> failed = new ArrayList<>();
        for (Area area : areas) {
            if (area.polygon() == null || area.polygon().isEmpty()) {
                continue;
            }
            Geometry rings = area.polygon().getBoundary();
            double[][] parts = new double[rings.getNumGeometries()][];
            for (int g = 0; g < parts.length; g++) {
                Coordinate[] c = rings.getGeometryN(g).getCoordinates();
                parts[g] = new double[2 * c.length];
                for (int i = 0; i < c.length; i++) {
                    parts[g][2 * i] = c[i].x;
                    parts[g][2 * i + 1] = c[i].y;
                }
            }
            (area.planned() ? planned : failed).add(new MapFeature(parts, null, null, area.label(),
                    new LinkedHashMap<>(area.figures())));
        }
        List<MapLayer> layers = new ArrayList<>();
        layers.add(new MapLayer("planned-areas", String.format(Locale.ROOT, "Planned areas (%d)", planned.size()),
                "each area's figures on click; its tour, GPX, sheet and report are in its folder",
                MapLayer.Kind.LINES, new MapStyle(MapPalette.AREA, 3, 0.9, ""), true, planned));
        if (!failed.isEmpty()) {
            layers.add(new MapLayer("failed-areas", String.format(Locale.ROOT, "Failed areas (%d)", failed.size()),
                    "the reason on click, as in summary.csv", MapLayer.Kind.LINES,
                    new MapStyle(MapPalette.MISSED, 3, 0.9, "8 4"), true, failed));
        }
        return layers;
    }
}
