package org.streetcomb.read;

import java.util.List;

/**
 * An arc-routing benchmark instance in the CARPLIB text format (Belenguer &amp; Benavent's edition of the
 * gdb, val and egl sets): an undirected graph with integer costs, a required subset of edges with demands,
 * a depot, a fleet size and a vehicle capacity. Nodes are numbered from 1 as in the file.
 *
 * @param name      the instance name from the file
 * @param vertices  number of nodes
 * @param edges     required edges first, in file order, then the non-required ones
 * @param depot     depot node (1-based)
 * @param vehicles  fleet size
 * @param capacity  vehicle capacity
 */
public record CarplibInstance(String name, int vertices, List<Edge> edges, int depot, int vehicles, int capacity) {

    /** An undirected edge between 1-based nodes, with its traversal cost and demand (0 when not required). */
    public record Edge(int u, int v, int cost, int demand, boolean required) {
    }
}
