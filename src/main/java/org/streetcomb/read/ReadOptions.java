package org.streetcomb.read;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * How to read a road layer: which attributes hold the street name, the one-way flag, the required flag and
 * the cost, which features to keep, which travel mode selects OpenStreetMap roads, and the coordinate
 * reference system when the file does not state one.
 *
 * @param nameField       attribute holding the street name (geometric layers)
 * @param onewayField     attribute holding the one-way flag, or null to read none
 * @param onewayForward   values of {@code onewayField} meaning one-way in the digitised direction
 * @param onewayBackward  values meaning one-way against the digitised direction
 * @param onewayBoth      values meaning two-way (any other value is reported and read as two-way)
 * @param keep            a feature is kept only when it matches every one of these filters
 * @param drop            a feature is dropped when it matches any of these filters
 * @param requiredField   attribute marking streets that must be serviced, or null: every street is
 * @param mode            travel mode that selects roads and one-way rules in OpenStreetMap data
 * @param serviceRoads    include OpenStreetMap service roads when driving
 * @param privateRoads    include OpenStreetMap roads with private or no access
 * @param crs             the layer's CRS as "EPSG:code" or a path to a WKT file, or null to use the file's own
 * @param gradeSeparated  join a geometric layer's lines only at shared vertices, never at bare crossings
 * @param levelField      attribute giving each line's level (z-level, layer), honoured with grade separation
 * @param costField       attribute giving each line's cost (travel minutes, say) to use as its weight instead
 *                        of its geodesic length, or null
 * @param layer           the table to read from a GeoPackage holding several line layers, or null
 * @param idField         attribute whose value is each feature's id in messages, outputs and service lists,
 *                        or null for the layer's own id (FID as GDAL counts it, GeoJSON id, OSM way/N)
 * @param crossingLimit   most crossings noding may split at ({@link RoadLayer#AUTOMATIC_CROSSINGS}: the
 *                        default; 0: no limit)
 */
public record ReadOptions(String nameField, String onewayField, Set<String> onewayForward, Set<String> onewayBackward,
                          Set<String> onewayBoth, List<FieldFilter> keep, List<FieldFilter> drop, String requiredField,
                          TravelMode mode, boolean serviceRoads, boolean privateRoads, String crs,
                          boolean gradeSeparated, String levelField, String costField, String layer,
                          String idField, long crossingLimit) {

    /**
     * One-way encodings found in council layers and OpenStreetMap-derived exports (common practice):
     * OSM's yes/-1/no, booleans and 1/0, and from-to/to-from codes. The single letters T and F are left
     * out on purpose: some layers use them for true/false, others for to/from, so they are not guessed.
     */
    public static final Set<String> FORWARD_VALUES = Set.of("yes", "true", "1", "y", "ft", "forward", "fwd");
    public static final Set<String> BACKWARD_VALUES = Set.of("-1", "tf", "reverse", "backward", "back", "rev");
    public static final Set<String> BOTH_VALUES = Set.of("no", "false", "0", "n", "b", "both", "");

    public static final ReadOptions DEFAULTS = new ReadOptions("name", "oneway", FORWARD_VALUES, BACKWARD_VALUES,
            BOTH_VALUES, List.of(), List.of(), null, TravelMode.DRIVE, false, false, null, false, null, null, null, null, RoadLayer.AUTOMATIC_CROSSINGS);

    public ReadOptions {
        onewayForward = lowerCase(onewayForward);
        onewayBackward = lowerCase(onewayBackward);
        onewayBoth = lowerCase(onewayBoth);
        keep = List.copyOf(keep);
        drop = List.copyOf(drop);
    }

    /** These options with the layer's CRS stated. */
    public ReadOptions withCrs(String code) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, code, gradeSeparated, levelField, costField, layer, idField, crossingLimit);
    }

    /** These options with OpenStreetMap road selection for the mode, service roads and private roads. */
    public ReadOptions withRoads(TravelMode travelMode, boolean service, boolean privateAccess) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, travelMode, service, privateAccess, crs, gradeSeparated, levelField, costField, layer, idField, crossingLimit);
    }

    /** These options with grade separation, honouring {@code field} (or none when null) as the level. */
    public ReadOptions withGradeSeparation(String field) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, crs, true, field, costField, layer, idField, crossingLimit);
    }

    /** These options with the cost of each line read from {@code field}. */
    public ReadOptions withCostField(String field) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, crs, gradeSeparated, levelField, field, layer, idField, crossingLimit);
    }

    /** These options taking each feature's id from {@code field}. */
    public ReadOptions withIdField(String field) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, crs, gradeSeparated, levelField, costField, layer, field, crossingLimit);
    }

    /** These options noding at most {@code limit} crossings (0: no limit). */
    public ReadOptions withCrossingLimit(long limit) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, crs, gradeSeparated, levelField, costField, layer,
                idField, limit);
    }

    /** These options reading the named table of a GeoPackage. */
    public ReadOptions withLayer(String table) {
        return new ReadOptions(nameField, onewayField, onewayForward, onewayBackward, onewayBoth, keep, drop,
                requiredField, mode, serviceRoads, privateRoads, crs, gradeSeparated, levelField, costField, table, idField, crossingLimit);
    }

    private static Set<String> lowerCase(Set<String> values) {
        return Set.copyOf(values.stream().map(v -> v.trim().toLowerCase(Locale.ROOT)).toList());
    }

    /** Matches features whose {@code field} holds one of {@code values} (compared ignoring case). */
    public record FieldFilter(String field, Set<String> values) {

        public FieldFilter {
            values = lowerCase(values);
        }

        public boolean matches(Map<String, String> properties) {
            String value = properties.get(field);
            return value != null && values.contains(value.trim().toLowerCase(Locale.ROOT));
        }

        @Override
        public String toString() {
            return field + "=" + String.join(",", values.stream().sorted().toList());
        }
    }
}
