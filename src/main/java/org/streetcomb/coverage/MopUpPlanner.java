package org.streetcomb.coverage;

import java.util.List;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.PostmanVariants;
import org.streetcomb.solve.ReachabilityCheck;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * Plans the mop-up: a tour that services only what an audit found missed, travelling on any street to get
 * there. It is planned on the {@link MissedStretchNetwork}, where each missed stretch of an edge flagged for
 * mop-up ({@link CoverageReport#mopUp}) is an edge of its own that needs one pass in the way it was missed:
 * either way for a two-way street driven once, the permitted direction of a one-way street, each missing side
 * for both kerbs; the driven rest of the street is road to travel on. This is a rural postman problem;
 * {@link PostmanVariants} picks the solver (undirected, directed or mixed) and {@link TourPlanner} orders and
 * validates the tours.
 * The tour is closed at the depot, or, from a given start (where the crew is now), open and ends at the
 * depot. Streets in parts of the network not connected to the start get a closed tour each.
 */
public final class MopUpPlanner {

    /**
     * A planned mop-up.
     *
     * @param problem       what was solved
     * @param augmentation  the deadhead the solver added and the method that ran
     * @param tours         the tours, the start's first
     * @param start         where the first tour starts
     * @param end           where the first tour ends (the depot)
     */
    public record MopUp(PostmanProblem problem, Augmentation augmentation, List<Tour> tours, int start, int end) {

        /** The network the tours run on: the audited one with the mop-up edges cut at their missed stretches. */
        public StreetNetwork network() {
            return problem.network();
        }

        public double length() {
            return tours.stream().mapToDouble(t -> t.length(problem.network())).sum();
        }

        public double deadhead() {
            return tours.stream().mapToDouble(t -> t.deadhead(problem.network())).sum();
        }
    }

    private MopUpPlanner() {
    }

    /**
     * @param depot   the depot node: where the crew returns
     * @param first   the node the crew starts from: the depot, or where it is now
     * @param source  the layer's name, for messages
     * @return the mop-up, or null when nothing needs servicing
     */
    public static MopUp plan(CoverageReport report, int depot, int first, String source) {
        MissedStretchNetwork stretches = MissedStretchNetwork.of(report);
        StreetNetwork network = stretches.network();
        ServiceDemand demand = stretches.demand();
        boolean any = false;
        for (int e = 0; e < network.edgeCount() && !any; e++) {
            any = demand.needs(e);
        }
        if (!any) {
            return null;
        }
        int end = depot;
        Components components = Components.of(network);
        if (components.of(first) != components.of(end)) {
            throw new NoTourError(source + ": the start is on a part of the network not connected to the depot's");
        }
        int[] starts = TourPlanner.starts(network, components, demand, first, false);
        PostmanProblem problem = new PostmanProblem(network, demand, starts, end);
        ReachabilityCheck.check(problem, source);
        Augmentation augmentation = PostmanVariants.solve(problem);
        return new MopUp(problem, augmentation, TourPlanner.tours(problem, components, augmentation), first, end);
    }
}
