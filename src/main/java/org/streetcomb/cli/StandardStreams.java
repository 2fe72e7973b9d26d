package org.streetcomb.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.streetcomb.InputError;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * {@code -} for standard input and output, as shell users expect: one input file argument (a layer or a GPS
 * track) may be {@code -} to read the data piped in, and one text output marked
 * {@link Writes#standardOutput()} may be {@code -} to write it to standard output, the summary then going
 * to standard error so the data stay clean for the next program.
 *
 * <p>The readers need a file (formats are told by extension, a GeoPackage is a database), so the piped data
 * are kept in a private temporary folder under a name whose extension is sniffed from the first bytes, and
 * the output is written there and copied to standard output once the command has written it whole. Messages
 * name {@code -}, never the temporary file. Both are deleted when the command ends.
 */
final class StandardStreams implements AutoCloseable {

    static final String DASH = "-";

    private final Path folder;
    private final Path input;
    private final Path output;

    private StandardStreams(Path folder, Path input, Path output) {
        this.folder = folder;
        this.input = input;
        this.output = output;
    }

    /** Replaces {@code -} among the subcommand's file arguments; does nothing when none is {@code -}. */
    static StandardStreams attach(CommandLine.ParseResult parsed, InputStream stdin) {
        CommandLine.ParseResult sub = parsed;
        while (sub.hasSubcommand()) {
            sub = sub.subcommand();
        }
        CommandLine line = sub.commandSpec().commandLine();
        ArgSpec reads = null;
        ArgSpec writes = null;
        for (ArgSpec arg : sub.matchedArgs()) {
            if (!holdsDash(arg)) {
                continue;
            }
            Writes marked = arg.userObject() instanceof Field f ? f.getAnnotation(Writes.class) : null;
            String name = arg instanceof OptionSpec option ? option.longestName() : arg.paramLabel();
            if (marked != null && !marked.standardOutput()) {
                throw new OutputGuard.Clash(line, name + " cannot write to standard output (-): give a file name");
            }
            if (marked == null && !(arg instanceof PositionalParamSpec)) {
                throw new OutputGuard.Clash(line, name + " cannot read standard input (-): give a file name");
            }
            if (marked != null ? writes != null : reads != null) {
                throw new OutputGuard.Clash(line, "only one " + (marked != null ? "output" : "input")
                        + " can be standard " + (marked != null ? "output" : "input") + " (-)");
            }
            if (marked != null) {
                writes = arg;
            } else {
                reads = arg;
            }
        }
        if (reads == null && writes == null) {
            return new StandardStreams(null, null, null);
        }
        try {
            byte[] data = reads == null ? null : stdin.readAllBytes();
            String kind = reads == null ? null : extension(data, reads.paramLabel());
            Path folder = Files.createTempDirectory("streetcomb-");
            Path input = null;
            Path output = null;
            if (reads != null) {
                input = folder.resolve("standard-input" + kind);
                Files.write(input, data);
                replace(reads, input);
            }
            if (writes != null) {
                output = folder.resolve("standard-output" + outputExtension(writes));
                replace(writes, output);
                line.setOut(line.getErr());
            }
            return new StandardStreams(folder, input, output);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Copies the finished output to standard output. */
    void deliver(PrintWriter stdout) {
        if (output == null || !Files.exists(output)) {
            return;
        }
        try {
            stdout.print(Files.readString(output, StandardCharsets.UTF_8));
            stdout.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A message with the temporary files named as the user named them: {@code -}. */
    String named(String message) {
        String text = message;
        for (Path p : new Path[] {input, output}) {
            if (p != null) {
                text = text.replace(p.toString(), DASH).replace(p.getFileName().toString(), DASH);
            }
        }
        return text;
    }

    @Override
    public void close() {
        if (folder == null) {
            return;
        }
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            // a temporary folder left behind is not worth an error over a finished command
        }
    }

    private static boolean holdsDash(ArgSpec arg) {
        Object value = arg.getValue();
        if (value instanceof Path path) {
            return path.toString().equals(DASH);
        }
        return value instanceof Collection<?> list && list.stream().anyMatch(v -> v instanceof Path p
                && p.toString().equals(DASH));
    }

    @SuppressWarnings("unchecked")
    private static void replace(ArgSpec arg, Path path) {
        Object value = arg.getValue();
        if (value instanceof Path) {
            arg.setValue(path);
            return;
        }
        List<Path> paths = new ArrayList<>();
        for (Object v : (Collection<Object>) value) {
            paths.add(v instanceof Path p && p.toString().equals(DASH) ? path : (Path) v);
        }
        arg.setValue(paths);
    }

    /** The extension an output's readers expect: GeoJSON unless the option names another kind. */
    private static String outputExtension(ArgSpec arg) {
        String label = arg.paramLabel().toLowerCase(java.util.Locale.ROOT);
        if (label.endsWith(".html")) {
            return ".html";
        }
        String name = arg instanceof OptionSpec option ? option.longestName() : "";
        return name.endsWith("-ids") ? ".txt" : ".geojson";
    }

    /**
     * The extension that tells the readers the format of piped data, from its first bytes: the magic numbers
     * of gzip, bzip2, zip (a zipped shapefile) and SQLite (a GeoPackage), the "OSMHeader" block type that
     * opens every OSM PBF file, else the first non-blank character: '{' for GeoJSON, '<' for OSM XML, or
     * GPX when a track is read.
     */
    static String extension(byte[] data, String label) {
        boolean track = label.equals("TRACK");
        if (starts(data, new byte[] {0x1f, (byte) 0x8b})) {
            return ".osm.gz";
        }
        if (starts(data, "BZh".getBytes(StandardCharsets.US_ASCII))) {
            return ".osm.bz2";
        }
        if (starts(data, new byte[] {'P', 'K', 3, 4})) {
            return ".zip";
        }
        if (starts(data, "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII))) {
            return ".gpkg";
        }
        String head = new String(data, 0, Math.min(data.length, 64), StandardCharsets.ISO_8859_1);
        if (head.contains("OSMHeader")) {
            return ".osm.pbf";
        }
        String text = head.replace("\u00ef\u00bb\u00bf", "").strip();
        if (!track && (text.startsWith("{") || text.startsWith("["))) {
            return ".geojson";
        }
        if (text.startsWith("<")) {
            return track ? ".gpx" : ".osm";
        }
        throw InputError.at(Path.of(DASH), null, data.length == 0 ? "standard input is empty"
                : "standard input is not a format streetcomb reads as " + label + " (" + (track ? "GPX"
                : "GeoJSON, a zipped shapefile, a GeoPackage, OpenStreetMap XML or PBF") + ")");
    }

    private static boolean starts(byte[] data, byte[] prefix) {
        if (data.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if (data[i] != prefix[i]) {
                return false;
            }
        }
        return true;
    }

    /**
     * A writer that names the temporary files as the user named them ({@code -}) in everything the command
     * prints; the files are set once the command line is parsed.
     */
    static final class Naming extends java.io.FilterWriter {
        private StandardStreams streams;

        Naming(java.io.Writer out) {
            super(out);
        }

        void use(StandardStreams attached) {
            this.streams = attached;
        }

        @Override
        public void write(String text, int off, int len) throws IOException {
            String part = text.substring(off, off + len);
            String named = streams == null ? part : streams.named(part);
            out.write(named, 0, named.length());
        }

        @Override
        public void write(char[] chars, int off, int len) throws IOException {
            write(new String(chars, off, len), 0, len);
        }
    }
}
