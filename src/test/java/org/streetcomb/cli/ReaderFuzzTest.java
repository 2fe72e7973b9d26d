package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;
import org.streetcomb.FolderHashes;

/**
 * Seeded mutation fuzzing of every reader through the command line (a mutation loop of our own, in the
 * manner of byte-level fuzzers: bit flips, interesting bytes and numbers, inserted, deleted, repeated and
 * truncated chunks). Each mutant of a real fixture is read by {@code health} (GPX by {@code audit}), and
 * every run must end as the README promises for bad input: exit 0, 3 or 4, never 1; on an error one line
 * that starts "streetcomb: " and names the file (health's exit 4 for blocking findings prints its summary); no Java exception or stack trace in any output; and the
 * folder holding the input unchanged, byte for byte and file for file (nothing beside it, such as a
 * GeoPackage's -wal and -shm). Seeds are fixed, so a failure repeats with its seed and mutant number.
 *
 * <p>Time-bounded: {@code -Dstreetcomb.fuzz.seconds} (default 40) shared by the readers; the counts go to
 * target/hostile/fuzz.txt. The fixtures are real open data (fixtures/, NOTICE) and the invented demo town.
 */
class ReaderFuzzTest {

    private static final long SECONDS = Long.getLong("streetcomb.fuzz.seconds", 40);
    private static final Pattern JAVA_NAMES = Pattern.compile(
            "\\b[A-Z][A-Za-z]*(Exception|Error)\\b|\\n\\s+at [a-z]|\\bjava\\.[a-z]+\\.|\\bcrosby\\.|\\borg\\.[a-z]+\\.");
    private static final Map<String, int[]> COUNTS = new TreeMap<>();

    /** A reader's seed: the files copied into each run's folder, the one mutated, and the command. */
    private record Seed(String name, List<Path> files, String mutated, String[] command, int keep) {
        Seed(String name, List<Path> files, String mutated, String[] command) {
            this(name, files, mutated, command, 0);
        }
    }

    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    private static final Path MESA = Path.of("fixtures/shapefiles/mesa-az-stateplane-ft");

    private static List<Seed> seeds() {
        List<Path> mesa = Stream.of("shp", "shx", "dbf", "prj").map(e -> MESA.resolve("streets." + e)).toList();
        String[] health = {"health", "@", "-q"};
        return List.of(
                new Seed("GeoJSON", List.of(Path.of(DEMO)), "brackenford.geojson", health),
                new Seed("shapefile .shp", mesa, "streets.shp", new String[] {"health", "@streets.shp", "-q"}),
                // past the 100-byte header, whose every mutant extent costs a fresh CRS resolution (seconds)
                new Seed("shapefile records", mesa, "streets.shp", new String[] {"health", "@streets.shp", "-q"}, 100),
                new Seed("shapefile .shx", mesa, "streets.shx", new String[] {"health", "@streets.shp", "-q"}),
                new Seed("shapefile .dbf", mesa, "streets.dbf", new String[] {"health", "@streets.shp", "-q"}),
                new Seed("shapefile .prj", mesa, "streets.prj", new String[] {"health", "@streets.shp", "-q"}),
                new Seed("GeoPackage", List.of(Path.of("fixtures/geopackage/mesa.gpkg")), "mesa.gpkg", health),
                new Seed("OSM XML", List.of(Path.of("fixtures/osm/bavaria-rural.osm")), "bavaria-rural.osm", health),
                new Seed("OSM bz2", List.of(Path.of("fixtures/osm/West-Oakland.osm.bz2")), "West-Oakland.osm.bz2", health),
                new Seed("OSM PBF", List.of(Path.of("fixtures/osm/aguascalientes.osm.pbf")), "aguascalientes.osm.pbf", health),
                new Seed("GPX", List.of(Path.of(DEMO), Path.of("fixtures/demo/brackenford-drive.gpx")), "brackenford-drive.gpx",
                        new String[] {"audit", "@brackenford.geojson", "@", "-q"}));
    }

    @TempDir
    Path dir;

    @Test
    void everyMutantEndsCleanly() throws Exception {
        // mutants of a shapefile's header give new extents, each a new entry of the CRS cache: keep those here
        String cache = System.getProperty("streetcomb.crs.cache");
        System.setProperty("streetcomb.crs.cache", Files.createDirectories(dir.resolve("crs-cache")).toString());
        try {
            fuzz();
        } finally {
            if (cache == null) {
                System.clearProperty("streetcomb.crs.cache");
            } else {
                System.setProperty("streetcomb.crs.cache", cache);
            }
        }
    }

