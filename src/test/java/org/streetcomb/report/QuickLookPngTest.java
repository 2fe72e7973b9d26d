package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Tour;

/** The PNG quick look of the demo plan: the stated size, read back by ImageIO, with the tour drawn where it runs. */
class QuickLookPngTest {

    @TempDir
    Path folder;

    @Test
    void demoPictureHasTheStatedSizeAndShowsTheTourAlongItsWholeLength() throws Exception {
        Plan plan = Planner.plan(new PlanRequest(Path.of("fixtures/demo/brackenford.geojson"), new LonLat(-31.2, 44.6),
                0.5, 500, false), new StageClock(StageClock.SILENT));
        MapReport report = new MapReport("Plan: demo", PlanLayers.of(plan), PlanLayers.groups(plan),
                new com.fasterxml.jackson.databind.ObjectMapper().createObjectNode(), List.of(), List.of("Drive safely."), null, 0);
        Path file = folder.resolve("demo.png");
        QuickLookPng png = new QuickLookPng(900, 640);
        png.write(file, report);

        BufferedImage image = ImageIO.read(file.toFile());
        assertNotNull(image, "ImageIO reads the file back as an image");
        assertEquals(900, image.getWidth());
        assertEquals(640, image.getHeight());

        // walk every step of the tour in 2 m strides: the pixel under each position must be drawn on
        PixelFrame frame = png.frame(report);
        StreetNetwork network = plan.network();
        int samples = 0;
        int drawn = 0;
        for (Tour tour : plan.tours()) {
            for (int e : tour.edges()) {
                for (int k = 1; k < network.pointCount(e); k++) {
                    double x0 = frame.px(network.pointLon(e, k - 1));
                    double y0 = frame.py(network.pointLat(e, k - 1));
                    double x1 = frame.px(network.pointLon(e, k));
                    double y1 = frame.py(network.pointLat(e, k));
                    int strides = (int) Math.max(1, Math.hypot(x1 - x0, y1 - y0));
                    for (int s = 0; s <= strides; s++) {
                        int x = (int) Math.round(x0 + (x1 - x0) * s / strides);
                        int y = (int) Math.round(y0 + (y1 - y0) * s / strides);
                        samples++;
                        if (image.getRGB(x, y) != QuickLookPng.BACKGROUND.getRGB()) {
                            drawn++;
                        }
                    }
                }
            }
        }
        assertTrue(samples > 1000, "the tour is long enough to sample: " + samples);
        assertTrue(drawn >= 0.99 * samples, "tour drawn at " + drawn + " of " + samples + " sampled pixels");

        int service = 0;
        Color serviceColour = QuickLookPng.colour(PlanLayers.tourColour(0), 1);
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                Color c = new Color(image.getRGB(x, y));
                if (Math.abs(c.getRed() - serviceColour.getRed()) + Math.abs(c.getGreen() - serviceColour.getGreen())
                        + Math.abs(c.getBlue() - serviceColour.getBlue()) < 60) {
                    service++;
                }
            }
        }
        assertTrue(service > 0.01 * image.getWidth() * image.getHeight(), "service passes in the tour colour: " + service + " px");
    }
}
