package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.IntStream;
import org.jgrapht.alg.interfaces.MatchingAlgorithm;
import org.jgrapht.alg.matching.blossom.v5.KolmogorovWeightedPerfectMatching;
import org.jgrapht.alg.matching.blossom.v5.ObjectiveSense;
import org.streetcomb.network.DijkstraSearch;
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
 * the matching is optimal there: the result is exact, not a heuristic. Pricing all pairs takes local
 * multi-source searches rather than T full ones ({@link DualPricing}). On street networks two to five
 * rounds suffice; the candidate set only grows, so the loop ends. Blossom V gets the candidates as a
 * primitive read-only graph ({@link CandidateGraph}) and they are kept in a primitive map
 * ({@link PairDistances}). Re-solving only a region around the violated pairs was tried and rejected: the
 * region's own optimal dual lifts the potentials at its border, and the violations grew round after round.
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
    private final PairDistances candidates = new PairDistances();
    private final DualPricing pricing;

    private OddVertexMatching(StreetNetwork network, int[] odd) {
        this.network = network;
        this.odd = odd;
        this.pricing = new DualPricing(network, odd);
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
                continue;
            }
            long[] violated = pricing.violatedPairs(solution.potential, solution.blossoms);
            if (addPairs(violated) == 0) {
                // no pair prices below zero, or only pairs already solved over (within rounding)
                return new Result(solution.pairs(odd), solution.cost, rounds, candidates.size());
            }
        }
    }

    /** Adds the pairs the pricing found, with their exact distance (one search per pair, on every core). */
    private int addPairs(long[] pairs) {
        ThreadLocal<DijkstraSearch> searches = ThreadLocal.withInitial(() -> new DijkstraSearch(network));
        double[] distance = new double[pairs.length];
        IntStream.range(0, pairs.length).parallel().forEach(p -> {
            DijkstraSearch search = searches.get();
            search.start(odd[(int) (pairs[p] / odd.length)]);
            distance[p] = search.runTo(odd[(int) (pairs[p] % odd.length)]);
        });
        int added = 0;
        for (int p = 0; p < pairs.length; p++) {
            if (candidates.putIfAbsent(pairs[p], distance[p])) {
                added++;
            }
        }
        return added;
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

    /**
     * A matching with its dual: mate per odd index; potential[u] = Y(u), the node dual plus all blossom duals
     * holding u; the blossoms with a positive dual (member odd indices, dual in metres); the cost in metres.
     */
    private record Solution(int[] mate, double cost, double[] potential, List<Map.Entry<int[], Double>> blossoms) {

        int[] pairs(int[] odd) {
            int[] pairs = new int[mate.length];
            int p = 0;
            for (int i = 0; i < mate.length; i++) {
                if (i < mate[i]) {
                    pairs[p++] = odd[i];
                    pairs[p++] = odd[mate[i]];
                }
            }
            return pairs;
        }
    }

    /** Blossom V on the candidate graph, with its dual; null when it has no perfect matching. */
    private Solution blossom() {
        long[] keys = candidates.sortedKeys();
        int[] source = new int[keys.length];
        int[] target = new int[keys.length];
        double[] metres = new double[keys.length];
        double[] kilometres = new double[keys.length];
        for (int e = 0; e < keys.length; e++) {
            source[e] = (int) (keys[e] / odd.length);
            target[e] = (int) (keys[e] % odd.length);
            metres[e] = candidates.get(keys[e]);
            kilometres[e] = metres[e] / 1000.0;
        }
        CandidateGraph graph = new CandidateGraph(odd.length, source, target, kilometres);
        KolmogorovWeightedPerfectMatching<Integer, Integer> blossom =
                new KolmogorovWeightedPerfectMatching<>(graph, ObjectiveSense.MINIMIZE);
        MatchingAlgorithm.Matching<Integer, Integer> matching;
        try {
            matching = blossom.getMatching();
        } catch (IllegalArgumentException noPerfectMatching) {
            return null;
        }
        int[] mate = new int[odd.length];
        double cost = 0;
        for (int e : matching.getEdges()) {
            mate[source[e]] = target[e];
            mate[target[e]] = source[e];
            cost += metres[e];
        }
        double[] potential = new double[odd.length];
        List<Map.Entry<int[], Double>> blossoms = new ArrayList<>();
        for (Map.Entry<Set<Integer>, Double> dual : blossom.getDualSolution().getDualVariables().entrySet()) {
            double value = dual.getValue() * 1000.0;
            int[] members = dual.getKey().stream().mapToInt(Integer::intValue).sorted().toArray();
            for (int i : members) {
                potential[i] += value;
            }
            if (members.length > 1 && value > 0) {
                // a blossom with a zero dual changes no reduced cost, so pricing need not descend into it
                blossoms.add(Map.entry(members, value));
            }
        }
        blossoms.sort(BLOSSOM_ORDER);
        return new Solution(mate, cost, potential, blossoms);
    }

    /** Blossoms by their smallest member, larger first: an order that does not depend on hashing. */
    private static final Comparator<Map.Entry<int[], Double>> BLOSSOM_ORDER = Comparator
            .<Map.Entry<int[], Double>>comparingInt(b -> b.getKey()[0])
            .thenComparing(b -> -b.getKey().length);
}
