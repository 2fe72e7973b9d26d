package org.streetcomb.tour;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.streetcomb.read.RoadFeature;

/**
 * What a direction sheet calls a street: its name, or for an unnamed way its class ("unnamed primary road",
 * "unnamed residential street", "roundabout") taken from the layer's road-class attribute: OSM's
 * {@code highway} and {@code junction} tags, or the class field of common centreline exports ({@code fclass},
 * {@code type}, {@code class}). Directions then tie an unnamed way to the named street it leads to or comes
 * from, so a crew can find it on the ground.
 */
public final class StreetLabel {

    /** Attribute names that hold a road class, in the order they are tried. */
    private static final List<String> CLASS_KEYS = List.of("highway", "fclass", "type", "class", "HIGHWAY", "FCLASS",
            "TYPE", "CLASS");
    private static final Set<String> STREET_CLASSES = Set.of("residential", "living street", "pedestrian");
    private static final Set<String> LAST_WORDS = Set.of("road", "street", "way", "lane", "track", "path", "roundabout",
            "motorway");

    private StreetLabel() {
    }

    /**
     * The key that tells streets apart: the name; for an unnamed way its feature id (never merged with another),
     * except that the pieces of an unnamed roundabout, which OSM often splits into several ways, are one.
     */
    static String key(RoadFeature feature) {
        if (!feature.name().isEmpty()) {
            return feature.name();
        }
        return roundabout(feature) ? "\u0000roundabout" : "\u0000" + feature.id();
    }

    static boolean roundabout(RoadFeature feature) {
        String junction = feature.properties().get("junction");
        return "roundabout".equals(junction) || "circular".equals(junction);
    }

    /** The street's name, or what an unnamed way is, e.g. "unnamed primary road" or "roundabout". */
    static String of(RoadFeature feature) {
        if (!feature.name().isEmpty()) {
            return feature.name();
        }
        if (roundabout(feature)) {
            return "unnamed roundabout";
        }
        for (String key : CLASS_KEYS) {
            String value = feature.properties().get(key);
            if (value != null && !value.isBlank() && value.length() <= 40) {
                return "unnamed " + phrase(value);
            }
        }
        return "unnamed street";
    }

    /** "primary_link" → "primary link road", "residential" → "residential street", "service" → "service road". */
    private static String phrase(String roadClass) {
        String words = roadClass.strip().toLowerCase(Locale.ROOT).replace('_', ' ');
        if (STREET_CLASSES.contains(words)) {
            return words.endsWith("street") ? words : words + " street";
        }
        return LAST_WORDS.contains(words.substring(words.lastIndexOf(' ') + 1)) ? words : words + " road";
    }
}
