package org.streetcomb.solve;

/**
 * The contract every postman solver keeps. {@link #solve} takes a {@link PostmanProblem} that has passed
 * {@link ReachabilityCheck} and returns an {@link Augmentation} whose traversals are either all undirected
 * with every node even, or all directed with every node balanced (apart from an open route's ends), and
 * whose lower bound no tour of the problem can beat. {@code tour.TourPlanner} turns it into tours and
 * {@code tour.TourValidator} checks them against the demand.
 *
 * <p>Each solver states in code what the summary and docs/method.md state in words: the published method
 * it follows, whether its answer is proved optimal on every problem it is chosen for, and its running
 * time. {@link PostmanVariants} picks one from a table.
 */
public interface PostmanSolver {

    /** The published method, with its source, e.g. "Edmonds & Johnson 1973". */
    String method();

    /** Whether the answer is proved optimal on every problem this solver is chosen for. */
    boolean exact();

    /** Running time in n nodes, m edges and the problem's other sizes, as the class comment derives it. */
    String complexity();

    Augmentation solve(PostmanProblem problem);
}
