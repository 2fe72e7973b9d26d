package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.Color;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.streetcomb.plan.Audit;
import org.streetcomb.plan.AuditRequest;
import org.streetcomb.plan.DriveAudit;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.StreetCoverage;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.ReadOptions;

/**
 * The coverage map's colours and its PNG quick look. The drive is the bundled simulated drive of the demo
 * town (invented data) that left out Sallow Lane (bf-005) and Harrow Close (bf-044).
 */
class CoverageLayersTest {

    @TempDir
    Path folder;

    /**
     * The status colours stay apart for viewers with each kind of dichromacy: simulated with the matrices
     * of Machado, Oliveira and Fernandes (2009, IEEE TVCG 15(6), severity 1.0; values from memory) on
     * linear sRGB (IEC 61966-2-1), compared in CIE 1976 L*a*b* (D65). 20 units is far above the just
     * noticeable difference of about 2.3 (Sharma, Digital Color Imaging Handbook; from memory); red against
     * green, the pair these matrices are known to merge, falls below it, so the check can fail.
     */
    @Test
    void statusColoursStayApartForColourBlindViewers() {
        double[][][] simulations = {
            {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}},
            {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216}, {-0.003882, -0.048116, 1.051998}},
            {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413}, {-0.011820, 0.042940, 0.968881}},
            {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602}, {0.004733, 0.691367, 0.303900}}};
        List<String> colours = List.of(CoverageLayers.COVERED, CoverageLayers.PARTLY, CoverageLayers.MISSED,
                CoverageLayers.NOT_REQUIRED, CoverageLayers.WRONG_WAY);
        for (double[][] simulation : simulations) {
            for (int a = 0; a < colours.size(); a++) {
                for (int b = a + 1; b < colours.size(); b++) {
                    double difference = deltaE(lab(simulation, colours.get(a)), lab(simulation, colours.get(b)));
                    assertTrue(difference >= 20, colours.get(a) + " and " + colours.get(b) + " differ by " + difference);
                }
            }
        }
        // deuteranopia merges a pure red and a green of similar lightness: the measure does tell them apart
        assertTrue(deltaE(lab(simulations[2], "#d62728"), lab(simulations[2], "#2ca02c")) < 20);
    }

    @Test
    void quickLookHasTheStatedSizeAndDrawsTheSkippedStreetInTheMissedColour() throws Exception {
        TrackLines tracks = new TrackLines();
        Audit audit = DriveAudit.run(new AuditRequest(Path.of("fixtures/demo/brackenford.geojson"),
                List.of(Path.of("fixtures/demo/brackenford-drive.gpx")), 0.5, MatchSettings.defaults(), 0.9, false,
                ReadOptions.DEFAULTS), new StageClock(StageClock.SILENT), tracks);
        MapReport report = new MapReport("Coverage: demo", CoverageLayers.of(audit.coverage(), tracks), List.of(),
                new ObjectMapper().createObjectNode(), List.of(), List.of("Check doubtful streets on the ground."), null, 0);
        Path file = folder.resolve("coverage.png");
        QuickLookPng png = new QuickLookPng(900, 640);
        png.write(file, report);
        BufferedImage image = ImageIO.read(file.toFile());
        assertNotNull(image, "ImageIO reads the file back as an image");
        assertEquals(900, image.getWidth());
        assertEquals(640, image.getHeight());

        PixelFrame frame = png.frame(report);
        StreetCoverage sallow = street(audit, "bf-005");
        StreetCoverage covered = street(audit, "bf-003");
        assertTrue(share(image, frame, sallow, CoverageLayers.MISSED) >= 0.9, "Sallow Lane is drawn in the missed colour");
        assertTrue(share(image, frame, covered, CoverageLayers.MISSED) < 0.2, "a driven street is not");
        assertTrue(share(image, frame, covered, CoverageLayers.COVERED) >= 0.5, "it is drawn in the covered colour");
        assertEquals(audit.tally().fixes(), tracks.fixes(), "the tracks layer saw every fix the audit read");
    }

    private static StreetCoverage street(Audit audit, String id) {
        return audit.coverage().streets().stream().filter(s -> s.feature().id().equals(id)).findFirst().orElseThrow();
    }

    /** Share of pixels along the street's line, sampled every pixel, close to the colour. */
    private static double share(BufferedImage image, PixelFrame frame, StreetCoverage street, String hex) {
        Color target = QuickLookPng.colour(hex, 1);
        Coordinate[] line = street.feature().line().getCoordinates();
        int samples = 0;
        int close = 0;
        for (int k = 1; k < line.length; k++) {
            double x0 = frame.px(line[k - 1].x);
            double y0 = frame.py(line[k - 1].y);
            double x1 = frame.px(line[k].x);
            double y1 = frame.py(line[k].y);
            int strides = (int) Math.max(1, Math.hypot(x1 - x0, y1 - y0));
            for (int s = 0; s <= strides; s++) {
                Color c = new Color(image.getRGB((int) Math.round(x0 + (x1 - x0) * s / strides),
                        (int) Math.round(y0 + (y1 - y0) * s / strides)));
                samples++;
                if (Math.abs(c.getRed() - target.getRed()) + Math.abs(c.getGreen() - target.getGreen())
                        + Math.abs(c.getBlue() - target.getBlue()) < 60) {
                    close++;
                }
            }
        }
        return (double) close / samples;
    }

    private static double[] lab(double[][] simulation, String hex) {
        int rgb = Integer.parseInt(hex.substring(1), 16);
        double[] linear = {linear((rgb >> 16) & 0xff), linear((rgb >> 8) & 0xff), linear(rgb & 0xff)};
        double[] seen = new double[3];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                seen[r] += simulation[r][c] * linear[c];
            }
            seen[r] = Math.max(0, Math.min(1, seen[r]));
        }
        // sRGB (D65) to CIE XYZ, IEC 61966-2-1
        double x = 0.4124 * seen[0] + 0.3576 * seen[1] + 0.1805 * seen[2];
        double y = 0.2126 * seen[0] + 0.7152 * seen[1] + 0.0722 * seen[2];
        double z = 0.0193 * seen[0] + 0.1192 * seen[1] + 0.9505 * seen[2];
        double fx = f(x / 0.95047);
        double fy = f(y);
        double fz = f(z / 1.08883);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    private static double f(double t) {
        double d = 6.0 / 29;
        return t > d * d * d ? Math.cbrt(t) : t / (3 * d * d) + 4.0 / 29;
    }

    private static double linear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static double deltaE(double[] a, double[] b) {
        return Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
    }
}
