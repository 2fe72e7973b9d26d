package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.PriorityQueue;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.jgrapht.Graph;
import org.jgrapht.alg.matching.KuhnMunkresMinimalWeightBipartitePerfectMatching;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.streetcomb.network.StreetNetwork;

/**
 * Reorders a closed tour so the driver meets fewer U-turns and turns across oncoming traffic, driving
 * exactly the same directed traversals (so the length cannot change, and any solver's tour can be
 * reordered, undirected or directed).
 *
 * <p>A closed walk is fixed by which outgoing traversal follows each incoming one at every node. The
 * plain Euler tour makes that choice blindly; here it is made by turn cost ({@link Turn#cost()}):
 * <ol>
 * <li><b>Assignment.</b> At each node the incoming and outgoing traversals are paired at least total turn
 * cost (every permutation where a node is passed up to four times, else Kuhn-Munkres, JGraphT). The
 * pairing is the cheapest possible, but it may fall apart into several closed circuits.</li>
 * <li><b>Patching.</b> Two circuits that pass through a common node are joined by exchanging the
 * successors of one incoming traversal of each there, at the least added cost, cheapest exchange
 * first, until one circuit remains: the patching step of Karp's assignment-based method for the
 * asymmetric travelling salesman problem (R. M. Karp, SIAM J. Comput. 8, 1979), applied to the
 * transition graph as in arc routing with turn penalties. Each node's circuits are always joinable
 * there, so one circuit always results when the tour was connected.</li>
 * <li>The circuit is opened at the start node where its costliest transition is, since the start and the
 * final arrival are not turns.</li>
 * </ol>
 * An open route (from the depot to another end) is closed by a virtual traversal from its end back to its
 * start whose transitions cost nothing; the circuit is then opened just after that traversal, so the route
 * keeps its start and its end.
 * The service passes are then moved to the earliest passes that can carry them ({@link EarliestService}). Patching is a heuristic (the least-turn Euler tour is
 * NP-hard in general), so the result is kept only when it has no more U-turns, then no more crossing
 * turns, then no higher turn cost than the input; otherwise the input is returned unchanged.
 * O(sum over nodes of k^3 + k^2 log k) for k traversals through a node, about linear on street networks.
 */
public final class TurnAwareOrder {

    /** Nodes passed at most this many times are paired by trying every permutation. */
    private static final int SMALL = 4;
    /** PERMUTATIONS[k]: every permutation of 0..k-1, identity first, for k up to {@link #SMALL}. */
    private static final int[][][] PERMUTATIONS = IntStream.rangeClosed(0, SMALL)
            .mapToObj(TurnAwareOrder::permutations).toArray(int[][][]::new);

    private TurnAwareOrder() {
    }

    private static int[][] permutations(int k) {
        if (k == 0) {
            return new int[][] {{}};
        }
        List<int[]> all = new ArrayList<>();
        for (int[] shorter : permutations(k - 1)) { // k-1 inserted at every place, from the end
            for (int at = k - 1; at >= 0; at--) {
                int[] p = new int[k];
                System.arraycopy(shorter, 0, p, 0, at);
                p[at] = k - 1;
                System.arraycopy(shorter, at, p, at + 1, k - 1 - at);
                all.add(p);
            }
        }
        return all.toArray(int[][]::new);
    }

    public static Tour of(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
        if (tour.steps() < 3) {
            return tour;
        }
        Transitions transitions = new Transitions(network, bearings, side, tour);
        int[] successor = transitions.assign();
        transitions.patch(successor);
        Tour reordered = transitions.open(successor);
        TurnCounts before = TurnCounts.of(network, bearings, side, tour);
        TurnCounts after = TurnCounts.of(network, bearings, side, reordered);
        return after.worseThan(before) ? tour : reordered;
    }

    /** The traversals of one tour grouped by the node they arrive at and the node they leave. */
    private static final class Transitions {
        private final Tour tour;
        private final EdgeBearings bearings;
        private final TrafficSide side;
        private final int[] arriving;
        private final int[] arrivingStart;
        private final int[] leaving;
        private final int[] leavingStart;
        private final int[] nodes;
        /** For an open route, the index of the virtual traversal from its end back to its start; else -1. */
        private final int closing;

