package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs GDAL's ogrinfo as the independent reference reader. Skips the calling test when ogrinfo is not
 * installed on a developer machine; in CI (STREETCOMB_CI set) a missing ogrinfo fails the test.
 */
final class Gdal {

    private Gdal() {
    }

    /** Runs ogrinfo with the arguments and returns its standard output. */
    static String ogrinfo(String... args) {
        List<String> command = new ArrayList<>(List.of("ogrinfo", "-ro", "-q"));
        command.addAll(List.of(args));
        try {
            Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!process.waitFor(60, TimeUnit.SECONDS) || process.exitValue() != 0) {
                fail("ogrinfo failed: " + output);
            }
            return output;
        } catch (IOException e) {
            if (System.getenv("STREETCOMB_CI") == null) {
                Assumptions.abort("ogrinfo (gdal-bin) is not installed: skipping the check against GDAL");
            }
            return fail("ogrinfo is required in CI: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return fail(e);
        }
    }

    /** The value of {@code field} in ogrinfo's listing of a one-row SQL result. */
    static double number(String output, String field) {
        Matcher m = Pattern.compile("\\b" + Pattern.quote(field) + " \\([A-Za-z0-9]+\\) = ([-0-9.eE+]+)").matcher(output);
        if (!m.find()) {
            fail("no " + field + " in ogrinfo output: " + output);
        }
        return Double.parseDouble(m.group(1));
    }
}
