package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Local improvement of a set of trips with the moves of the local search in Lacomme, Prins &amp;
 * Ramdane-Chérif's memetic algorithm for arc routing (Annals of Operations Research 131, 2004): move a
 * task elsewhere (or to a trip of its own), swap two tasks of different trips, exchange the tails of two
 * trips (2-opt between trips) and reverse a run within a trip, each task in either permitted direction.
 * Moves are tried only where they bring a task next to one of its nearest tasks (a granular neighbourhood,
 * Toth &amp; Vigo, INFORMS J. Computing 15, 2003), so a pass costs O(n * k * trip length) rather than
 * O(n^2). Every improving move that keeps the trips it touches within the limit is applied at once, and
 * passes repeat until none is found.
 */
final class TripLocalSearch {

    private static final double EPSILON = 1e-7;
    /** Nearest tasks considered per task. */
    static final int NEIGHBOURS = 30;

    private final Tasks tasks;
    private final Distances distances;
    private final int depot;
    private final TripLimit limit;
    private final int[][] neighbours;
    /** Cost charged per unit of use beyond the limit, or infinity when trips must fit. */
    private final double penalty;
    private final List<int[]> trips = new ArrayList<>();
    private final List<double[]> totals = new ArrayList<>();
    private final int[] tripOf;
    private final int[] positionOf;

    TripLocalSearch(Tasks tasks, Distances distances, int depot, TripLimit limit, int[][] neighbours) {
        this(tasks, distances, depot, limit, neighbours, Double.POSITIVE_INFINITY);
    }

    /**
     * A search that may overfill trips at a price per unit of use beyond the limit (penalised capacity,
     * as in Beullens, Muyldermans, Cattrysse &amp; Van Oudheusden, EJOR 147, 2003, and Vidal's hybrid
     * genetic search), so tasks can pass through a full trip on their way to a better place.
     */
    TripLocalSearch(Tasks tasks, Distances distances, int depot, TripLimit limit, int[][] neighbours, double penalty) {
        this.penalty = penalty;
        this.tasks = tasks;
        this.distances = distances;
        this.depot = depot;
        this.limit = limit;
        this.neighbours = neighbours;
        this.tripOf = new int[tasks.size()];
        this.positionOf = new int[tasks.size()];
    }

    /** For each task, the {@link #NEIGHBOURS} tasks whose nearer end is closest to either of its ends. */
    static int[][] neighbours(Tasks tasks, Distances distances) {
        int n = tasks.size();
        int k = Math.min(NEIGHBOURS, n - 1);
        int[][] nearest = new int[n][];
        Integer[] others = new Integer[n];
        double[] gap = new double[n];
        for (int t = 0; t < n; t++) {
            for (int s = 0; s < n; s++) {
                others[s] = s;
                gap[s] = s == t ? Double.POSITIVE_INFINITY : Math.min(
                        Math.min(distances.between(tasks.head[t], tasks.tail[s]), distances.between(tasks.head[t], tasks.head[s])),
                        Math.min(distances.between(tasks.tail[t], tasks.tail[s]), distances.between(tasks.tail[t], tasks.head[s])));
            }
            Arrays.sort(others, (x, y) -> gap[x] != gap[y] ? Double.compare(gap[x], gap[y]) : Integer.compare(x, y));
            nearest[t] = new int[k];
            for (int i = 0; i < k; i++) {
                nearest[t][i] = others[i];
            }
        }
        return nearest;
    }

    /** Improves a copy of the trips; returns the improved trips. */
    List<int[]> improve(List<int[]> start) {
        trips.clear();
        totals.clear();
        for (int[] trip : start) {
            trips.add(trip.clone());
            totals.add(totals(trip));
        }
        reindex();
        boolean improved = true;
        while (improved) {
            improved = false;
            for (int t = 0; t < tasks.size(); t++) {
                improved |= improveAround(t);
            }
        }
        return new ArrayList<>(trips);
    }

    double cost(List<int[]> solution) {
        double sum = 0;
        for (int[] trip : solution) {
            sum += totals(trip)[0];
        }
        return sum;
    }

