package org.streetcomb.read;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.PrecisionModel;
import org.streetcomb.InputError;

/**
 * Reads road centrelines from an ESRI shapefile (.shp with its .shx index, .dbf attributes, .prj
 * coordinate system and optional .cpg encoding), or from a .zip holding one.
 *
 * <p>Geometry is streamed by {@link ShpLineReader} and attributes by {@link DbfAttributes}, one record at a
 * time in step; every part of a PolyLine becomes one road line, transformed to WGS 84 by
 * {@link Wgs84Transform}. The .shx and .dbf must hold as many records as the .shp. The CRS comes from the
 * .prj, or from the --crs option, which takes precedence; a layer with neither is refused.
 */
final class ShapefileReader implements LayerReader {

    private static final GeometryFactory GEOMETRY = new GeometryFactory(new PrecisionModel(), 4326);

    private final ReadOptions options;
    private final AttributeMapping mapping;

    ShapefileReader(ReadOptions options) {
        this.options = options;
        this.mapping = new AttributeMapping(options);
    }

    @Override
    public RoadLayer read(Path file) {
        if (!ShapefileZip.extension(file.getFileName().toString()).equals(".zip")) {
            return read(file, file.toString(), file);
        }
        Path folder = null;
        try {
            folder = Files.createTempDirectory("streetcomb-shp").toRealPath();
            Path shp = ShapefileZip.unpack(file, folder);
            return read(shp, file + "!" + folder.relativize(shp), file);
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot unpack into a temporary folder: " + e.getMessage());
        } finally {
            deleteQuietly(folder);
        }
    }

    private RoadLayer read(Path shp, String label, Path source) {
        Path shx = sidecar(shp, ".shx", label);
        Path dbf = sidecar(shp, ".dbf", label);
        Path prj = find(shp, ".prj");
        Path cpg = find(shp, ".cpg");
        ReadTally tally = new ReadTally();
        try (ShpLineReader shapes = new ShpLineReader(shp, label);
             DbfAttributes attributes = new DbfAttributes(dbf, cpg == null ? null : charset(cpg, label), sibling(label, ".dbf"))) {
            int indexed = indexedRecords(shx, sibling(label, ".shx"));
            if (attributes.recordCount() != indexed) {
                throw InputError.at(sibling(label, ".dbf"), null, "holds " + attributes.recordCount()
                        + " records but the .shp index (.shx) holds " + indexed + ": the files do not belong together");
            }
            Wgs84Transform toWgs84 = toWgs84(prj, label, shapes.minX(), shapes.minY(), shapes.maxX(), shapes.maxY(), tally);
            for (ShpLineReader.Shape shape; (shape = shapes.next()) != null; ) {
                if (shape.number() > indexed) {
                    break;
                }
                Map<String, String> properties = attributes.next(tally);
                tally.feature();
                if (shape.parts().length == 0) {
                    tally.skip("null shape");
                } else if (mapping.keeps(properties, tally)) {
                    List<LineString> lines = new ArrayList<>();
                    for (double[] xy : shape.parts()) {
                        addLine(lines, xy, toWgs84, tally, label, shape.number());
                    }
                    // the id is the FID desktop GIS shows (GDAL counts features from 0; the format's records from 1)
                    mapping.keep(String.valueOf(shape.number() - 1), properties, lines, tally,
                            label + ": feature " + (shape.number() - 1));
                }
            }
            if (shapes.recordsRead() != indexed) {
                throw InputError.at(label, null, "holds " + shapes.recordsRead() + " records but its index (.shx) holds "
                        + indexed + ": the files do not belong together");
            }
            if (tally.isEmpty()) {
                throw InputError.at(label, null, "no road lines kept among " + tally.features() + " records (skipped: "
                        + tally.skippedText() + ")");
            }
            return tally.layer(source, toWgs84.description());
        } catch (IOException e) {
            throw InputError.at(label, null, "cannot read: " + e.getMessage());
        }
    }

    private static void addLine(List<LineString> lines, double[] xy, Wgs84Transform toWgs84, ReadTally tally,
                                String label, int record) {
        int n = xy.length / 2;
        if (n < 2) {
            tally.skip("line part with fewer than 2 points");
            return;
        }
        Coordinate[] coords = toWgs84.lonLat(xy, n, label, "feature " + (record - 1));
        lines.add(GEOMETRY.createLineString(coords));
    }

    private Wgs84Transform toWgs84(Path prj, String label, double minX, double minY, double maxX, double maxY,
                                   ReadTally tally) {
        if (options.crs() != null) {
            Wgs84Transform chosen = Wgs84Transform.forOption(options.crs(), minX, minY, maxX, maxY);
            if (prj != null) {
                noteDisagreement(chosen, prj, label, minX, minY, maxX, maxY, tally);
            }
            return chosen;
        }
        if (prj == null) {
            throw InputError.at(label, null, "no .prj file says which coordinate reference system the layer uses: "
                    + "state it with --crs=EPSG:code (or --crs=FILE holding its WKT)");
        }
        try {
            return Wgs84Transform.forWkt(Files.readString(prj, StandardCharsets.ISO_8859_1), sibling(label, ".prj"),
                    minX, minY, maxX, maxY);
        } catch (IOException e) {
            throw InputError.at(sibling(label, ".prj"), null, "cannot read: " + e.getMessage());
        }
    }

