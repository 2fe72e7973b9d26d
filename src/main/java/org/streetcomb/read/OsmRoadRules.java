package org.streetcomb.read;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Which OpenStreetMap ways are streets for a travel mode, which way they may be travelled, and what they
 * are called, following the OSM wiki:
 * <ul>
 * <li>road classes: https://wiki.openstreetmap.org/wiki/Key:highway. Driving takes the public road classes
 *     motorway, trunk, primary, secondary, tertiary (and their _link roads), unclassified, residential and
 *     living_street; service roads only when asked. Walking takes the same except motorways and their
 *     links, plus pedestrian, footway, path and steps.</li>
 * <li>access: https://wiki.openstreetmap.org/wiki/Key:access. The most specific tag for the mode decides
 *     (driving: motorcar, then motor_vehicle, vehicle, access; walking: foot, then access); private and
 *     no are left out unless asked.</li>
 * <li>one-way for driving: https://wiki.openstreetmap.org/wiki/Key:oneway (yes/true/1 with the drawn
 *     direction, -1 against it, no/false/0 two-way), https://wiki.openstreetmap.org/wiki/Key:junction
 *     (roundabout and circular imply one-way) and https://wiki.openstreetmap.org/wiki/Tag:highway=motorway
 *     (motorways and motorway links imply one-way), unless an explicit oneway tag says otherwise;
 *     oneway:motorcar, oneway:motor_vehicle and oneway:vehicle override oneway.</li>
 * <li>one-way for walking: only oneway:foot applies; oneway and roundabouts bind vehicles.</li>
 * <li>oneway=reversible and oneway=alternating change direction by time of day or by signals: they are
 *     read as two-way and counted in the report, so a planner can check them on the ground.</li>
 * </ul>
 */
final class OsmRoadRules {

    static final Set<String> DRIVE = Set.of("motorway", "motorway_link", "trunk", "trunk_link", "primary",
            "primary_link", "secondary", "secondary_link", "tertiary", "tertiary_link", "unclassified", "residential",
            "living_street");
    static final Set<String> WALK_EXTRA = Set.of("pedestrian", "footway", "path", "steps");
    private static final Set<String> NO_WALKING = Set.of("motorway", "motorway_link");
    private static final Set<String> CLOSED = Set.of("private", "no");
    private static final Set<String> FORWARD = Set.of("yes", "true", "1");
    private static final Set<String> BACKWARD = Set.of("-1", "reverse");
    private static final Set<String> TWO_WAY = Set.of("no", "false", "0");
    private static final Set<String> TIMED = Set.of("reversible", "alternating");

    /** The tag keys the rules read; readers keep only these. */
    static final Set<String> KEYS = Set.of("highway", "name", "ref", "oneway", "oneway:foot", "oneway:motorcar",
            "oneway:motor_vehicle", "oneway:vehicle", "junction", "access", "vehicle", "motor_vehicle", "motorcar",
            "foot", "area", "service", "bridge", "tunnel", "layer");

    private final TravelMode mode;
    private final boolean serviceRoads;
    private final boolean privateRoads;

    OsmRoadRules(TravelMode mode, boolean serviceRoads, boolean privateRoads) {
        this.mode = mode;
        this.serviceRoads = serviceRoads;
        this.privateRoads = privateRoads;
    }

    /** Null when the way is a street for this mode, else why not (for the report). */
    String exclusion(Map<String, String> tags) {
        String highway = tags.get("highway");
        if (highway == null) {
            return "not a highway";
        }
        if ("yes".equals(tags.get("area"))) {
            return "highway area";
        }
        boolean classOk = mode == TravelMode.DRIVE
                ? DRIVE.contains(highway) || (serviceRoads && highway.equals("service"))
                : (DRIVE.contains(highway) && !NO_WALKING.contains(highway)) || WALK_EXTRA.contains(highway)
                  || (serviceRoads && highway.equals("service"));
        if (!classOk) {
            return "highway=" + highway + " not used for " + mode.name().toLowerCase(Locale.ROOT);
        }
        String access = first(tags, mode == TravelMode.DRIVE ? List.of("motorcar", "motor_vehicle", "vehicle", "access")
                : List.of("foot", "access"));
        if (access != null && CLOSED.contains(access) && !privateRoads) {
            return "access " + access;
        }
        return null;
    }

    /** Permitted directions relative to the way's node order. */
    Travel travel(Map<String, String> tags) {
        String value = onewayValue(tags);
        if (value == null || !(FORWARD.contains(value) || BACKWARD.contains(value) || TWO_WAY.contains(value))) {
            return (value != null && TIMED.contains(value)) || mode == TravelMode.WALK ? Travel.BOTH : implied(tags);
        }
        return FORWARD.contains(value) ? Travel.FORWARD : BACKWARD.contains(value) ? Travel.BACKWARD : Travel.BOTH;
    }

    /** Whether the way changes direction by time of day or by signals (read as two-way). */
    boolean timed(Map<String, String> tags) {
        String value = onewayValue(tags);
        return value != null && TIMED.contains(value);
    }

    private String onewayValue(Map<String, String> tags) {
        return first(tags, mode == TravelMode.WALK ? List.of("oneway:foot")
                : List.of("oneway:motorcar", "oneway:motor_vehicle", "oneway:vehicle", "oneway"));
    }

    private static Travel implied(Map<String, String> tags) {
        String junction = tags.get("junction");
        String highway = tags.get("highway");
        return "roundabout".equals(junction) || "circular".equals(junction)
                || "motorway".equals(highway) || "motorway_link".equals(highway) ? Travel.FORWARD : Travel.BOTH;
    }

    /**
     * The street name: name, else ref, else empty (the direction sheet then describes the way by its
     * {@code highway} class and the named street it leads to, and never merges it with another unnamed way).
     */
    static String name(Map<String, String> tags) {
        String name = tags.get("name");
        if (name != null && !name.isBlank()) {
            return name;
        }
        String ref = tags.get("ref");
        if (ref != null && !ref.isBlank()) {
            return ref;
        }
        return "";
    }

    private static String first(Map<String, String> tags, List<String> keys) {
        for (String key : keys) {
            String value = tags.get(key);
            if (value != null) {
                return value;
            }
        }
        return null;
    }
}
