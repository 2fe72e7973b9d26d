package org.streetcomb.solve;

import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;

/**
 * Picks the postman variant from the network and the demand, and runs it: no one-way street and every
 * street once in any direction → undirected, exact; every service pass with a fixed direction and every
 * street serviced → directed, exact; a subset of streets → the rural postman heuristics, then a search of
 * the order of the service passes ({@link ServiceOrderSearch}); one-way and two-way streets together → the
 * mixed postman heuristic with a lower bound (rural demand: also that search); an open route through
 * parts that one-way streets join in one direction only → those parts one by one ({@link AreaChainPostman}).
 * The method that ran is in the returned {@link Augmentation}.
 */
public final class PostmanVariants {

    private PostmanVariants() {
    }

    public static Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        boolean oneWay = false;
        for (int e = 0; e < network.edgeCount() && !oneWay; e++) {
            oneWay = network.travel(e).oneWay();
        }
        if (oneWay && problem.open()) {
            OpenRouteOrder.Chain chain = OpenRouteOrder.chain(problem, "the open route");
            if (chain.order().length > 1) {
                return ServiceOrderSearch.improve(problem, AreaChainPostman.solve(problem, chain));
            }
        }
        boolean everyEdge = coversPlannedParts(problem);
        if (!oneWay && demand.undirected()) {
            return everyEdge ? UndirectedPostman.solve(problem)
                    : ServiceOrderSearch.improve(problem, UndirectedRuralPostman.solve(problem));
        }
        if (demand.directed()) {
            return everyEdge ? DirectedPostman.solve(problem)
                    : ServiceOrderSearch.improve(problem, DirectedRuralPostman.solve(problem));
        }
        Augmentation mixed = MixedPostman.solve(problem);
        return everyEdge ? mixed : ServiceOrderSearch.improve(problem, mixed);
    }

    /** Whether every street of every part that gets a tour has service demand. */
    static boolean coversPlannedParts(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        Components components = Components.of(network);
        boolean[] planned = new boolean[components.count()];
        for (int start : problem.starts()) {
            planned[components.of(start)] = true;
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            if (planned[components.of(network.from(e))] && !problem.demand().needs(e)) {
                return false;
            }
        }
        return true;
    }
}
