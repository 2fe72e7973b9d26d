package org.streetcomb.check;

import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.ReadReport;

/**
 * The outcome of a health check of one layer.
 *
 * @param input    the layer file
 * @param read     the reader's account of it
 * @param network  the network built from it
 * @param depot    the depot node the reach check used, or -1
 * @param options  the thresholds used
 * @param findings every finding, grouped by kind
 */
public record HealthReport(Path input, ReadReport read, StreetNetwork network, int depot, CheckOptions options,
                           List<Finding> findings) {

    /** Whether a finding makes a tour over every street impossible. */
    public boolean blocking() {
        return findings.stream().anyMatch(f -> f.severity() == Severity.BLOCKING);
    }

    /** How many findings of each kind, for the kinds found, in report order. */
    public Map<FindingKind, Integer> counts() {
        Map<FindingKind, Integer> counts = new EnumMap<>(FindingKind.class);
        for (Finding f : findings) {
            counts.merge(f.kind(), 1, Integer::sum);
        }
        return counts;
    }

    public long count(Severity severity) {
        return findings.stream().filter(f -> f.severity() == severity).count();
    }
}