    /** Tries the moves that bring task t next to one of its nearest tasks; applies the first that helps. */
    private boolean improveAround(int t) {
        int a = tripOf[t];
        int p = positionOf[t];
        int[] one = trips.get(a);
        if (one.length > 1) {
            // a trip of its own pays only if the saving where it was exceeds the new trip's cost (less any penalty lifted)
            double removal = distances.between(before(one, p), after(one, p)) - detour(before(one, p), one[p], after(one, p));
            double lifted = priced(totals.get(a)) - totals.get(a)[0];
            for (int d = 0; d < 2; d++) {
                int ref = 2 * t + d;
                if (tasks.allowed(ref) && removal + detour(depot, ref, depot) < lifted - EPSILON
                        && replace(a, without(one, p), -1, new int[] {ref})) {
                    return true;
                }
            }
        }
        for (int s : neighbours[t]) {
            int b = tripOf[s];
            int q = positionOf[s];
            int[] two = trips.get(b);
            if (a == b) {
                if (withinTrip(a, one, p, q)) {
                    return true;
                }
                continue;
            }
            // cheap detour arithmetic screens each move before the trips are rebuilt and checked in full
            double gain = gain(a, b);
            double outOfOne = detour(before(one, p), one[p], after(one, p));
            double outOfTwo = detour(before(two, q), two[q], after(two, q));
            double removal = distances.between(before(one, p), after(one, p)) - outOfOne;
            for (int d = 0; d < 2; d++) {
                int ref = 2 * t + d;
                if (!tasks.allowed(ref)) {
                    continue;
                }
                double beforeS = detour(before(two, q), ref, tasks.start(two[q])) - distances.between(before(two, q), tasks.start(two[q]));
                if (removal + beforeS < gain && replace(a, without(one, p), b, with(two, q, ref))) {
                    return true;
                }
                double afterS = detour(tasks.end(two[q]), ref, after(two, q)) - distances.between(tasks.end(two[q]), after(two, q));
                if (removal + afterS < gain && replace(a, without(one, p), b, with(two, q + 1, ref))) {
                    return true;
                }
                double intoTwo = detour(before(two, q), ref, after(two, q)) - outOfTwo;
                for (int e = 0; e < 2; e++) {
                    int other = 2 * s + e;
                    if (tasks.allowed(other)
                            && intoTwo + detour(before(one, p), other, after(one, p)) - outOfOne < gain
                            && replace(a, set(one, p, other), b, set(two, q, ref))) {
                        return true;
                    }
                }
            }
            // the tails keep their cost: the exchanges are screened exactly on their two new links
            double tailsAfterT = distances.between(tasks.end(one[p]), tasks.start(two[q]))
                    + distances.between(before(two, q), after(one, p))
                    - distances.between(tasks.end(one[p]), after(one, p))
                    - distances.between(before(two, q), tasks.start(two[q]));
            double tailsAfterS = distances.between(before(one, p), after(two, q))
                    + distances.between(tasks.end(two[q]), tasks.start(one[p]))
                    - distances.between(before(one, p), tasks.start(one[p]))
                    - distances.between(tasks.end(two[q]), after(two, q));
            if ((tailsAfterT < gain && replace(a, join(one, p + 1, two, q), b, join(two, q, one, p + 1)))
                    || (tailsAfterS < gain && replace(a, join(one, p, two, q + 1), b, join(two, q + 1, one, p)))
                    || crossReversed(a, one, p, b, two, q)
                    || (p + 1 < one.length && movePair(a, one, p, b, two, q))) {
                return true;
            }
        }
        return false;
    }

    /**
     * The other 2-opt between trips: one trip's head up to t followed by the other's head up to s driven
     * backwards, and the first trip's tail driven backwards followed by the other's tail.
     */
    private boolean crossReversed(int a, int[] one, int p, int b, int[] two, int q) {
        // the runs keep their cost reversed where distances are symmetric: screen on the two new links
        double links = distances.between(tasks.end(one[p]), tasks.end(two[q]))
                + distances.between(p + 1 < one.length ? tasks.start(one[p + 1]) : depot, after(two, q))
                - distances.between(tasks.end(one[p]), after(one, p))
                - distances.between(tasks.end(two[q]), after(two, q));
        if (links >= gain(a, b)) {
            return false;
        }
        int[] first = new int[p + 1 + q + 1];
        int[] second = new int[one.length - p - 1 + two.length - q - 1];
        System.arraycopy(one, 0, first, 0, p + 1);
        for (int k = 0; k <= q; k++) {
            first[p + 1 + k] = two[q - k] ^ 1;
        }
        for (int k = 0; k < one.length - p - 1; k++) {
            second[k] = one[one.length - 1 - k] ^ 1;
        }
        System.arraycopy(two, q + 1, second, one.length - p - 1, two.length - q - 1);
        return allAllowed(first) && allAllowed(second) && replace(a, first, b, second);
    }