        Transitions(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
            this.tour = tour;
            this.bearings = bearings;
            this.side = side;
            int m = tour.steps();
            int end = tour.end(network);
            this.closing = end == tour.start() ? -1 : m;
            int n = closing < 0 ? m : m + 1;
            int[] exit = new int[n];
            int[] entry = new int[n];
            for (int t = 0; t < m; t++) {
                exit[t] = tour.exit(network, t);
                entry[t] = tour.entry(network, t);
            }
            if (closing >= 0) {
                exit[closing] = tour.start();
                entry[closing] = end;
            }
            int[] index = new int[network.nodeCount()]; // node -> its place in nodes, plus one once seen
            for (int node : exit) {
                index[node] = 1;
            }
            this.nodes = IntStream.range(0, index.length).filter(node -> index[node] > 0).toArray();
            for (int i = 0; i < nodes.length; i++) {
                index[nodes[i]] = i;
            }
            this.arrivingStart = new int[nodes.length + 1];
            this.leavingStart = new int[nodes.length + 1];
            this.arriving = group(exit, index, arrivingStart);
            this.leaving = group(entry, index, leavingStart);
        }

        /** Traversals sorted by node (counting sort, stable), with the start of each node's run. */
        private static int[] group(int[] nodeOf, int[] index, int[] start) {
            for (int node : nodeOf) {
                start[index[node] + 1]++;
            }
            for (int i = 0; i + 1 < start.length; i++) {
                start[i + 1] += start[i];
            }
            int[] fill = Arrays.copyOf(start, start.length);
            int[] grouped = new int[nodeOf.length];
            for (int t = 0; t < nodeOf.length; t++) {
                grouped[fill[index[nodeOf[t]]]++] = t;
            }
            return grouped;
        }

        int count() {
            return closing < 0 ? tour.steps() : tour.steps() + 1;
        }

        double cost(int in, int out) {
            if (in == closing || out == closing) {
                return 0;
            }
            return Turn.between(bearings, side, tour.edges()[in], tour.forward()[in], tour.edges()[out],
                    tour.forward()[out]).cost();
        }

        /** Step 1: the least-cost pairing of incoming with outgoing traversals at each node. */
        int[] assign() {
            int[] successor = new int[count()];
            for (int v = 0; v < nodes.length; v++) {
                int from = arrivingStart[v];
                int k = arrivingStart[v + 1] - from;
                if (leavingStart[v + 1] - leavingStart[v] != k) {
                    throw new IllegalStateException("tour is not closed at node " + nodes[v]);
                }
                if (k == 1) {
                    successor[arriving[from]] = leaving[leavingStart[v]];
                    continue;
                }
                double[][] cost = new double[k][k];
                for (int i = 0; i < k; i++) {
                    for (int j = 0; j < k; j++) {
                        cost[i][j] = cost(arriving[from + i], leaving[leavingStart[v] + j]);
                    }
                }
                int[] pairing = k <= SMALL ? cheapestPermutation(cost) : kuhnMunkres(cost);
                for (int i = 0; i < k; i++) {
                    successor[arriving[from + i]] = leaving[leavingStart[v] + pairing[i]];
                }
            }
            return successor;
        }

        /**
         * The least-cost pairing by trying every permutation: at most 4! = 24 for the few passes through a
         * street junction, where building a graph for Kuhn-Munkres cost more than the whole search (on a
         * million streets it made this stage longer than the solve).
         */
        private static int[] cheapestPermutation(double[][] cost) {
            int k = cost.length;
            int[] best = null;
            double bestCost = Double.POSITIVE_INFINITY;
            for (int[] p : PERMUTATIONS[k]) {
                double c = 0;
                for (int i = 0; i < k; i++) {
                    c += cost[i][p[i]];
                }
                if (c < bestCost) {
                    bestCost = c;
                    best = p;
                }
            }
            return best;
        }

