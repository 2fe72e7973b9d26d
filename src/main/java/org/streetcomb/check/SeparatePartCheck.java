package org.streetcomb.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;

/**
 * Reports every connected part of the network except the largest (the main network, by street length),
 * largest first. A separate part cannot be reached from the main network without leaving the layer, so
 * the planner gives it a tour of its own or drops it ({@code --depot-part-only}).
 */
final class SeparatePartCheck implements Detector {

    @Override
    public List<Finding> find(CheckInput input) {
        StreetNetwork network = input.network();
        Components components = Components.of(network);
        List<Finding> findings = new ArrayList<>();
        int[][] edges = components.edgesByComponent(network);
        for (int c = 1; c < components.count(); c++) {
            List<String> ids = Places.featureIds(network, edges[c]);
            findings.add(new Finding(FindingKind.SEPARATE_PART, Severity.WARNING, Places.edges(network, edges[c]), ids,
                    components.length(c), "m",
                    String.format(Locale.ROOT, "%d street edge%s (%.0f m) not joined to the main network (%.0f m, %d parts in all)",
                            edges[c].length, edges[c].length == 1 ? "" : "s", components.length(c), components.length(0),
                            components.count()),
                    "join it to a street of the main network if it is connected on the ground, "
                            + "otherwise plan it separately or leave it out with --depot-part-only"));
        }
        return findings;
    }
}
