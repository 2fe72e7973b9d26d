package org.streetcomb.tour;

import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.Augmentation;

/**
 * Orders an augmented network into closed tours, one per connected component: the depot's component
 * first, starting at the depot node, then the others from largest to smallest, each starting at its
 * node nearest the depot (where a crew arriving from the depot would join it). Every tour is checked by
 * {@link TourValidator} before it is returned.
 */
public final class TourPlanner {

    private TourPlanner() {
    }

    /**
     * @param depot         the depot node
     * @param depotOnly     plan only the depot's component
     */
    public static List<Tour> tours(StreetNetwork network, Components components, Augmentation augmentation,
                                   int depot, boolean depotOnly) {
        int count = components.count();
        int[] startOf = new int[count];
        double[] startScore = new double[count];
        Arrays.fill(startOf, -1);
        double cos = Math.cos(Math.toRadians(network.lat(depot)));
        for (int v = 0; v < network.nodeCount(); v++) {
            int c = components.of(v);
            if (c < 0) {
                continue;
            }
            // a planar screen is enough to pick where a crew joins each component
            double dx = (network.lon(v) - network.lon(depot)) * cos;
            double dy = network.lat(v) - network.lat(depot);
            double score = v == depot ? -1 : dx * dx + dy * dy;
            if (startOf[c] < 0 || score < startScore[c]) {
                startOf[c] = v;
                startScore[c] = score;
            }
        }
        int depotComponent = components.of(depot);
        int[] starts = depotOnly ? new int[] {depot} : new int[count];
        if (!depotOnly) {
            starts[0] = depot;
            int k = 1;
            for (int c = 0; c < count; c++) {
                if (c != depotComponent) {
                    starts[k++] = startOf[c];
                }
            }
        }
        boolean[] include = new boolean[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            include[e] = !depotOnly || components.of(network.from(e)) == depotComponent;
        }
        List<Tour> tours = HierholzerCircuit.of(network, augmentation.copies(), starts, include);
        int[][] edgesOf = components.edgesByComponent(network);
        for (Tour tour : tours) {
            List<String> problems = TourValidator.problems(network, tour, edgesOf[components.of(tour.start())]);
            if (!problems.isEmpty()) {
                throw new IllegalStateException("invalid tour from node " + tour.start() + ": " + problems);
            }
        }
        return tours;
    }
}
