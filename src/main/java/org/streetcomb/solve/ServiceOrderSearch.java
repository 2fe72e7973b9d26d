package org.streetcomb.solve;

import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import org.streetcomb.network.Components;
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
 * programming over the sequence (two states per pass), and the order is improved by 2-opt (reverse a
 * stretch of the sequence, as in the rural postman improvement procedures of Hertz, Laporte &amp;
 * Nanchen-Hugo, INFORMS J. Computing 11, 1999) and Or-opt (move one to three consecutive passes
 * elsewhere, either way round; Or 1976), then from seeded double-bridge perturbations of the best order
 * (iterated local search, Lourenço, Martin &amp; Stützle 2003). The result replaces a constructed tour
 * only when it is shorter, so it is never worse.
 *
 * <p>Written by hand: no library searches tours over a shortest-path matrix with per-pass directions.
 * Cost: 2K + 2 Dijkstra searches for K passes, then O(K) per move; the moves are bounded by
 * {@link #WORK} (shared among the tours by their passes), and a tour with more than {@link #MAX_PASSES}
 * passes is searched in stretches of that many passes of its constructed order. The search starts from
 * the constructed tour's own order (read off an
 * Euler walk, {@link EulerWalk}) and from a nearest-neighbour order, and keeps the better.
 */
final class ServiceOrderSearch {

    /** Most service passes searched together: the distance matrix needs 2K + 2 full searches. */
    static final int MAX_PASSES = 400;

    /**
     * Tours with more service passes than this are searched in stretches of {@link #LONG_TOUR_WINDOW}: the
     * distance matrix of a stretch of w passes costs 2w searches reaching about w passes away, so its work per
     * pass grows with w squared. On generated grids with a fifth of the streets one-way (docs/mixed-bench.sh,
     * measured 2026-12-05) stretches of 25 instead of 400 took the 100,000-street solve from 50 s to 16 s with
     * a tour as short (10,000 streets: 0.02 % shorter).
     */
    static final int LONG_TOUR = 2_000;

    /** Stretch length for tours longer than {@link #LONG_TOUR} passes. */
    static final int LONG_TOUR_WINDOW = 25;

    /** Dynamic-programming steps allowed in all (each step compares four direction pairs). */
    static final long WORK = 10_000_000L;

    /** Perturbations of the best order tried after the first local optimum. */
    static final int KICKS = 50;

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
    private final long budget;
    private long work;

    /**
     * @param search a search over the network, reused between stretches (its arrays are network-sized)
     * @param keyOf  network-sized, all -1; left all -1 again
     */
    private ServiceOrderSearch(StreetNetwork network, DijkstraSearch search, int[] keyOf, int start, int end,
                               int[] edge, int[] allowed, long budget) {
        this.budget = budget;
        this.passes = edge.length;
        this.edge = edge;
        this.allowed = allowed;
        this.rest = new int[passes];
        int[] nodes = new int[2 * passes + 2];
        int keys = 0;
        int[] ends = new int[2 * passes + 2];
        ends[0] = start;
        ends[1] = end;
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
        for (int node : keyNode) {
            keyOf[node] = -1;
        }
    }

    /**
     * The constructed tours, each replaced by a shorter one where searching the order of its service passes
     * finds one.
     */
    static Augmentation improve(PostmanProblem problem, Augmentation constructed) {
        return improve(problem, constructed, MAX_PASSES);
    }