        /** The least-cost pairing by Kuhn-Munkres (JGraphT), O(k^3), for nodes passed more than four times. */
        private static int[] kuhnMunkres(double[][] cost) {
            int k = cost.length;
            Graph<Integer, DefaultWeightedEdge> graph = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
            for (int i = 0; i < 2 * k; i++) {
                graph.addVertex(i);
            }
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    graph.setEdgeWeight(graph.addEdge(i, k + j), cost[i][j]);
                }
            }
            Set<Integer> ins = IntStream.range(0, k).boxed().collect(Collectors.toSet());
            Set<Integer> outs = IntStream.range(k, 2 * k).boxed().collect(Collectors.toSet());
            int[] pairing = new int[k];
            for (DefaultWeightedEdge edge : new KuhnMunkresMinimalWeightBipartitePerfectMatching<>(graph, ins, outs)
                    .getMatching().getEdges()) {
                int a = graph.getEdgeSource(edge);
                int b = graph.getEdgeTarget(edge);
                pairing[Math.min(a, b)] = Math.max(a, b) - k;
            }
            return pairing;
        }

        /** An exchange of successors between two traversals arriving at the same node. */
        private record Exchange(double delta, int a, int b, int stampA, int stampB) implements Comparable<Exchange> {
            @Override
            public int compareTo(Exchange o) {
                int c = Double.compare(delta, o.delta);
                if (c != 0) {
                    return c;
                }
                return a != o.a ? Integer.compare(a, o.a) : Integer.compare(b, o.b);
            }
        }

        /** Step 2: joins the circuits of the pairing into one by the cheapest successor exchanges. */
        void patch(int[] successor) {
            int m = successor.length;
            int[] circuit = new int[m];
            Arrays.fill(circuit, -1);
            int circuits = 0;
            for (int t = 0; t < m; t++) {
                if (circuit[t] < 0) {
                    for (int u = t; circuit[u] < 0; u = successor[u]) {
                        circuit[u] = circuits;
                    }
                    circuits++;
                }
            }
            if (circuits == 1) {
                return;
            }
            int[] parent = IntStream.range(0, circuits).toArray();
            int[] stamp = new int[m];
            PriorityQueue<Exchange> queue = new PriorityQueue<>();
            for (int v = 0; v < nodes.length; v++) {
                for (int i = arrivingStart[v]; i < arrivingStart[v + 1]; i++) {
                    for (int j = i + 1; j < arrivingStart[v + 1]; j++) {
                        int a = arriving[i];
                        int b = arriving[j];
                        if (circuit[a] != circuit[b]) {
                            queue.add(exchange(successor, stamp, a, b));
                        }
                    }
                }
            }
            while (circuits > 1 && !queue.isEmpty()) {
                Exchange x = queue.poll();
                int ra = find(parent, circuit[x.a()]);
                int rb = find(parent, circuit[x.b()]);
                if (ra == rb) {
                    continue;
                }
                if (x.stampA() != stamp[x.a()] || x.stampB() != stamp[x.b()]) {
                    queue.add(exchange(successor, stamp, x.a(), x.b()));
                    continue;
                }
                int swap = successor[x.a()];
                successor[x.a()] = successor[x.b()];
                successor[x.b()] = swap;
                stamp[x.a()]++;
                stamp[x.b()]++;
                parent[ra] = rb;
                circuits--;
            }
            if (circuits > 1) {
                throw new IllegalStateException("tour's traversals do not form one connected walk");
            }
        }

        private Exchange exchange(int[] successor, int[] stamp, int a, int b) {
            double delta = cost(a, successor[b]) + cost(b, successor[a]) - cost(a, successor[a]) - cost(b, successor[b]);
            return new Exchange(delta, a, b, stamp[a], stamp[b]);
        }

        private static int find(int[] parent, int x) {
            while (parent[x] != x) {
                parent[x] = parent[parent[x]];
                x = parent[x];
            }
            return x;
        }

        /** Step 3: the circuit as a tour from the start node, opened at its costliest transition there. */
        Tour open(int[] successor) {
            int n = successor.length;
            int m = tour.steps();
            int[] predecessor = new int[n];
            for (int t = 0; t < n; t++) {
                predecessor[successor[t]] = t;
            }
            int first = closing < 0 ? -1 : successor[closing];
            double worst = Double.NEGATIVE_INFINITY;
            int v = Arrays.binarySearch(nodes, tour.start());
            for (int i = leavingStart[v]; closing < 0 && i < leavingStart[v + 1]; i++) {
                int t = leaving[i];
                double c = cost(predecessor[t], t);
                if (c > worst) {
                    worst = c;
                    first = t;
                }
            }
            int[] edges = new int[m];
            boolean[] forward = new boolean[m];
            boolean[] service = new boolean[m];
            int t = first;
            for (int i = 0; i < m; i++, t = successor[t]) {
                edges[i] = tour.edges()[t];
                forward[i] = tour.forward()[t];
                service[i] = tour.service()[t];
            }
            if (t != (closing < 0 ? first : closing)) {
                throw new IllegalStateException("patched walk is not one circuit");
            }
            return EarliestService.of(new Tour(tour.start(), edges, forward, service));
        }
    }
}