    private void fuzz() throws Exception {
        List<Seed> seeds = seeds();
        long budget = SECONDS * 1_000_000_000L / seeds.size();
        List<String> failures = new ArrayList<>();
        for (int s = 0; s < seeds.size(); s++) {
            Seed seed = seeds.get(s);
            int[] counts = COUNTS.computeIfAbsent(seed.name(), k -> new int[6]);
            Random random = new Random(7919L * (s + 1));
            long end = System.nanoTime() + budget;
            for (int mutant = 0; System.nanoTime() < end && failures.size() < 5; mutant++) {
                String problem = runMutant(seed, random, mutant, counts);
                if (problem != null) {
                    failures.add(seed.name() + " mutant " + mutant + " (seed " + (7919L * (s + 1)) + "): " + problem);
                }
            }
        }
        assertEquals(List.of(), failures);
        int runs = COUNTS.values().stream().mapToInt(c -> c[0]).sum();
        assertTrue(runs >= 10 * seeds.size(), "mutants run: " + runs);
    }

    /** Runs one mutant; returns what went wrong, or null. Counts: runs, exit 0, 3, 4, other, changed input. */
    private String runMutant(Seed seed, Random random, int mutant, int[] counts) throws IOException {
        Path folder = Files.createDirectories(dir.resolve(seed.name().replace(' ', '-') + "-" + mutant));
        for (Path file : seed.files()) {
            Files.copy(file, folder.resolve(file.getFileName().toString()));
        }
        Path target = folder.resolve(seed.mutated());
        byte[] original = Files.readAllBytes(target);
        byte[] kept = java.util.Arrays.copyOf(original, seed.keep());
        byte[] tail = Mutations.mutate(java.util.Arrays.copyOfRange(original, seed.keep(), original.length), random);
        byte[] mutated = java.util.Arrays.copyOf(kept, kept.length + tail.length);
        System.arraycopy(tail, 0, mutated, kept.length, tail.length);
        Files.write(target, mutated);
        Map<String, String> before = hashes(folder);
        String[] args = new String[seed.command().length];
        for (int i = 0; i < args.length; i++) {
            String a = seed.command()[i];
            args[i] = a.equals("@") ? target.toString() : a.startsWith("@") ? folder.resolve(a.substring(1)).toString() : a;
        }
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        // a library that prints on the process's own streams (a parser's "[Fatal Error]" line) is caught too
        java.io.PrintStream systemErr = System.err;
        java.io.PrintStream systemOut = System.out;
        java.io.ByteArrayOutputStream stray = new java.io.ByteArrayOutputStream();
        int code;
        try (java.io.PrintStream capture = new java.io.PrintStream(stray, true, StandardCharsets.UTF_8)) {
            System.setErr(capture);
            System.setOut(capture);
            code = Main.run(args, new ByteArrayInputStream(new byte[0]), new PrintWriter(out, true),
                    new PrintWriter(err, true));
        } finally {
            System.setErr(systemErr);
            System.setOut(systemOut);
        }
        counts[0]++;
        String problem = null;
        String message = err.toString();
        if (code == ExitCode.OK) {
            counts[1]++;
        } else if (code == ExitCode.BAD_INPUT) {
            counts[2]++;
        } else if (code == ExitCode.NO_TOUR) {
            counts[3]++;
        } else {
            counts[4]++;
            problem = "exit " + code + ": " + firstLines(message);
        }
        // health exits 4 with its summary (blocking findings) and nothing on standard error
        boolean blockingFindings = code == ExitCode.NO_TOUR && args[0].equals("health") && message.isEmpty()
                && out.toString().contains("blocking");
        if (problem == null && code != ExitCode.OK && !blockingFindings) {
            String stem = seed.mutated().substring(0, seed.mutated().indexOf('.'));
            if (message.lines().count() != 1 || !message.startsWith("streetcomb: ") || !message.contains(stem)) {
                problem = "not one line naming the file: " + firstLines(message);
            }
        }
        if (problem == null && (JAVA_NAMES.matcher(message).find() || JAVA_NAMES.matcher(out.toString()).find())) {
            problem = "Java names in the output: " + firstLines(message + out);
        }
        if (problem == null && stray.size() > 0) {
            problem = "printed past the command's streams: " + firstLines(stray.toString(StandardCharsets.UTF_8));
        }
        if (problem == null && !before.equals(hashes(folder))) {
            counts[5]++;
            problem = "the input folder changed: " + before.keySet() + " -> " + hashes(folder).keySet();
        }
        if (problem == null) {
            deleteFolder(folder);
        }
        return problem;
    }

    @AfterAll
    static void writeCounts() throws IOException {
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "reader fuzzing, %d s budget: runs, exit 0, exit 3, exit 4, other exits, inputs changed%n", SECONDS));
        COUNTS.forEach((name, c) -> text.append(String.format(Locale.ROOT, "%-16s %6d %6d %6d %6d %6d %6d%n", name,
                c[0], c[1], c[2], c[3], c[4], c[5])));
        Path out = Path.of("target/hostile/fuzz.txt");
        Files.createDirectories(out.getParent());
        Files.writeString(out, text.toString(), StandardCharsets.UTF_8);
    }

    private static String firstLines(String text) {
        return text.lines().limit(4).reduce((a, b) -> a + " | " + b).orElse("(nothing)");
    }

    private static Map<String, String> hashes(Path folder) {
        return FolderHashes.of(folder);
    }

    private static void deleteFolder(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            for (Path f : files.toList()) {
                Files.delete(f);
            }
        }
        Files.delete(folder);
    }
}
