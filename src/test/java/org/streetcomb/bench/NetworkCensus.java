package org.streetcomb.bench;

import java.nio.file.Path;
import java.util.Locale;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadLayer;

/**
 * Prints one Markdown row per road layer with the figures that make a street network hard to plan: the
 * share of odd-degree nodes (the postman's matching size), of dead ends (degree 1), of degree-2 nodes
 * (bends the noder keeps), the mean edge length and the one-way share. docs/benchmarks.md takes the
 * realistic generator's defaults from these rows. Usage: NetworkCensus LAYER...
 */
public final class NetworkCensus {

    private NetworkCensus() {
    }

    public static void main(String[] args) {
        System.out.println("| layer | edges | nodes | odd / nodes | dead ends / nodes | degree 2 / nodes | degree 4+ / nodes | mean edge m | one-way edges |");
        System.out.println("|---|---:|---:|---:|---:|---:|---:|---:|---:|");
        for (String arg : args) {
            Path file = Path.of(arg);
            RoadLayer layer = LayerReaders.read(file);
            StreetNetwork network = new NetworkBuilder(0.5).build(layer);
            System.out.println(row(file.getFileName().toString(), network));
        }
    }

    static String row(String name, StreetNetwork network) {
        int nodes = network.nodeCount();
        int odd = 0;
        int deadEnds = 0;
        int two = 0;
        int fourPlus = 0;
        for (int v = 0; v < nodes; v++) {
            int degree = network.degree(v);
            odd += degree % 2;
            deadEnds += degree == 1 ? 1 : 0;
            two += degree == 2 ? 1 : 0;
            fourPlus += degree >= 4 ? 1 : 0;
        }
        int oneWay = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            oneWay += network.travel(e).oneWay() ? 1 : 0;
        }
        return String.format(Locale.ROOT, "| %s | %,d | %,d | %.2f | %.2f | %.2f | %.2f | %.0f | %.2f |", name,
                network.edgeCount(), nodes, odd / (double) nodes, deadEnds / (double) nodes, two / (double) nodes,
                fourPlus / (double) nodes, network.totalLength() / network.edgeCount(),
                oneWay / (double) network.edgeCount());
    }
}
