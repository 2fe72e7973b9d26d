package org.streetcomb.report;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Takes a screenshot of an HTML report in headless Chromium (1400 x 900 pixels), optionally zoomed in on a
 * point, for the pictures in README and docs/ and for looking at a report as a reader does. Usage:
 * {@code ReportScreenshot REPORT.html OUT.png [ZOOM LAT LON]} (see docs/screenshots.sh).
 */
public final class ReportScreenshot {

    private ReportScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        Path profile = Files.createTempDirectory("streetcomb-shot");
        try (HeadlessChromium chromium = HeadlessChromium.start(profile)) {
            chromium.open(Path.of(args[0]).toAbsolutePath());
            if (args.length >= 5) {
                chromium.eval("window.streetcombReport.map.setView([" + Double.parseDouble(args[3]) + ", "
                        + Double.parseDouble(args[4]) + "], " + Double.parseDouble(args[2]) + ", {animate: false}) && true");
                chromium.eval("new Promise(r => setTimeout(r, 500))");
            }
            Files.write(Path.of(args[1]), chromium.screenshot());
        }
    }
}
