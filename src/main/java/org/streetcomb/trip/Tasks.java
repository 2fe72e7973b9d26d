package org.streetcomb.trip;

import java.util.Arrays;
import java.util.function.IntPredicate;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.tour.Tour;

/**
 * The services a tour performs, as tasks for cutting it into trips: each service traversal of a required
 * street, in tour order. A task is referred to by {@code 2 * task + direction}, direction 0 being the way
 * the tour drove it; a task may be driven the other way only when its street is two-way and the tour
 * services it once (a street serviced once per kerb must keep its directions).
 */
public final class Tasks {

    final int[] edge;
    final int[] tail;
    final int[] head;
    final double[] cost;
    final double[] demand;
    final boolean[] flippable;

    private Tasks(int[] edge, int[] tail, int[] head, double[] cost, double[] demand, boolean[] flippable) {
        this.edge = edge;
        this.tail = tail;
        this.head = head;
        this.cost = cost;
        this.demand = demand;
        this.flippable = flippable;
    }

    /**
     * @param demandPerEdge what servicing each edge uses of a vehicle's capacity, or null for none
     */
    public static Tasks of(StreetNetwork network, Tour tour, double[] demandPerEdge) {
        return of(network, tour, demandPerEdge, step -> true);
    }

    /**
     * @param demandPerEdge what servicing each edge uses of a vehicle's capacity, or null for none
     * @param taken         the tour's service steps to take (by step index); the others are left to someone else
     */
    public static Tasks of(StreetNetwork network, Tour tour, double[] demandPerEdge, IntPredicate taken) {
        int steps = tour.steps();
        int[] servicePasses = new int[network.edgeCount()];
        for (int i = 0; i < steps; i++) {
            if (tour.service()[i]) {
                servicePasses[tour.edges()[i]]++;
            }
        }
        int n = 0;
        int[] edge = new int[steps];
        int[] tail = new int[steps];
        int[] head = new int[steps];
        double[] cost = new double[steps];
        double[] demand = new double[steps];
        boolean[] flippable = new boolean[steps];
        for (int i = 0; i < steps; i++) {
            int e = tour.edges()[i];
            if (!tour.service()[i] || !network.required(e) || !taken.test(i)) {
                continue;
            }
            edge[n] = e;
            tail[n] = tour.entry(network, i);
            head[n] = tour.exit(network, i);
            cost[n] = network.length(e);
            demand[n] = demandPerEdge == null ? 0 : demandPerEdge[e];
            flippable[n] = network.travel(e) == Travel.BOTH && servicePasses[e] == 1;
            n++;
        }
        return new Tasks(Arrays.copyOf(edge, n), Arrays.copyOf(tail, n), Arrays.copyOf(head, n),
                Arrays.copyOf(cost, n), Arrays.copyOf(demand, n), Arrays.copyOf(flippable, n));
    }

    public int size() {
        return edge.length;
    }

    int start(int ref) {
        return (ref & 1) == 0 ? tail[ref >> 1] : head[ref >> 1];
    }

    int end(int ref) {
        return (ref & 1) == 0 ? head[ref >> 1] : tail[ref >> 1];
    }

    boolean allowed(int ref) {
        return (ref & 1) == 0 || flippable[ref >> 1];
    }

    double cost(int ref) {
        return cost[ref >> 1];
    }

    double demand(int ref) {
        return demand[ref >> 1];
    }

    /** The network endpoints of all tasks, without repeats, sorted. */
    int[] endpoints() {
        int[] all = new int[2 * size()];
        System.arraycopy(tail, 0, all, 0, size());
        System.arraycopy(head, 0, all, size(), size());
        return Arrays.stream(all).distinct().sorted().toArray();
    }
}
