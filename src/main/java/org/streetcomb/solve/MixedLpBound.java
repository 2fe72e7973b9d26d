package org.streetcomb.solve;

import com.google.ortools.Loader;
import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPSolverParameters;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * A lower bound for the mixed postman (also rural, and open routes): the linear relaxation of the integer
 * model of Nobert &amp; Picard (Operations Research 44, 1996), solved by cutting planes.
 *
 * <p>Variables: x(e, d) &ge; 0 traversals of each street in each permitted direction, priced by length.
 * Rows: every node balanced (out minus in equals the open route's end balance); each street driven at least
 * its service passes in total (one-way streets in their direction, fixed-direction passes in theirs). This
 * relaxation alone equals Frederickson's INOUTDEGREE flow. Parity enters through odd-cut inequalities
 * (Christofides, Benavent, Campos, Corberán &amp; Mota 1984; Nobert &amp; Picard 1996): a closed walk crosses
 * every node set S an even number of times, so where the service passes crossing S, plus one if S holds
 * exactly one end of an open route, are odd, x(&delta;(S)) &ge; r(&delta;(S)) + 1. Violated cuts are found
 * heuristically (Corberán, Plana &amp; Sanchis use the same idea for the windy polyhedron): the sets S are the
 * connected parts of the network once the streets whose LP traversals exceed their service passes by more
 * than a threshold are kept; the streets across such a set have (nearly) no spare traversals, so an odd
 * set gives a cut violated by nearly one. The LP is re-solved after each round of cuts (GLOP, the simplex
 * code of OR-Tools: dual simplex, warm-started from the last basis after rows are added) until no cut is found or the work
 * budget ends; every round's optimum is a valid bound, and the bound only grows.
 *
 * <p>Determinism: the budget is counted in work, never in time ({@link Limits}: rounds, cuts added per round,
 * simplex iterations over all rounds; a solve cut short by the iteration budget is dropped and the last completed
 * round counts), so the same input gives the same bound and traversals on any machine and under any load. A wall
 * clock is kept only as a safety net far above what the work budget takes; when it fires the result says so
 * ({@link Result#stoppedByClock}) and the bound's description names it, because the plan may then differ between runs.
 *
 * <p>Why a library: a dual simplex with warm starts after added rows is a large, well-kept piece of code
 * (OR-Tools, Apache-2.0); the separation is ours because it is specific to the problem. Complexity: per
 * round one simplex re-solve (polynomial in practice, exponential worst case) plus O(m &alpha;(n)) for the
 * separation over a few thresholds.
 */
public final class MixedLpBound {

    /**
     * Work limits for the cutting planes.
     *
     * @param rounds        LP solves at most
     * @param cutsPerRound  violated cuts added per round at most (the first found: tightest threshold, lowest node id)
     * @param iterations    simplex iterations over all rounds at most
     * @param safetySeconds wall-clock safety net; reaching it makes the result machine-dependent, and says so
     */
    public record Limits(int rounds, int cutsPerRound, long iterations, double safetySeconds) {
    }

    /** Slack thresholds for the separation: a street with more spare traversals joins the two sides. */
    private static final double[] THRESHOLDS = {1e-6, 0.25, 0.5, 0.75};

    /**
     * The bound and the fractional traversals behind it.
     *
     * @param bound   a proven lower bound on the total length of any tour set meeting the demand, metres
     * @param along   LP traversals along each edge's digitised direction
     * @param against LP traversals against it
     * @param cuts    odd-cut inequalities added
     * @param rounds  LP solves
     * @param integral whether the final LP solution is integral (then, if connected, it is an optimal tour)
     * @param iterations simplex iterations over all rounds
     * @param stoppedByClock whether the wall-clock safety net, not the work budget, ended the rounds
     */
    public record Result(double bound, double[] along, double[] against, int cuts, int rounds, boolean integral,
                         long iterations, boolean stoppedByClock) {

        public String describe() {
            return "LP relaxation with " + cuts + " odd cuts"
                    + (stoppedByClock ? ", stopped by the wall-clock safety net (may differ between runs)" : "");
        }
    }

    private MixedLpBound() {
    }

    /**
     * Solves the relaxation with cuts within the work {@code limits} (the last completed LP counts); null when
     * the LP solver cannot be loaded or fails, so callers keep their combinatorial bound.
     */
    public static Result solve(PostmanProblem problem, Limits limits) {
        try {
            Loader.loadNativeLibraries();
        } catch (UnsatisfiedLinkError | RuntimeException e) {
            return null;
        }
        long deadline = System.nanoTime() + (long) (limits.safetySeconds() * 1e9);
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int n = network.nodeCount();
        int m = network.edgeCount();
        MPSolver solver = MPSolver.createSolver("GLOP");
        if (solver == null) {
            return null;
        }
        try {
            MPVariable[] along = new MPVariable[m];
            MPVariable[] against = new MPVariable[m];
            MPConstraint[] balance = new MPConstraint[n];
            for (int v = 0; v < n; v++) {
                double b = problem.endBalance(v);
                balance[v] = solver.makeConstraint(b, b);
            }
            int[] passes = new int[m];
            for (int e = 0; e < m; e++) {
                Travel travel = network.travel(e);
                passes[e] = demand.passes(e);
                int u = network.from(e);
                int v = network.to(e);
                if (u == v) {
                    continue;
                }
                double length = network.length(e);
                if (travel != Travel.BACKWARD) {
                    double low = travel == Travel.FORWARD ? passes[e] : demand.along()[e];
                    along[e] = solver.makeNumVar(low, Double.POSITIVE_INFINITY, "");
                    solver.objective().setCoefficient(along[e], length);
                    balance[u].setCoefficient(along[e], 1);
                    balance[v].setCoefficient(along[e], -1);
                }
                if (travel != Travel.FORWARD) {
                    double low = travel == Travel.BACKWARD ? passes[e] : demand.against()[e];
                    against[e] = solver.makeNumVar(low, Double.POSITIVE_INFINITY, "");
                    solver.objective().setCoefficient(against[e], length);
                    balance[u].setCoefficient(against[e], -1);
                    balance[v].setCoefficient(against[e], 1);
                }
                if (travel == Travel.BOTH && demand.either()[e] > 0) {
                    MPConstraint cover = solver.makeConstraint(passes[e], Double.POSITIVE_INFINITY);
                    cover.setCoefficient(along[e], 1);
                    cover.setCoefficient(against[e], 1);
                }
            }
            solver.objective().setMinimization();
            double selfLoops = 0;
            for (int e = 0; e < m; e++) {
                if (network.from(e) == network.to(e)) {
                    selfLoops += passes[e] * network.length(e);
                }
            }
            // dual simplex without presolve: after added rows it re-starts from the last basis (measured on
            // Andorra, 2,813 streets: 0.012 s a round against 0.13 s with the defaults)
            MPSolverParameters params = new MPSolverParameters();
            params.setIntegerParam(MPSolverParameters.IntegerParam.PRESOLVE,
                    MPSolverParameters.PresolveValues.PRESOLVE_OFF.swigValue());
            params.setIntegerParam(MPSolverParameters.IntegerParam.LP_ALGORITHM,
                    MPSolverParameters.LpAlgorithmValues.DUAL.swigValue());
            double[] a = new double[m];
            double[] b = new double[m];
            double bound = Double.NEGATIVE_INFINITY;
            int cuts = 0;
            int rounds = 0;
            long iterations = 0;
            boolean integral = false;
            boolean clock = false;
            Set<String> seen = new HashSet<>();
            while (rounds < limits.rounds() && iterations < limits.iterations()) {
                double left = (deadline - System.nanoTime()) / 1e9;
                if (left <= 0) {
                    clock = true;
                    break;
                }
                solver.setTimeLimit((long) (left * 1000) + 1);
                solver.setSolverSpecificParametersAsString(
                        "max_number_of_iterations: " + (limits.iterations() - iterations));
                MPSolver.ResultStatus status = solver.solve(params);
                iterations += solver.iterations();
                if (status != MPSolver.ResultStatus.OPTIMAL) {
                    clock = System.nanoTime() >= deadline;
                    break;
                }
                rounds++;
                // the relaxation's optimum, less the solver's relative tolerance, is a lower bound
                double value = solver.objective().value();
                bound = Math.max(bound, value - 1e-6 * Math.abs(value) + selfLoops);
                for (int e = 0; e < m; e++) {
                    a[e] = along[e] == null ? 0 : along[e].solutionValue();
                    b[e] = against[e] == null ? 0 : against[e].solutionValue();
                }
                integral = isIntegral(a) && isIntegral(b);
                List<int[]> found = separate(problem, passes, a, b, seen);
                if (found.isEmpty() || rounds == limits.rounds()) {
                    break;
                }
                for (int[] crossing : found.subList(0, Math.min(found.size(), limits.cutsPerRound()))) {
                    seen.add(Arrays.toString(crossing));
                    int rhs = 1;
                    MPConstraint cut = solver.makeConstraint(0, Double.POSITIVE_INFINITY);
                    for (int e : crossing) {
                        rhs += passes[e];
                        if (along[e] != null) {
                            cut.setCoefficient(along[e], 1);
                        }
                        if (against[e] != null) {
                            cut.setCoefficient(against[e], 1);
                        }
                    }
                    cut.setLb(rhs);
                    cuts++;
                }
            }
            if (rounds == 0) {
                return null;
            }
            return new Result(bound, a, b, cuts, rounds, integral, iterations, clock);
        } finally {
            solver.delete();
        }
    }

    private static boolean isIntegral(double[] x) {
        for (double v : x) {
            if (Math.abs(v - Math.rint(v)) > 1e-6) {
                return false;
            }
        }
        return true;
    }

    /**
     * Odd sets whose cut the LP solution violates, each given as the edges across it, in a fixed order (threshold,
     * then node id); {@code seen} holds the cuts already added (keyed by their edges) and those are skipped.
     */
    static List<int[]> separate(PostmanProblem problem, int[] passes, double[] a, double[] b, Set<String> seen) {
        StreetNetwork network = problem.network();
        int n = network.nodeCount();
        int m = network.edgeCount();
        List<int[]> cuts = new ArrayList<>();
        Set<String> found = new HashSet<>();
        int openStart = problem.open() ? problem.starts()[0] : -1;
        int openEnd = problem.open() ? problem.end() : -1;
        for (double threshold : THRESHOLDS) {
            int[] parent = new int[n];
            for (int v = 0; v < n; v++) {
                parent[v] = v;
            }
            for (int e = 0; e < m; e++) {
                if (a[e] + b[e] - passes[e] > threshold) {
                    union(parent, network.from(e), network.to(e));
                }
            }
            int[] root = new int[n];
            for (int v = 0; v < n; v++) {
                root[v] = find(parent, v);
            }
            int[] parity = new int[n];
            double[] slack = new double[n];
            for (int e = 0; e < m; e++) {
                int ru = root[network.from(e)];
                int rv = root[network.to(e)];
                if (ru != rv) {
                    parity[ru] += passes[e];
                    parity[rv] += passes[e];
                    double spare = a[e] + b[e] - passes[e];
                    slack[ru] += spare;
                    slack[rv] += spare;
                }
            }
            if (openStart >= 0 && root[openStart] != root[openEnd]) {
                parity[root[openStart]]++;
                parity[root[openEnd]]++;
            }
            List<Integer> roots = new ArrayList<>();
            for (int v = 0; v < n; v++) {
                if (root[v] == v && parity[v] % 2 == 1 && slack[v] < 1 - 1e-6) {
                    roots.add(v);
                }
            }
            if (roots.isEmpty()) {
                continue;
            }
            int[] index = new int[n];
            Arrays.fill(index, -1);
            for (int i = 0; i < roots.size(); i++) {
                index[roots.get(i)] = i;
            }
            int[] counts = new int[roots.size()];
            for (int e = 0; e < m; e++) {
                int ru = root[network.from(e)];
                int rv = root[network.to(e)];
                if (ru != rv) {
                    if (index[ru] >= 0) {
                        counts[index[ru]]++;
                    }
                    if (index[rv] >= 0) {
                        counts[index[rv]]++;
                    }
                }
            }
            int[][] crossing = new int[roots.size()][];
            for (int i = 0; i < crossing.length; i++) {
                crossing[i] = new int[counts[i]];
            }
            int[] fill = new int[roots.size()];
            for (int e = 0; e < m; e++) {
                int ru = root[network.from(e)];
                int rv = root[network.to(e)];
                if (ru != rv) {
                    if (index[ru] >= 0) {
                        crossing[index[ru]][fill[index[ru]]++] = e;
                    }
                    if (index[rv] >= 0) {
                        crossing[index[rv]][fill[index[rv]]++] = e;
                    }
                }
            }
            for (int[] edges : crossing) {
                String key = Arrays.toString(edges);
                if (!seen.contains(key) && found.add(key)) {
                    cuts.add(edges);
                }
            }
        }
        return cuts;
    }

    /** Union-find with path halving (both this class and CirculationSearch group nodes with it). */
    static int find(int[] parent, int v) {
        while (parent[v] != v) {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }
        return v;
    }

    static void union(int[] parent, int u, int v) {
        int ru = find(parent, u);
        int rv = find(parent, v);
        if (ru != rv) {
            parent[Math.max(ru, rv)] = Math.min(ru, rv);
        }
    }
}
