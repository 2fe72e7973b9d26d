package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** OpenStreetMap road selection and one-way rules, tag combination by tag combination. */
class OsmRoadRulesTest {

    private static Map<String, String> tags(String spec) {
        Map<String, String> tags = new HashMap<>();
        for (String pair : spec.split(" ")) {
            String[] kv = pair.split("=", 2);
            tags.put(kv[0], kv[1]);
        }
        return tags;
    }

    private static final OsmRoadRules DRIVE = new OsmRoadRules(TravelMode.DRIVE, false, false);
    private static final OsmRoadRules WALK = new OsmRoadRules(TravelMode.WALK, false, false);

    @ParameterizedTest(name = "drive: {0} -> {1}")
    @CsvSource(delimiter = '|', value = {
        // https://wiki.openstreetmap.org/wiki/Key:oneway
        "highway=residential oneway=yes | FORWARD",
        "highway=residential oneway=true | FORWARD",
        "highway=residential oneway=1 | FORWARD",
        "highway=residential oneway=-1 | BACKWARD",
        "highway=residential oneway=no | BOTH",
        "highway=residential | BOTH",
        // reversible/alternating: direction changes over time; documented choice: two-way, reported
        "highway=residential oneway=reversible | BOTH",
        "highway=residential oneway=alternating | BOTH",
        // https://wiki.openstreetmap.org/wiki/Key:junction: roundabout and circular imply oneway=yes
        "highway=primary junction=roundabout | FORWARD",
        "highway=tertiary junction=circular | FORWARD",
        "highway=primary junction=roundabout oneway=no | BOTH",
        // https://wiki.openstreetmap.org/wiki/Tag:highway=motorway: oneway=yes implied, also for links
        "highway=motorway | FORWARD",
        "highway=motorway_link | FORWARD",
        "highway=motorway oneway=no | BOTH",
        "highway=motorway oneway=-1 | BACKWARD",
        "highway=trunk | BOTH",
        // mode-specific tags: oneway:bicycle binds cyclists only, oneway:foot pedestrians only
        "highway=residential oneway=yes oneway:bicycle=no | FORWARD",
        "highway=residential oneway:foot=yes | BOTH",
        "highway=residential oneway=yes oneway:motor_vehicle=no | BOTH",
    })
    void driveOneWay(String spec, Travel expected) {
        assertEquals(expected, DRIVE.travel(tags(spec)));
    }

    @ParameterizedTest(name = "walk: {0} -> {1}")
    @CsvSource(delimiter = '|', value = {
        // Key:oneway: oneway=* binds vehicles; pedestrians follow oneway:foot only
        "highway=residential oneway=yes | BOTH",
        "highway=primary junction=roundabout | BOTH",
        "highway=footway oneway:foot=yes | FORWARD",
        "highway=footway oneway:foot=-1 | BACKWARD",
        "highway=steps | BOTH",
    })
    void walkOneWay(String spec, Travel expected) {
        assertEquals(expected, WALK.travel(tags(spec)));
    }

    @ParameterizedTest(name = "{0}: {1} -> kept {2}")
    @CsvSource(delimiter = '|', value = {
        // https://wiki.openstreetmap.org/wiki/Key:highway road classes
        "drive | highway=motorway | true",
        "drive | highway=trunk_link | true",
        "drive | highway=residential | true",
        "drive | highway=unclassified | true",
        "drive | highway=living_street | true",
        "drive | highway=service | false",
        "drive | highway=footway | false",
        "drive | highway=track | false",
        "drive | highway=construction | false",
        "walk | highway=motorway | false",
        "walk | highway=footway | true",
        "walk | highway=path | true",
        "walk | highway=pedestrian | true",
        "walk | highway=steps | true",
        "walk | highway=residential | true",
        // https://wiki.openstreetmap.org/wiki/Key:access: the most specific tag for the mode decides
        "drive | highway=residential access=private | false",
        "drive | highway=residential access=no | false",
        "drive | highway=residential access=destination | true",
        "drive | highway=residential access=no motor_vehicle=yes | true",
        "drive | highway=residential motorcar=no | false",
        "walk | highway=residential access=no foot=yes | true",
        "walk | highway=footway foot=private | false",
        "drive | highway=pedestrian area=yes | false",
        "walk | highway=pedestrian area=yes | false",
        "drive | building=yes | false",
    })
    void selection(String mode, String spec, boolean kept) {
        OsmRoadRules rules = mode.equals("drive") ? DRIVE : WALK;
        assertEquals(kept, rules.exclusion(tags(spec)) == null);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "highway=service | true | false",
        "highway=residential access=private | false | true",
    })
    void optionsWidenTheSelection(String spec, boolean serviceRoads, boolean privateRoads) {
        assertEquals(false, DRIVE.exclusion(tags(spec)) == null);
        assertEquals(true, new OsmRoadRules(TravelMode.DRIVE, serviceRoads, privateRoads).exclusion(tags(spec)) == null);
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', value = {
        // the name is name, else ref, else none (https://wiki.openstreetmap.org/wiki/Key:name, Key:ref)
        "highway=primary name=Avenida_Madero ref=MEX_45 | Avenida_Madero",
        "highway=primary ref=MEX_45 | MEX_45",
        "highway=living_street | ''",
    })
    void names(String spec, String expected) {
        assertEquals(expected, OsmRoadRules.name(tags(spec)));
    }
}
