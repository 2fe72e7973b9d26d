package org.streetcomb.quality;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.solve.ExactMixedReference;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.solve.StrongCore;

/**
 * Computes the exact references of the real mixed instances (fixtures/benchmarks/mixed-osm/values.csv):
 * every listed OpenStreetMap layer cut to its largest strongly connected core, every street required once,
 * solved by the integer circulation model in OR-Tools CP-SAT ({@link ExactMixedReference}) with a time
 * limit. Prints the CSV rows. Run from the repository root:
 * {@code mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.quality.MixedOsmReference
 * -Dexec.classpathScope=test -Dexec.args=600}.
 */
public final class MixedOsmReference {

    /** The instances: fixture path and name. */
    public static final List<String[]> INSTANCES = List.of(
            new String[] {"fixtures/benchmarks/mixed-osm/vienna-a.geojson", "vienna-a"},
            new String[] {"fixtures/benchmarks/mixed-osm/vienna-b.geojson", "vienna-b"},
            new String[] {"fixtures/benchmarks/mixed-osm/vienna-c.geojson", "vienna-c"},
            new String[] {"fixtures/benchmarks/mixed-osm/vienna-d.geojson", "vienna-d"},
            new String[] {"fixtures/benchmarks/mixed-osm/monaco.osm.pbf", "monaco"},
            new String[] {"fixtures/benchmarks/mixed-osm/andorra-vella.osm.pbf", "andorra-vella"},
            new String[] {"fixtures/benchmarks/mixed-osm/baltimore-window.osm.pbf", "baltimore-window"},
            new String[] {"fixtures/osm/Helsinki.osm.pbf", "helsinki"},
            new String[] {"fixtures/osm/baltimore.osm.pbf", "baltimore"});

    private MixedOsmReference() {
    }

    /** The instance's network: the layer's largest strongly connected core (as in the test). */
    public static StreetNetwork network(String path) {
        var layer = LayerReaders.read(Path.of(path), ReadOptions.DEFAULTS);
        return StrongCore.of(new NetworkBuilder(0.5).build(layer.features()));
    }

    public static void main(String[] args) {
        double seconds = args.length > 0 ? Double.parseDouble(args[0]) : 600;
        System.out.println("instance,edges,one_way,reference,best_bound,status,seconds,how");
        for (String[] instance : INSTANCES) {
            if (args.length > 1 && !instance[1].matches(args[1])) {
                continue;
            }
            StreetNetwork network = network(instance[0]);
            int oneWay = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                oneWay += network.travel(e).oneWay() ? 1 : 0;
            }
            boolean[] all = new boolean[network.edgeCount()];
            java.util.Arrays.fill(all, true);
            long start = System.nanoTime();
            ExactMixedReference.Result exact = ExactMixedReference.solve(network,
                    ServiceDemand.of(network, all, KerbMode.ONE_PASS), seconds);
            System.out.printf(Locale.ROOT, "%s,%d,%d,%.3f,%.3f,%s,%.1f,computed (OR-Tools CP-SAT 9.12 integer circulation, MixedOsmReference %.0f s)%n",
                    instance[1], network.edgeCount(), oneWay, exact.optimum(), exact.bestBound(),
                    exact.proved() ? "optimal" : "feasible", (System.nanoTime() - start) / 1e9, seconds);
        }
    }
}
