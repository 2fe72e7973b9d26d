package org.streetcomb.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.Pseudograph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadLayer;

/**
 * Separate parts on real layers (see NOTICE): OpenStreetMap roads of Yongsan, Seoul, and the Mesa (Arizona)
 * street shapefile. The parts the check reports, with their edge counts and
 * lengths, must be the connected components that JGraphT's {@link ConnectivityInspector} (a reference
 * library) finds on the same noded edges, less the largest.
 */
class RealLayerComponentsTest {

    @ParameterizedTest
    @CsvSource({"real/roads-seoul.geojson,", "shapefiles/mesa-az-stateplane-ft/streets.shp, EPSG:2223"})
    void separatePartsAreJGraphTComponentsBesidesTheLargest(String fixture, String crs) {
        RoadLayer layer = Layers.read(fixture, crs);
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
        assertTrue(expected.size() > 1 || fixture.contains("mesa"), "the test must see separate parts where there are some");
        for (int i = 0; i < parts.size(); i++) {
            double[] component = expected.get(i + 1);
            assertEquals(component[0], parts.get(i).value(), 1e-6);
            assertEquals((int) component[1] + " street edge" + (component[1] == 1 ? "" : "s"),
                    parts.get(i).problem().substring(0, parts.get(i).problem().indexOf(" (")));
        }
    }

    /**
     * The Mesa street layer is fully noded, in one piece, with three dead ends (GDAL counts in
     * /work/shared/realdata/SOURCES.md): a clean real layer, on which the check must find nothing.
     */
    @Test
    void cleanRealLayerHasNoFindings() {
        RoadLayer layer = Layers.read("shapefiles/mesa-az-stateplane-ft/streets.shp", "EPSG:2223");
        assertEquals(List.of(), Layers.check(layer, layer.features(), 0));
    }
}
