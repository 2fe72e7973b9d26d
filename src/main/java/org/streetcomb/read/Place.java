package org.streetcomb.read;

import java.util.Map;
import org.locationtech.jts.geom.Geometry;

/**
 * One feature of an area or depot layer: its geometry in WGS84 longitude/latitude (x = longitude), whatever
 * its type, so the caller can say what it expected when the type is wrong.
 *
 * @param id         the feature's id (GeoJSON id, an id property, the primary key, or its 1-based record number)
 * @param properties its scalar attributes as text
 * @param geometry   its geometry, or null when the feature has none
 */
public record Place(String id, Map<String, String> properties, Geometry geometry) {

    public boolean isPolygonal() {
        return geometry != null && !geometry.isEmpty()
                && (geometry.getGeometryType().equals("Polygon") || geometry.getGeometryType().equals("MultiPolygon"));
    }

    public boolean isPoint() {
        return geometry != null && !geometry.isEmpty() && geometry.getGeometryType().equals("Point");
    }

    /** "Polygon", "LineString", ..., or "no geometry". */
    public String kind() {
        return geometry == null || geometry.isEmpty() ? "no geometry" : geometry.getGeometryType();
    }
}
