package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        for (int trial = 0; trial < 20; trial++) {
            double[] potential = new double[odd.length];
            for (int i = 0; i < odd.length; i++) {
                potential[i] = random.nextDouble() * 120 - 10;
            }
            // one blossom over the first three odd nodes, to exercise the level-by-level pricing
            double z = random.nextDouble() * 30;
            List<Map.Entry<int[], Double>> blossoms = odd.length >= 3 && trial % 2 == 1
                    ? List.of(Map.entry(new int[] {0, 1, 2}, z)) : List.of();
            double[] y = potential.clone();
            if (!blossoms.isEmpty()) {
                for (int i = 0; i < 3; i++) {
                    y[i] += z;
                }
            }
            Set<Long> expected = new TreeSet<>();
            for (int i = 0; i < odd.length; i++) {
                for (int j = i + 1; j < odd.length; j++) {
                    boolean sameBlossom = !blossoms.isEmpty() && i < 3 && j < 3;
                    double reduced = d[odd[i]][odd[j]] - (sameBlossom ? potential[i] + potential[j] : y[i] + y[j]);
                    if (reduced < -1e-3) {
                        expected.add((long) i * odd.length + j);
                    }
                }
            }
            long[] found = new DualPricing(network, odd).violatedPairs(y, blossoms);

            assertEquals(expected.isEmpty(), found.length == 0, "a violation is found iff one exists");
            for (long key : found) {
                assertTrue(expected.contains(key) || nearZero(key, odd, d, potential, y, blossoms),
                        "reported pair " + key + " is violated");
            }
        }
    }

    /** A pair within the pricing tolerance of zero, which either answer may report. */
    private static boolean nearZero(long key, int[] odd, double[][] d, double[] potential, double[] y,
                                    List<Map.Entry<int[], Double>> blossoms) {
        int i = (int) (key / odd.length);
        int j = (int) (key % odd.length);
        boolean sameBlossom = !blossoms.isEmpty() && i < 3 && j < 3;
        double reduced = d[odd[i]][odd[j]] - (sameBlossom ? potential[i] + potential[j] : y[i] + y[j]);
        return reduced < 1e-3;
    }
}
