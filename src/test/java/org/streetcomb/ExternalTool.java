package org.streetcomb;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs an outside program (GDAL's ogrinfo, gpsbabel) as an independent reader of our output. When the
 * program is missing the test is skipped with a message on a developer machine and fails in CI
 * (STREETCOMB_CI set), where .ci/run installs it.
 */
public final class ExternalTool {

    private ExternalTool() {
    }

    /** Runs the command and returns its standard output; fails the test on a non-zero exit. */
    public static String run(String... command) throws IOException, InterruptedException {
        requireOnPath(command[0]);
        List<String> args = new ArrayList<>(List.of(command));
        Process process = new ProcessBuilder(args).redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, process.waitFor(), () -> String.join(" ", command) + " failed:\n" + output);
        return output;
    }

    private static void requireOnPath(String program) {
        String path = System.getenv().getOrDefault("PATH", "");
        for (String dir : path.split(File.pathSeparator)) {
            if (Files.isExecutable(Path.of(dir, program))) {
                return;
            }
        }
        if (System.getenv("STREETCOMB_CI") != null) {
            fail(program + " is not installed but the test runs in CI (STREETCOMB_CI is set); .ci/run installs it");
        }
        Assumptions.abort(program + " is not installed: skipping the read-back check (apt-get install gdal-bin gpsbabel)");
    }
}
