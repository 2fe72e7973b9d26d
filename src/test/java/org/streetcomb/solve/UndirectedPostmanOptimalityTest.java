package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.jgrapht.Graph;
import org.jgrapht.alg.matching.blossom.v5.KolmogorovWeightedPerfectMatching;
import org.jgrapht.alg.matching.blossom.v5.ObjectiveSense;
import org.jgrapht.alg.shortestpath.DijkstraManyToManyShortestPaths;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.jgrapht.graph.WeightedMultigraph;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.TestNetworks;
import org.streetcomb.bench.GridLayer;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.GeoJsonReader;

/**
 * The deadhead of {@link UndirectedPostman} equals an independent exact computation of the
 * Edmonds-Johnson bound: brute force over all pairings of up to 12 odd nodes on all-pairs distances from
 * Floyd-Warshall, and JGraphT's Blossom V over the complete graph of odd nodes with JGraphT's own
 * shortest paths for networks of a few thousand edges.
 */
class UndirectedPostmanOptimalityTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20})
    void smallNetworksMatchBruteForceOverAllPairings(long seed) {
        // the first generated network from this seed on that is connected and small enough to enumerate
        StreetNetwork network;
        int[] odd;
        long next = seed;
        do {
            network = TestNetworks.network(TestNetworks.grid(4, 3, 0.75, next));
            odd = UndirectedPostman.oddNodes(network);
            next += 1000;
        } while (odd.length > 12 || Components.of(network).count() != 1);
        double[][] d = floydWarshall(network);
        double best = bestPairing(odd, d);

        Augmentation augmentation = UndirectedPostman.solve(network);

        assertEquals(best, augmentation.deadhead(), 1e-6 * Math.max(1, best));
    }

    @Test
    void gridOfThousandsOfEdgesMatchesBlossomVOnTheCompleteGraph() {
        StreetNetwork network = TestNetworks.network(TestNetworks.grid(40, 40, 0.8, 101));
        assertTrue(network.edgeCount() > 2500, "a few thousand edges");
        double reference = completeGraphMatching(network);

        Augmentation augmentation = UndirectedPostman.solve(network);

        assertEquals(reference, augmentation.deadhead(), 1e-6 * reference);
    }

    @Test
    void gridOfLongStreetsMatchesBlossomVOnTheCompleteGraph(@TempDir Path dir) throws IOException {
        // long streets through many junctions give long edges, where two pricing balls can overlap
        // inside a single edge
        Path layer = dir.resolve("grid.geojson");
        GridLayer.write(layer, 3000, 42);
        StreetNetwork network = TestNetworks.network(new GeoJsonReader().read(layer).features());
        double reference = completeGraphMatching(network);

        assertEquals(reference, UndirectedPostman.solve(network).deadhead(), 1e-6 * reference);
    }

    @Test
    void demoTownMatchesBlossomVOnTheCompleteGraph() {
        StreetNetwork network = TestNetworks.network(
                new GeoJsonReader().read(Path.of("fixtures/demo/brackenford.geojson")).features());
        double reference = completeGraphMatching(network);

        assertEquals(reference, UndirectedPostman.solve(network).deadhead(), 1e-6 * reference);
    }

    /** Minimum total distance of a perfect pairing, by dynamic programming over subsets: O(2^T T). */
    static double bestPairing(int[] odd, double[][] d) {
        int t = odd.length;
        double[] best = new double[1 << t];
        Arrays.fill(best, Double.POSITIVE_INFINITY);
        best[0] = 0;
        for (int mask = 0; mask < (1 << t); mask++) {
            if (Double.isInfinite(best[mask])) {
                continue;
            }
            int i = Integer.numberOfTrailingZeros(~mask);
            if (i >= t) {
                continue;
            }
            for (int j = i + 1; j < t; j++) {
                if ((mask & (1 << j)) == 0) {
                    int next = mask | (1 << i) | (1 << j);
                    best[next] = Math.min(best[next], best[mask] + d[odd[i]][odd[j]]);
                }
            }
        }
        return best[(1 << t) - 1];
    }

    static double[][] floydWarshall(StreetNetwork network) {
        int n = network.nodeCount();
        double[][] d = new double[n][n];
        for (double[] row : d) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        for (int v = 0; v < n; v++) {
            d[v][v] = 0;
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            int u = network.from(e), v = network.to(e);
            d[u][v] = Math.min(d[u][v], network.length(e));
            d[v][u] = d[u][v];
        }
        for (int k = 0; k < n; k++) {
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (d[i][k] + d[k][j] < d[i][j]) {
                        d[i][j] = d[i][k] + d[k][j];
                    }
                }
            }
        }
        return d;
    }

    /** Blossom V over all pairs of odd nodes, distances from JGraphT's many-to-many Dijkstra (metres). */
    static double completeGraphMatching(StreetNetwork network) {
        Graph<Integer, DefaultWeightedEdge> roads = new WeightedMultigraph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            roads.addVertex(v);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.from(e) != network.to(e)) {
                roads.setEdgeWeight(roads.addEdge(network.from(e), network.to(e)), network.length(e));
            }
        }
        List<Integer> odd = Arrays.stream(UndirectedPostman.oddNodes(network)).boxed().toList();
        var paths = new DijkstraManyToManyShortestPaths<>(roads).getManyToManyPaths(
                new java.util.HashSet<>(odd), new java.util.HashSet<>(odd));
        Graph<Integer, DefaultWeightedEdge> complete = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
        odd.forEach(complete::addVertex);
        for (int i = 0; i < odd.size(); i++) {
            for (int j = i + 1; j < odd.size(); j++) {
                double w = paths.getWeight(odd.get(i), odd.get(j));
                if (Double.isFinite(w)) {
                    complete.setEdgeWeight(complete.addEdge(odd.get(i), odd.get(j)), w / 1000);
                }
            }
        }
        return 1000 * new KolmogorovWeightedPerfectMatching<>(complete, ObjectiveSense.MINIMIZE).getMatching().getWeight();
    }
}
