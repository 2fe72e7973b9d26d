package org.streetcomb.scope;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;
import org.streetcomb.InputError;
import org.streetcomb.read.Place;

/**
 * Picks the service area from an area layer: its only polygon, or the one polygon feature whose attribute
 * holds a given value, and checks that it is a polygon a street can be inside of (valid in the OGC Simple
 * Features sense, as JTS's {@link IsValidOp} tests it).
 */
public final class AreaChoice {

    private AreaChoice() {
    }

    /**
     * @param field the attribute to pick by, or null when the layer holds one polygon
     * @param value the value the picked feature holds in {@code field} (compared ignoring case and outer spaces)
     */
    public static ServiceArea pick(List<Place> places, Path file, String field, String value, double margin) {
        List<Place> chosen = field == null ? places : places.stream().filter(p -> value.strip()
                .equalsIgnoreCase(p.properties().getOrDefault(field, "").strip())).toList();
        if (chosen.isEmpty()) {
            throw InputError.at(file, null, "no feature has " + field + "=" + value);
        }
        if (chosen.size() > 1) {
            throw InputError.at(file, null, field == null
                    ? "holds " + chosen.size() + " features: pick one by an attribute (FIELD=VALUE)"
                    : chosen.size() + " features have " + field + "=" + value + ": pick by an attribute that is unique");
        }
        Place place = chosen.get(0);
        return new ServiceArea(label(place, field), polygon(place, file), margin);
    }

    /** The place's geometry if it is a valid polygon; else an error naming the feature and what is wrong. */
    public static org.locationtech.jts.geom.Geometry polygon(Place place, Object file) {
        String where = "feature " + place.id();
        if (!place.isPolygonal()) {
            throw InputError.at(file, where, "is " + place.kind() + ", not a polygon: an area must be a Polygon or "
                    + "MultiPolygon");
        }
        TopologyValidationError invalid = new IsValidOp(place.geometry()).getValidationError();
        if (invalid != null) {
            throw InputError.at(file, where, String.format(Locale.ROOT, "is not a valid polygon (%s at %.6f,%.6f): "
                    + "repair it in a GIS", invalid.getMessage().toLowerCase(Locale.ROOT), invalid.getCoordinate().x,
                    invalid.getCoordinate().y));
        }
        return place.geometry();
    }

    /** The feature's name attribute, else the picked value, else its id. */
    public static String label(Place place, String field) {
        for (String key : new String[] {"name", "NAME", "Name"}) {
            String name = place.properties().get(key);
            if (name != null && !name.isBlank()) {
                return name.strip();
            }
        }
        if (field != null && place.properties().get(field) != null) {
            return place.properties().get(field).strip();
        }
        return place.id();
    }
}
