package org.streetcomb.mopup;

import org.streetcomb.coverage.CoverageReport;

import java.util.ArrayList;
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
import org.streetcomb.tour.TourValidator;

/**
 * Plans the mop-up: a tour that services only what an audit found missed, travelling on any street to get
 * there. Its tours run on the {@link MissedStretchNetwork}, where each missed stretch of an edge flagged for
 * mop-up ({@link CoverageReport#mopUp}) is an edge of its own that needs one pass in the way it was missed:
 * either way for a two-way street driven once, the permitted direction of a one-way street, each missing side
 * for both kerbs; the driven rest of the street is road to travel on. This is a rural postman problem;
 * {@link PostmanVariants} picks the solver (undirected, directed or mixed) and {@link TourPlanner} orders and
 * validates the tours.
 *
 * <p>Where a stretch ends mid-street, a tour on the pieces may turn back there. Crews in large vehicles
 * (gritters, sweepers, refuse trucks) cannot turn in the middle of a street, and a turn there is hard to tell
 * from GPS noise when the drive is audited; so by default the problem is solved on the whole edges (an edge
 * needs a pass each way one of its stretches does) and each pass is then driven over the pieces, servicing
 * only the missed ones: the crew drives on to the next junction. The same length as a mop-up of whole edges,
 * less of it in service. With {@code turnBack} the problem is also solved on the pieces themselves, and the
 * shorter of the two tours is kept.
 * The tour is closed at the depot, or, from a given start (where the crew is now), open and ends at the
 * depot. Streets in parts of the network not connected to the start get a closed tour each. Missed
 * stretches that one-way streets cut off from the start or the depot are left out and named
 * ({@link MopUp#leftOut}), and the rest is planned.
 */
public final class MopUpPlanner {

    /**
     * A planned mop-up.
     *
     * @param problem       the pieces' network and demand, which the tours meet
     * @param augmentation  the solver's answer (on the whole edges when driving on) and the method that ran
     * @param tours         the tours, the start's first
     * @param start         where the first tour starts
     * @param end           where the first tour ends (the depot)
     * @param leftOut       what was left out because one-way streets cut it off, one line each
     */
    public record MopUp(PostmanProblem problem, Augmentation augmentation, List<Tour> tours, int start, int end,
                        List<String> leftOut) {

        public MopUp {
            leftOut = List.copyOf(leftOut);
        }

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

    /** Plans a mop-up that drives on to a junction where a missed stretch ends mid-street (see {@link #plan}). */
    public static MopUp plan(CoverageReport report, int depot, int first, String source) {
        return plan(report, depot, first, false, source);
    }

    /**
     * @param depot     the depot node: where the crew returns
     * @param first     the node the crew starts from: the depot, or where it is now
     * @param turnBack  whether the crew may turn back where a missed stretch ends mid-street; otherwise it drives
     *                  on along the street to a junction
     * @param source    the layer's name, for messages
     * @return the mop-up, or null when nothing needs servicing
     */
    public static MopUp plan(CoverageReport report, int depot, int first, boolean turnBack, String source) {
        MissedStretchNetwork stretches = MissedStretchNetwork.of(report);
        MopUp through = solve(report.network(), stretches.wholeEdges(), depot, first, source);
        if (through == null) {
            return null;
        }
        // the pieces of the whole edges left out (cut off by one-way streets) are left out too
        int[] parent = stretches.split().parent();
        boolean[] keep = new boolean[parent.length];
        for (int p = 0; p < parent.length; p++) {
            keep[p] = through.problem().demand().needs(parent[p]);
        }
        ServiceDemand pieces = stretches.demand().restrictedTo(keep);
        PostmanProblem problem = new PostmanProblem(stretches.network(), pieces, through.problem().starts(), depot);
        List<Tour> expanded = through.tours().stream().map(stretches::expand).toList();
        validate(problem, expanded);
        MopUp drivenOn = new MopUp(problem, through.augmentation(), expanded, first, depot, through.leftOut());
        if (!turnBack) {
            return drivenOn;
        }
        // the construction is a heuristic: more freedom does not always give it a shorter tour
        MopUp turning = solve(stretches.network(), pieces, depot, first, source);
        return turning.length() < drivenOn.length() ? turning : drivenOn;
    }

    /** The rural postman tours for a demand, or null when there is none. */
    private static MopUp solve(StreetNetwork network, ServiceDemand demand, int depot, int first, String source) {
        boolean any = false;
        for (int e = 0; e < network.edgeCount() && !any; e++) {
            any = demand.needs(e);
        }
        if (!any) {
            return null;
        }
        Components components = Components.of(network);
        if (components.of(first) != components.of(depot)) {
            throw new NoTourError(source + ": the start is on a part of the network not connected to the depot's");
        }
        int[] starts = TourPlanner.starts(network, components, demand, first, false);
        List<String> leftOut = new ArrayList<>();
        ServiceDemand reachable = ReachabilityCheck.check(new PostmanProblem(network, demand, starts, depot), source,
                true, leftOut).demand();
        PostmanProblem problem = new PostmanProblem(network, reachable,
                TourPlanner.starts(network, components, reachable, first, false), depot);
        Augmentation augmentation = PostmanVariants.solve(problem);
        return new MopUp(problem, augmentation, TourPlanner.tours(problem, components, augmentation), first, depot,
                leftOut);
    }

    /** Checks the tours driven over the pieces as {@link TourPlanner} checks every tour it makes. */
    private static void validate(PostmanProblem problem, List<Tour> tours) {
        StreetNetwork network = problem.network();
        Components components = Components.of(network);
        int[][] edgesOf = components.edgesByComponent(network);
        for (int t = 0; t < tours.size(); t++) {
            Tour tour = tours.get(t);
            List<String> problems = TourValidator.problems(network, tour, problem.demand(),
                    edgesOf[components.of(tour.start())], t == 0 ? problem.end() : tour.start());
            if (!problems.isEmpty()) {
                throw new IllegalStateException("invalid mop-up tour from node " + tour.start() + ": " + problems);
            }
        }
    }
}
