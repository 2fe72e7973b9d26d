package org.streetcomb.trip;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.CarplibNetwork;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.CarplibInstance;
import org.streetcomb.read.CarplibReader;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * Trips cut from the postman tour against the published best values of the capacitated arc-routing
 * benchmark sets gdb (Golden, DeArmon &amp; Baker 1983) and val (Benavent, Campos, Corberán &amp; Mota 1992),
 * CARPLIB edition (see NOTICE). Reference values: fixtures/benchmarks/values.csv, rows {@code CARP},
 * published values quoted from memory ("recall-high", not re-verified), reported as proven optimal.
 * Every trip must start and end at the depot and fit the vehicle capacity; the total cost may not fall
 * below a proven optimum (that would expose a costing error) and its mean gap per set must stay within
 * the bound below. The table with every instance is written to target/trip-split-quality.md.
 */
class TripSplitBenchmarkTest {

    /**
     * Further giant tours tried per instance: 10 in the suite, more for the docs table
     * ({@code -Dstreetcomb.tripRestarts=60}).
     */
    static final int RESTARTS = Integer.getInteger("streetcomb.tripRestarts", 10);
    /**
     * Mean gap per set the suite holds us to at its 10 restarts (a regression gate); the gaps measured with
     * 60 restarts, under 3 % on both sets, are in docs/quality.md.
     */
    private static final double MEAN_GAP_BOUND = Double.parseDouble(System.getProperty("streetcomb.tripGapBound", "0.05"));

    record Row(String set, String name, long published, double cost, int trips) {
        double gap() {
            return (cost - published) / published;
        }
    }

    @Test
    void tripsStayWithinTheGapOfPublishedValues() throws IOException {
        List<Row> rows = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("fixtures/benchmarks/values.csv")).subList(1, 210)) {
            String[] f = line.split(",", 7);
            if (!f[3].equals("CARP") || !(f[0].equals("gdb") || f[0].equals("val"))) {
                continue;
            }
            rows.add(solve(f[0], f[1], Path.of("fixtures/benchmarks", f[2]), Long.parseLong(f[4])));
        }
        Map<String, double[]> perSet = new LinkedHashMap<>();
        StringBuilder table = new StringBuilder("| set | instance | published (from memory) | trips cost | trips | gap |\n|---|---|---|---|---|---|\n");
        for (Row row : rows) {
            assertTrue(row.cost() >= row.published() - 1e-6, row.name() + " below the proven optimum: " + row.cost());
            perSet.computeIfAbsent(row.set(), k -> new double[2]);
            perSet.get(row.set())[0] += row.gap();
            perSet.get(row.set())[1]++;
            table.append(String.format(Locale.ROOT, "| %s | %s | %d | %.0f | %d | %.2f %% |%n", row.set(), row.name(),
                    row.published(), row.cost(), row.trips(), 100 * row.gap()));
        }
        perSet.forEach((set, sum) -> table.append(String.format(Locale.ROOT, "| %s | mean of %d | | | | %.2f %% |%n",
                set, (int) sum[1], 100 * sum[0] / sum[1])));
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target/trip-split-quality.md"), table);
        assertEquals(2, perSet.size());
        perSet.forEach((set, sum) -> assertTrue(sum[0] / sum[1] <= MEAN_GAP_BOUND,
                set + " mean gap " + sum[0] / sum[1] + "\n" + table));
    }

    private static Row solve(String set, String name, Path file, long published) {
        CarplibInstance instance = CarplibReader.read(file);
        StreetNetwork network = CarplibNetwork.of(instance);
        int depot = instance.depot() - 1;
        Tour tour = TourPlanner.tours(network, Components.of(network), UndirectedPostman.solve(network), depot, true).get(0);
        double[] demand = new double[network.edgeCount()];
        for (int e = 0; e < demand.length; e++) {
            demand[e] = instance.edges().get(e).demand();
        }
        TripPlanner.Result result = new TripPlanner(network, depot,
                new TripPlanner.Settings(TripLimit.capacity(instance.capacity()), 0, RESTARTS, 1)).plan(tour, demand);
        double served = 0;
        for (Trip trip : result.trips()) {
            assertEquals(depot, trip.tour().start());
            assertFalse(trip.overLimit(), name + ": a trip over capacity");
            assertTrue(trip.demand() <= instance.capacity());
            served += trip.service();
        }
        double required = instance.edges().stream().filter(CarplibInstance.Edge::required).mapToDouble(CarplibInstance.Edge::cost).sum();
        assertEquals(required, served, 1e-6, name + ": every required edge serviced once");
        return new Row(set, name, published, result.length(), result.trips().size());
    }
}
