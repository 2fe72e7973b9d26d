package org.streetcomb.solve;

import java.util.Arrays;
import org.streetcomb.network.StreetNetwork;

/**
 * The groups a rural tour must join: the connected groups of streets to be serviced (joined through their
 * shared nodes, directions ignored), and each tour's start and end node when it lies on none of them.
 */
final class ServiceGroups {

    /** For each node, its group id, or -1. */
    final int[] group;
    final int count;

    private ServiceGroups(int[] group, int count) {
        this.group = group;
        this.count = count;
    }

    /** Groups of the serviced edges plus the problem's start and end nodes. */
    static ServiceGroups of(PostmanProblem problem, boolean[] serviced) {
        StreetNetwork network = problem.network();
        int n = network.nodeCount();
        int[] parent = new int[n];
        Arrays.setAll(parent, i -> i);
        boolean[] member = new boolean[n];
        for (int e = 0; e < network.edgeCount(); e++) {
            if (serviced[e]) {
                int a = find(parent, network.from(e));
                int b = find(parent, network.to(e));
                parent[a] = b;
                member[network.from(e)] = true;
                member[network.to(e)] = true;
            }
        }
        for (int s : problem.starts()) {
            member[s] = true;
        }
        if (problem.starts().length > 0) {
            member[problem.end()] = true;
            // the walk of an open tour joins its ends itself: they are one group, as if a street ran between them
            parent[find(parent, problem.starts()[0])] = find(parent, problem.end());
        }
        int[] id = new int[n];
        Arrays.fill(id, -1);
        int[] group = new int[n];
        Arrays.fill(group, -1);
        int count = 0;
        for (int v = 0; v < n; v++) {
            if (member[v]) {
                int root = find(parent, v);
                if (id[root] < 0) {
                    id[root] = count++;
                }
                group[v] = id[root];
            }
        }
        return new ServiceGroups(group, count);
    }

    /**
     * Whether the edges with positive {@code passes} join all member nodes that lie in the same part of
     * the network ({@code part}: a component id per node) into one piece.
     */
    boolean connected(StreetNetwork network, int[] part, int parts, int[] passes) {
        int n = network.nodeCount();
        int[] parent = new int[n];
        Arrays.setAll(parent, i -> i);
        for (int e = 0; e < network.edgeCount(); e++) {
            if (passes[e] > 0) {
                parent[find(parent, network.from(e))] = find(parent, network.to(e));
            }
        }
        int[] rootOfPart = new int[parts];
        Arrays.fill(rootOfPart, -1);
        for (int v = 0; v < n; v++) {
            if (group[v] >= 0) {
                int r = find(parent, v);
                if (rootOfPart[part[v]] < 0) {
                    rootOfPart[part[v]] = r;
                } else if (rootOfPart[part[v]] != r) {
                    return false;
                }
            }
        }
        return true;
    }

    static int find(int[] parent, int x) {
        while (parent[x] != x) {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    }
}
