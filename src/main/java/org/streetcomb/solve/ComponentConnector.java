package org.streetcomb.solve;

import java.util.Arrays;
import java.util.stream.IntStream;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;

/**
 * Joins the separate groups of streets to be serviced (and the tour ends) by shortest paths along a
 * minimum spanning tree, the connection step of Frederickson's rural postman construction (G. N.
 * Frederickson, "Approximation algorithms for some postman problems", J. ACM 26, 1979).
 *
 * <p>The spanning tree over the complete graph of group-to-group distances would need one search per
 * group. Instead, one multi-source Dijkstra search grows every group's region at once, and every street
 * joining two regions gives a candidate link of length d(u) + l(e) + d(v); Kruskal's algorithm on these
 * links yields a minimum spanning tree of the group distance graph (K. Mehlhorn, "A faster approximation
 * algorithm for the Steiner problem in graphs", Inf. Proc. Letters 27, 1988). O(E log E) in all. With
 * one-way streets the regions are grown twice, away from the groups and towards them, and a link is a
 * path from one group to another in a drivable direction; then the tree is only a good heuristic choice
 * (directed distances are not symmetric), which suffices because the balancing step adds the way back.
 */
final class ComponentConnector {

    private ComponentConnector() {
    }

    /**
     * Deadhead passes that connect the groups, per edge and direction.
     *
     * @param group    for each node, its group id (0..groups-1), or -1 when it belongs to none
     * @param directed whether one-way streets must be respected
     * @return {along, against} pass counts per edge (an undirected connection counts as along)
     */
    static int[][] connect(StreetNetwork network, int[] group, int groups, boolean directed) {
        int m = network.edgeCount();
        int[][] passes = {new int[m], new int[m]};
        if (groups < 2) {
            return passes;
        }
        Regions out = new Regions(network, group, directed ? Heading.OUTBOUND : Heading.ANY);
        Regions in = directed ? new Regions(network, group, Heading.INBOUND) : out;
        int count = 0;
        long[] order = new long[2 * m];
        double[] weight = new double[2 * m];
        for (int e = 0; e < m; e++) {
            for (int dir = 0; dir < 2; dir++) {
                int u = dir == 0 ? network.from(e) : network.to(e);
                int v = network.other(e, u);
                if (out.label[u] < 0 || in.label[v] < 0 || out.label[u] == in.label[v]
                        || !Heading.OUTBOUND.allows(network, e, u) && directed) {
                    continue;
                }
                weight[count] = out.distance[u] + network.length(e) + in.distance[v];
                order[count] = 2L * e + dir;
                count++;
            }
        }
        Integer[] sorted = new Integer[count];
        Arrays.setAll(sorted, i -> i);
        final double[] w = weight;
        final long[] o = order;
        Arrays.sort(sorted, (a, b) -> w[a] != w[b] ? Double.compare(w[a], w[b]) : Long.compare(o[a], o[b]));
        int[] parent = new int[groups];
        Arrays.setAll(parent, i -> i);
        int joined = 0;
        for (int i : sorted) {
            int e = (int) (order[i] / 2);
            int u = order[i] % 2 == 0 ? network.from(e) : network.to(e);
            int v = network.other(e, u);
            int a = find(parent, out.label[u]);
            int b = find(parent, in.label[v]);
            if (a == b) {
                continue;
            }
            parent[a] = b;
            out.addPath(u, passes);
            add(network, passes, e, u);
            in.addPath(v, passes);
            if (++joined == groups - 1) {
                break;
            }
        }
        return passes;
    }

    /**
     * The sum over groups of each group's shortest distance to its nearest other group (undirected), or 0
     * for fewer than two groups. A closed walk through all groups leaves each group for another and enters
     * it from another, along stretches that service nothing, and each stretch between two groups is at
     * least as long as the mean of their two nearest-group distances: so this sum is a lower bound on the
     * deadhead of any closed tour. Each group's distance is the least link over the region boundary
     * (Mehlhorn 1988), so one search suffices.
     */
    static double nearestGroupBound(StreetNetwork network, int[] group, int groups) {
        if (groups < 2) {
            return 0;
        }
        Regions regions = new Regions(network, group, Heading.ANY);
        double[] nearest = new double[groups];
        java.util.Arrays.fill(nearest, Double.POSITIVE_INFINITY);
        for (int e = 0; e < network.edgeCount(); e++) {
            int u = network.from(e);
            int v = network.to(e);
            int a = regions.label[u];
            int b = regions.label[v];
            if (a >= 0 && b >= 0 && a != b) {
                double d = regions.distance[u] + network.length(e) + regions.distance[v];
                nearest[a] = Math.min(nearest[a], d);
                nearest[b] = Math.min(nearest[b], d);
            }
        }
        double sum = 0;
        for (double d : nearest) {
            // a group that reaches no other lies in a part of its own: it adds nothing
            sum += Double.isFinite(d) ? d : 0;
        }
        return sum;
    }

    private static void add(StreetNetwork network, int[][] passes, int edge, int fromNode) {
        passes[network.from(edge) == fromNode ? 0 : 1][edge]++;
    }

    private static int find(int[] parent, int x) {
        while (parent[x] != x) {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    }

    /**
     * Shortest-path regions of the groups: distance, nearest group and parent edge of every node, from one
     * multi-source {@link DijkstraSearch} started at every group node.
     */
    private static final class Regions {
        final double[] distance;
        final int[] label;
        final int[] parentEdge;
        private final StreetNetwork network;
        private final Heading heading;

        Regions(StreetNetwork network, int[] group, Heading heading) {
            this.network = network;
            this.heading = heading;
            int n = network.nodeCount();
            distance = new double[n];
            label = new int[n];
            parentEdge = new int[n];
            Arrays.fill(distance, Double.POSITIVE_INFINITY);
            Arrays.fill(label, -1);
            Arrays.fill(parentEdge, -1);
            DijkstraSearch search = new DijkstraSearch(network, heading);
            search.startFrom(IntStream.range(0, n).filter(v -> group[v] >= 0).toArray());
            while (search.next() >= 0) {
                // every reachable node settled
            }
            for (int v = 0; v < n; v++) {
                if (search.reached(v)) {
                    distance[v] = search.distance(v);
                    label[v] = group[search.origin(v)];
                    parentEdge[v] = search.parentEdge(v);
                }
            }
        }

        /** Adds the path between {@code node} and its group, in driving order, to the pass counts. */
        void addPath(int node, int[][] passes) {
            for (int v = node; parentEdge[v] >= 0; ) {
                int e = parentEdge[v];
                int w = network.other(e, v);
                // outbound regions were grown from the group towards v; inbound ones from v towards the group
                add(network, passes, e, heading == Heading.INBOUND ? v : w);
                v = w;
            }
        }
    }
}
