package org.streetcomb.read;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.InputError;

/**
 * Turns a geometric layer's feature attributes into road features as {@link ReadOptions} says: keeps or
 * drops features by the filters, and reads the street name, the one-way flag and the required flag.
 * A one-way value that is neither forward, backward nor two-way is read as two-way and counted in the
 * report, so a layer with an unexpected encoding shows up in the summary instead of failing.
 */
final class AttributeMapping {

    /** Values of the required field that mean "must be serviced" (common practice). */
    private static final Set<String> TRUE_VALUES = Set.of("yes", "true", "1", "y", "t");

    private final ReadOptions options;

    AttributeMapping(ReadOptions options) {
        this.options = options;
    }

    /** Whether the filters keep a feature with these attributes; counts the dropped ones. */
    boolean keeps(Map<String, String> properties, ReadTally tally) {
        for (ReadOptions.FieldFilter filter : options.keep()) {
            if (!filter.matches(properties)) {
                tally.skip("not matching --keep " + filter);
                return false;
            }
        }
        for (ReadOptions.FieldFilter filter : options.drop()) {
            if (filter.matches(properties)) {
                tally.skip("matching --drop " + filter);
                return false;
            }
        }
        return true;
    }

    /**
     * Keeps the lines of a kept feature as road features; a multi-part feature's cost is shared among its
     * lines in proportion to their lengths.
     *
     * @param place where the feature is in the file, for an error message
     */
    void keep(String layerId, Map<String, String> properties, List<LineString> lines, ReadTally tally, String place) {
        String id = id(layerId, properties, place);
        String name = properties.getOrDefault(options.nameField(), "");
        Travel travel = travel(properties, tally);
        boolean required = required(properties);
        double cost = cost(properties, place);
        double total = lines.stream().mapToDouble(LineString::getLength).sum();
        for (LineString line : lines) {
            double share = total > 0 ? line.getLength() / total : 1.0 / lines.size();
            tally.keep(new RoadFeature(id, name, line, travel, required, properties, cost * share));
        }
    }

    /** The feature's id: the layer's own, or the value of the id field when one is named. */
    String id(String layerId, Map<String, String> properties, String place) {
        if (options.idField() == null) {
            return layerId;
        }
        String value = properties.get(options.idField());
        if (value == null || value.isBlank()) {
            throw new InputError(place + ": id field " + options.idField() + " holds "
                    + (value == null ? "nothing" : "only blanks") + ": --id-field needs a value for every street"
                    + (properties.containsKey(options.idField()) ? "" : "; the feature's fields are "
                    + String.join(", ", properties.keySet().stream().limit(12).toList())));
        }
        return value.trim();
    }

    /** The feature's cost from the cost field, or NaN when no cost field is named. */
    private double cost(Map<String, String> properties, String place) {
        if (options.costField() == null) {
            return Double.NaN;
        }
        String raw = properties.get(options.costField());
        double cost;
        try {
            cost = raw == null ? Double.NaN : Double.parseDouble(raw.trim());
        } catch (NumberFormatException e) {
            cost = Double.NaN;
        }
        if (!(cost >= 0) || Double.isInfinite(cost)) {
            throw new InputError(place + ": cost field " + options.costField() + " holds "
                    + (raw == null ? "nothing" : "'" + raw + "'") + ": expected a number of 0 or more for every street");
        }
        return cost;
    }

    private Travel travel(Map<String, String> properties, ReadTally tally) {
        if (options.onewayField() == null) {
            return Travel.BOTH;
        }
        String raw = properties.get(options.onewayField());
        if (raw == null) {
            return Travel.BOTH;
        }
        String value = raw.trim().toLowerCase(Locale.ROOT);
        if (options.onewayForward().contains(value)) {
            return Travel.FORWARD;
        }
        if (options.onewayBackward().contains(value)) {
            return Travel.BACKWARD;
        }
        if (!options.onewayBoth().contains(value)) {
            tally.note("one-way value '" + raw.trim() + "' not recognised, read as two-way");
        }
        return Travel.BOTH;
    }

    /** Whether the street must be serviced: every street, unless a required field is named. */
    boolean required(Map<String, String> properties) {
        if (options.requiredField() == null) {
            return true;
        }
        String value = properties.get(options.requiredField());
        return value != null && TRUE_VALUES.contains(value.trim().toLowerCase(Locale.ROOT));
    }
}