    /**
     * --crs takes precedence over the .prj, but not silently: when the two put the middle of the layer more
     * than a kilometre apart, the read report says so (a wrong --crs otherwise shows only as a puzzling
     * failure later, such as no street of positive length after noding).
     */
    private void noteDisagreement(Wgs84Transform chosen, Path prj, String label, double minX, double minY,
                                  double maxX, double maxY, ReadTally tally) {
        Wgs84Transform stated;
        try {
            stated = Wgs84Transform.forWkt(Files.readString(prj, StandardCharsets.ISO_8859_1), sibling(label, ".prj"),
                    minX, minY, maxX, maxY);
        } catch (IOException | InputError unusable) {
            return; // a .prj that cannot be used is what --crs is for
        }
        double[] a = {(minX + maxX) / 2, (minY + maxY) / 2};
        double[] b = a.clone();
        try {
            chosen.transform(a, 1);
            stated.transform(b, 1);
        } catch (InputError outside) {
            return;
        }
        double km = Math.hypot((a[0] - b[0]) * Math.cos(Math.toRadians((a[1] + b[1]) / 2)), a[1] - b[1]) * 111.32;
        if (!(km <= 1)) {
            tally.note(String.format(java.util.Locale.ROOT, "--crs %s overrides the .prj, which puts the layer's "
                    + "middle %.0f km away; check which is right", options.crs(), km));
        }
    }

    /** Records in the .shx index: (file length - 100 bytes) / 8, after checking its header. */
    static int indexedRecords(Path shx, String label) throws IOException {
        long size = Files.size(shx);
        try (InputStream in = Files.newInputStream(shx)) {
            byte[] head = in.readNBytes(100);
            if (head.length < 100 || ByteBuffer.wrap(head).getInt(0) != 9994 || (size - 100) % 8 != 0) {
                throw InputError.at(label, null, "not a valid shapefile index (truncated or not a .shx file)");
            }
        }
        return (int) ((size - 100) / 8);
    }

    /**
     * The character set a .cpg names, or null when it names none (an empty .cpg says nothing, as if there were
     * none). A name Java does not know, or text that is no name at all, is refused in one line.
     */
    static Charset charset(Path cpg, String label) throws IOException {
        byte[] bytes;
        try (var in = Files.newInputStream(cpg)) {
            bytes = in.readNBytes(256); // real .cpg files hold one short name
        }
        String name = new String(bytes, StandardCharsets.ISO_8859_1).strip();
        if (name.isEmpty()) {
            return null;
        }
        String windows = name.replaceAll("^(?i)(ansi|cp)[ _]?", "windows-");
        for (String candidate : new String[] {name, windows, "windows-" + name}) {
            try {
                if (Charset.isSupported(candidate)) {
                    return Charset.forName(candidate);
                }
            } catch (IllegalArgumentException notAName) {
                // IllegalCharsetNameException: spaces, control characters and the like; try the next reading
            }
        }
        String shown = name.length() > 40 ? name.substring(0, 40) + "..." : name;
        throw InputError.at(sibling(label, ".cpg"), null, "unknown character encoding '"
                + shown.replaceAll("\\p{Cntrl}", "?") + "'");
    }

    static Path sidecar(Path shp, String extension, String label) {
        Path found = find(shp, extension);
        if (found == null) {
            throw InputError.at(sibling(label, extension), null, "missing: a shapefile needs its " + extension
                    + " file beside the .shp, with the same name");
        }
        return found;
    }

    /** The file beside {@code shp} with the same base name and this extension, in any letter case. */
    static Path find(Path shp, String extension) {
        String name = shp.getFileName().toString();
        String base = name.substring(0, name.length() - 4);
        Path folder = shp.toAbsolutePath().getParent();
        try (DirectoryStream<Path> siblings = Files.newDirectoryStream(folder)) {
            for (Path sibling : siblings) {
                String other = sibling.getFileName().toString();
                if (other.length() == name.length() && other.startsWith(base)
                        && other.substring(base.length()).toLowerCase(Locale.ROOT).equals(extension)) {
                    return sibling;
                }
            }
        } catch (IOException e) {
            throw InputError.at(folder, null, "cannot list the folder: " + e.getMessage());
        }
        return null;
    }

    static String sibling(String label, String extension) {
        return label.substring(0, label.length() - 4) + extension;
    }

    static void deleteQuietly(Path folder) {
        if (folder == null) {
            return;
        }
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException ignored) {
            // a leftover temporary folder is harmless
        }
    }
}
