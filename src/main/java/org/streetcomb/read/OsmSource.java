package org.streetcomb.read;

/**
 * An OpenStreetMap file that can be streamed more than once: first for its ways, then for the nodes the
 * kept ways use, so memory holds only road nodes whatever order the file lists its elements in.
 */
interface OsmSource {

    /** Streams the file, passing nodes when {@code nodes} and ways when {@code ways} to the sink. */
    void stream(OsmSink sink, boolean nodes, boolean ways);
}
