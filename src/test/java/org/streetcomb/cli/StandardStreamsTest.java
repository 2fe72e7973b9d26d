package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

/**
 * {@code -} as standard input and output, the shell convention (common practice; POSIX utilities read
 * standard input for an operand "-"): piped layers in every format the readers take, a track piped to
 * audit, a tour written to standard output with the summary moved to standard error, messages that name
 * "-", and nothing left in the temporary folder.
 */
class StandardStreamsTest {

    private static final String DEMO = "fixtures/demo/brackenford.geojson";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(byte[] stdin, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new ByteArrayInputStream(stdin), new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    private static byte[] bytes(String file) throws IOException {
        return Files.readAllBytes(Path.of(file));
    }

    @Test
    void aPipedLayerPlansAsTheFileDoes() throws IOException {
        Run file = run(new byte[0], "plan", DEMO, "--depot=-31.2,44.6");
        Run piped = run(bytes(DEMO), "plan", "-", "--depot=-31.2,44.6");
        assertEquals(ExitCode.OK, piped.code(), piped.err());
        assertEquals(line(file.out(), "Tour"), line(piped.out(), "Tour"));
        assertTrue(piped.out().startsWith("Layer     -: 47 features"), piped.out());
        assertFalse(piped.out().contains("standard-input"), piped.out());
    }

    @Test
    void everyFormatIsToldFromItsFirstBytes() throws IOException {
        for (String layer : new String[] {"fixtures/osm/Helsinki.osm.pbf", "fixtures/osm/West-Oakland.osm.bz2",
                "fixtures/geopackage/mesa.gpkg"}) {
            Run file = run(new byte[0], "health", layer);
            Run piped = run(bytes(layer), "health", "-");
            assertEquals(file.code(), piped.code(), layer + ": " + piped.err());
            assertEquals(line(file.out(), "Network"), line(piped.out(), "Network"), layer);
        }
    }

    @Test
    void theTourGoesToStandardOutputAndTheSummaryToStandardError() throws IOException {
        Path written = dir.resolve("tour.geojson");
        assertEquals(ExitCode.OK, run(new byte[0], "plan", DEMO, "--depot=-31.2,44.6", "--out", written.toString()).code());
        Run piped = run(new byte[0], "plan", DEMO, "--depot=-31.2,44.6", "--out", "-");
        assertEquals(ExitCode.OK, piped.code(), piped.err());
        assertEquals(Files.readString(written, StandardCharsets.UTF_8), piped.out());
        assertTrue(piped.err().contains("Written   -"), piped.err());
    }

    @Test
    void aTrackCanBePipedToAudit() throws IOException {
        String drive = "fixtures/demo/brackenford-drive.gpx";
        Run file = run(new byte[0], "audit", DEMO, drive);
        Run piped = run(bytes(drive), "audit", DEMO, "-");
        assertEquals(ExitCode.OK, piped.code(), piped.err());
        assertEquals(line(file.out(), "Coverage"), line(piped.out(), "Coverage"));
    }

    @Test
    void badPipedDataIsNamedAsTheUserNamedIt() {
        Run r = run("{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\"".getBytes(StandardCharsets.UTF_8),
                "plan", "-");
        assertEquals(ExitCode.BAD_INPUT, r.code());
        assertTrue(r.err().startsWith("streetcomb: -: "), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        Run text = run("street list\n".getBytes(StandardCharsets.UTF_8), "plan", "-");
        assertEquals(ExitCode.BAD_INPUT, text.code());
        assertTrue(text.err().contains("standard input is not a format streetcomb reads"), text.err());
    }

    @Test
    void outputsThatAreNotOneTextFileRefuseStandardOutput() {
        Run r = run(new byte[0], "plan", DEMO, "--depot=-31.2,44.6", "--gpx", "-");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(r.err().contains("--gpx cannot write to standard output (-)"), r.err());
        assertFalse(Files.exists(Path.of("-")), "no file named -");
    }

    @Test
    void nothingIsLeftInTheTemporaryFolder() throws IOException {
        Path tmp = Path.of(System.getProperty("java.io.tmpdir"));
        long before = countOurs(tmp);
        run(bytes(DEMO), "plan", "-", "--depot=-31.2,44.6", "--out", "-");
        run("not a layer".getBytes(StandardCharsets.UTF_8), "plan", "-");
        assertEquals(before, countOurs(tmp));
    }

    private static long countOurs(Path tmp) throws IOException {
        try (Stream<Path> files = Files.list(tmp)) {
            return files.filter(p -> p.getFileName().toString().matches("streetcomb-[0-9]+")).count();
        }
    }

    private static String line(String text, String label) {
        return text.lines().filter(l -> l.startsWith(label)).findFirst().orElse("no " + label + " line in: " + text);
    }
}
