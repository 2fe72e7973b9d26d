package org.streetcomb.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.alg.connectivity.KosarajuStrongConnectivityInspector;
import org.jgrapht.graph.DirectedPseudograph;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.network.Heading;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.network.StrongComponents;
import org.streetcomb.network.TravelArcs;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.Travel;

/**
 * One-way traps and depot reach. The planted fixture (fixtures/check/oneway-trap.geojson, invented) is a
 * two-way grid with a one-way dead-end spur; the strong components on seeded random one-way grids are
 * checked against JGraphT's {@link KosarajuStrongConnectivityInspector} (an independent algorithm in a
 * reference library), and the traps, there and on a real OpenStreetMap network, against the sources and
 * sinks of its condensation.
 */
class OneWayTrapTest {

    @Test
    void oneWaySpurIntoADeadEndCanBeEnteredButNotLeft() {
        // read with the reader's default one-way mapping: oneway=yes is one-way along the line
        RoadLayer layer = Layers.read("check/oneway-trap.geojson");
        List<Finding> findings = Layers.check(layer, layer.features(), 0);
        List<Finding> traps = Layers.ofKind(findings, FindingKind.ONE_WAY_TRAP);
        assertEquals(1, traps.size());
        Finding trap = traps.get(0);
        assertEquals(List.of("trap"), trap.featureIds());
        assertEquals(Severity.BLOCKING, trap.severity());
        assertTrue(trap.problem().contains("entered but not left"), trap.problem());
        assertEquals(60, trap.value(), 0.5, "planted as 60 m");
        List<Finding> reach = Layers.ofKind(findings, FindingKind.DEPOT_UNREACHABLE);
        assertEquals(1, reach.size());
        assertTrue(reach.get(0).problem().contains("no legal route back to the depot"), reach.get(0).problem());
        assertEquals(List.of("trap"), reach.get(0).featureIds());
    }

    @Test
    void reversedSpurCanBeLeftButNotEntered() {
        RoadLayer layer = Layers.read("check/oneway-trap.geojson");
        List<Finding> findings = Layers.check(layer, Layers.withOneWay(layer, Travel.BACKWARD), 0);
        Finding trap = Layers.ofKind(findings, FindingKind.ONE_WAY_TRAP).get(0);
        assertTrue(trap.problem().contains("left but not entered"), trap.problem());
        Finding reach = Layers.ofKind(findings, FindingKind.DEPOT_UNREACHABLE).get(0);
        assertTrue(reach.problem().contains("cannot be reached from the depot"), reach.problem());
    }

