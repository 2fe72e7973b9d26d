package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The optimal split of a giant tour into trips from the depot (G. Ulusoy, "The fleet size and mix problem
 * for capacitated arc routing", European J. Operational Research 22, 1985; in the form of C. Prins and of
 * P. Lacomme, C. Prins &amp; W. Ramdane-Chérif, "Competitive memetic algorithms for arc routing
 * problems", Annals of Operations Research 131, 2004): keeping the tasks in the giant tour's order, every
 * run {@code i..j} that fits the limit is a candidate trip priced at its cheapest directions, and a
 * shortest path over the candidates picks the cheapest cut. A single task beyond the limit becomes a trip
 * of its own (the caller reports it). O(n * w) for n tasks and at most w tasks per trip.
 */
final class GiantTourSplit {

    private GiantTourSplit() {
    }

    /** The trips, each as task references in driving order, and their total cost. */
    record Result(List<int[]> trips, double cost) {
    }

    static Result split(Tasks tasks, Distances distances, int depot, TripLimit limit, int[] order) {
        int n = order.length;
        double[] best = new double[n + 1];
        int[] cut = new int[n + 1];
        Arrays.fill(best, Double.POSITIVE_INFINITY);
        best[0] = 0;
        TripExtension trip = new TripExtension(tasks, distances, depot);
        for (int i = 0; i < n; i++) {
            if (best[i] == Double.POSITIVE_INFINITY) {
                continue;
            }
            trip.begin(order[i]);
            for (int j = i; j < n; j++) {
                if (j > i) {
                    trip.add(order[j]);
                    if (!limit.allows(trip.service(), trip.open() - trip.service(), trip.demand())) {
                        break;
                    }
                }
                double closed = trip.closed();
                boolean fits = limit.allows(trip.service(), closed - trip.service(), trip.demand());
                if ((fits || j == i) && best[i] + closed < best[j + 1]) {
                    best[j + 1] = best[i] + closed;
                    cut[j + 1] = i;
                }
            }
        }
        List<int[]> trips = new ArrayList<>();
        for (int j = n; j > 0; j = cut[j]) {
            trips.add(0, TripExtension.directions(tasks, distances, depot, order, cut[j], j - 1));
        }
        return new Result(trips, best[n]);
    }
}
