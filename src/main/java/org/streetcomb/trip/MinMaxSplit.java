package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Cuts a giant tour into at most k trips from the depot so the longest trip (by a {@link TripLimit}'s
 * measure: length or duration) is as short as possible, the k-vehicle min-max problem. Frederickson,
 * Hecht &amp; Kim ("Approximation algorithms for some routing problems", SIAM J. Computing 7, 1978) cut one
 * tour into k pieces at proportional positions; here the cut is made optimally for the tour's order: a
 * bisection on the bound B, each step checking with a dynamic programme whether k trips of measure at most
 * B suffice, then the cheapest such cut in total. O(n * w * (k + log(1/precision))).
 */
final class MinMaxSplit {

    private MinMaxSplit() {
    }

    static GiantTourSplit.Result split(Tasks tasks, Distances distances, int depot, TripLimit measure, int k,
                                       int[] order) {
        int n = order.length;
        TripExtension trip = new TripExtension(tasks, distances, depot);
        double low = 0;
        for (int i = 0; i < n; i++) {
            trip.begin(order[i]);
            low = Math.max(low, measure(measure, trip));
        }
        trip.begin(order[0]);
        for (int j = 1; j < n; j++) {
            trip.add(order[j]);
        }
        double high = Math.max(low, measure(measure, trip));
        if (trips(tasks, distances, depot, measure, low, order) > k) {
            for (int step = 0; step < 60 && high - low > 1e-9 * Math.max(1, high); step++) {
                double mid = (low + high) / 2;
                if (trips(tasks, distances, depot, measure, mid, order) <= k) {
                    high = mid;
                } else {
                    low = mid;
                }
            }
        } else {
            high = low;
        }
        return cheapest(tasks, distances, depot, measure, high, k, order);
    }

    private static double measure(TripLimit measure, TripExtension trip) {
        return measure.use(trip.service(), trip.closed() - trip.service(), trip.demand());
    }

    /**
     * The fewest trips of measure at most {@code bound} that cover the order, or n + 1 when none do. Greedy:
     * each trip takes the longest run that fits. That is optimal because distances are shortest paths, so
     * dropping a trip's first or last task never makes it dearer (triangle inequality): any cut can be
     * shifted so every trip reaches as far as the greedy one. O(n) per call.
     */
    private static int trips(Tasks tasks, Distances distances, int depot, TripLimit measure, double bound, int[] order) {
        int n = order.length;
        TripExtension trip = new TripExtension(tasks, distances, depot);
        int count = 0;
        int i = 0;
        while (i < n) {
            trip.begin(order[i]);
            if (measure(measure, trip) > bound) {
                return n + 1;
            }
            int j = i + 1;
            while (j < n) {
                TripExtension longer = trip.copy();
                longer.add(order[j]);
                if (measure(measure, longer) > bound) {
                    break;
                }
                trip = longer;
                j++;
            }
            count++;
            i = j;
        }
        return count;
    }

    /** The cheapest cut into at most k trips of measure at most {@code bound}. */
    private static GiantTourSplit.Result cheapest(Tasks tasks, Distances distances, int depot, TripLimit measure,
                                                  double bound, int k, int[] order) {
        int n = order.length;
        double[][] best = new double[k + 1][n + 1];
        int[][] cut = new int[k + 1][n + 1];
        for (double[] row : best) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        best[0][0] = 0;
        TripExtension trip = new TripExtension(tasks, distances, depot);
        for (int i = 0; i < n; i++) {
            trip.begin(order[i]);
            for (int j = i; j < n; j++) {
                if (j > i) {
                    trip.add(order[j]);
                    if (measure.use(trip.service(), trip.open() - trip.service(), trip.demand()) > bound * (1 + 1e-9)) {
                        break;
                    }
                }
                if (measure(measure, trip) > bound * (1 + 1e-9)) {
                    continue;
                }
                double closed = trip.closed();
                for (int t = 0; t < k; t++) {
                    if (best[t][i] + closed < best[t + 1][j + 1]) {
                        best[t + 1][j + 1] = best[t][i] + closed;
                        cut[t + 1][j + 1] = i;
                    }
                }
            }
        }
        int used = 1;
        for (int t = 1; t <= k; t++) {
            if (best[t][n] < best[used][n]) {
                used = t;
            }
        }
        List<int[]> trips = new ArrayList<>();
        for (int j = n, t = used; j > 0; j = cut[t][j], t--) {
            trips.add(0, TripExtension.directions(tasks, distances, depot, order, cut[t][j], j - 1));
        }
        return new GiantTourSplit.Result(trips, best[used][n]);
    }
}
