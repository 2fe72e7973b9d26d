package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.streetcomb.ExitCode;

/** Running out of memory ends in one line that says so and what to do, exit 1, never a stack trace. */
class LastResortTest {

    @Test
    void outOfMemoryIsOneLine() throws Exception {
        // a 10 MB heap cannot hold the Helsinki extract (it plans at 16 MB: measured with -Xmx12m and -Xmx16m)
        String javaCommand = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process process = new ProcessBuilder(javaCommand, "-Xmx10m", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "plan", "fixtures/osm/Helsinki.osm.pbf", "-q", "--leave-out-cut-off")
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(process.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(120, TimeUnit.SECONDS));
        assertEquals(ExitCode.INTERNAL, process.exitValue(), err);
        assertEquals(1, err.lines().count(), err);
        assertTrue(err.startsWith("streetcomb: out of memory (10 MB heap): give Java more"), err);
        assertFalse(err.contains("Exception") || err.contains("Error") || err.contains("\tat "), err);
    }
}
