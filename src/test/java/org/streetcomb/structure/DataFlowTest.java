package org.streetcomb.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The packages follow the data flow (DEVELOPERS.md): a package may use only the packages before it in
 * {@link #ORDER}. Read from the sources, every import and fully qualified name counts. A new package must
 * be given its place here, or this test fails.
 */
class DataFlowTest {

    /**
     * The stages in order: reading, the network, its health check and the service scope, solving, ordering
     * tours, trips and fleets; after the drive, matching tracks, coverage and the mop-up; then writing,
     * reports, the pipelines that run the stages, and the command line. "" is the root package (errors,
     * exit codes) and {@code timing} a utility every stage may use.
     */
    static final List<String> ORDER = List.of("", "timing", "read", "network", "check", "scope", "solve", "tour",
            "trip", "fleet", "match", "coverage", "mopup", "write", "report", "plan", "batch", "cli");

    private static final Pattern REFERENCE = Pattern.compile("\\borg\\.streetcomb\\.([a-z]+)\\.[A-Z*]");
    private static final Pattern PACKAGE = Pattern.compile("^package org\\.streetcomb\\.?([a-z.]*);", Pattern.MULTILINE);

    @Test
    void noPackageUsesALaterOne() throws IOException {
        List<String> against = new ArrayList<>();
        Path root = Path.of("src/main/java/org/streetcomb");
        try (Stream<Path> files = Files.walk(root)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).sorted().toList()) {
                String text = Files.readString(file);
                Matcher declared = PACKAGE.matcher(text);
                String pkg = declared.find() ? declared.group(1) : "?";
                int rank = ORDER.indexOf(pkg);
                if (rank < 0) {
                    against.add(file + ": package '" + pkg + "' has no place in DataFlowTest.ORDER");
                    continue;
                }
                Matcher used = REFERENCE.matcher(text);
                while (used.find()) {
                    String target = used.group(1);
                    if (!target.equals(pkg) && !(ORDER.indexOf(target) >= 0 && ORDER.indexOf(target) < rank)) {
                        against.add(root.relativize(file) + " (" + pkg + ") uses " + target);
                    }
                }
            }
        }
        assertEquals(List.of(), against.stream().distinct().toList());
    }
}
