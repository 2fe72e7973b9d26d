package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Broken shapefiles give a one-line error naming the file and what is wrong, exit code 3, no stack trace
 * and no output file. Each case damages a copy of a real fixture the way the ESRI Shapefile Technical
 * Description (1998) says a reader must notice: lengths, record counts, shape types.
 */
class ShapefileBadInputTest {

    private static final Path MESA = Path.of("fixtures/shapefiles/mesa-az-stateplane-ft");
    private static final Path AURICH = Path.of("fixtures/shapefiles/aurich-dhdn-gk2");

    @TempDir
    Path dir;

    private Path copy(Path folder, String base) throws IOException {
        for (String ext : new String[] {".shp", ".shx", ".dbf", ".prj"}) {
            Files.copy(folder.resolve(base + ext), dir.resolve(base + ext));
        }
        return dir.resolve(base + ".shp");
    }

    private void assertRefused(Path layer, String expected, String... options) {
        Refusals.assertRefused(dir, layer, expected, options);
    }

    @Test
    void truncatedShp() throws IOException {
        Path shp = copy(MESA, "streets");
        byte[] bytes = Files.readAllBytes(shp);
        Files.write(shp, java.util.Arrays.copyOf(bytes, bytes.length - 30));
        assertRefused(shp, "streets.shp: truncated", "--crs=EPSG:2223");
    }

    @Test
    void dbfRecordCountDiffers() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.copy(AURICH.resolve("roads.dbf"), dir.resolve("streets.dbf"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        assertRefused(shp, "streets.dbf: holds 956 records but the .shp index (.shx) holds 293", "--crs=EPSG:2223");
    }

    @Test
    void missingShx() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.delete(dir.resolve("streets.shx"));
        assertRefused(shp, "streets.shx: missing", "--crs=EPSG:2223");
    }

    @Test
    void unsupportedShapeType() throws IOException {
        Path shp = copy(MESA, "streets");
        byte[] bytes = Files.readAllBytes(shp);
        bytes[32] = 5; // Polygon, little-endian shape type at byte 32 of the main header
        Files.write(shp, bytes);
        assertRefused(shp, "shape type 5 (Polygon) is not a line layer", "--crs=EPSG:2223");
    }

