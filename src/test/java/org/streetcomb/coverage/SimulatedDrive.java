package org.streetcomb.coverage;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.streetcomb.network.GeodesicLength;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.tour.Tour;

/**
 * Invented GPS recordings of a drive along planned tours, for tests and benchmarks (simulated data, not a
 * recording): a speed drawn per step, fixes at intervals drawn per fix, Gaussian noise east and north, and
 * dropouts during which no fix is written. The noise is independent from fix to fix, or, with a noise
 * memory, a first-order Gauss-Markov process (each fix keeps exp(-dt / memory) of the last fix's error),
 * as real receivers' errors persist for a while. Seeded, so every run gives the same fixes.
 */
public final class SimulatedDrive {

    /**
     * @param minKmh          slowest speed on a step, km/h
     * @param maxKmh          fastest speed on a step, km/h
     * @param minInterval     shortest time between fixes, seconds
     * @param maxInterval     longest time between fixes, seconds
     * @param sigma           noise per axis, metres
     * @param dropoutEvery    mean seconds between dropouts (0: none)
     * @param minDropout      shortest dropout, seconds
     * @param maxDropout      longest dropout, seconds
     * @param noiseMemory     correlation time of the noise, seconds (0: independent from fix to fix)
     */
    public record Settings(double minKmh, double maxKmh, double minInterval, double maxInterval, double sigma,
                    double dropoutEvery, double minDropout, double maxDropout, double noiseMemory) {

        /** Noise independent from fix to fix. */
        public Settings(double minKmh, double maxKmh, double minInterval, double maxInterval, double sigma,
                        double dropoutEvery, double minDropout, double maxDropout) {
            this(minKmh, maxKmh, minInterval, maxInterval, sigma, dropoutEvery, minDropout, maxDropout, 0);
        }

        public Settings withNoiseMemory(double seconds) {
            return new Settings(minKmh, maxKmh, minInterval, maxInterval, sigma, dropoutEvery, minDropout, maxDropout,
                    seconds);
        }
    }

    /** 2026-03-02T07:00:00Z, an invented start of shift. */
    public static final double START = 1_772_434_800;
    private static final double METRES_PER_DEGREE = Math.PI / 180 * 6_371_008.8;

    private SimulatedDrive() {
    }

    /** One segment per tour, driven one after another from {@code start} seconds. */
    public static List<TrackSegment> drive(StreetNetwork network, List<Tour> tours, Settings s, long seed, double start) {
        Random random = new Random(seed);
        List<TrackSegment> segments = new ArrayList<>();
        double clock = start;
        for (Tour tour : tours) {
            TrackSegment segment = drive(network, tour, s, random, clock);
            segments.add(segment);
            clock = segment.time()[segment.size() - 1] + 600;
        }
        return segments;
    }

    private static TrackSegment drive(StreetNetwork network, Tour tour, Settings s, Random random, double start) {
        // the exact path: points with the time the vehicle passes them
        double[] lon = new double[64], lat = new double[64], time = new double[64];
        int n = 0;
        double t = start;
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            double speed = (s.minKmh() + random.nextDouble() * (s.maxKmh() - s.minKmh())) / 3.6;
            int count = network.pointCount(e);
            for (int k = 0; k < count; k++) {
                int p = tour.forward()[i] ? k : count - 1 - k;
                double x = network.pointLon(e, p), y = network.pointLat(e, p);
                if (n > 0) {
                    double d = GeodesicLength.between(lon[n - 1], lat[n - 1], x, y);
                    if (d == 0) {
                        continue;
                    }
                    t += d / speed;
                }
                if (n == lon.length) {
                    lon = Arrays.copyOf(lon, 2 * n);
                    lat = Arrays.copyOf(lat, 2 * n);
                    time = Arrays.copyOf(time, 2 * n);
                }
                lon[n] = x;
                lat[n] = y;
                time[n] = t;
                n++;
            }
        }
        List<double[]> fixes = new ArrayList<>();
        int at = 0;
        double dropoutUntil = -1;
        double east = 0, north = 0, last = start;
        for (double now = start; now <= time[n - 1]; now += s.minInterval() + random.nextDouble() * (s.maxInterval() - s.minInterval())) {
            while (at < n - 2 && time[at + 1] < now) {
                at++;
            }
            double f = time[at + 1] > time[at] ? Math.min(1, (now - time[at]) / (time[at + 1] - time[at])) : 0;
            double x = lon[at] + f * (lon[at + 1] - lon[at]);
            double y = lat[at] + f * (lat[at + 1] - lat[at]);
            if (s.dropoutEvery() > 0 && now > dropoutUntil && random.nextDouble() < s.maxInterval() / s.dropoutEvery()) {
                dropoutUntil = now + s.minDropout() + random.nextDouble() * (s.maxDropout() - s.minDropout());
            }
            // stationary: the error keeps its spread sigma whatever share of it the next fix keeps
            double kept = s.noiseMemory() > 0 ? Math.exp(-(now - last) / s.noiseMemory()) : 0;
            double fresh = Math.sqrt(1 - kept * kept);
            east = kept * east + fresh * random.nextGaussian() * s.sigma();
            north = kept * north + fresh * random.nextGaussian() * s.sigma();
            last = now;
            if (now <= dropoutUntil) {
                continue;
            }
            fixes.add(new double[] {
                x + east / (METRES_PER_DEGREE * Math.cos(Math.toRadians(y))), y + north / METRES_PER_DEGREE, now});
        }
        double[] fx = new double[fixes.size()], fy = new double[fixes.size()], ft = new double[fixes.size()];
        for (int i = 0; i < fixes.size(); i++) {
            fx[i] = fixes.get(i)[0];
            fy[i] = fixes.get(i)[1];
            ft[i] = fixes.get(i)[2];
        }
        return new TrackSegment(Path.of("simulated.gpx"), "tour from node " + tour.start(), fx, fy, ft);
    }

    /** Writes segments as one GPX 1.1 track; {@code timed} false leaves out the times. */
    public static void writeGpx(Path file, List<TrackSegment> segments, boolean timed) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<gpx version=\"1.1\" creator=\"streetcomb tests "
                    + "(simulated drive, invented data)\" xmlns=\"http://www.topografix.com/GPX/1/1\">\n<trk><name>simulated"
                    + "</name>\n");
            for (TrackSegment segment : segments) {
                w.write("<trkseg>\n");
                for (int i = 0; i < segment.size(); i++) {
                    w.write(String.format(Locale.ROOT, "<trkpt lat=\"%.7f\" lon=\"%.7f\">", segment.lat()[i], segment.lon()[i]));
                    if (timed) {
                        w.write("<time>" + Instant.ofEpochMilli(Math.round(segment.time()[i] * 1000)) + "</time>");
                    }
                    w.write("</trkpt>\n");
                }
                w.write("</trkseg>\n");
            }
            w.write("</trk>\n</gpx>\n");
        }
    }
}