    /** Moves t and the task after it together next to s (Or-opt of two tasks), either way round. */
    private boolean movePair(int a, int[] one, int p, int b, int[] two, int q) {
        double gain = gain(a, b);
        int[] rest = without(without(one, p), p);
        int[][] pairs = {{one[p], one[p + 1]}, {one[p + 1] ^ 1, one[p] ^ 1}};
        double removal = distances.between(before(one, p), after(one, p + 1))
                - distances.between(before(one, p), tasks.start(one[p])) - inner(one[p], one[p + 1])
                - distances.between(tasks.end(one[p + 1]), after(one, p + 1));
        for (int[] pair : pairs) {
            if (!tasks.allowed(pair[0]) || !tasks.allowed(pair[1])) {
                continue;
            }
            for (int at = q; at <= q + 1; at++) {
                int x = at == 0 ? depot : tasks.end(two[at - 1]);
                int y = at == two.length ? depot : tasks.start(two[at]);
                double insertion = distances.between(x, tasks.start(pair[0])) + inner(pair[0], pair[1])
                        + distances.between(tasks.end(pair[1]), y) - distances.between(x, y);
                if (removal + insertion < gain && replace(a, rest, b, with(with(two, at, pair[1]), at, pair[0]))) {
                    return true;
                }
            }
        }
        return false;
    }

    private double inner(int first, int second) {
        return tasks.cost(first) + distances.between(tasks.end(first), tasks.start(second)) + tasks.cost(second);
    }

    private boolean allAllowed(int[] trip) {
        for (int ref : trip) {
            if (!tasks.allowed(ref)) {
                return false;
            }
        }
        return true;
    }

    /** Moves within one trip: task at p next to the task at q, by relocation or by reversing the run between. */
    private boolean withinTrip(int a, int[] trip, int p, int q) {
        // a move within a trip leaves its demand and service as they are: only a shorter trip can pay
        int ref = trip[p];
        int restLength = trip.length - 1;
        double removal = distances.between(before(trip, p), after(trip, p)) - detour(before(trip, p), ref, after(trip, p));
        for (int d = 0; d < 2; d++) {
            int moved = (ref & ~1) | d;
            if (!tasks.allowed(moved)) {
                continue;
            }
            int at = q > p ? q - 1 : q;
            for (int slot = at; slot <= at + 1; slot++) {
                // the trip without p is not built unless the move is screened in: rest[i] is trip[i < p ? i : i + 1]
                int x = slot == 0 ? depot : tasks.end(trip[slot - 1 < p ? slot - 1 : slot]);
                int y = slot == restLength ? depot : tasks.start(trip[slot < p ? slot : slot + 1]);
                if (removal + detour(x, moved, y) - distances.between(x, y) < -EPSILON
                        && replace(a, with(without(trip, p), slot, moved), -1, null)) {
                    return true;
                }
            }
        }
        int from = Math.min(p, q) + (q > p ? 1 : 0);
        int to = Math.max(p, q) - (q > p ? 0 : 1);
        boolean shorter = to > from && distances.between(before(trip, from), tasks.end(trip[to]))
                + distances.between(tasks.start(trip[from]), after(trip, to))
                - distances.between(before(trip, from), tasks.start(trip[from]))
                - distances.between(tasks.end(trip[to]), after(trip, to)) < -EPSILON;
        if (shorter) {
            int[] reversed = trip.clone();
            for (int k = from; k <= to; k++) {
                reversed[k] = trip[from + to - k] ^ 1;
                if (!tasks.allowed(reversed[k])) {
                    return false;
                }
            }
            return replace(a, reversed, -1, null);
        }
        return false;
    }

