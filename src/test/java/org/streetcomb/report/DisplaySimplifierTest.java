package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Simplification keeps every dropped vertex within the stated tolerance, and keeps the ends. */
class DisplaySimplifierTest {

    private static final double METRES_PER_DEGREE = Math.PI / 180 * 6_371_008.8;

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5})
    void droppedVerticesStayWithinTheTolerance(long seed) {
        Random random = new Random(seed);
        int n = 400;
        double[] line = new double[2 * n];
        double lat0 = -60 + 120 * random.nextDouble();
        for (int i = 0; i < n; i++) {
            // a street 2 km long wobbling up to 3 m either side
            line[2 * i] = 10 + i * 5.0 / (METRES_PER_DEGREE * Math.cos(Math.toRadians(lat0)));
            line[2 * i + 1] = lat0 + (random.nextDouble() - 0.5) * 6 / METRES_PER_DEGREE;
        }
        double tolerance = 2;
        double[] kept = new DisplaySimplifier(tolerance).simplify(line);
        assertTrue(kept.length < line.length, "something was simplified");
        assertArrayEquals(new double[] {line[0], line[1]}, new double[] {kept[0], kept[1]}, 1e-12);
        assertArrayEquals(new double[] {line[2 * n - 2], line[2 * n - 1]},
                new double[] {kept[kept.length - 2], kept[kept.length - 1]}, 1e-12);
        double xScale = METRES_PER_DEGREE * Math.cos(Math.toRadians(lat0));
        for (int i = 0; i < n; i++) {
            double best = Double.POSITIVE_INFINITY;
            for (int k = 2; k < kept.length; k += 2) {
                best = Math.min(best, segmentDistance(line[2 * i] * xScale, line[2 * i + 1] * METRES_PER_DEGREE,
                        kept[k - 2] * xScale, kept[k - 1] * METRES_PER_DEGREE, kept[k] * xScale, kept[k + 1] * METRES_PER_DEGREE));
            }
            assertTrue(best <= tolerance + 1e-6, "vertex " + i + " is " + best + " m from the simplified line");
        }
    }

    private static double segmentDistance(double px, double py, double ax, double ay, double bx, double by) {
        double dx = bx - ax;
        double dy = by - ay;
        double t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
        return Math.hypot(px - ax - t * dx, py - ay - t * dy);
    }
}
