package org.streetcomb.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.cli.LayerOptions;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadLayer;
import picocli.CommandLine;

/**
 * Reads one road layer and builds its network, and prints one Markdown table row: features read, road
 * lines, edges, one-way edges, network length, read and network seconds, peak heap, and the time GDAL's
 * ogrinfo takes to read every feature of the same file (SQL sum over its geometries) with the ratio of
 * our read time to it, both measured in this run. Run one layer per JVM (docs/read-bench.sh) so the peak
 * heap is that layer's alone. Usage: ReadBenchmark LAYER [GDAL-LAYER-NAME|-] [layer options...]
 */
public final class ReadBenchmark {

    @CommandLine.Command(name = "read-benchmark")
    static final class Arguments {
        @CommandLine.Parameters(index = "0")
        Path layer;

        @CommandLine.Parameters(index = "1")
        String gdalLayer;

        @CommandLine.Mixin
        LayerOptions options;
    }

    private ReadBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Arguments a = new Arguments();
        new CommandLine(a).parseArgs(args);
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
        long start = System.nanoTime();
        RoadLayer layer = LayerReaders.read(a.layer, a.options.readOptions());
        double read = (System.nanoTime() - start) / 1e9;
        start = System.nanoTime();
        StreetNetwork network = new NetworkBuilder(a.options.snap()).build(layer);
        double build = (System.nanoTime() - start) / 1e9;
        long peak = ManagementFactory.getMemoryPoolMXBeans().stream()
                .filter(pool -> pool.getType() == MemoryType.HEAP)
                .mapToLong(pool -> pool.getPeakUsage().getUsed()).sum();
        int oneWay = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            oneWay += network.travel(e).oneWay() ? 1 : 0;
        }
        String gdal = a.gdalLayer.equals("-") ? "| - | - |" : gdalColumns(a.layer, a.gdalLayer, read);
        System.out.println(String.format(Locale.ROOT, "| %s | %,d | %,d | %,d | %,d | %.1f | %.2f | %.2f | %d %s",
                a.layer.getFileName(), layer.report().featuresRead(), layer.report().linesKept(), network.edgeCount(),
                oneWay, network.totalLength() / 1000, read, build, peak >> 20, gdal));
    }

    /** ogrinfo's time to read every geometry of the layer, and our read time over it. */
    private static String gdalColumns(Path file, String gdalLayer, double ours) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("ogrinfo", "-ro", "-q", "-dialect", "SQLite", "-sql",
                "SELECT SUM(ST_NPoints(geometry)) FROM \"" + gdalLayer + "\"", file.toString()));
        long start = System.nanoTime();
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        process.getInputStream().readAllBytes();
        if (process.waitFor() != 0) {
            return "| ogrinfo failed | - |";
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        return String.format(Locale.ROOT, "| %.2f | %.1f |", seconds, ours / seconds);
    }
}
