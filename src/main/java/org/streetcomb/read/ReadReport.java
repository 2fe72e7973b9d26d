package org.streetcomb.read;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

/**
 * What a reader took from a layer and what it left out, so nothing is dropped silently.
 *
 * @param featuresRead     features in the layer, of any geometry type (OpenStreetMap: ways)
 * @param linesKept        road lines kept (a multi-part feature counts once per part)
 * @param skippedByType    features left out, by geometry type or reason (sorted by key)
 * @param oneWayLines      kept lines that may be travelled in one direction only
 * @param notes            other counts worth knowing, by what they count (sorted by key), e.g. one-way
 *                         values not recognised and read as two-way
 * @param sourceCrs        the coordinate reference system the file was read in
 */
public record ReadReport(int featuresRead, int linesKept, Map<String, Integer> skippedByType, int oneWayLines,
                         Map<String, Integer> notes, String sourceCrs) {

    public static final String WGS84 = "WGS 84 (longitude, latitude)";

    public ReadReport {
        skippedByType = Collections.unmodifiableMap(new TreeMap<>(skippedByType));
        notes = Collections.unmodifiableMap(new TreeMap<>(notes));
    }

    public ReadReport(int featuresRead, int linesKept, Map<String, Integer> skippedByType) {
        this(featuresRead, linesKept, skippedByType, 0, Map.of(), WGS84);
    }

    public int skipped() {
        return skippedByType.values().stream().mapToInt(Integer::intValue).sum();
    }
}
