package org.streetcomb.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.streetcomb.network.CarplibNetwork;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.CarplibReader;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * The undirected postman optimum of every published gdb, val and egl graph (all edges to be driven).
 *
 * <p>Instances: Golden, DeArmon &amp; Baker (1983), Benavent, Campos, Corberán &amp; Mota (1992), Li &amp;
 * Eglese (1996), CARPLIB edition (see NOTICE). Reference values: fixtures/benchmarks/values.csv, rows
 * {@code UCPP_all_edges}: computed (not published) by the shared benchmark collection with networkx and
 * cross-checked with a SciPy/HiGHS integer program; capacity, demands and fleet are ignored.
 */
class UndirectedPostmanBenchmarkTest {

    static Stream<Arguments> instances() throws IOException {
        List<String> rows = Files.readAllLines(Path.of("fixtures/benchmarks/values.csv"));
        return rows.stream().skip(1)
                .map(row -> row.split(",", 7))
                .filter(f -> f[3].equals("UCPP_all_edges"))
                .map(f -> Arguments.of(f[1], Path.of("fixtures/benchmarks", f[2]), Long.parseLong(f[4])));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("instances")
    void tourLengthEqualsComputedOptimum(String name, Path file, long optimum) {
        var instance = CarplibReader.read(file);
        StreetNetwork network = CarplibNetwork.of(instance);
        ServiceDemand demand = ServiceDemand.everyEdge(network);
        PostmanProblem problem = new PostmanProblem(network, demand, new int[] {instance.depot() - 1}, instance.depot() - 1);
        Augmentation augmentation = new UndirectedPostman().solve(problem);
        List<Tour> tours = TourPlanner.tours(problem, Components.of(network), augmentation);

        assertEquals(1, tours.size(), "the benchmark graphs are connected");
        Tour tour = tours.get(0);
        assertEquals(instance.depot() - 1, tour.start());
        assertEquals(optimum, tour.length(network), 1e-9, name);
        assertEquals(network.totalLength() + augmentation.deadhead(), tour.length(network), 1e-9);
        assertTrue(augmentation.certified());
    }
}
