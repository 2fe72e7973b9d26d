package org.streetcomb.solve;

import com.google.ortools.Loader;
import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * An exact reference for the mixed postman, independent of the solvers under test: the integer
 * circulation model solved by OR-Tools CP-SAT. One integer variable per street and permitted direction
 * counts its traversals; each one-way street is driven at least its demand along its direction, each
 * two-way street at least its demand in total (and any fixed-direction demand in that direction), and
 * every node is balanced. Every street has demand and the network is strongly connected, so any feasible
 * circulation is one closed tour. Lengths are integer decimetres for the solver; the optimum is
 * re-measured in metres from the chosen counts, and the proven bound is lowered by the largest rounding
 * error a solution of as many traversals can carry (0.05 m each, twice over for safety).
 */
public final class ExactMixedReference {

    /** Traversals per street and direction at most this many: far above what an optimum uses here (Monaco's core needs more than 6). */
    private static final int MAX_TRAVERSALS = 64;

    public record Result(double optimum, double bestBound, boolean proved) {
    }

    private ExactMixedReference() {
    }

    public static Result solve(StreetNetwork network, ServiceDemand demand, double seconds) {
        Loader.loadNativeLibraries();
        CpModel model = new CpModel();
        int n = network.nodeCount();
        int m = network.edgeCount();
        IntVar[] along = new IntVar[m];
        IntVar[] against = new IntVar[m];
        LinearExprBuilder[] balance = new LinearExprBuilder[n];
        for (int v = 0; v < n; v++) {
            balance[v] = LinearExpr.newBuilder();
        }
        LinearExprBuilder objective = LinearExpr.newBuilder();
        for (int e = 0; e < m; e++) {
            Travel travel = network.travel(e);
            along[e] = model.newIntVar(travel == Travel.BACKWARD ? 0 : demand.along()[e],
                    travel == Travel.BACKWARD ? 0 : MAX_TRAVERSALS, "a" + e);
            against[e] = model.newIntVar(travel == Travel.FORWARD ? 0 : demand.against()[e],
                    travel == Travel.FORWARD ? 0 : MAX_TRAVERSALS, "b" + e);
            model.addGreaterOrEqual(LinearExpr.sum(new IntVar[] {along[e], against[e]}), demand.passes(e));
            long cost = Math.round(network.length(e) * 10);
            objective.addTerm(along[e], cost).addTerm(against[e], cost);
            balance[network.from(e)].addTerm(along[e], 1).addTerm(against[e], -1);
            balance[network.to(e)].addTerm(along[e], -1).addTerm(against[e], 1);
        }
        for (int v = 0; v < n; v++) {
            model.addEquality(balance[v], 0);
        }
        model.minimize(objective);
        CpSolver solver = new CpSolver();
        solver.getParameters().setMaxTimeInSeconds(seconds);
        solver.getParameters().setNumWorkers(2);
        solver.getParameters().setRandomSeed(1);
        solver.getParameters().setLogSearchProgress(System.getProperty("cplog") != null);
        CpSolverStatus status = solver.solve(model);
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            throw new IllegalStateException("reference model not solved: " + status);
        }
        double metres = 0;
        long traversals = 0;
        for (int e = 0; e < m; e++) {
            long x = solver.value(along[e]) + solver.value(against[e]);
            metres += x * network.length(e);
            traversals += x;
        }
        double bound = Math.min(metres, solver.bestObjectiveBound() / 10.0 - 0.1 * traversals);
        return new Result(metres, bound, status == CpSolverStatus.OPTIMAL);
    }
}