    /**
     * Replaces trip a (and trip b, or a new trip when b is -1 and {@code second} is given) when that lowers
     * the total cost and both fit the limit.
     */
    private boolean replace(int a, int[] first, int b, int[] second) {
        double[] newFirst = totals(first);
        double[] newSecond = second == null ? null : totals(second);
        double before = priced(totals.get(a)) + (b >= 0 ? priced(totals.get(b)) : 0);
        double after = (first.length == 0 ? 0 : priced(newFirst)) + (second == null || second.length == 0 ? 0 : priced(newSecond));
        if (after >= before - EPSILON) {
            return false;
        }
        if (penalty == Double.POSITIVE_INFINITY
                && ((first.length > 0 && !fits(newFirst)) || (second != null && second.length > 0 && !fits(newSecond)))) {
            return false;
        }
        trips.set(a, first);
        totals.set(a, newFirst);
        if (second != null) {
            if (b >= 0) {
                trips.set(b, second);
                totals.set(b, newSecond);
            } else {
                trips.add(second);
                totals.add(newSecond);
            }
        }
        for (int i = trips.size() - 1; i >= 0; i--) {
            if (trips.get(i).length == 0) {
                trips.remove(i);
                totals.remove(i);
            }
        }
        reindex();
        return true;
    }

    private void reindex() {
        for (int i = 0; i < trips.size(); i++) {
            int[] trip = trips.get(i);
            for (int k = 0; k < trip.length; k++) {
                tripOf[trip[k] >> 1] = i;
                positionOf[trip[k] >> 1] = k;
            }
        }
    }

    private double[] totals(int[] trip) {
        return totals(tasks, distances, depot, trip);
    }

    /** Cost, service length and demand of a trip from and back to the depot. */
    static double[] totals(Tasks tasks, Distances distances, int depot, int[] trip) {
        double cost = 0;
        double service = 0;
        double demand = 0;
        int at = depot;
        for (int ref : trip) {
            cost += distances.between(at, tasks.start(ref)) + tasks.cost(ref);
            service += tasks.cost(ref);
            demand += tasks.demand(ref);
            at = tasks.end(ref);
        }
        cost += distances.between(at, depot);
        return new double[] {cost, service, demand};
    }

    /**
     * The change in cost below which a move between trips a and b may pay: any saving at all, or with
     * penalised overfilling, a rise no larger than the penalty both trips now carry.
     */
    private double gain(int a, int b) {
        return penalty == Double.POSITIVE_INFINITY ? -EPSILON
                : priced(totals.get(a)) - totals.get(a)[0] + priced(totals.get(b)) - totals.get(b)[0] - EPSILON;
    }

    /** A trip's cost plus the penalty for what it uses beyond the limit. */
    private double priced(double[] total) {
        if (penalty == Double.POSITIVE_INFINITY) {
            return total[0];
        }
        return total[0] + penalty * limit.excess(total[1], total[0] - total[1], total[2]);
    }

    private boolean fits(double[] total) {
        return limit.allows(total[1], total[0] - total[1], total[2]);
    }

    private int before(int[] trip, int p) {
        return p == 0 ? depot : tasks.end(trip[p - 1]);
    }

    private int after(int[] trip, int p) {
        return p == trip.length - 1 ? depot : tasks.start(trip[p + 1]);
    }

    /** Cost of driving {@code ref} between nodes x and y, from x to y. */
    private double detour(int x, int ref, int y) {
        return distances.between(x, tasks.start(ref)) + tasks.cost(ref) + distances.between(tasks.end(ref), y);
    }

    private static int[] without(int[] trip, int p) {
        int[] rest = new int[trip.length - 1];
        System.arraycopy(trip, 0, rest, 0, p);
        System.arraycopy(trip, p + 1, rest, p, trip.length - p - 1);
        return rest;
    }

    private static int[] with(int[] trip, int q, int ref) {
        int[] result = new int[trip.length + 1];
        System.arraycopy(trip, 0, result, 0, q);
        result[q] = ref;
        System.arraycopy(trip, q, result, q + 1, trip.length - q);
        return result;
    }

    private static int[] set(int[] trip, int p, int ref) {
        int[] result = trip.clone();
        result[p] = ref;
        return result;
    }

    /** The first {@code p} tasks of one trip followed by the tasks of another from {@code q} on. */
    private static int[] join(int[] headOf, int p, int[] tailOf, int q) {
        int[] result = new int[p + tailOf.length - q];
        System.arraycopy(headOf, 0, result, 0, p);
        System.arraycopy(tailOf, q, result, p, tailOf.length - q);
        return result;
    }
}
