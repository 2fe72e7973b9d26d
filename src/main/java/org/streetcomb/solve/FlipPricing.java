package org.streetcomb.solve;

import java.util.Arrays;
import org.streetcomb.network.MinHeap;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * Direction flips of service passes priced on the residual deadhead network of an optimal flow, warm-started
 * from its node potentials: successive shortest paths (Ahuja, Magnanti &amp; Orlin, "Network Flows", 1993,
 * ch. 9) instead of a full minimum-cost flow per trial. Flipping k passes of a street from u&rarr;v to
 * v&rarr;u leaves u with 2k more arrivals than departures and v with 2k fewer, so the deadhead must carry 2k
 * more units from u to v; the cheapest way is found by Dijkstra on reduced costs {@code c - p[tail] +
 * p[head]} (never negative for an optimal flow), cancelling deadhead where the residual network allows.
 * Only a path costing less than nothing can pay for a flip, and a path from u to v costs at least
 * {@code p[u] - p[v]}, so each search stops at the radius where that fails: trials are local and cheap.
 * An accepted flip augments the flow and moves the potentials of the settled nodes (by the standard update
 * {@code p += d(v) - d}, so the rest of the network keeps its potentials); a rejected one leaves everything
 * as it was. Each trial is exact, so the flow stays optimal for the passes as flipped.
 *
 * <p>Hand-written because no library here offers a warm-started flow on arrays: OR-Tools' flows start from
 * scratch each solve. Per trial O(r log r) for the r arcs within the search radius.
 */
final class FlipPricing {

    private final StreetNetwork network;
    /** Deadhead traversals along and against each edge's digitised direction. */
    private final int[] deadAlong;
    private final int[] deadAgainst;
    private final double[] potential;
    private double deadhead;

    private final double[] dist;
    private final int[] seen;
    private final int[] settled;
    private final int[] predEdge;
    private int stamp;
    private final MinHeap heap = new MinHeap();
    private final int[] settledList;
    private int settledCount;
    /** Undo log of the trial under way. */
    private int[] loggedNode = new int[64];
    private double[] loggedPotential = new double[64];
    private int nodeLogged;
    private int[] loggedEdge = new int[64];
    private int[] loggedFlow = new int[128];
    private int edgeLogged;

    /**
     * @param service   service passes along and against each edge
     * @param balanced  an optimal balancing of those passes and its potentials
     */
    FlipPricing(StreetNetwork network, int[] serviceAlong, int[] serviceAgainst, DirectedPostman.Balanced balanced) {
        this.network = network;
        int m = network.edgeCount();
        int n = network.nodeCount();
        deadAlong = new int[m];
        deadAgainst = new int[m];
        for (int e = 0; e < m; e++) {
            deadAlong[e] = balanced.traversals().along()[e] - serviceAlong[e];
            deadAgainst[e] = balanced.traversals().against()[e] - serviceAgainst[e];
            deadhead += (deadAlong[e] + deadAgainst[e]) * network.length(e);
        }
        potential = balanced.potential().clone();
        dist = new double[n];
        seen = new int[n];
        settled = new int[n];
        predEdge = new int[n];
        settledList = new int[n];
    }

    double[] potential() {
        return potential;
    }

    /** Deadhead metres of the current flow. */
    double deadhead() {
        return deadhead;
    }

