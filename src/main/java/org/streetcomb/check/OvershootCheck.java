package org.streetcomb.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds short dead-end stubs just past a junction: an edge with a dead end (a node of degree 1) whose other
 * node is a junction (degree 3 or more) and whose length is at most {@link CheckOptions#stub()} metres.
 * Such a stub is usually a line drawn a little too far; as it stands, the tour must drive it and turn
 * back. O(nodes).
 */
final class OvershootCheck implements Detector {

    @Override
    public List<Finding> find(CheckInput input) {
        StreetNetwork network = input.network();
        List<Finding> findings = new ArrayList<>();
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) != 1) {
                continue;
            }
            int e = network.incidentEdge(network.incidenceStart(v));
            int junction = network.other(e, v);
            if (network.degree(junction) < 3 || network.length(e) > input.options().stub()) {
                continue;
            }
            String id = network.feature(e).id();
            findings.add(new Finding(FindingKind.OVERSHOOT, Severity.WARNING, Places.edge(network, e),
                    List.of(id), network.length(e), "m",
                    String.format(Locale.ROOT, "feature %s runs %.2f m past a junction to a dead end", id, network.length(e)),
                    "trim feature " + id + " back to the junction unless the stub is a real street"));
        }
        return findings;
    }
}
