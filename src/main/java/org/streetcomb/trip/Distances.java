package org.streetcomb.trip;

/** Shortest-path distance in metres between two network nodes, as the trip methods need it. */
interface Distances {
    double between(int from, int to);
}
