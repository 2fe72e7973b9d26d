package org.streetcomb.solve;

import com.google.ortools.Loader;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverSolutionCallback;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import java.util.Locale;
import java.util.function.Consumer;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * Proves a postman tour optimal, or finds a shorter one, within a time limit: the integer circulation model
 * of the mixed postman (one count per street and permitted direction, at least the service passes, every
 * node balanced; Nobert &amp; Picard 1996 without the parity cuts, which integrality makes redundant) solved by
 * branch-and-bound in OR-Tools CP-SAT, started from the heuristic's tour as a hint. Where every street to
 * service lies in one connected part of the chosen streets with the tour's start, any balanced integer
 * solution is a closed tour; a solution whose serviced streets fall apart is not used (the rural case, whose
 * connectivity the model leaves out: its bound is still valid).
 *
 * <p>Lengths go to the solver as whole centimetres; the bound returned is the solver's, less half a
 * centimetre for every traversal of the best tour (the rounding such a tour can carry). Why a library: a
 * branch-and-bound with LP and cutting planes is far beyond what this project should keep by hand.
 * Complexity: exponential in the worst case (the problem is NP-hard); bounded here by the time limit. The
 * tests' {@code ExactMixedReference} builds the same model on its own, on purpose: it is the independent
 * reference these solvers are checked against.
 */
public final class CirculationSearch {

    /** Traversals per street and direction at most this many. */
    private static final int MAX_TRAVERSALS = 64;

    private CirculationSearch() {
    }

