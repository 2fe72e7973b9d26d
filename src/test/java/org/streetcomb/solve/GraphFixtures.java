package org.streetcomb.solve;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.network.Heading;
import org.streetcomb.network.Reach;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/** Abstract test networks: the directed rural postman file format, and seeded random mixed networks. */
public final class GraphFixtures {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private GraphFixtures() {
    }

    /** An edge list: from, to (0-based), length, travel, required. */
    public record Graph(int nodes, List<int[]> edges, List<Travel> travel, List<Boolean> required) {
        public StreetNetwork network() {
            int m = edges.size();
            int[] from = new int[m];
            int[] to = new int[m];
            double[] length = new double[m];
            List<RoadFeature> features = new ArrayList<>(m);
            for (int e = 0; e < m; e++) {
                from[e] = edges.get(e)[0];
                to[e] = edges.get(e)[1];
                length[e] = edges.get(e)[2];
                var line = GEOMETRY.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(0, 0)});
                features.add(new RoadFeature("e" + e, "", line, travel.get(e), required.get(e), Map.of()));
            }
            return StreetNetwork.ofGraph(nodes, from, to, length, features);
        }
    }

    /**
     * Reads a directed rural postman file of the Campos collection (five header lines, then
     * "tail, head, cost, status" per arc, status 1 = required); see fixtures/benchmarks/drpp.
     */
    public static Graph drpp(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file);
        int nodes = Integer.parseInt(lines.get(0).trim());
        int arcs = Integer.parseInt(lines.get(2).trim());
        Graph g = new Graph(nodes, new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        for (int i = 5; i < 5 + arcs; i++) {
            String[] f = lines.get(i).split(",");
            g.edges.add(new int[] {Integer.parseInt(f[0].trim()) - 1, Integer.parseInt(f[1].trim()) - 1,
                Integer.parseInt(f[2].trim())});
            g.travel.add(Travel.FORWARD);
            g.required.add(f[3].trim().equals("1"));
        }
        return g;
    }

    /**
     * A seeded random street grid (rows x cols nodes, integer lengths 10..99) with a share of one-way
     * streets, kept strongly connected by drawing one-ways only where the reverse route survives.
     */
    public static Graph mixedGrid(long seed, int rows, int cols, double oneWayShare, double requiredShare) {
        Random random = new Random(seed);
        Graph g = new Graph(rows * cols, new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                int v = r * cols + c;
                if (c + 1 < cols) {
                    addStreet(g, random, v, v + 1, oneWayShare, requiredShare);
                }
                if (r + 1 < rows) {
                    addStreet(g, random, v, v + cols, oneWayShare, requiredShare);
                }
            }
        }
        // one-way streets that cut the network are made two-way again, in order, until every node can reach
        // every other
        for (int e = 0; e < g.edges.size() && !stronglyConnected(g.network()); e++) {
            g.travel.set(e, Travel.BOTH);
        }
        return g;
    }

    public static boolean stronglyConnected(StreetNetwork network) {
        boolean[] out = Reach.of(network, 0, Heading.OUTBOUND);
        boolean[] in = Reach.of(network, 0, Heading.INBOUND);
        for (int v = 0; v < network.nodeCount(); v++) {
            if (!out[v] || !in[v]) {
                return false;
            }
        }
        return true;
    }

    private static void addStreet(Graph g, Random random, int u, int v, double oneWayShare, double requiredShare) {
        g.edges.add(new int[] {u, v, 10 + random.nextInt(90)});
        double x = random.nextDouble();
        g.travel.add(x < oneWayShare / 2 ? Travel.FORWARD : x < oneWayShare ? Travel.BACKWARD : Travel.BOTH);
        g.required.add(random.nextDouble() < requiredShare);
    }
}
