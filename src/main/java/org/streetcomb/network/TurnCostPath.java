package org.streetcomb.network;

/**
 * The cheapest drive between two nodes when turns cost extra: Dijkstra's search over arcs (an edge in one
 * direction: arc {@code 2e} along edge e, {@code 2e + 1} against it) instead of nodes, so each state knows
 * the street it arrived by and the next move can be priced as a turn, the edge-based search used to model
 * turn costs in route planning (S. Winter, "Modeling costs of turns in route planning", GeoInformatica 6,
 * 2002; from memory). The drive may be told the arc it arrives by at its start and the arc it must leave by
 * at its end, so the turns at both ends are priced too. One-way streets are followed
 * ({@link Heading#OUTBOUND}).
 *
 * <p>Written by hand: the network's node searches ({@link DijkstraSearch}) cannot price a turn, and a
 * general graph library would need the line graph built. O((A + T) log A) per search for A arcs and T
 * arc-to-arc transitions (the sum of squared degrees, small on street networks); arrays are allocated once
 * and reset lazily with a stamp. Not thread-safe.
 */
public final class TurnCostPath {

    /** The extra cost, in metres of driving, of going on from arc {@code in} into arc {@code out} at {@code node}. */
    @FunctionalInterface
    public interface TurnCost {
        double of(int in, int node, int out);
    }

    private final StreetNetwork network;
    private final TurnCost turns;
    private final double[] cost;
    private final int[] parent;
    private final int[] reached;
    private final MinHeap heap = new MinHeap();
    private int stamp;

    public TurnCostPath(StreetNetwork network, TurnCost turns) {
        this.network = network;
        this.turns = turns;
        int arcs = 2 * network.edgeCount();
        this.cost = new double[arcs];
        this.parent = new int[arcs];
        this.reached = new int[arcs];
    }

    /** The arc that drives {@code edge} away from {@code node} (a loop: along its digitised direction). */
    public static int arcFrom(StreetNetwork network, int edge, int node) {
        return 2 * edge + (network.from(edge) == node ? 0 : 1);
    }

    /** The node arc {@code arc} arrives at. */
    public static int head(StreetNetwork network, int arc) {
        int e = arc >> 1;
        return (arc & 1) == 0 ? network.to(e) : network.from(e);
    }

    /**
     * The arcs of the cheapest drive from {@code from} to {@code to}, or null when {@code to} cannot be
     * reached; empty when staying put is cheapest ({@code from == to}).
     *
     * @param arrivedBy the arc the vehicle arrived at {@code from} by, or -1
     * @param leaveBy   the arc the vehicle leaves {@code to} by next, or -1
     */
    public int[] arcs(int arrivedBy, int from, int to, int leaveBy) {
        stamp++;
        heap.clear();
        double best = from == to ? turn(arrivedBy, from, leaveBy) : Double.POSITIVE_INFINITY;
        int bestArc = -1;
        leave(from, arrivedBy, 0, -1);
        while (!heap.isEmpty() && heap.peekKey() < best) {
            double d = heap.peekKey();
            int arc = heap.peekValue();
            heap.pop();
            if (d > cost[arc]) {
                continue;
            }
            int at = head(network, arc);
            if (at == to) {
                double total = d + turn(arc, to, leaveBy);
                if (total < best) {
                    best = total;
                    bestArc = arc;
                }
            }
            leave(at, arc, d, arc);
        }
        if (best == Double.POSITIVE_INFINITY) {
            return null;
        }
        int count = 0;
        for (int a = bestArc; a >= 0; a = parent[a]) {
            count++;
        }
        int[] path = new int[count];
        for (int a = bestArc; a >= 0; a = parent[a]) {
            path[--count] = a;
        }
        return path;
    }

    /** Pushes every arc leaving {@code node} after arriving by arc {@code by}, from cost {@code d}. */
    private void leave(int node, int by, double d, int arc) {
        for (int i = network.incidenceStart(node); i < network.incidenceEnd(node); i++) {
            int e = network.incidentEdge(i);
            if (!Heading.OUTBOUND.allows(network, e, node)) {
                continue;
            }
            int next = arcFrom(network, e, node);
            double c = d + turn(by, node, next) + network.length(e);
            if (reached[next] != stamp || c < cost[next]) {
                reached[next] = stamp;
                cost[next] = c;
                parent[next] = arc;
                heap.push(c, next);
            }
        }
    }

    private double turn(int in, int node, int out) {
        return in < 0 || out < 0 ? 0 : turns.of(in, node, out);
    }
}
