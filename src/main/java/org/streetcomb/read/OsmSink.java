package org.streetcomb.read;

import java.util.Map;

/** Receives the nodes and ways of an OpenStreetMap file as a reader streams them. */
interface OsmSink {

    void node(long id, double lon, double lat);

    /** @param refs the way's node ids in order; @param tags its tags (only the keys the reader asked for) */
    void way(long id, long[] refs, Map<String, String> tags);
}