    /**
     * The better of {@code heuristic} and what CP-SAT finds in {@code seconds}, with the best bound either
     * proves; {@code progress} receives a line per improvement.
     */
    public static Augmentation improve(PostmanProblem problem, Augmentation heuristic, double seconds,
                                       Consumer<String> progress) {
        Traversals start = heuristic.traversals();
        if (heuristic.certified()) {
            return new Augmentation(heuristic.traversals(), heuristic.deadhead(), heuristic.oddNodes(),
                    heuristic.method() + "; already optimal by its bound, no search needed", true,
                    heuristic.lowerBound());
        }
        Loader.loadNativeLibraries();
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int n = network.nodeCount();
        int m = network.edgeCount();
        CpModel model = new CpModel();
        IntVar[] along = new IntVar[m];
        IntVar[] against = new IntVar[m];
        LinearExprBuilder[] balance = new LinearExprBuilder[n];
        for (int v = 0; v < n; v++) {
            balance[v] = LinearExpr.newBuilder();
        }
        LinearExprBuilder objective = LinearExpr.newBuilder();
        boolean undirected = !start.directed();
        for (int e = 0; e < m; e++) {
            Travel travel = network.travel(e);
            int passes = demand.passes(e);
            along[e] = model.newIntVar(travel == Travel.BACKWARD ? 0 : travel == Travel.FORWARD ? passes
                    : demand.along()[e], travel == Travel.BACKWARD ? 0 : MAX_TRAVERSALS, "");
            against[e] = model.newIntVar(travel == Travel.FORWARD ? 0 : travel == Travel.BACKWARD ? passes
                    : demand.against()[e], travel == Travel.FORWARD ? 0 : MAX_TRAVERSALS, "");
            model.addGreaterOrEqual(LinearExpr.sum(new IntVar[] {along[e], against[e]}), passes);
            long cost = Math.round(network.length(e) * 100);
            objective.addTerm(along[e], cost).addTerm(against[e], cost);
            balance[network.from(e)].addTerm(along[e], 1).addTerm(against[e], -1);
            balance[network.to(e)].addTerm(along[e], -1).addTerm(against[e], 1);
            if (!undirected) {
                model.addHint(along[e], start.along()[e]);
                model.addHint(against[e], start.against()[e]);
            }
        }
        for (int v = 0; v < n; v++) {
            model.addEquality(balance[v], problem.endBalance(v));
        }
        model.minimize(objective);
        CpSolver solver = new CpSolver();
        solver.getParameters().setMaxTimeInSeconds(seconds);
        solver.getParameters().setNumWorkers(2);
        solver.getParameters().setRandomSeed(1);
        long begin = System.nanoTime();
        CpSolverStatus status = solver.solve(model, new CpSolverSolutionCallback() {
            @Override
            public void onSolutionCallback() {
                progress.accept(String.format(Locale.ROOT, "proof: tour %.3f km, bound %.3f km after %.1f s",
                        objectiveValue() / 1e5, Math.max(heuristic.lowerBound() / 1000, bestObjectiveBound() / 1e5),
                        (System.nanoTime() - begin) / 1e9));
            }
        });
        double bound = heuristic.lowerBound();
        Augmentation best = heuristic;
        boolean proved = false;
        if (status == CpSolverStatus.OPTIMAL || status == CpSolverStatus.FEASIBLE) {
            int[] a = new int[m];
            int[] b = new int[m];
            long traversals = 0;
            for (int e = 0; e < m; e++) {
                a[e] = (int) solver.value(along[e]);
                b[e] = (int) solver.value(against[e]);
                traversals += a[e] + b[e];
            }
            Traversals found = Traversals.directed(a, b);
            bound = Math.max(bound, solver.bestObjectiveBound() / 100 - 0.005 * traversals);
            if (connected(problem, found)) {
                double length = found.length(network);
                if (length < heuristic.traversals().length(network) - 1e-6) {
                    best = new Augmentation(found, length - demand.length(network), heuristic.oddNodes(),
                            heuristic.method(), false, bound);
                }
                // optimal in whole centimetres, and nothing shorter than CP-SAT's tour was kept
                proved = status == CpSolverStatus.OPTIMAL
                        && best.traversals().length(network) <= length + 1e-6;
            }
        }
        double total = best.traversals().length(network);
        String method = best.method() + "; " + (best == heuristic ? "kept" : "improved") + " by CP-SAT over the "
                + "integer circulation model in " + String.format(Locale.ROOT, "%.1f s", (System.nanoTime() - begin) / 1e9)
                + (proved ? ": optimal, proved (lengths in whole centimetres)"
                        : String.format(Locale.ROOT, ": time limit, certified gap %.2f %%", 100 * (total / bound - 1)));
        return new Augmentation(best.traversals(), total - demand.length(network), best.oddNodes(), method,
                proved || total <= bound * (1 + MixedPostman.CERTIFIED), Math.min(bound, total));
    }

    /**
     * Whether, in every part of the network, the serviced streets and the part's tour start lie in one
     * connected piece of the driven streets; pieces with no service (closed loops of deadhead, never
     * shorter) are then dropped from {@code found}.
     */
    static boolean connected(PostmanProblem problem, Traversals found) {
        StreetNetwork network = problem.network();
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] parent = new int[n];
        for (int v = 0; v < n; v++) {
            parent[v] = v;
        }
        for (int e = 0; e < m; e++) {
            if (found.passes(e) > 0) {
                MixedLpBound.union(parent, network.from(e), network.to(e));
            }
        }
        boolean[] rooted = new boolean[n];
        for (int s : problem.starts()) {
            rooted[MixedLpBound.find(parent, s)] = true;
        }
        for (int e = 0; e < m; e++) {
            if (problem.demand().needs(e) && !rooted[MixedLpBound.find(parent, network.from(e))]) {
                return false;
            }
        }
        int[] startsPerPiece = new int[n];
        for (int s : problem.starts()) {
            if (++startsPerPiece[MixedLpBound.find(parent, s)] > 1) {
                return false;
            }
        }
        for (int e = 0; e < m; e++) {
            if (!rooted[MixedLpBound.find(parent, network.from(e))]) {
                found.along()[e] = 0;
                found.against()[e] = 0;
            }
        }
        return true;
    }
}
