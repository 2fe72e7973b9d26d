package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.IntStream;
import org.jgrapht.Graph;
import org.jgrapht.alg.interfaces.MatchingAlgorithm;
import org.jgrapht.alg.matching.blossom.v5.KolmogorovWeightedPerfectMatching;
import org.jgrapht.alg.matching.blossom.v5.ObjectiveSense;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.MinHeap;
import org.streetcomb.network.StreetNetwork;

/**
 * Minimum-cost pairing of odd-degree nodes by shortest-path distance: the matching step of Edmonds &amp;
 * Johnson's exact method for the undirected postman ("Matching, Euler tours and the Chinese postman",
 * Math. Programming 5, 1973).
 *
 * <p>The textbook form matches over the complete graph of all odd nodes, which needs one shortest-path
 * search per node and T(T-1)/2 edges: hopeless past a few thousand odd nodes. Here the matching runs on a
 * sparse candidate graph (each odd node joined to its k nearest odd nodes by network distance) with
 * Kolmogorov's Blossom V (JGraphT's {@link KolmogorovWeightedPerfectMatching}), and the result is then
 * <em>priced</em> against the complete graph with the matching's dual solution. Writing Y(u) for the
 * node dual of u plus the duals of all blossoms that contain u, the dual is feasible for the complete
 * graph if d(u,v) &ge; Y(u) + Y(v) for every pair (blossom duals are non-negative, so this bounds the
 * exact constraint from above). One Dijkstra search seeded at every odd node s with label -Y(s), keeping
 * the two best labels from distinct seeds at each node, finds for every odd v the smallest
 * d(s,v) - Y(s) over s &ne; v in O(E log E). Violated pairs are added as candidates and the matching is
 * solved again; when none are left, primal and dual agree on the complete graph and the matching is
 * optimal there. A violation on a pair that is already a candidate can only come from a blossom dual;
 * the conservative test then cannot certify, and the matching is solved on the complete graph when that
 * is small enough, else returned with {@link Result#certified()} false.
 *
 * <p>Distances are passed to Blossom V in kilometres: it is known to misbehave on badly scaled inputs and
 * treats costs above 1e10 as forbidden.
 */
public final class OddVertexMatching {

    /** Odd-node counts up to this are solved on the complete graph when pricing cannot certify. */
    static final int COMPLETE_GRAPH_LIMIT = 1500;

    /**
     * @param pairs          matched network nodes: pairs[2i] with pairs[2i+1]
     * @param cost           total shortest-path distance of the pairs, metres
     * @param certified      whether optimality over the complete graph was proved
     * @param rounds         Blossom V runs
     * @param candidateEdges edges in the last candidate graph
     */
    public record Result(int[] pairs, double cost, boolean certified, int rounds, int candidateEdges) {
    }

    private final StreetNetwork network;
    private final int[] odd;
    private final int[] oddIndex;
    /** Candidate pairs keyed by i * T + j (i &lt; j, indices into {@link #odd}), value metres. */
    private final Map<Long, Double> candidates = new HashMap<>();

    private OddVertexMatching(StreetNetwork network, int[] odd) {
        this.network = network;
        this.odd = odd;
        this.oddIndex = new int[network.nodeCount()];
        Arrays.fill(oddIndex, -1);
        for (int i = 0; i < odd.length; i++) {
            oddIndex[odd[i]] = i;
        }
    }

    /**
     * @param odd        the odd-degree nodes, an even number in every connected component
     * @param neighbours candidate partners per odd node to start with
     */
    public static Result solve(StreetNetwork network, int[] odd, int neighbours) {
        if (odd.length == 0) {
            return new Result(new int[0], 0, true, 0, 0);
        }
        return new OddVertexMatching(network, odd).run(neighbours);
    }

    private Result run(int neighbours) {
        int k = Math.max(1, neighbours);
        addNearest(k);
        int rounds = 0;
        while (true) {
            Solution solution = blossom();
            rounds++;
            if (solution == null) {
                // the candidate graph has no perfect matching: widen it
                k *= 2;
                addNearest(k);
                continue;
            }
            Pricing pricing = price(solution.potential);
            if (pricing.added > 0) {
                continue;
            }
            if (pricing.blossomAlarms == 0) {
                return result(solution, true, rounds);
            }
            if (odd.length <= COMPLETE_GRAPH_LIMIT && k < odd.length - 1) {
                k = odd.length - 1;
                addNearest(k);
                continue;
            }
            return result(solution, k >= odd.length - 1, rounds);
        }
    }

    private Result result(Solution solution, boolean certified, int rounds) {
        return new Result(solution.pairs, solution.cost, certified, rounds, candidates.size());
    }

    /** Adds, for every odd node, its k nearest odd nodes by network distance as candidate partners. */
    private void addNearest(int k) {
        ThreadLocal<DijkstraSearch> searches = ThreadLocal.withInitial(() -> new DijkstraSearch(network));
        long[][] found = new long[odd.length][];
        double[][] distances = new double[odd.length][];
        IntStream.range(0, odd.length).parallel().forEach(i -> {
            DijkstraSearch search = searches.get();
            search.start(odd[i]);
            long[] keys = new long[k];
            double[] dist = new double[k];
            int count = 0;
            for (int v = search.next(); v >= 0 && count < k; v = search.next()) {
                int j = oddIndex[v];
                if (j >= 0 && j != i) {
                    keys[count] = key(i, j);
                    dist[count++] = search.distance(v);
                }
            }
            found[i] = Arrays.copyOf(keys, count);
            distances[i] = Arrays.copyOf(dist, count);
        });
        for (int i = 0; i < odd.length; i++) {
            for (int c = 0; c < found[i].length; c++) {
                candidates.putIfAbsent(found[i][c], distances[i][c]);
            }
        }
    }

