package org.streetcomb.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Reports the features the reader left out (other geometry types, lines with too few points, features
 * removed by filters), one finding per reason with the count as its value. The reader keeps counts, not
 * places, so these findings have no location.
 */
final class DroppedCheck implements Detector {

    @Override
    public List<Finding> find(CheckInput input) {
        List<Finding> findings = new ArrayList<>();
        for (Map.Entry<String, Integer> skipped : new TreeMap<>(input.read().skippedByType()).entrySet()) {
            int n = skipped.getValue();
            findings.add(new Finding(FindingKind.DROPPED, Severity.NOTE, null, List.of(), n, "features",
                    n + " feature" + (n == 1 ? "" : "s") + " left out: " + skipped.getKey(),
                    "nothing to do if they are not streets; otherwise convert them to lines or change the filters"));
        }
        return findings;
    }
}
