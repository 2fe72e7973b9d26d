package org.streetcomb.check;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.Pseudograph;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadLayer;

/**
 * Separate parts on a real layer: OpenStreetMap roads of Yongsan, Seoul (fixtures/real/roads-seoul.geojson,
 * ODbL, see NOTICE). The parts the check reports, with their edge counts and lengths, must be the
 * connected components that JGraphT's {@link ConnectivityInspector} (a reference library) finds on the
 * same noded edges, less the largest.
 */
class RealLayerComponentsTest {

    @Test
    void separatePartsAreJGraphTComponentsBesidesTheLargest() {
        RoadLayer layer = Layers.read("real/roads-seoul.geojson");
        StreetNetwork network = new NetworkBuilder(CheckOptions.DEFAULTS.snap()).build(layer.features());
        List<Finding> parts = Layers.ofKind(Layers.check(layer, layer.features(), -1), FindingKind.SEPARATE_PART);

        Graph<Integer, Integer> graph = new Pseudograph<>(null, null, false);
        for (int e = 0; e < network.edgeCount(); e++) {
            graph.addVertex(network.from(e));
            graph.addVertex(network.to(e));
            graph.addEdge(network.from(e), network.to(e), e);
        }
        List<Set<Integer>> components = new ConnectivityInspector<>(graph).connectedSets();
        List<double[]> expected = new ArrayList<>();
        for (Set<Integer> nodes : components) {
            int edges = 0;
            double length = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                if (nodes.contains(network.from(e))) {
                    edges++;
                    length += network.length(e);
                }
            }
            expected.add(new double[] {length, edges});
        }
        expected.sort(Comparator.comparingDouble((double[] c) -> c[0]).reversed());

        assertEquals(expected.size() - 1, parts.size());
        for (int i = 0; i < parts.size(); i++) {
            double[] component = expected.get(i + 1);
            assertEquals(component[0], parts.get(i).value(), 1e-6);
            assertEquals((int) component[1] + " street edge" + (component[1] == 1 ? "" : "s"),
                    parts.get(i).problem().substring(0, parts.get(i).problem().indexOf(" (")));
        }
    }
}
