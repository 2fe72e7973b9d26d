package org.streetcomb.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.jgrapht.alg.cycle.ChinesePostman;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.WeightedPseudograph;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.timing.StageClock;

/**
 * Plans a tour of a generated street grid and prints one Markdown table row: edges, odd nodes, time per
 * stage, peak heap, and the ratio of JGraphT's {@link ChinesePostman} time to our solve time on the same
 * network when it finishes within the time limit. Run one size per JVM (docs/bench.sh) so peak heap is
 * that size's alone. Usage: PlanBenchmark EDGES|LAYER [REFERENCE_LIMIT_SECONDS], 0 to skip the reference; given a
 * layer file (docs/bench/make_grid.py --town writes one) it plans that instead of generating the easy grid.
 */
public final class PlanBenchmark {

    private PlanBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int limit = args.length > 1 ? Integer.parseInt(args[1]) : 120;
        boolean given = !args[0].matches("\\d+");
        Path dir = given ? null : Files.createTempDirectory("streetcomb-bench");
        Path layer = given ? Path.of(args[0]) : dir.resolve("grid.geojson");
        if (!given) {
            GridLayer.write(layer, Integer.parseInt(args[0]), 42);
        }
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);

        long start = System.nanoTime();
        StageClock clock = new StageClock(StageClock.SILENT);
        Plan plan = Planner.plan(new PlanRequest(layer, null, 0.5, 500, false), clock);
        double total = (System.nanoTime() - start) / 1e9;
        long peak = ManagementFactory.getMemoryPoolMXBeans().stream()
                .filter(pool -> pool.getType() == MemoryType.HEAP)
                .mapToLong(pool -> pool.getPeakUsage().getUsed()).sum();
        double solve = clock.stages().stream().filter(s -> s.name().equals("solve")).findFirst().orElseThrow().seconds();

        String reference = limit > 0 ? referenceRatio(plan.network(), plan.augmentation().deadhead(), solve, limit)
                : "not run (O(n^3) at this size)";
        StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "| %,d | %,d (%.2f) |", plan.network().edgeCount(),
                plan.augmentation().oddNodes(), plan.augmentation().oddNodes() / (double) plan.network().nodeCount()));
        // the table's stage columns, by name (the pipeline times more stages than the table shows)
        for (String name : new String[] {"read", "network", "solve", "order", "turns"}) {
            double seconds = clock.stages().stream().filter(s -> s.name().equals(name))
                    .mapToDouble(StageClock.Stage::seconds).sum();
            row.append(String.format(Locale.ROOT, " %.2f |", seconds));
        }
        row.append(String.format(Locale.ROOT, " %.2f | %,d | %s |", total, peak >> 20, reference));
        System.out.println(row);
        System.err.println(plan.augmentation().method());
        if (!given) {
            Files.deleteIfExists(layer);
            Files.deleteIfExists(dir);
        }
    }

    /** JGraphT's ChinesePostman on the same edges; its time divided by ours, or why there is none. */
    private static String referenceRatio(StreetNetwork network, double deadhead, double solveSeconds, int limit)
            throws Exception {
        WeightedPseudograph<Integer, DefaultWeightedEdge> graph = new WeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            graph.addVertex(v);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            graph.setEdgeWeight(graph.addEdge(network.from(e), network.to(e)), network.length(e));
        }
        ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
            Thread thread = new Thread(r);
            thread.setDaemon(true);
            return thread;
        });
        long start = System.nanoTime();
        Future<Double> weight = executor.submit(() -> new ChinesePostman<Integer, DefaultWeightedEdge>().getCPPSolution(graph).getWeight());
        try {
            double length = weight.get(limit, TimeUnit.SECONDS);
            double seconds = (System.nanoTime() - start) / 1e9;
            double ours = network.totalLength() + deadhead;
            return String.format(Locale.ROOT, "%.1f (%.2f s; same length: %s)", seconds / solveSeconds, seconds,
                    Math.abs(length - ours) <= 1e-6 * ours ? "yes" : "NO, " + length + " vs " + ours);
        } catch (TimeoutException e) {
            return "not finished in " + limit + " s";
        } finally {
            executor.shutdownNow();
        }
    }
}
