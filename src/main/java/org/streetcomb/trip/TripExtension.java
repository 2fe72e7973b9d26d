package org.streetcomb.trip;

/**
 * A trip from the depot being extended task by task, tracking the cheapest way to drive it so far with
 * each task in either permitted direction: a two-state dynamic programme over the directions, O(1) per
 * task. Used by the splits to price every trip {@code i..j} of a giant tour in O(n * tasks per trip).
 */
final class TripExtension {

    private final Tasks tasks;
    private final Distances distances;
    private final int depot;
    /** Cheapest cost from the depot through the tasks so far, ending with the last task in direction 0 or 1. */
    private double best0;
    private double best1;
    private int last = -1;
    private double service;
    private double demand;

    TripExtension(Tasks tasks, Distances distances, int depot) {
        this.tasks = tasks;
        this.distances = distances;
        this.depot = depot;
    }

    /** An independent copy of this trip so far. */
    TripExtension copy() {
        TripExtension c = new TripExtension(tasks, distances, depot);
        c.best0 = best0;
        c.best1 = best1;
        c.last = last;
        c.service = service;
        c.demand = demand;
        return c;
    }

    void begin(int task) {
        last = -1;
        service = 0;
        demand = 0;
        add(task);
    }

    void add(int task) {
        double c = tasks.cost[task];
        double next0 = reach(2 * task) + c;
        double next1 = tasks.flippable[task] ? reach(2 * task + 1) + c : Double.POSITIVE_INFINITY;
        best0 = next0;
        best1 = next1;
        last = task;
        service += c;
        demand += tasks.demand[task];
    }

    private double reach(int ref) {
        int s = tasks.start(ref);
        if (last < 0) {
            return distances.between(depot, s);
        }
        return Math.min(best0 + distances.between(tasks.end(2 * last), s),
                best1 + distances.between(tasks.end(2 * last + 1), s));
    }

    /** Cost so far, not yet back at the depot; it never decreases as tasks are added. */
    double open() {
        return Math.min(best0, best1);
    }

    /** Cost of the trip closed back to the depot now. */
    double closed() {
        return Math.min(best0 + distances.between(tasks.end(2 * last), depot),
                best1 + distances.between(tasks.end(2 * last + 1), depot));
    }

    double service() {
        return service;
    }

    double demand() {
        return demand;
    }

    /** The cheapest directions for the tasks {@code order[from..to]} driven as one trip, as task references. */
    static int[] directions(Tasks tasks, Distances distances, int depot, int[] order, int from, int to) {
        int len = to - from + 1;
        double[][] cost = new double[len][2];
        int[][] back = new int[len][2];
        for (int k = 0; k < len; k++) {
            int t = order[from + k];
            for (int d = 0; d < 2; d++) {
                int ref = 2 * t + d;
                if (!tasks.allowed(ref)) {
                    cost[k][d] = Double.POSITIVE_INFINITY;
                    continue;
                }
                if (k == 0) {
                    cost[k][d] = distances.between(depot, tasks.start(ref)) + tasks.cost[t];
                    continue;
                }
                int p = order[from + k - 1];
                double via0 = cost[k - 1][0] + distances.between(tasks.end(2 * p), tasks.start(ref));
                double via1 = cost[k - 1][1] + distances.between(tasks.end(2 * p + 1), tasks.start(ref));
                back[k][d] = via1 < via0 ? 1 : 0;
                cost[k][d] = Math.min(via0, via1) + tasks.cost[t];
            }
        }
        int lastTask = order[to];
        int d = cost[len - 1][1] + distances.between(tasks.end(2 * lastTask + 1), depot)
                < cost[len - 1][0] + distances.between(tasks.end(2 * lastTask), depot) ? 1 : 0;
        int[] refs = new int[len];
        for (int k = len - 1; k >= 0; k--) {
            refs[k] = 2 * order[from + k] + d;
            d = back[k][d];
        }
        return refs;
    }
}
