package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.TestNetworks;
import org.streetcomb.network.StreetNetwork;

/**
 * Pricing finds a pair with negative reduced cost whenever one exists, and reports only such pairs,
 * checked against the definition (reduced cost of a pair in Edmonds' matching LP: d(u,v) - P(u) - P(v))
 * with all-pairs distances from Floyd-Warshall.
 */
class DualPricingTest {

    @Test
    void ballsThatOverlapInsideOneEdgeAreFound() {
        StreetNetwork network = TestNetworks.network(List.of(TestNetworks.line("long", 10.0, 20.0, 10.001, 20.0)));
        double d = network.length(0);
        int[] odd = {network.from(0), network.to(0)};
        DualPricing pricing = new DualPricing(network, odd);

        assertEquals(1, pricing.violatedPairs(new double[] {0.6 * d, 0.6 * d}, List.of()).length);
        assertEquals(0, pricing.violatedPairs(new double[] {0.4 * d, 0.6 * d}, List.of()).length);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10})
    void agreesWithTheDefinitionOnRandomPotentials(long seed) {
        StreetNetwork network = TestNetworks.network(TestNetworks.grid(6, 5, 0.8, seed));
        int[] odd = UndirectedPostman.oddNodes(network);
        double[][] d = UndirectedPostmanOptimalityTest.floydWarshall(network);
        Random random = new Random(seed);
        for (int trial = 0; trial < 30; trial++) {
            double[] node = new double[odd.length];
            for (int i = 0; i < odd.length; i++) {
                node[i] = random.nextDouble() * 120 - 10;
            }
            // none, one, or two nested blossoms (with a sibling), to exercise every pricing level
            List<Map.Entry<int[], Double>> blossoms = new java.util.ArrayList<>();
            if (trial % 3 >= 1 && odd.length >= 9) {
                blossoms.add(Map.entry(new int[] {0, 1, 2}, random.nextDouble() * 30));
            }
            if (trial % 3 == 2 && odd.length >= 9) {
                blossoms.add(Map.entry(new int[] {0, 1, 2, 3, 4}, random.nextDouble() * 30));
                blossoms.add(Map.entry(new int[] {6, 7, 8}, random.nextDouble() * 30));
            }
            double[] y = node.clone();
            for (var blossom : blossoms) {
                for (int i : blossom.getKey()) {
                    y[i] += blossom.getValue();
                }
            }
            Set<Long> expected = new TreeSet<>();
            Set<Long> nearZero = new TreeSet<>();
            for (int i = 0; i < odd.length; i++) {
                for (int j = i + 1; j < odd.length; j++) {
                    double reduced = d[odd[i]][odd[j]] - y[i] - y[j];
                    for (var blossom : blossoms) {
                        var set = Arrays.stream(blossom.getKey()).boxed().toList();
                        if (set.contains(i) && set.contains(j)) {
                            reduced += 2 * blossom.getValue();
                        }
                    }
                    long key = (long) i * odd.length + j;
                    if (reduced < -1e-3) {
                        expected.add(key);
                    } else if (reduced < 1e-3) {
                        nearZero.add(key);
                    }
                }
            }
            long[] found = new DualPricing(network, odd).violatedPairs(y, blossoms);

            assertEquals(expected.isEmpty(), found.length == 0, "a violation is found iff one exists");
            for (long key : found) {
                assertTrue(expected.contains(key) || nearZero.contains(key), "reported pair " + key + " is violated");
            }
            // each level (the top, each blossom) is priced on its own: one with a violated pair reports one
            for (int level = -1; level < blossoms.size(); level++) {
                final int l = level;
                boolean violatedHere = expected.stream().anyMatch(k -> level(k, odd.length, blossoms) == l);
                boolean foundHere = Arrays.stream(found).anyMatch(k -> level(k, odd.length, blossoms) == l);
                assertTrue(!violatedHere || foundHere, "level " + level + " has a violated pair that was not found");
            }
        }
    }

    /** The innermost of the given blossoms that holds both ends of the pair, or -1 for none. */
    private static int level(long key, int count, List<Map.Entry<int[], Double>> blossoms) {
        int i = (int) (key / count);
        int j = (int) (key % count);
        int level = -1;
        int size = Integer.MAX_VALUE;
        for (int b = 0; b < blossoms.size(); b++) {
            var set = Arrays.stream(blossoms.get(b).getKey()).boxed().toList();
            if (set.contains(i) && set.contains(j) && set.size() < size) {
                level = b;
                size = set.size();
            }
        }
        return level;
    }
}
