package org.streetcomb.solve;

import java.util.stream.IntStream;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.StreetNetwork;

/**
 * The undirected Chinese postman problem, solved exactly by Edmonds &amp; Johnson's method (1973): pair
 * the odd-degree nodes at minimum total shortest-path distance ({@link OddVertexMatching}) and add one
 * deadhead copy of every edge on each pair's shortest path. Every node is then even, so each connected
 * component has an Euler circuit of minimum length. If two paths share an edge, both copies are dropped:
 * parity is kept, the original edge still connects, and the tour gets shorter. For an open route the
 * start and end nodes swap parity first, so the walk ends at the end node (semi-Eulerian case).
 *
 * <p>Exact when every edge of each planned part is to be serviced once and no street is one-way; the
 * rural variant ({@link UndirectedRuralPostman}) reuses the matching step.
 */
public final class UndirectedPostman implements PostmanSolver {

    /** Initial candidate partners per odd node; pricing adds any the optimum needs. */
    static final int NEIGHBOURS = 8;


    /** Every edge of a network without one-way streets, closed tours. */
    public static Augmentation solve(StreetNetwork network) {
        return new UndirectedPostman().solve(new PostmanProblem(network, ServiceDemand.everyEdge(network), new int[0], -1));
    }

    @Override
    public String method() {
        return "Edmonds & Johnson 1973: minimum-cost pairing of odd nodes (Blossom V, Kolmogorov 2009) over shortest paths";
    }

    @Override
    public boolean exact() {
        return true;
    }

    @Override
    public String complexity() {
        return "O(k m log n) for k candidate partners per odd node by Dijkstra, plus Blossom V on the candidate graph, repeated while pricing finds a violated pair";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        int[] either = problem.demand().either().clone();
        Matched matched = addMatching(problem, either);
        double deadhead = matched.cost;
        String method = "undirected postman, exact (Edmonds-Johnson; " + matched.describe() + ")";
        double total = problem.demand().length(network) + deadhead;
        return new Augmentation(Traversals.undirected(either), deadhead, oddNodes(network).length, method, true, total);
    }

    /** The result of pairing odd nodes: its cost in metres and how the matching went. */
    record Matched(double cost, OddVertexMatching.Result result) {
        String describe() {
            return "Blossom V on " + result.candidateEdges() + " candidate pairs, " + result.rounds() + " round"
                    + (result.rounds() == 1 ? "" : "s");
        }
    }

    /**
     * Makes the multigraph of {@code either} traversals even (apart from an open route's ends) by adding
     * the shortest paths of a minimum-cost pairing of its odd nodes; updates {@code either} in place.
     */
    static Matched addMatching(PostmanProblem problem, int[] either) {
        StreetNetwork network = problem.network();
        int[] odd = oddNodes(network, either, problem);
        OddVertexMatching.Result matching = OddVertexMatching.solve(network, odd, NEIGHBOURS);
        int[] copies = new int[network.edgeCount()];
        DijkstraSearch search = new DijkstraSearch(network);
        int[] pairs = matching.pairs();
        for (int p = 0; p < pairs.length; p += 2) {
            search.start(pairs[p]);
            search.runTo(pairs[p + 1]);
            for (int e : search.pathTo(pairs[p + 1])) {
                copies[e]++;
            }
        }
        double cost = 0;
        for (int e = 0; e < copies.length; e++) {
            copies[e] %= 2;
            either[e] += copies[e];
            cost += copies[e] * network.length(e);
        }
        return new Matched(cost, matching);
    }

    /** Nodes of odd degree in the multigraph of the given traversals, parity swapped at open ends. */
    static int[] oddNodes(StreetNetwork network, int[] either, PostmanProblem problem) {
        int[] degree = new int[network.nodeCount()];
        for (int e = 0; e < either.length; e++) {
            degree[network.from(e)] += either[e];
            degree[network.to(e)] += either[e];
        }
        return IntStream.range(0, network.nodeCount())
                .filter(v -> (degree[v] + Math.abs(problem.endBalance(v))) % 2 == 1)
                .toArray();
    }

    /** Nodes with an odd number of edge ends, in id order. */
    public static int[] oddNodes(StreetNetwork network) {
        return IntStream.range(0, network.nodeCount())
                .filter(v -> network.degree(v) % 2 == 1)
                .toArray();
    }
}
