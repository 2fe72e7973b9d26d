package org.streetcomb.read;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.streetcomb.InputError;

/**
 * Streams the line records of a .shp file, one record at a time, as described in the ESRI Shapefile
 * Technical Description (ESRI white paper, July 1998): a 100-byte main header (file code 9994 and file
 * length in 16-bit words, big-endian; version 1000, shape type and bounding box, little-endian), then
 * records of an 8-byte big-endian header (record number, content length in words) and a little-endian
 * content. Road layers must be PolyLine (3), PolyLineZ (13) or PolyLineM (23); a reader made with
 * {@link #anyShape} also takes Polygon (5, 15, 25: the same record layout, parts are rings) and Point (1, 11,
 * 21) layers, for area and depot layers. Z and M values follow the x,y points and are skipped. Null shapes
 * (0) are allowed in any layer.
 *
 * <p>Written by hand because no maintained .shp geometry reader is published on Maven Central apart
 * from large GIS stacks (see /work/shared/LIBRARIES.md); the record format is small and fully specified.
 * Every length read from the file is checked against the record and the file, so a truncated or
 * corrupt file gives a one-line error naming the record, never an exception from deep inside.
 */
final class ShpLineReader implements Closeable {

    static final int NULL_SHAPE = 0;
    private static final int FILE_CODE = 9994;
    private static final int VERSION = 1000;
    private static final int HEADER_BYTES = 100;
    private static final Map<Integer, String> SHAPE_NAMES = Map.ofEntries(Map.entry(0, "Null"), Map.entry(1, "Point"),
            Map.entry(3, "PolyLine"), Map.entry(5, "Polygon"), Map.entry(8, "MultiPoint"), Map.entry(11, "PointZ"),
            Map.entry(13, "PolyLineZ"), Map.entry(15, "PolygonZ"), Map.entry(18, "MultiPointZ"), Map.entry(21, "PointM"),
            Map.entry(23, "PolyLineM"), Map.entry(25, "PolygonM"), Map.entry(28, "MultiPointM"),
            Map.entry(31, "MultiPatch"));

    /** One record: its parts as packed x,y pairs; no parts for a null shape. */
    record Shape(int number, double[][] parts) {
    }

    private final String label;
    private final DataInputStream in;
    private final long fileBytes;
    private final long end;
    private final int shapeType;
    private final double minX, minY, maxX, maxY;
    private long offset;
    private int records;
    private byte[] buffer = new byte[1024];

    /** @param label how errors name the file (for a zip member, the zip and the member) */
    ShpLineReader(Path file, String label) throws IOException {
        this(file, label, false);
    }

    /** A reader of line, polygon or point layers; {@link #shapeType()} says which. */
    static ShpLineReader anyShape(Path file, String label) throws IOException {
        return new ShpLineReader(file, label, true);
    }

    private ShpLineReader(Path file, String label, boolean anyShape) throws IOException {
        this.label = label;
        this.fileBytes = Files.size(file);
        this.in = new DataInputStream(new BufferedInputStream(Files.newInputStream(file), 1 << 16));
        ByteBuffer header = read(HEADER_BYTES, "the 100-byte header");
        if (header.order(ByteOrder.BIG_ENDIAN).getInt(0) != FILE_CODE) {
            throw error(null, "not a shapefile: the file code is not 9994");
        }
        long declared = 2L * header.getInt(24);
        if (declared > fileBytes) {
            throw error(null, "truncated: the header declares " + declared + " bytes, the file has " + fileBytes);
        }
        end = declared;
        header.order(ByteOrder.LITTLE_ENDIAN);
        if (header.getInt(28) != VERSION) {
            throw error(null, "unsupported shapefile version " + header.getInt(28) + " (expected 1000)");
        }
        shapeType = header.getInt(32);
        boolean lines = shapeType == 3 || shapeType == 13 || shapeType == 23;
        if (anyShape && !lines && !isPolygon(shapeType) && !isPoint(shapeType)) {
            throw error(null, "shape type " + shapeType + " (" + SHAPE_NAMES.getOrDefault(shapeType, "unknown")
                    + ") is not a line, polygon or point layer");
        }
        if (!anyShape && !lines) {
            throw error(null, "shape type " + shapeType + " (" + SHAPE_NAMES.getOrDefault(shapeType, "unknown")
                    + ") is not a line layer: expected PolyLine, PolyLineZ or PolyLineM road centrelines");
        }
        minX = header.getDouble(36);
        minY = header.getDouble(44);
        maxX = header.getDouble(52);
        maxY = header.getDouble(60);
    }

