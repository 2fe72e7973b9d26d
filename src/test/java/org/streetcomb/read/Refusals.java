package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.streetcomb.ExitCode;
import org.streetcomb.cli.Main;

/** Runs {@code streetcomb plan} on a bad layer and checks the refusal a user sees. */
final class Refusals {

    private Refusals() {
    }

    /**
     * Asserts exit code 3, one line on stderr containing {@code expected}, no stack trace, and nothing in
     * {@code dir} written, changed or removed (the inputs hashed before and after).
     */
    static void assertRefused(Path dir, Path layer, String expected, String... options) {
        Path out = dir.resolve("tour.geojson");
        java.util.Map<String, String> before = org.streetcomb.FolderHashes.of(dir);
        StringWriter err = new StringWriter();
        List<String> args = new ArrayList<>(List.of("plan", layer.toString(), "--out=" + out));
        args.addAll(List.of(options));
        int code = Main.run(args.toArray(new String[0]), new PrintWriter(new StringWriter()), new PrintWriter(err, true));
        String message = err.toString();
        assertEquals(ExitCode.BAD_INPUT, code, message);
        assertEquals(1, message.lines().count(), message);
        assertTrue(message.contains(expected), () -> "expected '" + expected + "' in: " + message);
        assertFalse(message.contains("Exception"), message);
        assertFalse(Files.exists(out));
        assertEquals(before, org.streetcomb.FolderHashes.of(dir), "the folder of the input changed");
    }
}
