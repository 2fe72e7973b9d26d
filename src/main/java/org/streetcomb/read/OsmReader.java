package org.streetcomb.read;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.PrecisionModel;
import org.streetcomb.InputError;

/**
 * Reads the streets of an OpenStreetMap extract with OSM's own topology: ways meet only where they share
 * a node, so a bridge over a street, or a tunnel under it, never gets a false junction.
 *
 * <p>Two streaming passes over the file: the first keeps the ways that are streets for the travel mode
 * ({@link OsmRoadRules}) as node id arrays and counts how often each node is used; the second takes the
 * coordinates of those nodes only. Each way is then cut at every node another street (or the way itself)
 * also uses, and the pieces carry their end node ids so the network is joined by id, not by geometry.
 * Memory holds the kept ways and their nodes, in sorted primitive arrays, never the whole file. A way
 * whose nodes are missing from the extract (clipped at its edge) keeps the runs of nodes that are
 * present; the cuts are counted in the report.
 */
final class OsmReader implements LayerReader {

    private static final GeometryFactory GEOMETRY = new GeometryFactory(new PrecisionModel(), 4326);

    private final ReadOptions options;
    private final OsmRoadRules rules;
    private final AttributeMapping mapping;
    private final boolean pbf;

    OsmReader(ReadOptions options, boolean pbf) {
        this.options = options;
        this.rules = new OsmRoadRules(options.mode(), options.serviceRoads(), options.privateRoads());
        this.mapping = new AttributeMapping(options);
        this.pbf = pbf;
    }

    private record Way(long id, long[] refs, Map<String, String> tags, Travel travel, String featureId) {
    }

    @Override
    public RoadLayer read(Path file) {
        OsmSource source = pbf ? new OsmPbfSource(file, OsmRoadRules.KEYS) : new OsmXmlSource(file, OsmRoadRules.KEYS);
        ReadTally tally = new ReadTally();
        List<Way> ways = new ArrayList<>();
        LongList used = new LongList();
        source.stream(new OsmSink() {
            @Override
            public void node(long id, double lon, double lat) {
                throw new IllegalStateException("nodes were not asked for");
            }

            @Override
            public void way(long id, long[] refs, Map<String, String> tags) {
                tally.feature();
                String exclusion = rules.exclusion(tags);
                if (exclusion != null) {
                    tally.skip(exclusion);
                    return;
                }
                Map<String, String> kept = new TreeMap<>(tags);
                kept.put("osm_way", Long.toString(id));
                if (!mapping.keeps(kept, tally)) {
                    return;
                }
                if (rules.timed(tags)) {
                    tally.note("oneway=" + tags.get("oneway") + " read as two-way: check the times on the ground");
                }
                ways.add(new Way(id, refs, Map.copyOf(kept), rules.travel(tags),
                        mapping.id("way/" + id, kept, file + ": way " + id)));
                for (long ref : refs) {
                    used.add(ref);
                }
            }
        }, false, true);
        NodeTable nodes = NodeTable.of(used.toArray());
        source.stream(new OsmSink() {
            @Override
            public void node(long id, double lon, double lat) {
                nodes.locate(id, lon, lat);
            }

            @Override
            public void way(long id, long[] refs, Map<String, String> tags) {
                throw new IllegalStateException("ways were not asked for");
            }
        }, true, false);
        LongList ends = new LongList();
        for (Way way : ways) {
            split(way, nodes, tally, ends);
        }
        if (tally.isEmpty()) {
            throw InputError.at(file, null, "no streets for " + options.mode().name().toLowerCase(Locale.ROOT)
                    + " among " + tally.features() + " ways (skipped: " + tally.skippedText() + ")");
        }
        return tally.layer(file, ReadReport.WGS84, ends.toArray());
    }

    /** Cuts a way into pieces between junction nodes, skipping nodes the extract lacks. */
    private void split(Way way, NodeTable nodes, ReadTally tally, LongList ends) {
        long[] refs = way.refs();
        List<Coordinate> piece = new ArrayList<>();
        long start = 0;
        boolean cut = false;
        for (int i = 0; i < refs.length; i++) {
            int n = nodes.index(refs[i]);
            if (!nodes.located(n)) {
                cut = true;
                piece.clear();
                continue;
            }
            Coordinate c = new Coordinate(nodes.lon(n), nodes.lat(n));
            if (piece.isEmpty()) {
                piece.add(c);
                start = refs[i];
                continue;
            }
            if (!piece.get(piece.size() - 1).equals2D(c)) {
                piece.add(c);
            }
            boolean last = i == refs.length - 1 || !nodes.located(nodes.index(refs[i + 1]));
            if (nodes.uses(n) > 1 || last) {
                if (piece.size() >= 2) {
                    String id = way.featureId();
                    tally.keep(new RoadFeature(id, OsmRoadRules.name(way.tags()),
                            GEOMETRY.createLineString(piece.toArray(new Coordinate[0])), way.travel(),
                            mapping.required(way.tags()), way.tags()));
                    ends.add(start);
                    ends.add(refs[i]);
                }
                piece.clear();
                piece.add(c);
                start = refs[i];
            }
        }
        if (cut) {
            tally.note("ways cut where their nodes are missing from the extract");
        }
    }

    /** Node ids used by kept ways (sorted, unique), their use counts and coordinates. */
    private static final class NodeTable {
        private final long[] ids;
        private final int[] uses;
        private final double[] lon;
        private final double[] lat;

        private NodeTable(long[] ids, int[] uses) {
            this.ids = ids;
            this.uses = uses;
            this.lon = new double[ids.length];
            this.lat = new double[ids.length];
            Arrays.fill(lon, Double.NaN);
        }

        static NodeTable of(long[] references) {
            Arrays.sort(references);
            int unique = 0;
            int[] counts = new int[references.length];
            for (int i = 0; i < references.length; i++) {
                if (unique == 0 || references[unique - 1] != references[i]) {
                    references[unique++] = references[i];
                }
                counts[unique - 1]++;
            }
            return new NodeTable(Arrays.copyOf(references, unique), Arrays.copyOf(counts, unique));
        }

        int index(long id) {
            return Arrays.binarySearch(ids, id);
        }

        void locate(long id, double x, double y) {
            int i = index(id);
            if (i >= 0) {
                lon[i] = x;
                lat[i] = y;
            }
        }

        boolean located(int i) {
            return i >= 0 && !Double.isNaN(lon[i]);
        }

        int uses(int i) {
            return uses[i];
        }

        double lon(int i) {
            return lon[i];
        }

        double lat(int i) {
            return lat[i];
        }
    }
}
