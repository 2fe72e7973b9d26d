package org.streetcomb.solve;

import java.util.Arrays;
import java.util.Random;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * Improves a rural tour by searching the order in which its service passes are driven. A tour is written
 * as the sequence of its service passes with a shortest drivable path between consecutive ones; every
 * tour, the optimal one included, drives no less than some such sequence (take each pass where the tour
 * services it and replace the deadhead between two passes by a shortest path), so the sequence space
 * holds the optimum. For a given order, the direction of each two-way pass is chosen exactly by dynamic
 * programming over the sequence (two states per pass), and the order is improved by the sequence moves
 * of the rural postman local search of Hertz, Laporte &amp; Nanchen-Hugo (Operations Research 47, 1999):
 * 2-opt (reverse a stretch of the sequence) and Or-opt (move one to three consecutive passes elsewhere,
 * either way round), from a nearest-neighbour start and from seeded double-bridge perturbations of the
 * best order (iterated local search, Lourenço, Martin &amp; Stützle 2003). The result replaces the
 * constructed tour only when it is shorter, so it is never worse.
 *
 * <p>Written by hand: no library searches tours over a shortest-path matrix with per-pass directions.
 * Cost: 2K + 2 Dijkstra searches for K passes, then O(K) per move; the moves are bounded by
 * {@link #WORK}, and problems with more than {@link #MAX_PASSES} passes, or with several tours, keep
 * the constructed tour.
 */
final class ServiceOrderSearch {

    /** Largest number of service passes searched: the distance matrix needs 2K + 2 full searches. */
    static final int MAX_PASSES = 400;

    /** Dynamic-programming steps allowed in all (each step compares four direction pairs). */
    static final long WORK = 40_000_000L;

    /** Perturbations of the best order tried after the first local optimum. */
    static final int KICKS = 200;

    private static final double INF = Double.POSITIVE_INFINITY;

    private final int passes;
    private final int[] edge;
    private final int[] allowed;
    private final int[][] tail;
    private final int[][] head;
    private final double[][] distance;
    private final int startKey;
    private final int endKey;
    private final int[] keyNode;
    private final int[] rest;
    private long work;

    private ServiceOrderSearch(PostmanProblem problem, int[] edge, int[] allowed) {
        StreetNetwork network = problem.network();
        this.passes = edge.length;
        this.edge = edge;
        this.allowed = allowed;
        this.rest = new int[passes];
        int[] keyOf = new int[network.nodeCount()];
        Arrays.fill(keyOf, -1);
        int[] nodes = new int[2 * passes + 2];
        int keys = 0;
        int[] ends = new int[2 * passes + 2];
        ends[0] = problem.starts()[0];
        ends[1] = problem.end();
        for (int t = 0; t < passes; t++) {
            ends[2 + 2 * t] = network.from(edge[t]);
            ends[3 + 2 * t] = network.to(edge[t]);
        }
        for (int v : ends) {
            if (keyOf[v] < 0) {
                keyOf[v] = keys;
                nodes[keys++] = v;
            }
        }
        keyNode = Arrays.copyOf(nodes, keys);
        startKey = keyOf[ends[0]];
        endKey = keyOf[ends[1]];
        tail = new int[passes][2];
        head = new int[passes][2];
        for (int t = 0; t < passes; t++) {
            int from = keyOf[network.from(edge[t])];
            int to = keyOf[network.to(edge[t])];
            tail[t][0] = from;
            head[t][0] = to;
            tail[t][1] = to;
            head[t][1] = from;
        }
        distance = new double[keys][keys];
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        for (int k = 0; k < keys; k++) {
            Arrays.fill(distance[k], INF);
            search.start(keyNode[k]);
            int found = 0;
            for (int v = search.next(); v >= 0 && found < keys; v = search.next()) {
                if (keyOf[v] >= 0) {
                    distance[k][keyOf[v]] = search.distance(v);
                    found++;
                }
            }
        }
    }

    /** The constructed tour, or a shorter one found by searching the order of its service passes. */
    static Augmentation improve(PostmanProblem problem, Augmentation constructed) {
        if (problem.starts().length != 1) {
            return constructed;
        }
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int count = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            count += demand.passes(e);
        }
        if (count == 0 || count > MAX_PASSES) {
            return constructed;
        }
        int[] edge = new int[count];
        int[] allowed = new int[count];
        int t = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            Travel travel = network.travel(e);
            int free = travel == Travel.FORWARD ? 1 : travel == Travel.BACKWARD ? 2 : 3;
            t = fill(edge, allowed, t, e, demand.along()[e], 1);
            t = fill(edge, allowed, t, e, demand.against()[e], 2);
            t = fill(edge, allowed, t, e, demand.either()[e], free);
        }
        ServiceOrderSearch search = new ServiceOrderSearch(problem, edge, allowed);
        int[] order = search.bestOrder();
        if (order == null) {
            return constructed;
        }
        Traversals found = search.walk(problem, order, !constructed.traversals().isDirected());
        double before = constructed.traversals().length(network);
        double after = found.length(network);
        if (after >= before - 1e-6) {
            return constructed;
        }
        double service = demand.length(network);
        return new Augmentation(found, after - service, constructed.oddNodes(),
                constructed.method() + "; service order searched (2-opt, Or-opt, " + count + " passes), "
                        + String.format(java.util.Locale.ROOT, "%.1f %% shorter", 100 * (before - after) / before),
                after <= constructed.lowerBound() + 1e-9 * Math.max(1, after), constructed.lowerBound());
    }

    private static int fill(int[] edge, int[] allowed, int t, int e, int count, int mask) {
        for (int k = 0; k < count; k++) {
            edge[t] = e;
            allowed[t] = mask;
            t++;
        }
        return t;
    }

    /** The best order found, or null when no order is drivable (then the constructed tour stands). */
    private int[] bestOrder() {
        int[] best = nearestNeighbour();
        double bestCost = localSearch(best);
        if (bestCost == INF) {
            return null;
        }
        Random random = new Random(passes);
        int[] trial = new int[passes];
        for (int kick = 0; kick < KICKS && passes >= 4 && work < WORK; kick++) {
            doubleBridge(best, trial, random);
            double cost = localSearch(trial);
            if (cost < bestCost - 1e-9) {
                bestCost = cost;
                System.arraycopy(trial, 0, best, 0, passes);
            }
        }
        return best;
    }

    private int[] nearestNeighbour() {
        int[] order = new int[passes];
        boolean[] done = new boolean[passes];
        int at = startKey;
        for (int i = 0; i < passes; i++) {
            int pick = -1;
            int pickDir = 0;
            double nearest = INF;
            for (int t = 0; t < passes; t++) {
                for (int o = 0; o < 2; o++) {
                    if (!done[t] && (allowed[t] >> o & 1) == 1 && distance[at][tail[t][o]] < nearest) {
                        nearest = distance[at][tail[t][o]];
                        pick = t;
                        pickDir = o;
                    }
                }
            }
            if (pick < 0) {
                // stuck behind one-way streets: the local search may still find a drivable order
                pick = firstUndone(done);
                pickDir = (allowed[pick] & 1) != 0 ? 0 : 1;
            }
            done[pick] = true;
            order[i] = pick;
            at = head[pick][pickDir];
        }
        return order;
    }

    private static int firstUndone(boolean[] done) {
        int t = 0;
        while (done[t]) {
            t++;
        }
        return t;
    }

    /** Three cuts: A B C D becomes A C B D, a move 2-opt and Or-opt cannot undo in one step. */
    private void doubleBridge(int[] from, int[] to, Random random) {
        int a = 1 + random.nextInt(passes - 2);
        int b = a + 1 + random.nextInt(passes - a - 1);
        int c = b + 1 + random.nextInt(passes - b);
        int k = 0;
        for (int i = 0; i < a; i++) {
            to[k++] = from[i];
        }
        for (int i = b; i < c; i++) {
            to[k++] = from[i];
        }
        for (int i = a; i < b; i++) {
            to[k++] = from[i];
        }
        for (int i = c; i < passes; i++) {
            to[k++] = from[i];
        }
    }

    /** Applies improving 2-opt and Or-opt moves to {@code order} until none improves; returns its cost. */
    private double localSearch(int[] order) {
        int[] trial = new int[passes];
        double cost = cost(order);
        boolean improved = true;
        while (improved && work < WORK) {
            improved = false;
            for (int i = 0; i < passes && work < WORK; i++) {
                for (int j = i + 1; j < passes; j++) {
                    reverse(order, trial, i, j);
                    double c = cost(trial);
                    if (c < cost - 1e-9) {
                        cost = c;
                        System.arraycopy(trial, 0, order, 0, passes);
                        improved = true;
                    }
                }
            }
            for (int length = 1; length <= 3; length++) {
                for (int i = 0; i + length <= passes && work < WORK; i++) {
                    for (int p = 0; p <= passes - length; p++) {
                        for (int flip = p == i ? 1 : 0; flip < (length > 1 || p != i ? 2 : 0); flip++) {
                            move(order, trial, i, length, p, flip == 1);
                            double c = cost(trial);
                            if (c < cost - 1e-9) {
                                cost = c;
                                System.arraycopy(trial, 0, order, 0, passes);
                                improved = true;
                            }
                        }
                    }
                }
            }
        }
        return cost;
    }

    private void reverse(int[] from, int[] to, int i, int j) {
        System.arraycopy(from, 0, to, 0, passes);
        for (int a = i, b = j; a < b; a++, b--) {
            int x = to[a];
            to[a] = to[b];
            to[b] = x;
        }
    }

    /** Takes the {@code length} passes at {@code i} out and puts them back starting at position {@code p}. */
    private void move(int[] from, int[] to, int i, int length, int p, boolean reversed) {
        int k = 0;
        for (int x = 0; x < passes; x++) {
            if (x < i || x >= i + length) {
                rest[k++] = from[x];
            }
        }
        k = 0;
        for (int x = 0; x < p; x++) {
            to[k++] = rest[x];
        }
        for (int x = 0; x < length; x++) {
            to[k++] = from[reversed ? i + length - 1 - x : i + x];
        }
        for (int x = p; x < passes - length; x++) {
            to[k++] = rest[x];
        }
    }

    /** Deadhead of the order with the best directions: the dynamic programme over the sequence. */
    private double cost(int[] order) {
        return directions(order, null);
    }

    /** The dynamic programme; fills {@code chosen} with each pass's direction (0 along, 1 against) if given. */
    private double directions(int[] order, int[] chosen) {
        work += passes;
        double[][] f = chosen == null ? null : new double[passes][2];
        int[][] from = chosen == null ? null : new int[passes][2];
        double f0 = INF;
        double f1 = INF;
        int first = order[0];
        if ((allowed[first] & 1) != 0) {
            f0 = distance[startKey][tail[first][0]];
        }
        if ((allowed[first] & 2) != 0) {
            f1 = distance[startKey][tail[first][1]];
        }
        if (f != null) {
            f[0][0] = f0;
            f[0][1] = f1;
        }
        for (int i = 1; i < passes; i++) {
            int prev = order[i - 1];
            int t = order[i];
            double g0 = INF;
            double g1 = INF;
            int p0 = 0;
            int p1 = 0;
            if ((allowed[t] & 1) != 0) {
                double a = f0 + distance[head[prev][0]][tail[t][0]];
                double b = f1 + distance[head[prev][1]][tail[t][0]];
                g0 = Math.min(a, b);
                p0 = b < a ? 1 : 0;
            }
            if ((allowed[t] & 2) != 0) {
                double a = f0 + distance[head[prev][0]][tail[t][1]];
                double b = f1 + distance[head[prev][1]][tail[t][1]];
                g1 = Math.min(a, b);
                p1 = b < a ? 1 : 0;
            }
            f0 = g0;
            f1 = g1;
            if (f != null) {
                f[i][0] = g0;
                f[i][1] = g1;
                from[i][0] = p0;
                from[i][1] = p1;
            }
        }
        int last = order[passes - 1];
        double e0 = f0 + distance[head[last][0]][endKey];
        double e1 = f1 + distance[head[last][1]][endKey];
        if (chosen != null) {
            int o = e1 < e0 ? 1 : 0;
            for (int i = passes - 1; i >= 0; i--) {
                chosen[i] = o;
                o = from[i][o];
            }
        }
        return Math.min(e0, e1);
    }

    /** The passes of the walk that drives the order with its best directions and shortest paths between. */
    private Traversals walk(PostmanProblem problem, int[] order, boolean undirected) {
        StreetNetwork network = problem.network();
        int m = network.edgeCount();
        int[] along = new int[m];
        int[] against = new int[m];
        int[] chosen = new int[passes];
        directions(order, chosen);
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        int at = keyNode[startKey];
        for (int i = 0; i <= passes; i++) {
            int target = i < passes ? keyNode[tail[order[i]][chosen[i]]] : keyNode[endKey];
            search.start(at);
            search.runTo(target);
            int v = at;
            for (int e : search.pathTo(target)) {
                (network.from(e) == v ? along : against)[e]++;
                v = network.other(e, v);
            }
            if (i < passes) {
                int e = edge[order[i]];
                (chosen[i] == 0 ? along : against)[e]++;
                at = keyNode[head[order[i]][chosen[i]]];
            }
        }
        if (!undirected) {
            return Traversals.directed(along, against);
        }
        int[] either = new int[m];
        for (int e = 0; e < m; e++) {
            either[e] = along[e] + against[e];
        }
        return Traversals.undirected(either);
    }
}