    @Test
    void twoWaySpurIsNoTrap() {
        RoadLayer layer = Layers.read("check/oneway-trap.geojson");
        assertEquals(List.of(), Layers.check(layer, Layers.withOneWay(layer, Travel.BOTH), 0));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void strongComponentsAndTrapsAgreeWithJGraphT(long seed) {
        StreetNetwork network = randomOneWayGrid(new Random(seed), 9, 7, 0.35);
        StrongComponents ours = StrongComponents.of(network, new TravelArcs(network));
        Graph<Integer, Integer> graph = drivable(network);
        List<Set<Integer>> theirs = new KosarajuStrongConnectivityInspector<>(graph).stronglyConnectedSets();
        assertEquals(theirs.size(), ours.count());
        for (Set<Integer> set : theirs) {
            Set<Integer> labels = new HashSet<>();
            set.forEach(v -> labels.add(ours.of(v)));
            assertEquals(1, labels.size(), "one of our components per JGraphT component");
        }
        assertEquals(trapsByJGraphT(graph), new OneWayTrapCheck().find(network).size());
    }

    /**
     * A real one-way network: OpenStreetMap roads of central Aguascalientes (fixtures/osm, ODbL, see
     * NOTICE), read with the OSM one-way rules; its one-way streets cut at the edge of the extract are
     * traps. The count must be JGraphT's.
     */
    @Test
    void trapsOnARealOneWayNetworkAgreeWithJGraphT() {
        RoadLayer layer = Layers.read("osm/aguascalientes.osm.pbf");
        StreetNetwork network = new NetworkBuilder(0.5).build(layer);
        int traps = new OneWayTrapCheck().find(network).size();
        assertTrue(traps > 0, "the extract has one-way streets cut at its edge");
        assertEquals(trapsByJGraphT(drivable(network)), traps);
    }

    /** The drivable arcs as a JGraphT graph, from the network's travel directions ({@link Heading}). */
    private static Graph<Integer, Integer> drivable(StreetNetwork network) {
        Graph<Integer, Integer> graph = new DirectedPseudograph<>(null, null, false);
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) > 0) {
                graph.addVertex(v);
            }
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            if (Heading.OUTBOUND.allows(network, e, network.from(e))) {
                graph.addEdge(network.from(e), network.to(e), 2 * e);
            }
            if (Heading.OUTBOUND.allows(network, e, network.to(e))) {
                graph.addEdge(network.to(e), network.from(e), 2 * e + 1);
            }
        }
        return graph;
    }

    /**
     * Sources and sinks of JGraphT's condensation (Kosaraju), in each weakly connected part (JGraphT's
     * ConnectivityInspector) with more than one strong component, less the part's largest.
     */
    private static int trapsByJGraphT(Graph<Integer, Integer> graph) {
        List<Set<Integer>> strong = new KosarajuStrongConnectivityInspector<>(graph).stronglyConnectedSets();
        Map<Integer, Integer> setOf = new HashMap<>();
        for (int s = 0; s < strong.size(); s++) {
            for (int v : strong.get(s)) {
                setOf.put(v, s);
            }
        }
        boolean[] in = new boolean[strong.size()];
        boolean[] out = new boolean[strong.size()];
        for (Integer a : graph.edgeSet()) {
            int s = setOf.get(graph.getEdgeSource(a));
            int t = setOf.get(graph.getEdgeTarget(a));
            if (s != t) {
                out[s] = true;
                in[t] = true;
            }
        }
        int traps = 0;
        for (Set<Integer> part : new ConnectivityInspector<>(graph).connectedSets()) {
            List<Integer> inPart = new ArrayList<>();
            for (int s = 0; s < strong.size(); s++) {
                if (part.contains(strong.get(s).iterator().next())) {
                    inPart.add(s);
                }
            }
            int largest = inPart.stream().max((x, y) -> Integer.compare(strong.get(x).size(), strong.get(y).size())).orElseThrow();
            for (int s : inPart) {
                if (inPart.size() > 1 && s != largest && (!in[s] || !out[s])) {
                    traps++;
                }
            }
        }
        return traps;
    }

    /** A connected grid of two-way and one-way streets; the first row stays two-way to keep it connected. */
    private static StreetNetwork randomOneWayGrid(Random random, int cols, int rows, double oneWayShare) {
        GeometryFactory geometry = new GeometryFactory();
        List<RoadFeature> features = new ArrayList<>();
        for (int j = 0; j < rows; j++) {
            for (int i = 0; i < cols; i++) {
                for (int[] d : new int[][] {{1, 0}, {0, 1}}) {
                    if (i + d[0] >= cols || j + d[1] >= rows) {
                        continue;
                    }
                    Travel travel = random.nextDouble() >= oneWayShare ? Travel.BOTH
                            : random.nextBoolean() ? Travel.FORWARD : Travel.BACKWARD;
                    features.add(new RoadFeature("g" + features.size(), "", geometry.createLineString(new Coordinate[] {
                        new Coordinate(-30 + i * 0.001, 44 + j * 0.001),
                        new Coordinate(-30 + (i + d[0]) * 0.001, 44 + (j + d[1]) * 0.001)}), travel, true, Map.of()));
                }
            }
        }
        return new NetworkBuilder(0.5).build(features);
    }
}
