package org.streetcomb.tour;

import org.streetcomb.network.StreetNetwork;

/**
 * One walk through a network: the edges in the order driven, the direction of each traversal, and
 * whether the traversal services the street or is deadhead (travel that services nothing). The walk
 * starts at {@code start} and ends there, unless the plan asked for an open route.
 *
 * @param start   the node the walk starts at
 * @param edges   edge ids in driving order
 * @param forward for each step, true when driven in the edge's digitised direction
 * @param service for each step, true when this traversal services the street
 */
public record Tour(int start, int[] edges, boolean[] forward, boolean[] service) {

    public int steps() {
        return edges.length;
    }

    /** The node step {@code i} enters from. */
    public int entry(StreetNetwork network, int i) {
        return forward[i] ? network.from(edges[i]) : network.to(edges[i]);
    }

    /** The node step {@code i} leaves by. */
    public int exit(StreetNetwork network, int i) {
        return forward[i] ? network.to(edges[i]) : network.from(edges[i]);
    }

    /** The node the walk ends at. */
    public int end(StreetNetwork network) {
        return edges.length == 0 ? start : exit(network, edges.length - 1);
    }

    public double length(StreetNetwork network) {
        double sum = 0;
        for (int e : edges) {
            sum += network.length(e);
        }
        return sum;
    }

    public double deadhead(StreetNetwork network) {
        double sum = 0;
        for (int i = 0; i < edges.length; i++) {
            if (!service[i]) {
                sum += network.length(edges[i]);
            }
        }
        return sum;
    }
}