    static boolean isPolygon(int type) {
        return type == 5 || type == 15 || type == 25;
    }

    static boolean isPoint(int type) {
        return type == 1 || type == 11 || type == 21;
    }

    int shapeType() {
        return shapeType;
    }

    double minX() {
        return minX;
    }

    double minY() {
        return minY;
    }

    double maxX() {
        return maxX;
    }

    double maxY() {
        return maxY;
    }

    /** Byte offset in the file where the next record starts (for checking against the .shx index). */
    long offset() {
        return offset;
    }

    int recordsRead() {
        return records;
    }

    /** The next record, or null at the end of the file. */
    Shape next() throws IOException {
        if (offset >= end) {
            return null;
        }
        records++;
        ByteBuffer head = read(8, "the record header").order(ByteOrder.BIG_ENDIAN);
        long contentBytes = 2L * head.getInt(4);
        if (contentBytes < 4 || offset + contentBytes > end) {
            throw error(records, "truncated or corrupt: the record needs " + contentBytes + " bytes at byte " + offset
                    + ", the file ends at " + end);
        }
        ByteBuffer content = read((int) contentBytes, "the record").order(ByteOrder.LITTLE_ENDIAN);
        int type = content.getInt(0);
        if (type == NULL_SHAPE) {
            return new Shape(records, new double[0][]);
        }
        if (type != shapeType) {
            throw error(records, "shape type " + type + " (" + SHAPE_NAMES.getOrDefault(type, "unknown")
                    + ") in a layer of type " + shapeType);
        }
        if (isPoint(type)) {
            if (contentBytes < 20) {
                throw error(records, "record too short for a Point");
            }
            return new Shape(records, new double[][] {{content.getDouble(4), content.getDouble(12)}});
        }
        return new Shape(records, parts(content, contentBytes));
    }

    private double[][] parts(ByteBuffer content, long contentBytes) {
        if (contentBytes < 44) {
            throw error(records, "record too short for a PolyLine");
        }
        int numParts = content.getInt(36);
        int numPoints = content.getInt(40);
        long needed = 44L + 4L * numParts + 16L * numPoints;
        if (numParts < 0 || numPoints < 0 || needed > contentBytes) {
            throw error(records, numParts + " parts and " + numPoints + " points do not fit in the record's "
                    + contentBytes + " bytes");
        }
        double[][] parts = new double[numParts][];
        int pointBase = 44 + 4 * numParts;
        for (int p = 0; p < numParts; p++) {
            int start = content.getInt(44 + 4 * p);
            int end = p + 1 < numParts ? content.getInt(44 + 4 * (p + 1)) : numPoints;
            if (start < 0 || end < start || end > numPoints) {
                throw error(records, "part " + (p + 1) + " has point indices " + start + ".." + end + " outside 0.."
                        + numPoints);
            }
            double[] xy = new double[2 * (end - start)];
            for (int i = 0; i < xy.length; i++) {
                xy[i] = content.getDouble(pointBase + 8 * (2 * start + i));
            }
            parts[p] = xy;
        }
        return parts;
    }

    private ByteBuffer read(int bytes, String what) throws IOException {
        if (buffer.length < bytes) {
            buffer = new byte[Math.max(bytes, 2 * buffer.length)];
        }
        try {
            in.readFully(buffer, 0, bytes);
        } catch (EOFException e) {
            throw error(records == 0 ? null : records, "truncated: the file ends inside " + what + " at byte " + offset);
        }
        offset += bytes;
        return ByteBuffer.wrap(buffer, 0, bytes);
    }

    private InputError error(Integer record, String problem) {
        return InputError.at(label, record == null ? null : "record " + record, problem);
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
