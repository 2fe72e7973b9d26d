package org.streetcomb.solve;

import java.util.List;
import java.util.function.Predicate;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;

/**
 * Picks the postman solver from the network and the demand, by the first row of {@link #TABLE} whose
 * condition holds, and runs it. The method that ran is in the returned {@link Augmentation}.
 */
public final class PostmanVariants {

    /** What decides the variant: one-way streets, the demand's directions, coverage, an open route. */
    public record Shape(boolean oneWay, boolean undirectedDemand, boolean directedDemand, boolean everyEdge,
                        boolean chainedOpenRoute) {
    }

    /** A row of the table: when it applies, in words and as a test, and the solver that runs. */
    public record Variant(String when, Predicate<Shape> applies, PostmanSolver solver) {
    }

    /**
     * The variants, first match wins. Rural demand (some streets only) runs a construction, then a search
     * of the order of the service passes ({@link ServiceOrderSearch}).
     */
    public static final List<Variant> TABLE = List.of(
            new Variant("open route through parts joined one way only", Shape::chainedOpenRoute,
                    new OrderSearched(new AreaChainPostman())),
            new Variant("no one-way street, every street once in either direction",
                    s -> !s.oneWay() && s.undirectedDemand() && s.everyEdge(), new UndirectedPostman()),
            new Variant("no one-way street, some streets once in either direction",
                    s -> !s.oneWay() && s.undirectedDemand(), new OrderSearched(new UndirectedRuralPostman())),
            new Variant("every pass with a direction, every street", s -> s.directedDemand() && s.everyEdge(),
                    new DirectedPostman()),
            new Variant("every pass with a direction, some streets", Shape::directedDemand,
                    new OrderSearched(new DirectedRuralPostman())),
            new Variant("one-way and two-way streets, every street", Shape::everyEdge, new MixedPostman()),
            new Variant("one-way and two-way streets, some streets", s -> true,
                    new OrderSearched(new MixedPostman())));

    private PostmanVariants() {
    }

    public static Augmentation solve(PostmanProblem problem) {
        return choose(problem).solve(problem);
    }

    /** The solver of the first row of {@link #TABLE} that applies to the problem. */
    public static PostmanSolver choose(PostmanProblem problem) {
        Shape shape = shape(problem);
        for (Variant variant : TABLE) {
            if (variant.applies().test(shape)) {
                return variant.solver();
            }
        }
        throw new IllegalStateException("no postman variant for " + shape);
    }

    static Shape shape(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        boolean oneWay = false;
        for (int e = 0; e < network.edgeCount() && !oneWay; e++) {
            oneWay = network.travel(e).oneWay();
        }
        boolean chained = oneWay && problem.open()
                && OpenRouteOrder.chain(problem, "the open route").order().length > 1;
        ServiceDemand demand = problem.demand();
        return new Shape(oneWay, demand.undirected(), demand.directed(), coversPlannedParts(problem), chained);
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

    /** A construction followed by {@link ServiceOrderSearch}: never longer than the construction alone. */
    record OrderSearched(PostmanSolver construction) implements PostmanSolver {
        @Override
        public String method() {
            return construction.method() + ", then 2-opt, Or-opt and exact directions over the service order "
                    + "(Hertz, Laporte & Nanchen-Hugo 1999)";
        }

        @Override
        public boolean exact() {
            return false;
        }

        @Override
        public String complexity() {
            return construction.complexity() + ", plus O(p^2) per search round over p service passes";
        }

        @Override
        public Augmentation solve(PostmanProblem problem) {
            return ServiceOrderSearch.improve(problem, construction.solve(problem));
        }
    }
}
