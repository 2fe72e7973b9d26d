package org.streetcomb.read;

import java.util.Map;

/**
 * What a reader took from a layer and what it left out, so nothing is dropped silently.
 *
 * @param featuresRead     features in the layer, of any geometry type
 * @param linesKept        road lines kept (a multi-part feature counts once per part)
 * @param skippedByType    features left out, by geometry type (sorted by type name)
 */
public record ReadReport(int featuresRead, int linesKept, Map<String, Integer> skippedByType) {

    public int skipped() {
        return skippedByType.values().stream().mapToInt(Integer::intValue).sum();
    }
}
