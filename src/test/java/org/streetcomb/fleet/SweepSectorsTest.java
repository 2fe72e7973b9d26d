package org.streetcomb.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The sweep's cut against an exhaustive search (exact reference computed here): over every way to cut the
 * services, in bearing order from the widest empty angle, into k consecutive runs, the heaviest run is never
 * lighter than the sweep's.
 */
class SweepSectorsTest {

    @Test
    void theHeaviestSectorIsAsLightAsAnyCutOfTheSweepOrderAllows() {
        Random random = new Random(3);
        for (int round = 0; round < 300; round++) {
            int n = 2 + random.nextInt(9);
            int k = 2 + random.nextInt(3);
            double[] x = new double[n];
            double[] y = new double[n];
            double[] w = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = random.nextGaussian();
                y[i] = random.nextGaussian();
                w[i] = 0.1 + random.nextDouble();
            }
            int[] sector = SweepSectors.assign(x, y, w, k);
            double[] load = new double[k];
            for (int i = 0; i < n; i++) {
                load[sector[i]] += w[i];
            }
            double swept = java.util.Arrays.stream(load).max().orElseThrow();
            // the sweep order: by bearing, from after the widest gap
            Integer[] order = java.util.stream.IntStream.range(0, n).boxed().toArray(Integer[]::new);
            java.util.Arrays.sort(order, java.util.Comparator.<Integer>comparingDouble(i -> Math.atan2(x[i], y[i])));
            int start = 0;
            double widest = -1;
            for (int p = 0; p < n; p++) {
                double a = Math.atan2(x[order[p]], y[order[p]]);
                double before = p == 0 ? Math.atan2(x[order[n - 1]], y[order[n - 1]]) - 2 * Math.PI
                        : Math.atan2(x[order[p - 1]], y[order[p - 1]]);
                if (a - before > widest) {
                    widest = a - before;
                    start = p;
                }
            }
            double[] seq = new double[n];
            for (int p = 0; p < n; p++) {
                seq[p] = w[order[(start + p) % n]];
            }
            assertEquals(best(seq, 0, k), swept, 1e-9, "round " + round);
        }
    }

    /** The lightest possible heaviest run when seq[from..] is cut into at most k consecutive runs. */
    private static double best(double[] seq, int from, int k) {
        if (from == seq.length) {
            return 0;
        }
        if (k == 1) {
            double sum = 0;
            for (int i = from; i < seq.length; i++) {
                sum += seq[i];
            }
            return sum;
        }
        double result = Double.POSITIVE_INFINITY;
        double run = 0;
        for (int end = from; end < seq.length; end++) {
            run += seq[end];
            result = Math.min(result, Math.max(run, best(seq, end + 1, k - 1)));
        }
        return result;
    }
}
