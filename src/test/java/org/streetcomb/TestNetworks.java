package org.streetcomb;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/** Seeded generated street networks for tests (invented data, not a real place). */
public final class TestNetworks {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private TestNetworks() {
    }

    /**
     * A jittered lattice of {@code cols} x {@code rows} blocks about 100 m wide near 0,0 where each block
     * side is kept with the given probability, as one road line per side.
     */
    public static List<RoadFeature> grid(int cols, int rows, double keep, long seed) {
        Random random = new Random(seed);
        double step = 0.0009;
        double[][] lon = new double[cols + 1][rows + 1];
        double[][] lat = new double[cols + 1][rows + 1];
        for (int i = 0; i <= cols; i++) {
            for (int j = 0; j <= rows; j++) {
                lon[i][j] = 10 + i * step + (random.nextDouble() - 0.5) * step * 0.4;
                lat[i][j] = 20 + j * step + (random.nextDouble() - 0.5) * step * 0.4;
            }
        }
        List<RoadFeature> lines = new ArrayList<>();
        for (int i = 0; i <= cols; i++) {
            for (int j = 0; j <= rows; j++) {
                if (i < cols && random.nextDouble() < keep) {
                    lines.add(line("e" + i + "_" + j, lon[i][j], lat[i][j], lon[i + 1][j], lat[i + 1][j]));
                }
                if (j < rows && random.nextDouble() < keep) {
                    lines.add(line("n" + i + "_" + j, lon[i][j], lat[i][j], lon[i][j + 1], lat[i][j + 1]));
                }
            }
        }
        return lines;
    }

    public static RoadFeature line(String id, double... lonLat) {
        Coordinate[] coords = new Coordinate[lonLat.length / 2];
        for (int i = 0; i < coords.length; i++) {
            coords[i] = new Coordinate(lonLat[2 * i], lonLat[2 * i + 1]);
        }
        return new RoadFeature(id, "", GEOMETRY.createLineString(coords), Travel.BOTH, true, Map.of());
    }

    public static StreetNetwork network(List<RoadFeature> lines) {
        return new NetworkBuilder(0.5).build(lines);
    }
}
