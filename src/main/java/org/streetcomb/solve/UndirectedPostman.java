package org.streetcomb.solve;

import java.util.stream.IntStream;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.StreetNetwork;

/**
 * The undirected Chinese postman problem, solved exactly by Edmonds &amp; Johnson's method (1973): pair
 * the odd-degree nodes at minimum total shortest-path distance ({@link OddVertexMatching}) and add one
 * deadhead copy of every edge on each pair's shortest path. Every node is then even, so each connected
 * component has an Euler circuit of minimum length. If two paths share an edge, both copies are dropped:
 * parity is kept, the original edge still connects, and the tour gets shorter.
 */
public final class UndirectedPostman {

    /** Initial candidate partners per odd node; pricing adds any the optimum needs. */
    static final int NEIGHBOURS = 8;

    private UndirectedPostman() {
    }

    public static Augmentation solve(StreetNetwork network) {
        int[] odd = oddNodes(network);
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
        double deadhead = 0;
        for (int e = 0; e < copies.length; e++) {
            copies[e] %= 2;
            deadhead += copies[e] * network.length(e);
        }
        String method = "undirected postman, exact (Edmonds-Johnson; Blossom V on "
                + matching.candidateEdges() + " candidate pairs, " + matching.rounds() + " round"
                + (matching.rounds() == 1 ? "" : "s") + ")";
        return new Augmentation(copies, deadhead, odd.length, method, true);
    }

    /** Nodes with an odd number of edge ends, in id order. */
    public static int[] oddNodes(StreetNetwork network) {
        return IntStream.range(0, network.nodeCount())
                .filter(v -> network.degree(v) % 2 == 1)
                .toArray();
    }
}
