package org.streetcomb.fleet;

import java.nio.file.Path;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;

/**
 * What servicing each street uses of a vehicle's load: a quantity per street from a layer field (bins,
 * kilograms), shared among the street's edges by length, or a rate per kilometre (salt spread per km and
 * lane) times the street's lanes from an optional field (1 where it is empty; common practice for spread
 * rates). O(edges).
 */
public final class StreetDemand {

    private StreetDemand() {
    }

    /**
     * @param field      the field holding each street's quantity, or null to use the rate
     * @param ratePerKm  quantity per kilometre and lane, used when {@code field} is null
     * @param lanesField the field holding each street's lanes, or null for one lane
     * @param source     the layer, for messages
     * @return the demand of each edge
     */
    public static double[] of(StreetNetwork network, String field, double ratePerKm, String lanesField, Path source) {
        int features = network.features().size();
        double[] featureLength = new double[features];
        for (int e = 0; e < network.edgeCount(); e++) {
            featureLength[network.featureIndex(e)] += network.length(e);
        }
        if (lanesField != null && network.features().stream().noneMatch(f -> f.properties().containsKey(lanesField))) {
            throw new InputError(String.format(Locale.ROOT, "%s: no street has a field %s: check the name with the "
                    + "layer's fields, or leave out --lanes-field for one lane", source, lanesField));
        }
        double[] demand = new double[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            RoadFeature feature = network.feature(e);
            if (field != null) {
                double quantity = number(feature, field, source, true);
                demand[e] = featureLength[network.featureIndex(e)] == 0 ? 0
                        : quantity * network.length(e) / featureLength[network.featureIndex(e)];
            } else {
                double lanes = lanesField == null ? 1 : number(feature, lanesField, source, false);
                demand[e] = ratePerKm * lanes * network.length(e) / 1000;
            }
        }
        return demand;
    }

    /** The field's value as a non-negative number; an empty lanes value counts as one lane. */
    private static double number(RoadFeature feature, String field, Path source, boolean required) {
        String text = feature.properties().get(field);
        if (text == null || text.isBlank()) {
            if (!required) {
                return 1;
            }
            throw new InputError(String.format(Locale.ROOT, "%s: feature %s: no value in field %s: give every street "
                    + "a quantity, or use a rate per kilometre instead", source, feature.id(), field));
        }
        try {
            // OSM lanes may read "2;3" where a street changes: the first value stands
            double value = Double.parseDouble(text.trim().split(";")[0]);
            if (!(value >= 0) || Double.isInfinite(value)) {
                throw new NumberFormatException();
            }
            return value;
        } catch (NumberFormatException notNumber) {
            throw new InputError(String.format(Locale.ROOT, "%s: feature %s: field %s holds '%s', not a number of 0 or "
                    + "more", source, feature.id(), field, text.length() > 40 ? text.substring(0, 40) + "..." : text));
        }
    }
}
