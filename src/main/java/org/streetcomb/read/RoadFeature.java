package org.streetcomb.read;

import java.util.Map;
import org.locationtech.jts.geom.LineString;

/**
 * One road centreline as read from a layer: a single line in WGS84 longitude/latitude, with the source
 * feature it came from. A multi-part feature becomes several road features with the same id.
 *
 * @param id         the source feature's id (its GeoJSON id, an id property, or its 1-based position)
 * @param name       street name, or an empty string when the layer has none
 * @param line       the centreline, x = longitude, y = latitude (degrees)
 * @param travel     permitted directions of travel
 * @param required   whether the street must be serviced (all streets unless a layer says otherwise)
 * @param properties the feature's scalar attributes, as text
 * @param cost       the cost of travelling the whole line (minutes, say) from the layer's cost field, or
 *                   NaN when the layer gives none and geodesic length is the weight
 */
public record RoadFeature(String id, String name, LineString line, Travel travel, boolean required,
                          Map<String, String> properties, double cost) {

    public RoadFeature(String id, String name, LineString line, Travel travel, boolean required,
                       Map<String, String> properties) {
        this(id, name, line, travel, required, properties, Double.NaN);
    }

    public boolean hasCost() {
        return !Double.isNaN(cost);
    }

    /**
     * Whether the line runs underground: tagged {@code tunnel} with any value but "no" (OpenStreetMap's tunnel
     * key: yes, building_passage, culvert, ...; a layer with such a field works the same way).
     */
    public boolean tunnel() {
        String value = properties.getOrDefault("tunnel", "no").trim();
        return !value.isEmpty() && !value.equalsIgnoreCase("no") && !value.equals("0");
    }
}
