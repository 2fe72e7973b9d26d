package org.streetcomb.read;

import crosby.binary.BinaryParser;
import crosby.binary.Osmformat;
import crosby.binary.file.BlockInputStream;
import java.io.BufferedInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.io.input.BoundedInputStream;
import org.streetcomb.InputError;

/**
 * Streams an OpenStreetMap PBF file (.osm.pbf) block by block with the osmpbf library, which inflates
 * each block and resolves its string table, offsets and coordinate granularity; this class decodes the
 * delta-coded ids, coordinates and node references of dense nodes and ways
 * (https://wiki.openstreetmap.org/wiki/PBF_Format). Blocks are handled in file order.
 */
final class OsmPbfSource implements OsmSource {

    /** Header features this reader understands; a file requiring any other is refused. */
    private static final Set<String> FEATURES = Set.of("OsmSchema-V0.6", "DenseNodes");

    private final Path file;
    private final Set<String> keys;

    OsmPbfSource(Path file, Set<String> keys) {
        this.file = file;
        this.keys = keys;
    }

    @Override
    public void stream(OsmSink sink, boolean nodes, boolean ways) {
        Parser parser = new Parser(sink, nodes, ways);
        long size;
        try (BoundedInputStream in = BoundedInputStream.builder()
                .setInputStream(new BufferedInputStream(Files.newInputStream(file), 1 << 16)).get()) {
            size = Files.size(file);
            parser.counter = in;
            new BlockInputStream(in, parser).process();
        } catch (InputError e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw InputError.at(file, parser.blocks == 0 ? "header" : "after block " + parser.blocks,
                    "not a readable OSM PBF file (truncated or corrupt): " + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage().lines().findFirst().orElse("")));
        }
        if (!parser.sawHeader) {
            throw InputError.at(file, null, "not an OSM PBF file: no OSMHeader block");
        }
        // osmpbf ends quietly at end of file, even inside a block: a file must end where a block ends
        if (parser.boundary != size) {
            throw InputError.at(file, "after block " + parser.blocks, "truncated: the file ends inside a block (byte "
                    + size + ", the last whole block ends at byte " + parser.boundary + ")");
        }
    }

    private final class Parser extends BinaryParser {
        private final OsmSink sink;
        private final boolean nodes;
        private final boolean ways;
        BoundedInputStream counter;
        int blocks;
        long boundary;
        boolean sawHeader;
        private long latOffset;
        private long lonOffset;

        Parser(OsmSink sink, boolean nodes, boolean ways) {
            this.sink = sink;
            this.nodes = nodes;
            this.ways = ways;
        }

        @Override
        public void handleBlock(crosby.binary.file.FileBlock block) {
            blocks++;
            boundary = counter.getCount();
            super.handleBlock(block);
        }

        @Override
        public void parse(Osmformat.PrimitiveBlock block) {
            latOffset = block.getLatOffset();
            lonOffset = block.getLonOffset();
            super.parse(block);
        }

        /**
         * Degrees from a coordinate in granularity units, divided (not multiplied by 1e-9) so the result is
         * the double nearest the exact value: the same double the XML text of the same node parses to.
         */
        private double degrees(long offset, long units) {
            return (offset + (long) granularity * units) / 1e9;
        }

        @Override
        protected void parse(Osmformat.HeaderBlock header) {
            sawHeader = true;
            for (String feature : header.getRequiredFeaturesList()) {
                if (!FEATURES.contains(feature)) {
                    throw InputError.at(file, "header", "requires the unsupported feature \"" + feature + "\"");
                }
            }
        }

        @Override
        protected void parseDense(Osmformat.DenseNodes dense) {
            if (!nodes) {
                return;
            }
            long id = 0, lat = 0, lon = 0;
            for (int i = 0; i < dense.getIdCount(); i++) {
                id += dense.getId(i);
                lat += dense.getLat(i);
                lon += dense.getLon(i);
                sink.node(id, degrees(lonOffset, lon), degrees(latOffset, lat));
            }
        }

        @Override
        protected void parseNodes(List<Osmformat.Node> list) {
            if (!nodes) {
                return;
            }
            for (Osmformat.Node node : list) {
                sink.node(node.getId(), degrees(lonOffset, node.getLon()), degrees(latOffset, node.getLat()));
            }
        }

        @Override
        protected void parseWays(List<Osmformat.Way> list) {
            if (!ways) {
                return;
            }
            for (Osmformat.Way way : list) {
                Map<String, String> tags = new HashMap<>();
                for (int i = 0; i < way.getKeysCount(); i++) {
                    String key = getStringById(way.getKeys(i));
                    if (keys.contains(key)) {
                        tags.put(key, getStringById(way.getVals(i)));
                    }
                }
                long[] refs = new long[way.getRefsCount()];
                long ref = 0;
                for (int i = 0; i < refs.length; i++) {
                    ref += way.getRefs(i);
                    refs[i] = ref;
                }
                sink.way(way.getId(), refs, tags);
            }
        }

        @Override
        protected void parseRelations(List<Osmformat.Relation> list) {
            // relations (turn restrictions, routes) are not used for planning yet
        }

        @Override
        public void complete() {
            // nothing to finish: the sink holds what was read
        }
    }
}
