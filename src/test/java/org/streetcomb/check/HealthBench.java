package org.streetcomb.check;

import java.nio.file.Path;
import java.util.Locale;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadLayer;

/**
 * Times the health check of a layer, detector by detector, against building the network of the same
 * layer in the same run (the reference). Not a test: run it as docs/benchmarks.md says.
 */
public final class HealthBench {

    private HealthBench() {
    }

    public static void main(String[] args) {
        RoadLayer layer = LayerReaders.read(Path.of(args[0]));
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        for (int round = 1; round <= rounds; round++) {
            long t0 = System.nanoTime();
            StreetNetwork network = new NetworkBuilder(0.5).build(layer);
            double build = (System.nanoTime() - t0) / 1e9;
            CheckInput input = new CheckInput(layer, network, CheckOptions.DEFAULTS, 0);
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT,
                    "round %d: %d edges; network build %.2f s (reference)", round, network.edgeCount(), build));
            double total = 0;
            for (Detector detector : NetworkCheck.DETECTORS) {
                long t = System.nanoTime();
                int found = detector.find(input).size();
                double seconds = (System.nanoTime() - t) / 1e9;
                total += seconds;
                line.append(String.format(Locale.ROOT, "; %s %.2f s (%d)", detector.getClass().getSimpleName(), seconds, found));
            }
            line.append(String.format(Locale.ROOT, "; check %.2f s = %.2f x network build", total, total / build));
            System.out.println(line);
        }
    }
}
