package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.quality.MixedOsmReference;
import org.streetcomb.read.Travel;

/**
 * The warm-started flip pricing ({@link FlipPricing}) against a full minimum-cost flow re-solved from scratch
 * by OR-Tools for every trial ({@link DirectedPostman#balanced}, the reference): on real one-way networks
 * (OpenStreetMap windows of Baltimore and Vienna in fixtures/benchmarks/mixed-osm, ODbL, see NOTICE), every
 * two-way street's service pass is flipped in turn from an optimal balancing. Where the pricing keeps a flip,
 * its deadhead must equal the re-solved optimum's; where it refuses one, the re-solved optimum must be no
 * shorter than before. Kept flips stay applied, so later trials run on a flow and potentials the pricing
 * itself updated. Tolerance: the reference's costs are rounded to micrometres per unit of flow.
 */
class FlipPricingTest {

    @Test
    void everyFlipPricedAsAFullReSolvePricesIt() {
        for (String window : new String[] {"fixtures/benchmarks/mixed-osm/baltimore-window.osm.pbf",
                "fixtures/benchmarks/mixed-osm/vienna-b.geojson"}) {
            StreetNetwork network = MixedOsmReference.network(window);
            int start = 0;
            while (network.degree(start) == 0) {
                start++;
            }
            PostmanProblem problem = new PostmanProblem(network, ServiceDemand.of(network, DirectedPostmanTest.all(network),
                    KerbMode.ONE_PASS), new int[] {start}, start);
            int m = network.edgeCount();
            int[] along = new int[m];
            int[] against = new int[m];
            for (int e = 0; e < m; e++) {
                (network.travel(e) == Travel.BACKWARD ? against : along)[e] = 1;
            }
            DirectedPostman.Balanced balanced = DirectedPostman.balanced(problem, along, against);
            FlipPricing pricing = new FlipPricing(network, along, against, balanced);
            double service = 0;
            for (int e = 0; e < m; e++) {
                service += network.length(e);
            }
            double current = balanced.traversals().length(network) - service;
            assertEquals(current, pricing.deadhead(), 1e-3);
            int kept = 0;
            int refused = 0;
            long pricingNanos = 0;
            long reSolveNanos = 0;
            for (int e = 0; e < m; e++) {
                if (network.travel(e) != Travel.BOTH || network.from(e) == network.to(e)) {
                    continue;
                }
                boolean forward = along[e] == 1;
                long t0 = System.nanoTime();
                boolean keep = pricing.tryFlip(e, forward ? network.from(e) : network.to(e), 1);
                long t1 = System.nanoTime();
                (forward ? along : against)[e] = 0;
                (forward ? against : along)[e] = 1;
                double exact = DirectedPostman.balanced(problem, along, against).traversals().length(network) - service;
                long t2 = System.nanoTime();
                pricingNanos += t1 - t0;
                reSolveNanos += t2 - t1;
                double tolerance = 1e-5 * m;
                if (keep) {
                    assertEquals(exact, pricing.deadhead(), tolerance, window + ": kept flip of edge " + e);
                    assertTrue(exact < current, window + ": kept flip of edge " + e + " does not shorten");
                    current = exact;
                    kept++;
                } else {
                    assertTrue(exact >= current - tolerance, window + ": refused flip of edge " + e + " would save "
                            + (current - exact) + " m");
                    (forward ? along : against)[e] = 1;
                    (forward ? against : along)[e] = 0;
                    refused++;
                }
            }
            assertTrue(kept > 0 && refused > 0, window + ": both outcomes exercised: " + kept + " kept, " + refused + " refused");
            System.out.printf(Locale.ROOT, "%s: %d flips kept, %d refused; pricing %.1f ms, full re-solves %.1f ms (%.0f times)%n",
                    window, kept, refused, pricingNanos / 1e6, reSolveNanos / 1e6, (double) reSolveNanos / Math.max(1, pricingNanos));
        }
    }
}
