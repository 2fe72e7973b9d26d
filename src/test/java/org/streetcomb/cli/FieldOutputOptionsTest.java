package org.streetcomb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.ExitCode;

class FieldOutputOptionsTest {

    @TempDir
    Path folder;

    @Test
    void demoTownWritesEveryFieldFileFromTheReadmeCommand() throws Exception {
        Path gpx = folder.resolve("tour.gpx");
        Path kml = folder.resolve("tour.kml");
        Path csv = folder.resolve("directions.csv");
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--depot=-31.2,44.6",
            "--gpx", gpx.toString(), "--kml", kml.toString(), "--directions", csv.toString(), "--gpx-routes"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        assertTrue(out.toString().contains("U-turns"), out.toString());
        assertTrue(Files.size(gpx) > 0 && Files.size(kml) > 0);
        String sheet = Files.readString(csv);
        assertTrue(sheet.startsWith("\"Caution: Plans are advice"), "the caution heads the sheet");
        assertTrue(sheet.contains("\r\ntour,step,instruction,street,distance_m,cumulative_m,pass\r\n"));
    }

    @Test
    void tripsFromTheReadmeCommandFitTheShift() {
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--depot=-31.2,44.6",
            "--max-trip-hours", "1.5", "--trip-restarts", "2", "--json"},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(ExitCode.OK, code, out.toString());
        String json = out.toString();
        assertTrue(json.contains("\"trips\""), json);
        assertFalse(json.contains("\"over_limit\" : true"), "every trip fits 1.5 h");
    }

    @Test
    void directionSheetWithAnUnknownExtensionIsRefusedBeforePlanning() {
        Path sheet = folder.resolve("directions.txt");
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"plan", "fixtures/demo/brackenford.geojson", "--directions", sheet.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(ExitCode.USAGE, code);
        assertTrue(err.toString().contains(".csv or .html"), err.toString());
        assertFalse(Files.exists(sheet));
    }
}
