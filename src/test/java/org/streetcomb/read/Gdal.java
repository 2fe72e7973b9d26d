package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.streetcomb.ExternalTool;

/** Runs GDAL's ogrinfo as the independent reference reader (skipped or failed as {@link ExternalTool} says). */
final class Gdal {

    private Gdal() {
    }

    /** Runs ogrinfo read-only and quiet with the arguments and returns its standard output. */
    static String ogrinfo(String... args) {
        List<String> command = new ArrayList<>(List.of("ogrinfo", "-ro", "-q"));
        command.addAll(List.of(args));
        try {
            return ExternalTool.run(command.toArray(new String[0]));
        } catch (IOException e) {
            return fail("ogrinfo failed: " + e.getMessage());
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