    /**
     * Prices turning {@code k} service passes of {@code edge} that now run from {@code u} to its other end;
     * keeps the cheaper deadhead and returns true only where the flip shortens the tour.
     */
    boolean tryFlip(int edge, int u, int k) {
        int v = network.other(edge, u);
        int units = 2 * k;
        double spent = 0;
        nodeLogged = 0;
        edgeLogged = 0;
        while (units > 0) {
            // every unit left costs at least this path's cost: only a path cheaper than -spent/units can pay
            double radius = -spent / units + potential[v] - potential[u];
            if (radius <= 1e-9 || !search(u, v, radius)) {
                rollBack();
                return false;
            }
            double pathCost = 0;
            int bottleneck = units;
            for (int x = v; x != u; ) {
                int e = predEdge[x];
                int y = network.other(e, x);
                int opposite = network.from(e) == y ? deadAgainst[e] : deadAlong[e];
                if (opposite > 0) {
                    bottleneck = Math.min(bottleneck, opposite);
                    pathCost -= network.length(e);
                } else {
                    pathCost += network.length(e);
                }
                x = y;
            }
            for (int x = v; x != u; ) {
                int e = predEdge[x];
                int y = network.other(e, x);
                logEdge(e);
                if (network.from(e) == y) {
                    if (deadAgainst[e] > 0) {
                        deadAgainst[e] -= bottleneck;
                    } else {
                        deadAlong[e] += bottleneck;
                    }
                } else if (deadAlong[e] > 0) {
                    deadAlong[e] -= bottleneck;
                } else {
                    deadAgainst[e] += bottleneck;
                }
                x = y;
            }
            double reach = dist[v];
            for (int i = 0; i < settledCount; i++) {
                int x = settledList[i];
                logNode(x);
                potential[x] += reach - dist[x];
            }
            spent += bottleneck * pathCost;
            units -= bottleneck;
        }
        if (spent >= -1e-7) {
            rollBack();
            return false;
        }
        deadhead += spent;
        return true;
    }

    private void logNode(int x) {
        if (nodeLogged == loggedNode.length) {
            loggedNode = Arrays.copyOf(loggedNode, 2 * nodeLogged);
            loggedPotential = Arrays.copyOf(loggedPotential, 2 * nodeLogged);
        }
        loggedNode[nodeLogged] = x;
        loggedPotential[nodeLogged++] = potential[x];
    }

    private void logEdge(int e) {
        if (edgeLogged == loggedEdge.length) {
            loggedEdge = Arrays.copyOf(loggedEdge, 2 * edgeLogged);
            loggedFlow = Arrays.copyOf(loggedFlow, 4 * edgeLogged);
        }
        loggedEdge[edgeLogged] = e;
        loggedFlow[2 * edgeLogged] = deadAlong[e];
        loggedFlow[2 * edgeLogged++ + 1] = deadAgainst[e];
    }

    /** Restores the potentials and flows of the trial, newest change first. */
    private void rollBack() {
        for (int i = nodeLogged - 1; i >= 0; i--) {
            potential[loggedNode[i]] = loggedPotential[i];
        }
        for (int i = edgeLogged - 1; i >= 0; i--) {
            deadAlong[loggedEdge[i]] = loggedFlow[2 * i];
            deadAgainst[loggedEdge[i]] = loggedFlow[2 * i + 1];
        }
    }

    /**
     * Dijkstra on reduced costs from {@code u} until {@code v} is settled within {@code radius}; false if it
     * is not. Leaves the settled nodes in {@link #settledList} with their distances.
     */
    private boolean search(int u, int v, double radius) {
        stamp++;
        settledCount = 0;
        heap.clear();
        dist[u] = 0;
        seen[u] = stamp;
        heap.push(0, u);
        while (!heap.isEmpty()) {
            double key = heap.peekKey();
            int x = heap.peekValue();
            heap.pop();
            if (settled[x] == stamp || key > dist[x]) {
                continue;
            }
            if (key > radius) {
                return false;
            }
            settled[x] = stamp;
            settledList[settledCount++] = x;
            if (x == v) {
                return true;
            }
            for (int i = network.incidenceStart(x); i < network.incidenceEnd(x); i++) {
                int e = network.incidentEdge(i);
                int y = network.other(e, x);
                if (y == x || settled[y] == stamp) {
                    continue;
                }
                boolean alongStep = network.from(e) == x;
                int opposite = alongStep ? deadAgainst[e] : deadAlong[e];
                double cost;
                if (opposite > 0) {
                    cost = -network.length(e);
                } else {
                    Travel travel = network.travel(e);
                    if (alongStep ? travel == Travel.BACKWARD : travel == Travel.FORWARD) {
                        continue;
                    }
                    cost = network.length(e);
                }
                double d = key + Math.max(0, cost - potential[x] + potential[y]);
                if (seen[y] != stamp || d < dist[y]) {
                    seen[y] = stamp;
                    dist[y] = d;
                    predEdge[y] = e;
                    heap.push(d, y);
                }
            }
        }
        return false;
    }
}
