package org.streetcomb.trip;

import java.util.Arrays;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;

/**
 * Shortest-path distances between the nodes that matter for trips (the depot and the ends of every
 * task), one full Dijkstra search ({@link DijkstraSearch}) from each, kept as a dense table indexed by
 * those nodes. Memory is (nodes of interest)^2 doubles, so the table is built only up to
 * {@link #MAX_NODES} nodes of interest; beyond that the caller splits without local improvement. Searches
 * follow one-way streets only their permitted way, so the table is not symmetric where there are any.
 */
final class NodeDistances implements Distances {

    /** 4000^2 doubles is 128 MB: the most the table may take. */
    static final int MAX_NODES = 4000;

    private final int[] index;
    private final double[] table;
    private final int size;

    private NodeDistances(int[] index, double[] table, int size) {
        this.index = index;
        this.table = table;
        this.size = size;
    }

    static boolean fits(int nodes) {
        return nodes <= MAX_NODES;
    }

    static NodeDistances among(StreetNetwork network, int[] nodes) {
        int k = nodes.length;
        int[] index = new int[network.nodeCount()];
        Arrays.fill(index, -1);
        for (int i = 0; i < k; i++) {
            index[nodes[i]] = i;
        }
        double[] table = new double[k * k];
        Arrays.fill(table, Double.POSITIVE_INFINITY);
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        for (int i = 0; i < k; i++) {
            search.start(nodes[i]);
            int found = 0;
            for (int v = search.next(); v >= 0 && found < k; v = search.next()) {
                if (index[v] >= 0) {
                    table[i * k + index[v]] = search.distance(v);
                    found++;
                }
            }
        }
        return new NodeDistances(index, table, k);
    }

    @Override
    public double between(int from, int to) {
        return from == to ? 0 : table[index[from] * size + index[to]];
    }
}
