package org.streetcomb.report;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One thing drawn on the report's map: a line (one or more parts) or a point, with the text shown when
 * the user points at it or clicks it. All text is plain text: the writers escape it.
 *
 * @param parts   the geometry: each part a flat array lon0, lat0, lon1, lat1, ... in WGS84 degrees; a point
 *                is one part of one position. Not copied: callers must not change the arrays afterwards.
 * @param group   the id of the {@link MapGroup} this feature belongs to (for example a tour), or null
 * @param colour  a colour that overrides the layer's ({@code #rrggbb}), or null
 * @param label   short text shown on hover (and as the text of a label layer), or empty
 * @param details rows shown on click, in order
 */
public record MapFeature(double[][] parts, String group, String colour, String label, Map<String, String> details) {

    public MapFeature {
        for (double[] part : parts) {
            if (part.length < 2 || part.length % 2 != 0) {
                throw new IllegalArgumentException("a part needs whole lon,lat pairs");
            }
        }
        details = Collections.unmodifiableMap(new LinkedHashMap<>(details));
    }

    public static MapFeature point(double lon, double lat, String group, String label, Map<String, String> details) {
        return new MapFeature(new double[][] {{lon, lat}}, group, null, label, details);
    }
}
