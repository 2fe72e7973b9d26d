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
 * <em>priced</em> against the complete graph with the matching's dual solution, as in column generation:
 * any pair whose reduced cost is negative is added as a candidate and the matching is solved again.
 * When no such pair is left, the dual is feasible for the complete graph and equals the primal cost, so
 * the matching is optimal there: the result is exact, not a heuristic. Pricing every pair costs a few
 * multi-source Dijkstra searches, O(E log E) each, rather than T searches (see {@link #price}). On street
 * networks a handful of rounds suffice; the candidate set only grows, so the loop ends.
 *
 * <p>Distances are passed to Blossom V in kilometres: it is known to misbehave on badly scaled inputs and
 * treats costs above 1e10 as forbidden.
 */
public final class OddVertexMatching {

    /**
     * @param pairs          matched network nodes: pairs[2i] with pairs[2i+1]
     * @param cost           total shortest-path distance of the pairs, metres
     * @param rounds         Blossom V runs
     * @param candidateEdges edges in the last candidate graph
     */
    public record Result(int[] pairs, double cost, int rounds, int candidateEdges) {
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
            return new Result(new int[0], 0, 0, 0);
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
            } else if (price(solution) == 0) {
                return new Result(solution.pairs, solution.cost, rounds, candidates.size());
            }
        }
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

    /** A matching with its dual: potential[u] = Y(u), the node dual plus all blossom duals holding u. */
    private record Solution(int[] pairs, double cost, double[] potential, List<Map.Entry<int[], Double>> blossoms) {
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
        List<Map.Entry<int[], Double>> blossoms = new ArrayList<>();
        for (Map.Entry<Set<Integer>, Double> dual : blossom.getDualSolution().getDualVariables().entrySet()) {
            double value = dual.getValue() * 1000.0;
            int[] members = dual.getKey().stream().mapToInt(Integer::intValue).sorted().toArray();
            for (int i : members) {
                potential[i] += value;
            }
            if (members.length > 1) {
                blossoms.add(Map.entry(members, value));
            }
        }
        return new Solution(pairs, cost, potential, blossoms);
    }

    /**
     * Adds every non-candidate pair with negative reduced cost as a candidate, and returns how many.
     *
     * <p>For a laminar family of blossoms the reduced cost of a pair is d(u,v) - P(u) - P(v), where P sums
     * the node dual and the duals of the blossoms that contain one of the pair but not the other. This is
     * checked level by level: at the top, P(u) = Y(u) and pairs in different top-level groups (blossom or
     * single node) are priced by one search that keeps, at every network node, the two best labels from
     * seeds of distinct groups. Inside each blossom B the same is repeated for its members, with z(B)
     * taken off their potentials and B's own sub-blossoms as the groups. A search stops once its labels
     * exceed every member's potential, so the inner searches stay local.
     */
    private int price(Solution solution) {
        Laminar laminar = new Laminar(solution.blossoms, odd.length);
        GroupSearch search = new GroupSearch();
        int added = 0;
        java.util.ArrayDeque<int[]> levels = new java.util.ArrayDeque<>();
        int[] all = IntStream.range(0, odd.length).toArray();
        levels.add(new int[] {-1});
        double[] potential = solution.potential.clone();
        while (!levels.isEmpty()) {
            int blossom = levels.poll()[0];
            int[] members = blossom < 0 ? all : laminar.members(blossom);
            if (blossom >= 0) {
                for (int u : members) {
                    potential[u] -= laminar.value(blossom);
                }
            }
            int depth = blossom < 0 ? 0 : laminar.depth(blossom) + 1;
            added += search.run(members, potential, u -> laminar.groupAt(u, depth));
            for (int child : laminar.children(blossom)) {
                levels.add(new int[] {child});
            }
        }
        return added;
    }

    /** The blossoms of a dual solution as a tree: for each odd node, the blossoms holding it, outermost first. */
    private static final class Laminar {
        private final List<int[]> members = new ArrayList<>();
        private final List<Double> values = new ArrayList<>();
        private final List<Integer> depths = new ArrayList<>();
        private final List<List<Integer>> children = new ArrayList<>();
        private final List<Integer> roots = new ArrayList<>();
        private final int[][] chain;

        Laminar(List<Map.Entry<int[], Double>> blossoms, int oddCount) {
            List<Map.Entry<int[], Double>> sorted = new ArrayList<>(blossoms);
            sorted.sort((a, b) -> Integer.compare(b.getKey().length, a.getKey().length));
            List<List<Integer>> chains = new ArrayList<>();
            for (int u = 0; u < oddCount; u++) {
                chains.add(new ArrayList<>());
            }
            for (Map.Entry<int[], Double> entry : sorted) {
                int id = members.size();
                int[] set = entry.getKey();
                List<Integer> outer = chains.get(set[0]);
                int parent = outer.isEmpty() ? -1 : outer.get(outer.size() - 1);
                members.add(set);
                values.add(entry.getValue());
                depths.add(parent < 0 ? 0 : depths.get(parent) + 1);
                children.add(new ArrayList<>());
                (parent < 0 ? roots : children.get(parent)).add(id);
                for (int u : set) {
                    chains.get(u).add(id);
                }
            }
            chain = new int[oddCount][];
            for (int u = 0; u < oddCount; u++) {
                chain[u] = chains.get(u).stream().mapToInt(Integer::intValue).toArray();
            }
        }

        int[] members(int blossom) {
            return members.get(blossom);
        }

        double value(int blossom) {
            return values.get(blossom);
        }

        int depth(int blossom) {
            return depths.get(blossom);
        }

        List<Integer> children(int blossom) {
            return blossom < 0 ? roots : children.get(blossom);
        }

        /** The group of u among the members of a blossom at {@code depth}: a sub-blossom, or u alone. */
        int groupAt(int u, int depth) {
            return depth < chain[u].length ? -1 - chain[u][depth] : u;
        }
    }

    /**
     * A Dijkstra search seeded at odd nodes with labels -P(u) that keeps, at every network node, the two
     * best labels from seeds of distinct groups; then, for every seed v, the best label from another group
     * is min over u of d(u,v) - P(u), to be compared with P(v). Arrays are reset by stamp, not refilled.
     */
    private final class GroupSearch {
        private final int[] stamp = new int[network.nodeCount()];
        private final int[] bestGroup = new int[network.nodeCount()];
        private final int[] bestSeed = new int[network.nodeCount()];
        private final double[] bestLabel = new double[network.nodeCount()];
        private final int[] secondGroup = new int[network.nodeCount()];
        private final int[] secondSeed = new int[network.nodeCount()];
        private final double[] secondLabel = new double[network.nodeCount()];
        private final byte[] settled = new byte[network.nodeCount()];
        private int current;

        int run(int[] members, double[] potential, java.util.function.IntUnaryOperator group) {
            current++;
            EntryHeap heap = new EntryHeap();
            double ceiling = Double.NEGATIVE_INFINITY;
            for (int u : members) {
                heap.push(-potential[u], odd[u], u);
                ceiling = Math.max(ceiling, potential[u]);
            }
            ceiling += tolerance(ceiling);
            while (!heap.isEmpty() && heap.key() <= ceiling) {
                double label = heap.key();
                int v = heap.node();
                int seed = heap.source();
                heap.pop();
                if (stamp[v] != current) {
                    stamp[v] = current;
                    settled[v] = 0;
                }
                int g = group.applyAsInt(seed);
                if (settled[v] == 2 || (settled[v] == 1 && bestGroup[v] == g)) {
                    continue;
                }
                if (settled[v] == 0) {
                    bestGroup[v] = g;
                    bestSeed[v] = seed;
                    bestLabel[v] = label;
                } else {
                    secondGroup[v] = g;
                    secondSeed[v] = seed;
                    secondLabel[v] = label;
                }
                settled[v]++;
                for (int a = network.incidenceStart(v); a < network.incidenceEnd(v); a++) {
                    int e = network.incidentEdge(a);
                    int w = network.other(e, v);
                    if (stamp[w] != current || settled[w] < 2) {
                        heap.push(label + network.length(e), w, seed);
                    }
                }
            }
            int added = 0;
            for (int j : members) {
                int v = odd[j];
                if (stamp[v] != current) {
                    continue;
                }
                int g = group.applyAsInt(j);
                int seed;
                double label;
                if (settled[v] >= 1 && bestGroup[v] != g) {
                    seed = bestSeed[v];
                    label = bestLabel[v];
                } else if (settled[v] == 2) {
                    seed = secondSeed[v];
                    label = secondLabel[v];
                } else {
                    continue;
                }
                if (label - potential[j] < -tolerance(potential[j])) {
                    long key = key(seed, j);
                    if (candidates.putIfAbsent(key, label + potential[seed]) == null) {
                        added++;
                    }
                }
            }
            return added;
        }
    }

    private static double tolerance(double potential) {
        return 1e-5 + 1e-9 * Math.abs(potential);
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
