package org.streetcomb.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import org.streetcomb.network.Components;
import org.streetcomb.network.Heading;
import org.streetcomb.network.Reach;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds the streets of the depot's part of the network that a vehicle leaving the depot cannot reach by
 * legal moves, and those from which it cannot drive back. Two breadth-first searches over the drivable
 * arcs ({@link Reach}), forward from the depot and backward to it, O(nodes + edges); the streets found are grouped into
 * connected pieces (one finding each). Streets in other parts are {@link SeparatePartCheck}'s business.
 */
final class DepotReachCheck implements Detector {

    @Override
    public List<Finding> find(CheckInput input) {
        int depot = input.depot();
        StreetNetwork network = input.network();
        if (depot < 0 || network.degree(depot) == 0) {
            return List.of();
        }
        boolean[] reached = Reach.of(network, depot, Heading.OUTBOUND);
        boolean[] returns = Reach.of(network, depot, Heading.INBOUND);
        Components parts = Components.of(network);
        int depotPart = parts.of(depot);
        boolean[] unreachable = new boolean[network.edgeCount()];
        boolean[] stranded = new boolean[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            if (parts.of(network.from(e)) != depotPart) {
                continue;
            }
            int u = network.from(e);
            int v = network.to(e);
            boolean along = Heading.OUTBOUND.allows(network, e, u);
            boolean against = Heading.OUTBOUND.allows(network, e, v);
            unreachable[e] = !(along && reached[u] || against && reached[v]);
            stranded[e] = !(along && returns[v] || against && returns[u]);
        }
        List<Finding> findings = new ArrayList<>();
        for (int[] group : pieces(network, unreachable)) {
            findings.add(finding(network, group, true));
        }
        for (int[] group : pieces(network, stranded)) {
            findings.add(finding(network, group, false));
        }
        return findings;
    }

    private static Finding finding(StreetNetwork network, int[] edges, boolean fromDepot) {
        double length = Places.length(network, edges);
        List<String> ids = Places.featureIds(network, edges);
        String problem = fromDepot ? "cannot be reached from the depot by a legal route"
                : (edges.length == 1 ? "has" : "have") + " no legal route back to the depot";
        String fix = fromDepot ? "check the one-way directions on the way in to " : "check the one-way directions on the way out of ";
        return new Finding(FindingKind.DEPOT_UNREACHABLE, Severity.BLOCKING, Places.edges(network, edges), ids, length, "m",
                String.format(Locale.ROOT, "%d street edge%s (%.0f m) %s", edges.length, edges.length == 1 ? "" : "s",
                        length, problem),
                fix + Places.list(ids, 5) + ", or place the depot elsewhere");
    }

    /** The marked edges, grouped into pieces joined at shared nodes, each in id order, by lowest edge id. */
    private static List<int[]> pieces(StreetNetwork network, boolean[] marked) {
        int[] parent = new int[network.nodeCount()];
        for (int v = 0; v < parent.length; v++) {
            parent[v] = v;
        }
        for (int e = 0; e < marked.length; e++) {
            if (marked[e]) {
                parent[root(parent, network.from(e))] = root(parent, network.to(e));
            }
        }
        TreeMap<Integer, List<Integer>> byFirstEdge = new TreeMap<>();
        int[] firstEdgeOfRoot = new int[parent.length];
        Arrays.fill(firstEdgeOfRoot, -1);
        for (int e = 0; e < marked.length; e++) {
            if (marked[e]) {
                int r = root(parent, network.from(e));
                if (firstEdgeOfRoot[r] < 0) {
                    firstEdgeOfRoot[r] = e;
                }
                byFirstEdge.computeIfAbsent(firstEdgeOfRoot[r], x -> new ArrayList<>()).add(e);
            }
        }
        List<int[]> groups = new ArrayList<>();
        for (List<Integer> group : byFirstEdge.values()) {
            groups.add(group.stream().mapToInt(Integer::intValue).toArray());
        }
        return groups;
    }

    private static int root(int[] parent, int v) {
        while (parent[v] != v) {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }
        return v;
    }
}
