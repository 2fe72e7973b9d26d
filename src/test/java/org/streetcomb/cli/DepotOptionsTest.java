package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.ExitCode;

/**
 * One depot option group, one validation rule: every command that takes a depot refuses a negative reach the
 * same way, as a usage error (exit 2) named in one line, before reading anything. Demo data: the invented town.
 */
class DepotOptionsTest {

    @ParameterizedTest
    @ValueSource(strings = {"plan", "audit", "health"})
    void negativeReachIsAUsageErrorEverywhere(String command) {
        StringWriter err = new StringWriter();
        String[] args = command.equals("audit")
                ? new String[] {command, "fixtures/demo/brackenford.geojson", "no-such-drive.gpx", "--depot-reach=-5"}
                : new String[] {command, "fixtures/demo/brackenford.geojson", "--depot-reach=-5"};
        int code = Main.run(args, new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(ExitCode.USAGE, code, err.toString());
        assertTrue(err.toString().contains("--depot-reach must be 0 or more metres"), err.toString());
    }
}
