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
        assertTrue(share(image, frame, sallow, CoverageLayers.MISSED, MapPalette.STILL_TO_DRIVE) >= 0.9,
                "Sallow Lane is drawn in the missed colour, the stretch still to drive over it (or a blend of the two)");
        assertTrue(share(image, frame, covered, CoverageLayers.MISSED) < 0.2, "a driven street is not");
        assertTrue(share(image, frame, covered, CoverageLayers.COVERED) >= 0.5, "it is drawn in the covered colour");
        assertEquals(audit.tally().fixes(), tracks.fixes(), "the tracks layer saw every fix the audit read");
    }

    private static StreetCoverage street(Audit audit, String id) {
        return audit.coverage().streets().stream().filter(s -> s.feature().id().equals(id)).findFirst().orElseThrow();
    }

    /** Share of pixels along the street's line, sampled every pixel, close to the colour. */
    private static double share(BufferedImage image, PixelFrame frame, StreetCoverage street, String hex) {
        return share(image, frame, street, hex, hex);
    }

    /** Share of pixels along the street's line close to a colour between {@code hex} and {@code over} (antialiasing blends them). */
    private static double share(BufferedImage image, PixelFrame frame, StreetCoverage street, String hex, String over) {
        Color target = QuickLookPng.colour(hex, 1);
        Color top = QuickLookPng.colour(over, 1);
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
                for (int t = 0; t <= 10; t++) {
                    double r = target.getRed() + (top.getRed() - target.getRed()) * t / 10.0;
                    double g = target.getGreen() + (top.getGreen() - target.getGreen()) * t / 10.0;
                    double b = target.getBlue() + (top.getBlue() - target.getBlue()) * t / 10.0;
                    if (Math.abs(c.getRed() - r) + Math.abs(c.getGreen() - g) + Math.abs(c.getBlue() - b) < 60) {
                        close++;
                        break;
                    }
                }
            }
        }
        return (double) close / samples;
    }

}
