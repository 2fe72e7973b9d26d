package org.streetcomb.read;

import crosby.binary.BinaryParser;
import crosby.binary.Osmformat;
import crosby.binary.Fileformat;
import java.io.BufferedInputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import org.streetcomb.InputError;

/**
 * Streams an OpenStreetMap PBF file (.osm.pbf) block by block (https://wiki.openstreetmap.org/wiki/PBF_Format).
 * The block loop is written here rather than left to osmpbf's BlockInputStream because that one allocates
 * whatever raw size a block header claims before anyone can look at it (a 55 KB file claiming 2 GB took 4 GB
 * of heap): here every length is checked against the format's limits first, and a file must end where a block
 * ends. osmpbf's classes then decode each block and resolve its string table, offsets and granularity; this
 * class decodes the delta-coded ids, coordinates and node references of dense nodes and ways. Linear in the
 * file's size; one block (at most 32 MiB) in memory at a time.
 */
final class OsmPbfSource implements OsmSource {

    /** Header features this reader understands; a file requiring any other is refused. */
    private static final Set<String> FEATURES = Set.of("OsmSchema-V0.6", "DenseNodes");

    /** The PBF format's limits: a block header under 64 KiB, a block under 32 MiB packed or unpacked. */
    static final int MAX_HEADER_BYTES = 64 * 1024;
    static final int MAX_BLOB_BYTES = 32 * 1024 * 1024;

    private final Path file;
    private final Set<String> keys;

    OsmPbfSource(Path file, Set<String> keys) {
        this.file = file;
        this.keys = keys;
    }

    @Override
    public void stream(OsmSink sink, boolean nodes, boolean ways) {
        Parser parser = new Parser(sink, nodes, ways);
        try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(file), 1 << 16))) {
            long position = 0;
            int headerLength;
            while ((headerLength = readLength(in)) >= 0) {
                String place = "block " + (parser.blocks + 1) + " at byte " + position;
                if (headerLength < 0 || headerLength > MAX_HEADER_BYTES) {
                    throw InputError.at(file, place, "the block header claims " + headerLength + " bytes; the PBF "
                            + "format allows at most " + MAX_HEADER_BYTES + ": not an OSM PBF file, or corrupt");
                }
                Fileformat.BlobHeader header = Fileformat.BlobHeader.parseFrom(readFully(in, headerLength, place));
                if (header.getDatasize() < 0 || header.getDatasize() > MAX_BLOB_BYTES) {
                    throw InputError.at(file, place, "the block claims " + header.getDatasize() + " bytes; the PBF "
                            + "format allows at most " + MAX_BLOB_BYTES + " (32 MiB): corrupt");
                }
                byte[] data = inflate(Fileformat.Blob.parseFrom(readFully(in, header.getDatasize(), place)), place);
                position += 4L + headerLength + header.getDatasize();
                parser.blocks++;
                if (header.getType().equals("OSMHeader")) {
                    parser.parse(Osmformat.HeaderBlock.parseFrom(data));
                } else if (header.getType().equals("OSMData")) {
                    if (!parser.sawHeader) {
                        throw InputError.at(file, place, "not an OSM PBF file: data before the OSMHeader block");
                    }
                    parser.parse(Osmformat.PrimitiveBlock.parseFrom(data));
                }
                // blocks of other types are skipped, as the format asks of readers that do not know them
            }
        } catch (InputError e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw InputError.at(file, parser.blocks == 0 ? "header" : "after block " + parser.blocks,
                    "not a readable OSM PBF file (truncated or corrupt): " + InputError.inWords(e));
        }
        if (!parser.sawHeader) {
            throw InputError.at(file, null, "not an OSM PBF file: no OSMHeader block");
        }
    }

    /** The 4-byte big-endian length that starts a block, or -1 at the end of the file. */
    private int readLength(DataInputStream in) throws IOException {
        int first = in.read();
        if (first < 0) {
            return -1;
        }
        byte[] rest = readFully(in, 3, "the length of the next block");
        return first << 24 | (rest[0] & 0xff) << 16 | (rest[1] & 0xff) << 8 | rest[2] & 0xff;
    }

    /** {@code length} bytes, refused in words when the file ends first. */
    private byte[] readFully(DataInputStream in, int length, String place) throws IOException {
        byte[] bytes = in.readNBytes(length);
        if (bytes.length < length) {
            throw InputError.at(file, place, "truncated: the file ends inside a block (" + bytes.length + " of its "
                    + length + " bytes are there)");
        }
        return bytes;
    }

    /** The block's contents, its stated raw size checked against the format's cap before anything is allocated. */
    private byte[] inflate(Fileformat.Blob blob, String place) {
        if (blob.hasRaw()) {
            return blob.getRaw().toByteArray();
        }
        if (!blob.hasZlibData()) {
            throw InputError.at(file, place, "compressed in a way this reader does not support (only zlib and none)");
        }
        int size = blob.getRawSize();
        if (size < 0 || size > MAX_BLOB_BYTES) {
            throw InputError.at(file, place, "the block claims to hold " + Integer.toUnsignedLong(size) + " bytes; "
                    + "the PBF format allows at most " + MAX_BLOB_BYTES + " (32 MiB): corrupt");
        }
        Inflater inflater = new Inflater();
        try {
            inflater.setInput(blob.getZlibData().toByteArray());
            byte[] data = new byte[size];
            int length = inflater.inflate(data);
            if (length != size || !inflater.finished()) {
                throw InputError.at(file, place, "the block's compressed data do not inflate to the "
                        + size + " bytes it claims: corrupt");
            }
            return data;
        } catch (DataFormatException e) {
            throw InputError.at(file, place, "the block's compressed data are corrupt (" + InputError.inWords(e) + ")");
        } finally {
            inflater.end();
        }
    }

    private final class Parser extends BinaryParser {
        private final OsmSink sink;
        private final boolean nodes;
        private final boolean ways;
        int blocks;
        boolean sawHeader;
        private long latOffset;
        private long lonOffset;

        Parser(OsmSink sink, boolean nodes, boolean ways) {
            this.sink = sink;
            this.nodes = nodes;
            this.ways = ways;
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
