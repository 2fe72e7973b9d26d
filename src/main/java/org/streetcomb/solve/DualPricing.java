package org.streetcomb.solve;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.IntUnaryOperator;
import java.util.stream.IntStream;
import org.streetcomb.network.MinHeap;
import org.streetcomb.network.StreetNetwork;

/**
 * Prices a perfect matching of odd nodes against <em>all</em> pairs, using its dual solution, without
 * building the complete graph: it finds pairs (u, v) whose reduced cost is negative.
 *
 * <p>For the matching LP with odd-set constraints the reduced cost of a pair is d(u,v) - P(u) - P(v),
 * where P sums u's node dual and the duals of the blossoms that hold u but not v. The blossoms form a
 * laminar family, so pairs are priced level by level: at the top, P(u) = Y(u) (the node dual plus every
 * blossom dual holding u) and the groups are the outermost blossoms and the single nodes; inside a
 * blossom B, z(B) comes off its members' potentials and B's sub-blossoms are the groups. Only pairs in
 * different groups of a level are priced there, so each pair is priced once, at its own level.
 *
 * <p>Each level is one Dijkstra search seeded at every member u with label -P(u), where a seed expands
 * from a node only while its label there is at most 0 (within radius P(u)), so it reaches the first
 * nodes just past that radius too; every network node keeps the two best labels from seeds of distinct
 * groups. If d(u,v) &lt; P(u) + P(v), the two balls overlap on a shortest u-v path, possibly inside one
 * edge; at that edge's far end both labels are present and sum to less than 0, naming a violated pair.
 * (A seed pruned on the way is dominated by two others that reach the same node.) So at least one
 * violated pair is found whenever one exists, and each search only touches the balls, which on street
 * networks are small (a potential is about half a matched path). Blossoms with a zero dual are ignored:
 * they change no reduced cost.
 */
final class DualPricing {

    private final StreetNetwork network;
    private final int[] odd;
    private final int[] stamp;
    private final byte[] settled;
    private final int[] bestGroup;
    private final int[] bestSeed;
    private final double[] bestLabel;
    private final EntryHeap heap = new EntryHeap();
    private int current;

    DualPricing(StreetNetwork network, int[] odd) {
        this.network = network;
        this.odd = odd;
        int n = network.nodeCount();
        this.stamp = new int[n];
        this.settled = new byte[n];
        this.bestGroup = new int[n];
        this.bestSeed = new int[n];
        this.bestLabel = new double[n];
    }

    /**
     * @param potential Y(u) per odd index, metres
     * @param blossoms  blossom member sets (odd indices) with their positive duals, metres
     * @return violated pairs as keys i * T + j of odd indices, i &lt; j, sorted
     */
    long[] violatedPairs(double[] potential, List<Map.Entry<int[], Double>> blossoms) {
        Laminar laminar = new Laminar(blossoms, odd.length);
        double scale = Arrays.stream(potential).map(Math::abs).max().orElse(0);
        double tolerance = 1e-5 + 1e-9 * scale;
        double[] p = potential.clone();
        TreeSet<Long> found = new TreeSet<>();
        ArrayDeque<Integer> levels = new ArrayDeque<>();
        levels.add(-1);
        int[] all = IntStream.range(0, odd.length).toArray();
        while (!levels.isEmpty()) {
            int blossom = levels.poll();
            int[] members = blossom < 0 ? all : laminar.members(blossom);
            if (blossom >= 0) {
                for (int u : members) {
                    p[u] -= laminar.value(blossom);
                }
            }
            int depth = blossom < 0 ? 0 : laminar.depth(blossom) + 1;
            search(members, p, u -> laminar.groupAt(u, depth), tolerance, found);
            levels.addAll(laminar.children(blossom));
        }
        return found.stream().mapToLong(Long::longValue).toArray();
    }

    private void search(int[] members, double[] p, IntUnaryOperator group, double tolerance, Set<Long> found) {
        current++;
        heap.clear();
        for (int u : members) {
            heap.push(-p[u], odd[u], u);
        }
        while (!heap.isEmpty()) {
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
            } else if (bestLabel[v] + label < -tolerance) {
                int i = Math.min(bestSeed[v], seed);
                int j = Math.max(bestSeed[v], seed);
                found.add((long) i * odd.length + j);
            }
            settled[v]++;
            if (label > 0) {
                continue;
            }
            for (int a = network.incidenceStart(v); a < network.incidenceEnd(v); a++) {
                int e = network.incidentEdge(a);
                int w = network.other(e, v);
                if (stamp[w] != current || settled[w] < 2) {
                    heap.push(label + network.length(e), w, seed);
                }
            }
        }
    }

    /** The blossoms as a tree: for each odd node, the blossoms holding it, outermost first. */
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

    /** A heap of (label, node, seed) entries. */
    private static final class EntryHeap {
        private final MinHeap heap = new MinHeap();
        private int[] nodes = new int[1024];
        private int[] seeds = new int[1024];
        private int size;

        void clear() {
            heap.clear();
            size = 0;
        }

        void push(double key, int node, int seed) {
            if (size == nodes.length) {
                nodes = Arrays.copyOf(nodes, 2 * size);
                seeds = Arrays.copyOf(seeds, 2 * size);
            }
            nodes[size] = node;
            seeds[size] = seed;
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
            return seeds[heap.peekValue()];
        }

        void pop() {
            heap.pop();
        }
    }
}