    /**
     * As {@link #improve(PostmanProblem, Augmentation)}, searching at most {@code window} passes at a time:
     * a longer tour is searched in consecutive stretches of its constructed order, each from where the
     * stretch before it ends to where the next one begins, so every stretch keeps its place in the tour.
     */
    static Augmentation improve(PostmanProblem problem, Augmentation constructed, int window) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        Components components = Components.of(network);
        int[] starts = problem.starts();
        int[] passesIn = new int[components.count()];
        int total = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            passesIn[components.of(network.from(e))] += demand.passes(e);
            total += demand.passes(e);
        }
        Traversals before = constructed.traversals();
        int[] along = before.along().clone();
        int[] against = before.against().clone();
        int[] either = before.either().clone();
        boolean undirected = !before.directed();
        int improved = 0;
        for (int j = 0; j < starts.length; j++) {
            int part = components.of(starts[j]);
            int count = passesIn[part];
            if (count == 0) {
                continue;
            }
            int[] edge = new int[count];
            int[] allowed = new int[count];
            int t = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                if (components.of(network.from(e)) != part) {
                    continue;
                }
                Travel travel = network.travel(e);
                int free = travel == Travel.FORWARD ? 1 : travel == Travel.BACKWARD ? 2 : 3;
                t = fill(edge, allowed, t, e, demand.along()[e], 1);
                t = fill(edge, allowed, t, e, demand.against()[e], 2);
                t = fill(edge, allowed, t, e, demand.either()[e], free);
            }
            int end = j == 0 ? problem.end() : starts[j];
            int[] steps = EulerWalk.steps(network, before, starts[j]);
            int[] a = new int[network.edgeCount()];
            int[] b = new int[network.edgeCount()];
            long budget = Math.max(WORK / 20, WORK * count / total);
            int stretch = count > LONG_TOUR ? Math.min(window, LONG_TOUR_WINDOW) : window;
            if (!searchInStretches(network, starts[j], end, edge, allowed, steps, stretch, budget, a, b)) {
                continue;
            }
            double old = 0;
            double found = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                if (components.of(network.from(e)) == part) {
                    old += before.passes(e) * network.length(e);
                    found += (a[e] + b[e]) * network.length(e);
                }
            }
            if (found >= old - 1e-6) {
                continue;
            }
            improved++;
            for (int e = 0; e < network.edgeCount(); e++) {
                if (components.of(network.from(e)) == part) {
                    along[e] = undirected ? 0 : a[e];
                    against[e] = undirected ? 0 : b[e];
                    either[e] = undirected ? a[e] + b[e] : 0;
                }
            }
        }
        if (improved == 0) {
            return constructed;
        }
        Traversals after = new Traversals(along, against, either);
        double length = after.length(network);
        double was = before.length(network);
        return new Augmentation(after, length - demand.length(network), constructed.oddNodes(),
                constructed.method() + "; service order searched (2-opt, Or-opt, " + total + " passes), "
                        + String.format(Locale.ROOT, "%.1f %% shorter", 100 * (was - length) / was),
                length <= constructed.lowerBound() + 1e-9 * Math.max(1, length), constructed.lowerBound());
    }

    /**
     * Searches the passes in stretches of at most {@code window} of the constructed order and adds the
     * resulting walk to {@code along}/{@code against}; false when some stretch has no drivable order.
     */
    private static boolean searchInStretches(StreetNetwork network, int start, int end, int[] edge, int[] allowed,
                                             int[] steps, int window, long budget, int[] along, int[] against) {
        int count = edge.length;
        int[] constructed = new int[count];
        int[] direction = new int[count];
        orderOf(edge, allowed, steps, constructed, direction);
        int from = start;
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        int[] keyOf = new int[network.nodeCount()];
        Arrays.fill(keyOf, -1);
        for (int first = 0; first < count; first += window) {
            int n = Math.min(window, count - first);
            int[] part = new int[n];
            int[] partAllowed = new int[n];
            for (int i = 0; i < n; i++) {
                part[i] = edge[constructed[first + i]];
                partAllowed[i] = allowed[constructed[first + i]];
            }
            // the stretch ends where the next one's first pass begins, in its constructed direction
            int next = first + n < count ? constructed[first + n] : -1;
            int to = next < 0 ? end : direction[next] == 0 ? network.from(edge[next]) : network.to(edge[next]);
            ServiceOrderSearch stretch = new ServiceOrderSearch(network, search, keyOf, from, to, part, partAllowed,
                    Math.max(1, budget * n / count));
            int[] identity = java.util.stream.IntStream.range(0, n).toArray();
            int[] order = stretch.bestOrder(identity);
            if (order == null) {
                return false;
            }
            stretch.walk(network, order, along, against);
            from = to;
        }
        return true;
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
    private int[] bestOrder(int[] seed) {
        int[] best = seed;
        double bestCost = localSearch(best);
        int[] nearest = nearestNeighbour();
        double nearestCost = localSearch(nearest);
        if (nearestCost < bestCost) {
            best = nearest;
            bestCost = nearestCost;
        }
        if (bestCost == INF) {
            return null;
        }
        Random random = new Random(passes);
        int[] trial = new int[passes];
        for (int kick = 0; kick < KICKS && passes >= 4 && work < budget; kick++) {
            doubleBridge(best, trial, random);
            double cost = localSearch(trial);
            if (cost < bestCost - 1e-9) {
                bestCost = cost;
                System.arraycopy(trial, 0, best, 0, passes);
            }
        }
        return best;
    }

    /**
     * The passes in the order a walk services them (each pass at the first step that can service it, with
     * the direction it was driven: 0 along the edge, 1 against); passes the walk does not service go last.
     */
    private static void orderOf(int[] edge, int[] allowed, int[] steps, int[] order, int[] direction) {
        int passes = edge.length;
        boolean[] done = new boolean[passes];
        int maxEdge = 0;
        for (int e : edge) {
            maxEdge = Math.max(maxEdge, e);
        }
        int[] firstPass = new int[passes == 0 ? 0 : maxEdge + 2];
        java.util.Arrays.fill(firstPass, passes);
        for (int t = passes - 1; t >= 0; t--) {
            firstPass[edge[t]] = t;
        }
        int k = 0;
        for (int s = 0; s < steps.length; s += 2) {
            int e = steps[s];
            if (e >= firstPass.length) {
                continue;
            }
            int mask = steps[s + 1] == 1 ? 1 : 2;
            int pick = -1;
            for (int t = firstPass[e]; t < passes && edge[t] == e; t++) {
                // a pass of fixed direction first: a free one can take the other direction later
                if (!done[t] && (allowed[t] & mask) != 0 && (pick < 0 || allowed[t] != 3)) {
                    pick = t;
                }
            }
            if (pick >= 0) {
                done[pick] = true;
                direction[pick] = mask == 1 ? 0 : 1;
                order[k++] = pick;
            }
        }
        for (int t = 0; t < passes; t++) {
            if (!done[t]) {
                direction[t] = (allowed[t] & 1) != 0 ? 0 : 1;
                order[k++] = t;
            }
        }
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
        while (improved && work < budget) {
            improved = false;
            for (int i = 0; i < passes && work < budget; i++) {
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
                for (int i = 0; i + length <= passes && work < budget; i++) {
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

    /** Adds the passes of the walk that drives the order with its best directions and shortest paths between. */
    private void walk(StreetNetwork network, int[] order, int[] along, int[] against) {
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
    }
}
