package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.solve.Traversals;

/**
 * Chooses where tours start and orders a solver's traversals into tours, one per part of the network that
 * has streets to service: the depot's part first, starting at the depot node, then the others from
 * largest to smallest, each starting at its node nearest the depot (where a crew arriving from the depot
 * would join it). Every tour is checked by {@link TourValidator} before it is returned.
 */
public final class TourPlanner {

    private TourPlanner() {
    }

    /** Start nodes of the tours: the depot, then one node per other part with demand (none if depotOnly). */
    public static int[] starts(StreetNetwork network, Components components, ServiceDemand demand, int depot,
                               boolean depotOnly) {
        int count = components.count();
        boolean[] hasDemand = new boolean[count];
        for (int e = 0; e < network.edgeCount(); e++) {
            if (demand.needs(e)) {
                hasDemand[components.of(network.from(e))] = true;
            }
        }
        int depotComponent = components.of(depot);
        if (depotOnly) {
            return new int[] {depot};
        }
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
        int[] starts = new int[count];
        int k = 0;
        starts[k++] = depot;
        for (int c = 0; c < count; c++) {
            if (c != depotComponent && hasDemand[c]) {
                starts[k++] = startOf[c];
            }
        }
        return Arrays.copyOf(starts, k);
    }

    /** Closed tours driving every street of the network (or of the depot's part) once, from a solver's answer. */
    public static List<Tour> tours(StreetNetwork network, Components components, Augmentation augmentation,
                                   int depot, boolean depotOnly) {
        ServiceDemand demand = ServiceDemand.everyEdge(network);
        Augmentation used = augmentation;
        if (depotOnly) {
            boolean[] keep = new boolean[network.edgeCount()];
            int[] either = augmentation.traversals().either().clone();
            for (int e = 0; e < keep.length; e++) {
                keep[e] = components.of(network.from(e)) == components.of(depot);
                either[e] = keep[e] ? either[e] : 0;
            }
            demand = demand.restrictedTo(keep);
            used = new Augmentation(Traversals.undirected(either), augmentation.deadhead(), augmentation.oddNodes(),
                    augmentation.method(), augmentation.certified(), augmentation.lowerBound());
        }
        int[] starts = starts(network, components, demand, depot, depotOnly);
        return tours(new PostmanProblem(network, demand, starts, depot), components, used);
    }

    /** The tours of a solved problem, in the order of its start nodes, each validated. */
    public static List<Tour> tours(PostmanProblem problem, Components components, Augmentation augmentation) {
        StreetNetwork network = problem.network();
        int[] starts = problem.starts();
        List<Tour> tours = HierholzerCircuit.of(network, augmentation.traversals(), problem.demand(), starts,
                problem.end());
        int[][] edgesOf = components.edgesByComponent(network);
        for (int t = 0; t < tours.size(); t++) {
            Tour tour = tours.get(t);
            int end = t == 0 ? problem.end() : tour.start();
            List<String> problems = TourValidator.problems(network, tour, problem.demand(),
                    edgesOf[components.of(tour.start())], end);
            if (!problems.isEmpty()) {
                throw new IllegalStateException("invalid tour from node " + tour.start() + ": " + problems);
            }
        }
        // a part whose streets were all left out (cut off by one-way streets) has nothing to drive
        List<Tour> driven = new ArrayList<>(tours.size());
        for (int t = 0; t < tours.size(); t++) {
            if (t == 0 || tours.get(t).steps() > 0) {
                driven.add(tours.get(t));
            }
        }
        return driven;
    }
}
