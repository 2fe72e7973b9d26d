package org.streetcomb.solve;

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
 * <p>The top level is one Dijkstra search seeded at every odd node u with label -Y(u); a seed expands from
 * a node only while its label there is at most 0 (within radius Y(u)), so it reaches the first nodes just
 * past that radius too, and every network node keeps the two best labels from seeds of distinct groups.
 * If d(u,v) &lt; Y(u) + Y(v), the two balls overlap on a shortest u-v path, possibly inside one edge; at
 * that edge's far end both labels are present and sum to less than 0, naming a violated pair. (A seed
 * pruned on the way is dominated by two others that reach the same node.) On street networks the balls
 * are small: a potential is about half a matched path.
 *
 * <p>Inside a blossom the search starts only from the members outside its largest group and runs up to
 * the largest member potential, and each member reached compares its best label from another group with
 * its own potential. Blossoms on street grids come as long nested chains, each a couple of nodes larger
 * than the next; seeding the whole blossom at every level would cost O(T x depth), while a node is
 * outside the largest group only O(log T) times. Blossoms with a zero dual are left out: they change no
 * reduced cost. Either way at least one violated pair per level is found whenever one exists.
 */
final class DualPricing {

    private final StreetNetwork network;
    private final int[] odd;
    private final int[] stamp;
    private final byte[] settled;
    private final int[] bestGroup;
    private final int[] bestSeed;
    private final double[] bestLabel;
    private final int[] secondSeed;
    private final double[] secondLabel;
    private final int[] oddIndex;
    private final IntList touched = new IntList();
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
        this.secondSeed = new int[n];
        this.secondLabel = new double[n];
        this.oddIndex = new int[n];
        Arrays.fill(oddIndex, -1);
        for (int i = 0; i < odd.length; i++) {
            oddIndex[odd[i]] = i;
        }
    }

    /**
     * @param potential Y(u) per odd index, metres
     * @param blossoms  blossom member sets (odd indices) with their positive duals, metres
     * @return violated pairs as keys i * T + j of odd indices, i &lt; j, sorted
     */
    long[] violatedPairs(double[] potential, List<Map.Entry<int[], Double>> blossoms) {
        Laminar laminar = new Laminar(blossoms, odd.length, potential);
        double scale = Arrays.stream(potential).map(Math::abs).max().orElse(0);
        double tolerance = 1e-5 + 1e-9 * scale;
        TreeSet<Long> found = new TreeSet<>();
        meetHalfway(potential, u -> laminar.groupAt(u, 0), tolerance, found);
        for (int b = 0; b < laminar.count(); b++) {
            reachOut(laminar, b, potential, tolerance, found);
        }
        return found.stream().mapToLong(Long::longValue).toArray();
    }

    /** Top level: every odd node grows a ball of radius Y(u); overlapping balls of two groups are a violation. */
    private void meetHalfway(double[] p, IntUnaryOperator group, double tolerance, Set<Long> found) {
        current++;
        heap.clear();
        for (int u = 0; u < odd.length; u++) {
            heap.push(-p[u], odd[u], u);
        }
        while (!heap.isEmpty()) {
            double label = heap.key();
            int v = heap.node();
            int seed = heap.source();
            heap.pop();
            int before = settled(v);
            if (!settle(v, seed, label, group.applyAsInt(seed))) {
                continue;
            }
            if (before == 1 && bestLabel[v] + label < -tolerance) {
                found.add(key(bestSeed[v], seed));
            }
            if (label <= 0) {
                relax(v, seed, label, Double.POSITIVE_INFINITY);
            }
        }
    }

    /**
     * Inside blossom b, with P(u) = Y(u) minus the duals of b and its ancestors: searches from the members
     * outside b's largest group (so nested chains cost little) up to the largest member potential, and
     * compares at every reached member v the best label from another group with P(v).
     */
    private void reachOut(Laminar laminar, int b, double[] y, double tolerance, Set<Long> found) {
        double strip = laminar.cumulative(b);
        int depth = laminar.depth(b) + 1;
        IntUnaryOperator group = u -> laminar.groupAt(u, depth);
        double ceiling = laminar.maxPotential(b) - strip + tolerance;
        current++;
        heap.clear();
        touched.clear();
        for (int u : laminar.seedsOutsideLargestGroup(b)) {
            heap.push(strip - y[u], odd[u], u);
        }
        while (!heap.isEmpty() && heap.key() <= ceiling) {
            double label = heap.key();
            int v = heap.node();
            int seed = heap.source();
            heap.pop();
            if (settled(v) == 0) {
                touched.add(v);
            }
            if (settle(v, seed, label, group.applyAsInt(seed))) {
                relax(v, seed, label, ceiling);
            }
        }
        for (int t = 0; t < touched.size(); t++) {
            int v = touched.get(t);
            int j = oddIndex[v];
            if (j < 0 || !laminar.holds(b, j)) {
                continue;
            }
            int g = group.applyAsInt(j);
            boolean useBest = bestGroup[v] != g;
            if (!useBest && settled[v] < 2) {
                continue;
            }
            double label = useBest ? bestLabel[v] : secondLabel[v];
            if (label < y[j] - strip - tolerance) {
                found.add(key(useBest ? bestSeed[v] : secondSeed[v], j));
            }
        }
    }

    private int settled(int v) {
        if (stamp[v] != current) {
            stamp[v] = current;
            settled[v] = 0;
        }
        return settled[v];
    }

    /** Keeps the label if it is among the two best from distinct groups at v; false if it is not. */
    private boolean settle(int v, int seed, double label, int group) {
        if (settled(v) == 2 || (settled[v] == 1 && bestGroup[v] == group)) {
            return false;
        }
        if (settled[v] == 0) {
            bestGroup[v] = group;
            bestSeed[v] = seed;
            bestLabel[v] = label;
        } else {
            secondSeed[v] = seed;
            secondLabel[v] = label;
        }
        settled[v]++;
        return true;
    }

    private void relax(int v, int seed, double label, double ceiling) {
        for (int a = network.incidenceStart(v); a < network.incidenceEnd(v); a++) {
            int e = network.incidentEdge(a);
            int w = network.other(e, v);
            double next = label + network.length(e);
            if (next <= ceiling && (stamp[w] != current || settled[w] < 2)) {
                heap.push(next, w, seed);
            }
        }
    }

    private long key(int i, int j) {
        return i < j ? (long) i * odd.length + j : (long) j * odd.length + i;
    }

    /**
     * The blossoms as a tree, numbered outermost first: for each odd node the blossoms holding it, for
     * each blossom its children, the nodes directly inside it, its cumulative dual (its own plus its
     * ancestors') and its members' largest Y.
     */
    private static final class Laminar {
        private final List<int[]> members = new ArrayList<>();
        private final List<Integer> depths = new ArrayList<>();
        private final List<List<Integer>> children = new ArrayList<>();
        private final List<List<Integer>> singles = new ArrayList<>();
        private final double[] cumulative;
        private final double[] maxPotential;
        private final int[][] chain;

        Laminar(List<Map.Entry<int[], Double>> blossoms, int oddCount, double[] y) {
            List<Map.Entry<int[], Double>> sorted = new ArrayList<>(blossoms);
            sorted.sort((a, b) -> Integer.compare(b.getKey().length, a.getKey().length));
            cumulative = new double[sorted.size()];
            maxPotential = new double[sorted.size()];
            List<List<Integer>> chains = new ArrayList<>();
            for (int u = 0; u < oddCount; u++) {
                chains.add(new ArrayList<>());
            }
            int[] parents = new int[sorted.size()];
            for (Map.Entry<int[], Double> entry : sorted) {
                int id = members.size();
                int[] set = entry.getKey();
                List<Integer> outer = chains.get(set[0]);
                int parent = outer.isEmpty() ? -1 : outer.get(outer.size() - 1);
                parents[id] = parent;
                members.add(set);
                depths.add(parent < 0 ? 0 : depths.get(parent) + 1);
                cumulative[id] = entry.getValue() + (parent < 0 ? 0 : cumulative[parent]);
                children.add(new ArrayList<>());
                singles.add(new ArrayList<>());
                if (parent >= 0) {
                    children.get(parent).add(id);
                }
                for (int u : set) {
                    chains.get(u).add(id);
                }
            }
            chain = new int[oddCount][];
            Arrays.fill(maxPotential, Double.NEGATIVE_INFINITY);
            for (int u = 0; u < oddCount; u++) {
                chain[u] = chains.get(u).stream().mapToInt(Integer::intValue).toArray();
                if (chain[u].length > 0) {
                    int innermost = chain[u][chain[u].length - 1];
                    singles.get(innermost).add(u);
                    maxPotential[innermost] = Math.max(maxPotential[innermost], y[u]);
                }
            }
            // children come after their parents, so one backward pass carries maxima outwards
            for (int b = sorted.size() - 1; b >= 0; b--) {
                if (parents[b] >= 0) {
                    maxPotential[parents[b]] = Math.max(maxPotential[parents[b]], maxPotential[b]);
                }
            }
        }

        int count() {
            return members.size();
        }

        int depth(int blossom) {
            return depths.get(blossom);
        }

        double cumulative(int blossom) {
            return cumulative[blossom];
        }

        double maxPotential(int blossom) {
            return maxPotential[blossom];
        }

        boolean holds(int blossom, int u) {
            int d = depths.get(blossom);
            return chain[u].length > d && chain[u][d] == blossom;
        }

        /** The group of u among the members of a blossom at {@code depth}: a sub-blossom, or u alone. */
        int groupAt(int u, int depth) {
            return depth < chain[u].length ? -1 - chain[u][depth] : u;
        }

        /**
         * The blossom's members outside its largest group. Every pair of distinct groups keeps a seed at
         * one end; a node is a seed only where its group is not the largest, so over a whole chain of
         * nested blossoms each node is seeded O(log T) times.
         */
        int[] seedsOutsideLargestGroup(int blossom) {
            int largest = -1;
            for (int child : children.get(blossom)) {
                if (largest < 0 || members.get(child).length > members.get(largest).length) {
                    largest = child;
                }
            }
            List<Integer> single = singles.get(blossom);
            IntStream seeds = single.stream().mapToInt(Integer::intValue).skip(largest < 0 ? 1 : 0);
            for (int child : children.get(blossom)) {
                if (child != largest) {
                    seeds = IntStream.concat(seeds, IntStream.of(members.get(child)));
                }
            }
            return seeds.toArray();
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

    /** A growable list of ints. */
    private static final class IntList {
        private int[] values = new int[256];
        private int size;

        void add(int value) {
            if (size == values.length) {
                values = Arrays.copyOf(values, 2 * size);
            }
            values[size++] = value;
        }

        int get(int i) {
            return values[i];
        }

        int size() {
            return size;
        }

        void clear() {
            size = 0;
        }
    }
}
