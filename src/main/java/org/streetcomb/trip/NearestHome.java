package org.streetcomb.trip;

/**
 * Distances where a trip may start from and end at any of several homes: the depot or a reload point (a
 * salt barn, a tip). Every distance from or to the depot becomes the distance from the nearest home to the
 * node, or from the node to its nearest home, so the splits, the local search and the memetic search price
 * a trip as leaving from and returning to whichever home suits it, the relaxation route-first methods for
 * arc routing with intermediate facilities cut against (Ghiani, Improta &amp; Laporte 2001). The vehicle's
 * drive between one trip's home and the next trip's is left out here; for one vehicle's day the search's result
 * is priced and cut as a chain of homes by {@link ReloadChainSplit}. O(homes) per query.
 */
final class NearestHome implements Distances {

    private final Distances base;
    private final int depot;
    private final int[] homes;

    NearestHome(Distances base, int depot, int[] homes) {
        this.base = base;
        this.depot = depot;
        this.homes = homes;
    }

    @Override
    public double between(int from, int to) {
        if (from == depot && to == depot) {
            return 0;
        }
        if (from == depot) {
            return base.between(nearestFrom(to), to);
        }
        if (to == depot) {
            return base.between(from, nearestTo(from));
        }
        return base.between(from, to);
    }

    /** The home nearest to reach {@code node} from (ties to the first listed, the depot). */
    int nearestFrom(int node) {
        int best = homes[0];
        for (int home : homes) {
            if (base.between(home, node) < base.between(best, node)) {
                best = home;
            }
        }
        return best;
    }

    /** The home nearest to reach from {@code node}. */
    int nearestTo(int node) {
        int best = homes[0];
        for (int home : homes) {
            if (base.between(node, home) < base.between(node, best)) {
                best = home;
            }
        }
        return best;
    }
}
