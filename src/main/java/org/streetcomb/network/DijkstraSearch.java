package org.streetcomb.network;

/**
 * Dijkstra's shortest-path search, settling one node at a time so callers can stop early (at a target, or
 * after the k nearest nodes of interest). From one source, or from several at once (multi-source: every
 * node is reached from its nearest source, which {@link #origin} names; the regions of Mehlhorn's
 * spanning-tree construction). The {@link Heading} says whether one-way streets are ignored,
 * followed away from the source, or followed towards it (distances to the source). The arrays are allocated once and
 * reset lazily with a search stamp, so many short searches on a large network cost only what they touch.
 * O((V + E) log E) per full search; not thread-safe (use one instance per thread).
 */
public final class DijkstraSearch {

    private final StreetNetwork network;
    private final Heading heading;
    private final double[] distance;
    private final int[] parentEdge;
    private final int[] reached;
    private final int[] settled;
    private final int[] origin;
    private final MinHeap heap = new MinHeap();
    private int stamp;

    /** A search that ignores one-way restrictions. */
    public DijkstraSearch(StreetNetwork network) {
        this(network, Heading.ANY);
    }

    public DijkstraSearch(StreetNetwork network, Heading heading) {
        this.network = network;
        this.heading = heading;
        int n = network.nodeCount();
        this.distance = new double[n];
        this.parentEdge = new int[n];
        this.reached = new int[n];
        this.settled = new int[n];
        this.origin = new int[n];
    }

    /** Starts a new search from {@code source}. */
    public void start(int source) {
        stamp++;
        heap.clear();
        addSource(source);
    }

    /** Starts a new search from all {@code sources} at once, pushed in the given order. */
    public void startFrom(int[] sources) {
        stamp++;
        heap.clear();
        for (int source : sources) {
            addSource(source);
        }
    }

    private void addSource(int source) {
        reached[source] = stamp;
        distance[source] = 0;
        parentEdge[source] = -1;
        origin[source] = source;
        heap.push(0, source);
    }

    /** Settles and returns the next nearest node, or -1 when every reachable node is settled. */
    public int next() {
        while (!heap.isEmpty()) {
            double d = heap.peekKey();
            int v = heap.peekValue();
            heap.pop();
            if (settled[v] == stamp || d > distance[v]) {
                continue;
            }
            settled[v] = stamp;
            for (int i = network.incidenceStart(v); i < network.incidenceEnd(v); i++) {
                int e = network.incidentEdge(i);
                if (!heading.allows(network, e, v)) {
                    continue;
                }
                int w = network.other(e, v);
                double dw = d + network.length(e);
                if (reached[w] != stamp || dw < distance[w]) {
                    reached[w] = stamp;
                    distance[w] = dw;
                    parentEdge[w] = e;
                    origin[w] = origin[v];
                    heap.push(dw, w);
                }
            }
            return v;
        }
        return -1;
    }

    /** Runs the search until {@code target} is settled; returns its distance, or infinity if unreachable. */
    public double runTo(int target) {
        if (settled[target] == stamp) {
            return distance[target];
        }
        for (int v = next(); v >= 0; v = next()) {
            if (v == target) {
                return distance[v];
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    /** Distance in metres of a settled node from the source. */
    public double distance(int node) {
        return distance[node];
    }

    /** Whether the current search has reached the node (settled, or waiting in the heap). */
    public boolean reached(int node) {
        return reached[node] == stamp;
    }

    /** The source whose shortest-path tree holds a reached node. */
    public int origin(int node) {
        return origin[node];
    }

    /** The last edge of the shortest path to a reached node, or -1 at a source. */
    public int parentEdge(int node) {
        return parentEdge[node];
    }

    /**
     * Edges of the shortest path between the source and a settled node, in driving order: from the source
     * for {@link Heading#ANY} and {@link Heading#OUTBOUND}, from the node to the source for
     * {@link Heading#INBOUND}.
     */
    public int[] pathTo(int node) {
        int count = 0;
        for (int v = node; parentEdge[v] >= 0; v = network.other(parentEdge[v], v)) {
            count++;
        }
        int[] path = new int[count];
        int i = heading == Heading.INBOUND ? 0 : count;
        for (int v = node; parentEdge[v] >= 0; v = network.other(parentEdge[v], v)) {
            if (heading == Heading.INBOUND) {
                path[i++] = parentEdge[v];
            } else {
                path[--i] = parentEdge[v];
            }
        }
        return path;
    }
}
