package org.streetcomb.fleet;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/**
 * Cluster-first assignment of services to vehicles by the sweep of B. E. Gillett &amp; L. R. Miller ("A
 * heuristic algorithm for the vehicle-dispatch problem", Operations Research 22, 1974): services are sorted
 * by their bearing from the depot and the circle is cut into k sectors, so each vehicle gets a wedge of the
 * map around the depot instead of streets scattered among the others'. The sweep starts after the widest
 * empty angle (no sector straddles open country) and the cut into k consecutive runs minimises the
 * heaviest run's weight: a bisection on that weight, each step a greedy pass over prefix sums (greedy
 * filling is exact for consecutive runs of positive weights). O(n log n) for n services.
 */
final class SweepSectors {

    private SweepSectors() {
    }

    /**
     * @param x      east offset of each service from the depot (any unit)
     * @param y      north offset likewise
     * @param weight each service's share of the work (positive)
     * @param k      sectors wanted
     * @return the sector (0..k-1) of each service, numbered clockwise from the widest empty angle
     */
    static int[] assign(double[] x, double[] y, double[] weight, int k) {
        int n = x.length;
        int[] sector = new int[n];
        if (k <= 1 || n == 0) {
            return sector;
        }
        double[] angle = new double[n];
        for (int i = 0; i < n; i++) {
            angle[i] = x[i] == 0 && y[i] == 0 ? 0 : Math.atan2(x[i], y[i]);
        }
        Integer[] byAngle = IntStream.range(0, n).boxed().toArray(Integer[]::new);
        Arrays.sort(byAngle, Comparator.<Integer>comparingDouble(i -> angle[i]).thenComparingInt(i -> i));
        int start = 0;
        double widest = -1;
        for (int p = 0; p < n; p++) {
            double gap = p == 0 ? angle[byAngle[0]] + 2 * Math.PI - angle[byAngle[n - 1]]
                    : angle[byAngle[p]] - angle[byAngle[p - 1]];
            if (gap > widest) {
                widest = gap;
                start = p;
            }
        }
        double[] w = new double[n];
        double total = 0;
        double heaviest = 0;
        for (int p = 0; p < n; p++) {
            w[p] = Math.max(1e-12, weight[byAngle[(start + p) % n]]);
            total += w[p];
            heaviest = Math.max(heaviest, w[p]);
        }
        double low = Math.max(heaviest, total / k);
        double high = total;
        for (int step = 0; step < 100 && high - low > 1e-9 * high; step++) {
            double mid = (low + high) / 2;
            if (runs(w, mid) <= k) {
                high = mid;
            } else {
                low = mid;
            }
        }
        int run = 0;
        double filled = 0;
        for (int p = 0; p < n; p++) {
            if (filled + w[p] > high * (1 + 1e-12) && filled > 0) {
                run++;
                filled = 0;
            }
            filled += w[p];
            sector[byAngle[(start + p) % n]] = Math.min(run, k - 1);
        }
        return sector;
    }

    private static int runs(double[] w, double bound) {
        int runs = 1;
        double filled = 0;
        for (double v : w) {
            if (filled + v > bound * (1 + 1e-12) && filled > 0) {
                runs++;
                filled = 0;
            }
            filled += v;
        }
        return runs;
    }
}
