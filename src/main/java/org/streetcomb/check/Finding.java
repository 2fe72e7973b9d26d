package org.streetcomb.check;

import java.util.List;
import org.locationtech.jts.geom.Geometry;

/**
 * One defect found in a layer.
 *
 * @param kind       what sort of defect
 * @param severity   whether it blocks a tour
 * @param location   where it is, in WGS84 longitude/latitude (a point or lines), or null when the layer
 *                   gives no place (features dropped by the reader)
 * @param featureIds the ids of the source features involved, in the layer's order
 * @param value      the measurement that triggered it, in {@code unit}
 * @param unit       "m", "degrees" or "features"
 * @param problem    one line saying what is wrong
 * @param fix        one line saying what to do about it
 */
public record Finding(FindingKind kind, Severity severity, Geometry location, List<String> featureIds, double value,
                      String unit, String problem, String fix) {

    public Finding {
        featureIds = List.copyOf(featureIds);
    }
}
