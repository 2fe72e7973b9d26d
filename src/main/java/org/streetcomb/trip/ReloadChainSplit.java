package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The optimal split of one vehicle's sequence of services into trips chained through its homes (the depot
 * and the reload points): the first trip leaves the depot, each next one leaves the home the one before
 * ended at, and the last returns to the depot. This is Ulusoy's split ({@link GiantTourSplit}) with the home
 * between two trips as part of the state, the route-first step for arc routing with intermediate facilities
 * (Ghiani, Improta &amp; Laporte 2001; Polacek, Doerner, Hartl &amp; Maniezzo 2008): {@code best[j][h]} is
 * the cheapest way to serve the first j services and stand at home h, and a trip from home g over services
 * i+1..j to home h must fit the limit with its own drives out and back. The per-trip relaxation the search
 * prices ({@link NearestHome}: each trip from and to whichever home is nearest) can undercount the drive
 * between one trip's home and the next trip's; this split prices the chain exactly for the order it is
 * given. The services keep their order and directions. O(n * w * H^2) for n services, at most w per trip
 * and H homes.
 */
final class ReloadChainSplit {

    private ReloadChainSplit() {
    }

    /**
     * @param trips the trips whose concatenation, as task references in driving order, is the sequence
     * @param homes the depot first, then the reload points
     * @return the chained trips, each with the homes it leaves from and returns to
     */
    static Chain split(Tasks tasks, Distances direct, int[] homes, TripLimit limit, List<int[]> trips) {
        int[] refs = trips.stream().flatMapToInt(Arrays::stream).toArray();
        int n = refs.length;
        int h = homes.length;
        double[][] best = new double[n + 1][h];
        int[][] cutAt = new int[n + 1][h];
        int[][] cameFrom = new int[n + 1][h];
        for (double[] row : best) {
            Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        best[0][0] = 0;
        for (int i = 0; i < n; i++) {
            double service = 0;
            double between = 0;
            double demand = 0;
            for (int j = i; j < n; j++) {
                service += tasks.cost(refs[j]);
                demand += tasks.demand(refs[j]);
                if (j > i) {
                    between += direct.between(tasks.end(refs[j - 1]), tasks.start(refs[j]));
                }
                if (j > i && !limit.allows(service, between, demand)) {
                    break;
                }
                for (int g = 0; g < h; g++) {
                    if (best[i][g] == Double.POSITIVE_INFINITY) {
                        continue;
                    }
                    double out = direct.between(homes[g], tasks.start(refs[i]));
                    for (int k = 0; k < h; k++) {
                        if (j == n - 1 && k != 0) {
                            continue;
                        }
                        double back = direct.between(tasks.end(refs[j]), homes[k]);
                        double deadhead = out + between + back;
                        boolean fits = limit.allows(service, deadhead, demand);
                        double cost = best[i][g] + service + deadhead;
                        if ((fits || j == i) && cost < best[j + 1][k] - 1e-9) {
                            best[j + 1][k] = cost;
                            cutAt[j + 1][k] = i;
                            cameFrom[j + 1][k] = g;
                        }
                    }
                }
            }
        }
        List<int[]> chained = new ArrayList<>();
        List<int[]> ends = new ArrayList<>();
        for (int j = n, k = 0; j > 0; ) {
            int i = cutAt[j][k];
            int g = cameFrom[j][k];
            chained.add(0, Arrays.copyOfRange(refs, i, j));
            ends.add(0, new int[] {homes[g], homes[k]});
            j = i;
            k = g;
        }
        return new Chain(chained, ends, best[n][0]);
    }

    /**
     * @param trips each trip's task references in driving order
     * @param homes each trip's home left from and home returned to, as network nodes
     * @param cost  the day's length
     */
    record Chain(List<int[]> trips, List<int[]> homes, double cost) {
    }
}