    private long key(int i, int j) {
        return i < j ? (long) i * odd.length + j : (long) j * odd.length + i;
    }

    private record Solution(int[] pairs, double cost, double[] potential) {
    }

    /** Blossom V on the candidate graph; null when it has no perfect matching. */
    private Solution blossom() {
        Graph<Integer, DefaultWeightedEdge> graph = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
        for (int i = 0; i < odd.length; i++) {
            graph.addVertex(i);
        }
        long[] keys = candidates.keySet().stream().mapToLong(Long::longValue).sorted().toArray();
        for (long key : keys) {
            DefaultWeightedEdge edge = graph.addEdge((int) (key / odd.length), (int) (key % odd.length));
            graph.setEdgeWeight(edge, candidates.get(key) / 1000.0);
        }
        KolmogorovWeightedPerfectMatching<Integer, DefaultWeightedEdge> blossom =
                new KolmogorovWeightedPerfectMatching<>(graph, ObjectiveSense.MINIMIZE);
        MatchingAlgorithm.Matching<Integer, DefaultWeightedEdge> matching;
        try {
            matching = blossom.getMatching();
        } catch (IllegalArgumentException noPerfectMatching) {
            return null;
        }
        int[] pairs = new int[odd.length];
        int p = 0;
        double cost = 0;
        List<DefaultWeightedEdge> edges = new ArrayList<>(matching.getEdges());
        edges.sort((a, b) -> Integer.compare(Math.min(graph.getEdgeSource(a), graph.getEdgeTarget(a)),
                Math.min(graph.getEdgeSource(b), graph.getEdgeTarget(b))));
        for (DefaultWeightedEdge edge : edges) {
            int i = graph.getEdgeSource(edge);
            int j = graph.getEdgeTarget(edge);
            pairs[p++] = odd[i];
            pairs[p++] = odd[j];
            cost += candidates.get(key(i, j));
        }
        double[] potential = new double[odd.length];
        for (Map.Entry<Set<Integer>, Double> dual : blossom.getDualSolution().getDualVariables().entrySet()) {
            for (int i : dual.getKey()) {
                potential[i] += dual.getValue() * 1000.0;
            }
        }
        return new Solution(pairs, cost, potential);
    }

    private record Pricing(int added, int blossomAlarms) {
    }

    /** Finds pairs whose reduced cost d(u,v) - Y(u) - Y(v) is negative and adds them as candidates. */
    private Pricing price(double[] potential) {
        int n = network.nodeCount();
        int[] bestSource = new int[n];
        int[] secondSource = new int[n];
        double[] bestLabel = new double[n];
        double[] secondLabel = new double[n];
        byte[] settledCount = new byte[n];
        Arrays.fill(bestSource, -1);
        Arrays.fill(secondSource, -1);
        EntryHeap heap = new EntryHeap();
        for (int i = 0; i < odd.length; i++) {
            heap.push(-potential[i], odd[i], i);
        }
        while (!heap.isEmpty()) {
            double label = heap.key();
            int v = heap.node();
            int s = heap.source();
            heap.pop();
            if (settledCount[v] == 2 || (settledCount[v] == 1 && bestSource[v] == s)) {
                continue;
            }
            if (settledCount[v] == 0) {
                bestSource[v] = s;
                bestLabel[v] = label;
            } else {
                secondSource[v] = s;
                secondLabel[v] = label;
            }
            settledCount[v]++;
            for (int a = network.incidenceStart(v); a < network.incidenceEnd(v); a++) {
                int e = network.incidentEdge(a);
                int w = network.other(e, v);
                if (settledCount[w] < 2) {
                    heap.push(label + network.length(e), w, s);
                }
            }
        }
        int added = 0, alarms = 0;
        for (int j = 0; j < odd.length; j++) {
            int v = odd[j];
            boolean bestIsSelf = bestSource[v] == j;
            int s = bestIsSelf ? secondSource[v] : bestSource[v];
            if (s < 0) {
                continue;
            }
            double label = bestIsSelf ? secondLabel[v] : bestLabel[v];
            double tolerance = 1e-6 + 1e-9 * Math.abs(potential[j]);
            if (label - potential[j] < -tolerance) {
                long key = key(s, j);
                if (candidates.containsKey(key)) {
                    alarms++;
                } else {
                    candidates.put(key, label + potential[s]);
                    added++;
                }
            }
        }
        return new Pricing(added, alarms);
    }

    /** A heap of (label, node, source) entries for the two-best-seeds search. */
    private static final class EntryHeap {
        private final MinHeap heap = new MinHeap();
        private int[] nodes = new int[1024];
        private int[] sources = new int[1024];
        private int size;

        void push(double key, int node, int source) {
            if (size == nodes.length) {
                nodes = Arrays.copyOf(nodes, 2 * size);
                sources = Arrays.copyOf(sources, 2 * size);
            }
            nodes[size] = node;
            sources[size] = source;
            heap.push(key, size++);
        }

        boolean isEmpty() {
            return heap.isEmpty();
        }

        double key() {
            return heap.peekKey();
        }

        int node() {
            return nodes[heap.peekValue()];
        }

        int source() {
            return sources[heap.peekValue()];
        }

        void pop() {
            heap.pop();
        }
    }
}