    @Test
    void prjThatDoesNotParse() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.writeString(dir.resolve("streets.prj"), "PROJCS[\"broken\",GEOGCS[");
        assertRefused(shp, "streets.prj: the coordinate reference system does not parse");
    }

    @Test
    void costFieldWithoutAValue() throws IOException {
        Path shp = copy(MESA, "streets");
        assertRefused(shp, "streets.shp: feature 0: cost field MINUTES holds nothing", "--crs=EPSG:2223", "--cost-field=MINUTES");
    }

    @Test
    void missingPrjWithoutCrsOption() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.delete(dir.resolve("streets.prj"));
        assertRefused(shp, "no .prj file");
    }

    @Test
    void invalidUtf8WhenTheCpgSaysUtf8() throws IOException {
        Path shp = copy(AURICH, "roads");
        Files.writeString(dir.resolve("roads.cpg"), "UTF-8");
        byte[] dbf = Files.readAllBytes(dir.resolve("roads.dbf"));
        for (int i = 0; i + 1 < dbf.length; i++) {
            if ((dbf[i] & 0xff) == 0xc3 && (dbf[i + 1] & 0xff) == 0x9f) { // "ß" in UTF-8
                dbf[i] = (byte) 0xdf; // "ß" in ISO-8859-1: not valid UTF-8 before a space
                dbf[i + 1] = ' ';
                break;
            }
        }
        Files.write(dir.resolve("roads.dbf"), dbf);
        assertRefused(shp, "text is not valid UTF-8");
    }

    @Test
    void zipWithoutShp() throws IOException {
        Path zip = dir.resolve("layer.zip");
        try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(zip))) {
            entry(out, "readme.txt", "no shapefile here".getBytes(StandardCharsets.UTF_8));
        }
        assertRefused(zip, "layer.zip: the archive holds no .shp file");
    }

    @Test
    void zipEntryEscapingTheFolder() throws IOException {
        Path zip = dir.resolve("layer.zip");
        try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(zip))) {
            entry(out, "../../escaped.shp", Files.readAllBytes(MESA.resolve("streets.shp")));
        }
        assertRefused(zip, "entry ../../escaped.shp: the path leads outside");
        assertFalse(Files.exists(dir.getParent().getParent().resolve("escaped.shp")));
    }

    @Test
    void zippedShapefileReads() throws IOException {
        Path zip = dir.resolve("mesa.zip");
        try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(zip))) {
            for (String ext : new String[] {".shp", ".shx", ".dbf", ".prj"}) {
                entry(out, "mesa/streets" + ext, Files.readAllBytes(MESA.resolve("streets" + ext)));
            }
        }
        RoadLayer layer = LayerReaders.read(zip, ReadOptions.DEFAULTS.withCrs("EPSG:2223"));
        // SOURCES.md (measured with ogrinfo): 293 LineStrings
        assertEquals(293, layer.report().featuresRead());
    }

    @Test
    void emptyCpgReadsAsIfThereWereNone() throws IOException {
        // an empty .cpg once ended in an IllegalCharsetNameException and a stack trace
        Path shp = copy(MESA, "streets");
        Files.writeString(dir.resolve("streets.cpg"), "\r\n");
        java.io.StringWriter err = new java.io.StringWriter();
        int code = org.streetcomb.cli.Main.run(new String[] {"plan", shp.toString(), "--out=" + dir.resolve("t.geojson"),
                "--crs=EPSG:2223"}, new java.io.PrintWriter(new java.io.StringWriter()), new java.io.PrintWriter(err, true));
        assertEquals(0, code, err.toString());
    }

    @Test
    void cpgNamingNoCharacterSet() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.writeString(dir.resolve("streets.cpg"), "not a name\u0001");
        assertRefused(shp, "streets.cpg: unknown character encoding 'not a name?'", "--crs=EPSG:2223");
    }

    /** The .dbf with a little-endian 16-bit value at {@code offset} of its header replaced. */
    private Path dbfWith(int offset, int delta) throws IOException {
        Path shp = dir.resolve("streets.shp");
        if (!Files.exists(shp)) {
            copy(MESA, "streets");
        }
        Path dbf = dir.resolve("streets.dbf");
        byte[] bytes = Files.readAllBytes(MESA.resolve("streets.dbf"));
        java.nio.ByteBuffer b = java.nio.ByteBuffer.wrap(bytes).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        b.putShort(offset, (short) (Short.toUnsignedInt(b.getShort(offset)) + delta));
        Files.write(dbf, bytes);
        return shp;
    }

    @Test
    void dbfHeaderLyingAboutItsLength() throws IOException {
        // dBase header bytes 8-9 (header length) and 10-11 (record length), as the ESRI shapefile description's
        // dBase table uses them; a lie once gave every street the name '' and exit 0
        assertRefused(dbfWith(8, 64), "streets.dbf: header: states", "--crs=EPSG:2223");
        assertRefused(dbfWith(8, -32), "but its field list runs to byte", "--crs=EPSG:2223");
        assertRefused(dbfWith(10, 7), "but its fields add up to", "--crs=EPSG:2223");
    }

    @Test
    void crsThatDisagreesWithThePrjIsNoted() throws IOException {
        // the .prj is NAD83 / Arizona Central (US feet); UTM zone 12N metres puts the streets in the Pacific
        Path shp = copy(MESA, "streets");
        assertEquals(java.util.List.of(), LayerReaders.read(shp, ReadOptions.DEFAULTS.withCrs("EPSG:2223")).report().notes()
                .keySet().stream().filter(n -> n.contains("overrides")).toList());
        String notes = String.join("; ", LayerReaders.read(shp, ReadOptions.DEFAULTS.withCrs("EPSG:32612")).report().notes().keySet());
        org.junit.jupiter.api.Assertions.assertTrue(notes.contains("--crs EPSG:32612 overrides the .prj, which puts the layer's middle "), notes);
    }

    @Test
    void prjNestedTooDeep() throws IOException {
        // A hostile .prj nested thousands of brackets deep once overflowed the WKT parser's stack
        Path shp = copy(MESA, "streets");
        Files.writeString(dir.resolve("streets.prj"), "PROJCS[".repeat(5_000) + "]".repeat(5_000));
        assertRefused(shp, "streets.prj: character 231: the coordinate reference system definition is nested more than 32");
    }

    @Test
    void prjTooLong() throws IOException {
        Path shp = copy(MESA, "streets");
        Files.writeString(dir.resolve("streets.prj"), "PROJCS[".repeat(100_000));
        assertRefused(shp, "streets.prj: 700000 characters is too long for a coordinate reference system definition");
    }

    @Test
    void crsTextNestedTooDeep() throws IOException {
        Path shp = copy(MESA, "streets");
        Path wkt = dir.resolve("deep.wkt");
        Files.writeString(wkt, "GEOGCS[".repeat(5_000));
        assertRefused(shp, "nested more than 32 brackets deep", "--crs=" + wkt);
    }

    @Test
    void geocentricCrsRefusedInWords() throws IOException {
        // EPSG:4978 is WGS 84 geocentric (X, Y, Z from the earth's centre); it once ended in an array index error
        Path shp = copy(MESA, "streets");
        assertRefused(shp, "WGS 84 is a geocentric coordinate reference system", "--crs=EPSG:4978");
    }

    @Test
    void crsWktTakenAsThePrjWouldBe() throws IOException {
        // The same ESRI text that a .prj may hold, given on the command line (as a file and as text), plans
        Path shp = copy(MESA, "streets");
        String prj = Files.readString(dir.resolve("streets.prj"));
        Files.delete(dir.resolve("streets.prj"));
        Path wkt = dir.resolve("grid.wkt");
        Files.writeString(wkt, prj);
        for (String crs : new String[] {wkt.toString(), prj}) {
            java.io.StringWriter err = new java.io.StringWriter();
            int code = org.streetcomb.cli.Main.run(new String[] {"plan", shp.toString(), "--out=" + dir.resolve("t.geojson"),
                    "--crs=" + crs}, new java.io.PrintWriter(new java.io.StringWriter()), new java.io.PrintWriter(err, true));
            assertEquals(0, code, err.toString());
        }
    }

    private static void entry(ZipOutputStream out, String name, byte[] bytes) throws IOException {
        out.putNextEntry(new ZipEntry(name));
        out.write(bytes);
        out.closeEntry();
    }
}
