package org.streetcomb.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * The mixed postman problem (one-way and two-way streets together; NP-hard, Papadimitriou 1976), also in
 * its rural form, by Frederickson's MIXED2 scheme (J. ACM 26, 1979) and his MIXED1 (the same steps after
 * EVENDEGREE, a minimum-cost pairing of the underlying undirected graph's odd nodes, its copies put on two-way
 * streets only), each followed by exact re-optimisation, keeping the shorter, and a local search:
 * <ol>
 * <li>for a rural demand, join the groups of streets to service by drivable shortest paths
 *     ({@link ComponentConnector});</li>
 * <li>INOUTDEGREE: a minimum-cost flow balances every node, where each two-way street to service may be
 *     given a direction for free (a zero-cost arc of capacity one each way) and any street may be driven
 *     again in a permitted direction at its length;</li>
 * <li>EVENPARITY: the two-way streets the flow left without a direction must form an even graph to be
 *     oriented along cycles; their odd nodes are paired at minimum cost over two-way streets only
 *     (Blossom V), and each street on a pairing path either becomes a there-and-back pass or gains one
 *     undirected pass;</li>
 * <li>the even remainder is oriented along closed trails, which keeps every node balanced;</li>
 * <li>with every service pass now directed, the deadhead is re-solved exactly as a directed postman
 *     problem (never longer); the same is done for the orientation the LP bound's solution leans to
 *     ({@link MixedLpBound}: each two-way street in the direction the LP drives more, MIXED2's where it
 *     is even), and the shorter is kept;</li>
 * <li>single service directions are flipped while that shortens the tour, each flip priced exactly on the
 *     flow's residual network from its potentials ({@link FlipPricing}; at most {@link #FLIP_TRIALS}
 *     trials), in the spirit of the improvement procedures of Pearn &amp; Liu (Computers &amp; OR 22, 1995),
 *     and the flow re-solved once for the flipped passes.</li>
 * </ol>
 * Lower bound: the largest of the undirected relaxation (service plus a minimum-cost pairing of odd nodes,
 * one-way restrictions ignored), the INOUTDEGREE flow (service plus the flow's cost, parity relaxed) and
 * the LP relaxation with odd cuts ({@link MixedLpBound}, up to {@link #LP_MAX_EDGES} streets, within the work budget {@link #LP_LIMITS}); the method
 * string names the one used. Where the tour meets the bound it is reported optimal.
 */
public final class MixedPostman implements PostmanSolver {

    /**
     * Single-street direction flips tried in the local search, each a few bounded shortest-path searches
     * ({@link FlipPricing}); passes over the candidates repeat while one is kept.
     */
    static final int FLIP_TRIALS = 200_000;

    /**
     * Work budget for the LP bound's cutting planes, in work and not in time so that a plan is the same on any
     * machine ({@link MixedLpBound.Limits}). Every real extract of docs/quality.md ends its rounds within it
     * (at most 62 rounds, 1,526 simplex iterations); whole Baltimore (3,811 streets) reaches the round limit at a
     * 0.83 % certified gap (321 rounds to the end gave 0.85 %), a generated 10,000-street grid needed 155 rounds
     * and 16,862 iterations to the end. The two-minute clock is a safety net only.
     */
    static final MixedLpBound.Limits LP_LIMITS = new MixedLpBound.Limits(150, 2_000, 100_000, 120);

    /**
     * Larger networks skip the LP: on a generated 100,000-street grid its first solve did not finish in
     * 10 s (at 30,000 it did, giving a 0.43 % ceiling).
     */
    static final int LP_MAX_EDGES = 50_000;

    /**
     * Larger networks skip MIXED1, as they skip the LP: on the generated grids of docs/benchmarks.md it gave the
     * shorter tour at 10,000 streets (836.970 km against 839.214) but not at 30,000 or 100,000, where its
     * pairing and flow added 3 s to a 17 s solve.
     */
    static final int MIXED1_MAX_EDGES = LP_MAX_EDGES;

    /**
     * How far the LP's traversals must lean one way for the LP-guided orientation to follow it (a second
     * orientation at 0.5 was tried and gained nothing on the real instances of docs/quality.md).
     */
    static final double[] LEANS = {1e-6};

    /** A tour within this share of the bound counts as optimal: the LP solver's relative tolerance, twice. */
    static final double CERTIFIED = 2e-6;


    @Override
    public String method() {
        return "Frederickson 1979 MIXED1 and MIXED2 and an LP-guided orientation with exact re-balancing and direction flips; "
                + "lower bound from the LP relaxation with odd cuts (Nobert & Picard 1996)";
    }

    @Override
    public boolean exact() {
        return false;
    }

    @Override
    public String complexity() {
        return "a few minimum-cost flows and one Blossom V pairing, plus bounded shortest-path searches per direction flip tried (at most FLIP_TRIALS) and one flow after them and the LP rounds (at most LP_ROUNDS)";
    }

    @Override
    public Augmentation solve(PostmanProblem problem) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int m = network.edgeCount();
        int[] along = demand.along().clone();
        int[] against = demand.against().clone();
        String connection = "";
        if (!PostmanVariants.coversPlannedParts(problem)) {
            boolean[] serviced = new boolean[m];
            for (int e = 0; e < m; e++) {
                serviced[e] = demand.needs(e);
            }
            ServiceGroups groups = ServiceGroups.of(problem, serviced);
            int[][] links = ComponentConnector.connect(network, groups.group, groups.count, true);
            for (int e = 0; e < m; e++) {
                along[e] += links[0][e];
                against[e] += links[1][e];
            }
            connection = groups.count > 1 ? "spanning tree over " + groups.count + " groups, " : "";
        }
        Oriented oriented = inOutDegree(problem, along, against, demand.either());
        evenParity(network, oriented);
        orientAlongTrails(network, oriented);
        MixedLpBound.Result lp = m > LP_MAX_EDGES ? null : MixedLpBound.solve(problem, LP_LIMITS);
        // service directions now fixed: the connecting passes and the flow are re-solved together, for
        // MIXED2's orientation, for the LP's where it leans one way by more than each of LEANS (MIXED2's
        // elsewhere) and for MIXED1's (up to MIXED1_MAX_EDGES streets), keeping the shortest
        Kept kept = new Kept(problem, oriented(demand, along, against, oriented, null, 0), "MIXED2");
        for (double lean : lp == null ? new double[0] : LEANS) {
            kept.offer(oriented(demand, along, against, oriented, lp, lean), "LP-guided");
        }
        if (m <= MIXED1_MAX_EDGES) {
            kept.offer(oriented(demand, along, against, mixed1(problem, along, against), null, 0), "MIXED1");
        }
        DirectedPostman.Balanced best = kept.balanced;
        int[] serviceAlong = kept.along;
        int[] serviceAgainst = kept.against;
        String start = kept.name;
        // direction flips, each priced exactly by a few shortest paths on the flow's residual network
        FlipPricing pricing = new FlipPricing(network, serviceAlong, serviceAgainst, best);
        int[] keptAlong = serviceAlong.clone();
        int[] keptAgainst = serviceAgainst.clone();
        int flips = 0;
        int tried = 0;
        boolean improved = true;
        while (improved && tried < FLIP_TRIALS) {
            improved = false;
            for (int e : flipCandidates(network, demand, along, serviceAlong, pricing.potential())) {
                if (tried == FLIP_TRIALS) {
                    break;
                }
                tried++;
                int k = demand.either()[e];
                boolean forward = serviceAlong[e] - along[e] >= k;
                if (pricing.tryFlip(e, forward ? network.from(e) : network.to(e), k)) {
                    move(forward ? serviceAlong : serviceAgainst, forward ? serviceAgainst : serviceAlong, e, k);
                    flips++;
                    improved = true;
                }
            }
        }
        if (flips > 0) {
            // one exact re-solve for the flipped passes: the tour's traversals, and a check on the pricing
            DirectedPostman.Balanced flipped = DirectedPostman.balanced(problem, serviceAlong, serviceAgainst);
            if (flipped.traversals().length(network) < best.traversals().length(network) - 1e-9) {
                best = flipped;
            } else {
                serviceAlong = keptAlong;
                serviceAgainst = keptAgainst;
                flips = 0;
            }
        }
        double service = demand.length(network);
        double total = best.traversals().length(network);
        // the LP's first round is the flow relaxation, so with the LP only the undirected one is added
        double bound = lowerBound(problem, lp == null);
        String boundMethod = lp == null ? "undirected and flow relaxations" : "undirected relaxation";
        if (lp != null && lp.bound() > bound) {
            bound = lp.bound();
            boundMethod = lp.describe();
        }
        String method = "mixed postman, heuristic (" + connection + "Frederickson's " + (m <= MIXED1_MAX_EDGES ? "MIXED1 and MIXED2 orientations, " : "MIXED2 orientation, ")
                + "exact re-balancing by minimum-cost flow, " + start + " orientation kept, " + flips + " of " + tried + " direction flips kept; "
                + "bound: " + boundMethod + ")";
        return new Augmentation(best.traversals(), total - service, UndirectedPostman.oddNodes(network).length, method,
                total <= bound + CERTIFIED * Math.max(1, total), bound);
    }

    /**
     * Frederickson's MIXED1: EVENDEGREE first (a minimum-cost pairing of the odd nodes of the underlying
     * undirected multigraph, one-way restrictions ignored), then INOUTDEGREE, EVENPARITY and the trails. The
     * pairing's copies go on two-way streets only: a copy of a one-way street could lead where the flow cannot
     * return from (streets left out as cut off), and INOUTDEGREE and EVENPARITY restore the rest.
     */
    private static Oriented mixed1(PostmanProblem problem, int[] along, int[] against) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        int m = network.edgeCount();
        int[] passes = new int[m];
        for (int e = 0; e < m; e++) {
            passes[e] = along[e] + against[e] + demand.either()[e];
        }
        int[] evened = passes.clone();
        UndirectedPostman.addMatching(problem, evened);
        int[] either = demand.either().clone();
        for (int e = 0; e < m; e++) {
            if (network.travel(e) == Travel.BOTH) {
                either[e] += evened[e] - passes[e];
            }
        }
        Oriented mixed1 = inOutDegree(problem, along, against, either);
        evenParity(network, mixed1);
        orientAlongTrails(network, mixed1);
        return mixed1;
    }

    /** The shortest exact re-balancing of the service orientations offered so far, and which one it was. */
    private static final class Kept {
        private final PostmanProblem problem;
        DirectedPostman.Balanced balanced;
        int[] along;
        int[] against;
        String name;

        Kept(PostmanProblem problem, int[][] orientation, String name) {
            this.problem = problem;
            take(DirectedPostman.balanced(problem, orientation[0], orientation[1]), orientation, name);
        }

        /** Re-balances the service passes as {@code orientation} directs them and keeps the result if shorter. */
        void offer(int[][] orientation, String offered) {
            DirectedPostman.Balanced trial = DirectedPostman.balanced(problem, orientation[0], orientation[1]);
            if (trial.traversals().length(problem.network()) < balanced.traversals().length(problem.network()) - 1e-9) {
                take(trial, orientation, offered);
            }
        }

        private void take(DirectedPostman.Balanced trial, int[][] orientation, String offered) {
            balanced = trial;
            along = orientation[0];
            against = orientation[1];
            name = offered;
        }
    }

    /**
     * Service passes along and against each edge once every two-way pass has a direction: the LP's where
     * its traversals lean one way by more than {@code lean}, MIXED2's elsewhere (and everywhere without LP).
     */
    private static int[][] oriented(ServiceDemand demand, int[] along, int[] against, Oriented mixed2,
                                    MixedLpBound.Result lp, double lean) {
        int[] a = along.clone();
        int[] b = against.clone();
        for (int e = 0; e < a.length; e++) {
            if (demand.either()[e] > 0) {
                boolean forward = mixed2.along[e] >= mixed2.against[e];
                if (lp != null && Math.abs(lp.along()[e] - lp.against()[e]) > lean) {
                    forward = lp.along()[e] > lp.against()[e];
                }
                (forward ? a : b)[e] += demand.either()[e];
            }
        }
        return new int[][] {a, b};
    }

    /**
     * Two-way service passes whose flip might shorten the tour, most promising first. Flipping a pass
     * u&rarr;v needs two more units of deadhead from u to v, which costs at least 2 (p[u] - p[v]) for the
     * flow's potentials p: only passes with p[v] &gt; p[u] can gain, by at most 2 (p[v] - p[u]).
     */
    private static int[] flipCandidates(StreetNetwork network, ServiceDemand demand, int[] base, int[] serviceAlong,
                                        double[] p) {
        int m = network.edgeCount();
        double[] gain = new double[m];
        List<Integer> candidates = new ArrayList<>();
        for (int e = 0; e < m; e++) {
            int k = demand.either()[e];
            if (k == 0 || network.from(e) == network.to(e)) {
                continue;
            }
            boolean forward = serviceAlong[e] - base[e] >= k;
            int u = forward ? network.from(e) : network.to(e);
            int v = network.other(e, u);
            gain[e] = p[v] - p[u];
            if (gain[e] > 1e-9) {
                candidates.add(e);
            }
        }
        candidates.sort((a, b) -> gain[a] != gain[b] ? Double.compare(gain[b], gain[a]) : Integer.compare(a, b));
        return candidates.stream().mapToInt(Integer::intValue).toArray();
    }

    private static void move(int[] from, int[] to, int e, int k) {
        from[e] -= k;
        to[e] += k;
    }

    /** The larger of the undirected relaxation and the INOUTDEGREE flow relaxation, metres. */
    public static double lowerBound(PostmanProblem problem) {
        return lowerBound(problem, true);
    }

    /** The undirected relaxation, and the INOUTDEGREE flow relaxation if asked, metres. */
    private static double lowerBound(PostmanProblem problem, boolean withFlow) {
        StreetNetwork network = problem.network();
        ServiceDemand demand = problem.demand();
        double service = demand.length(network);
        int[] undirected = new int[network.edgeCount()];
        for (int e = 0; e < undirected.length; e++) {
            undirected[e] = demand.passes(e);
        }
        double matching = UndirectedPostman.addMatching(problem, undirected).cost();
        double flow = withFlow ? inOutDegree(problem, demand.along(), demand.against(), demand.either()).flowCost : 0;
        return service + Math.max(matching, flow);
    }

    /** Traversals under construction: directed passes, passes still without a direction, and the flow cost. */
    private static final class Oriented {
        final int[] along;
        final int[] against;
        final int[] free;
        double flowCost;

        Oriented(int[] along, int[] against, int[] free) {
            this.along = along;
            this.against = against;
            this.free = free;
        }
    }

    private static Oriented inOutDegree(PostmanProblem problem, int[] along, int[] against, int[] either) {
        StreetNetwork network = problem.network();
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] supply = new int[n];
        for (int e = 0; e < m; e++) {
            supply[network.to(e)] += along[e] - against[e];
            supply[network.from(e)] += against[e] - along[e];
        }
        for (int v = 0; v < n; v++) {
            supply[v] += problem.endBalance(v);
        }
        MinCostFlow flow = new MinCostFlow(n);
        int[] deadAlong = new int[m];
        int[] deadAgainst = new int[m];
        int[] freeAlong = new int[m];
        int[] freeAgainst = new int[m];
        Arrays.fill(freeAlong, -1);
        Arrays.fill(freeAgainst, -1);
        for (int e = 0; e < m; e++) {
            Travel travel = network.travel(e);
            int u = network.from(e);
            int v = network.to(e);
            deadAlong[e] = travel == Travel.BACKWARD ? -1 : flow.addArc(u, v, network.length(e), MinCostFlow.UNBOUNDED);
            deadAgainst[e] = travel == Travel.FORWARD ? -1 : flow.addArc(v, u, network.length(e), MinCostFlow.UNBOUNDED);
            if (either[e] > 0 && travel == Travel.BOTH) {
                freeAlong[e] = flow.addArc(u, v, 0, either[e]);
                freeAgainst[e] = flow.addArc(v, u, 0, either[e]);
            }
        }
        int[] x = flow.solve(supply);
        int[] a = along.clone();
        int[] b = against.clone();
        int[] free = either.clone();
        double cost = 0;
        for (int e = 0; e < m; e++) {
            int da = deadAlong[e] < 0 ? 0 : x[deadAlong[e]];
            int db = deadAgainst[e] < 0 ? 0 : x[deadAgainst[e]];
            a[e] += da;
            b[e] += db;
            cost += (da + db) * network.length(e);
            if (freeAlong[e] >= 0) {
                int fa = x[freeAlong[e]];
                int fb = x[freeAgainst[e]];
                int cancel = Math.min(fa, fb);
                fa -= cancel;
                fb -= cancel;
                a[e] += fa;
                b[e] += fb;
                free[e] -= fa + fb;
            } else if (either[e] > 0) {
                // a service pass on a one-way street (both-kerbs data) takes its only direction
                (network.travel(e) == Travel.FORWARD ? a : b)[e] += either[e];
                free[e] = 0;
            }
        }
        Oriented oriented = new Oriented(a, b, free);
        oriented.flowCost = cost;
        return oriented;
    }

    /** Pairs the odd nodes of the undirected passes over two-way streets and toggles parity along the paths. */
    private static void evenParity(StreetNetwork network, Oriented oriented) {
        int n = network.nodeCount();
        int m = network.edgeCount();
        int[] degree = new int[n];
        for (int e = 0; e < m; e++) {
            degree[network.from(e)] += oriented.free[e];
            degree[network.to(e)] += oriented.free[e];
        }
        int[] odd = java.util.stream.IntStream.range(0, n).filter(v -> degree[v] % 2 == 1).toArray();
        if (odd.length == 0) {
            return;
        }
        List<Integer> twoWay = new ArrayList<>();
        for (int e = 0; e < m; e++) {
            if (network.travel(e) == Travel.BOTH) {
                twoWay.add(e);
            }
        }
        int k = twoWay.size();
        int[] from = new int[k];
        int[] to = new int[k];
        double[] length = new double[k];
        List<RoadFeature> features = new ArrayList<>(k);
        for (int i = 0; i < k; i++) {
            int e = twoWay.get(i);
            from[i] = network.from(e);
            to[i] = network.to(e);
            length[i] = network.length(e);
            features.add(network.feature(e));
        }
        StreetNetwork sub = StreetNetwork.ofGraph(n, from, to, length, features);
        OddVertexMatching.Result matching = OddVertexMatching.solve(sub, odd, UndirectedPostman.NEIGHBOURS);
        int[] toggles = new int[k];
        DijkstraSearch search = new DijkstraSearch(sub);
        int[] pairs = matching.pairs();
        for (int p = 0; p < pairs.length; p += 2) {
            search.start(pairs[p]);
            search.runTo(pairs[p + 1]);
            for (int i : search.pathTo(pairs[p + 1])) {
                toggles[i] ^= 1;
            }
        }
        for (int i = 0; i < k; i++) {
            if (toggles[i] == 0) {
                continue;
            }
            int e = twoWay.get(i);
            if (oriented.free[e] > 0) {
                // the undirected pass becomes a there-and-back pass
                oriented.free[e]--;
                oriented.along[e]++;
                oriented.against[e]++;
            } else {
                oriented.free[e]++;
            }
        }
    }

    /**
     * Gives every undirected pass a direction by walking closed trails through the (even) undirected passes,
     * from each node in turn: the greedy steps of the Euler walk ({@link EulerWalk#step}), O(V + E).
     */
    private static void orientAlongTrails(StreetNetwork network, Oriented oriented) {
        int[] none = new int[network.edgeCount()];
        EulerWalk trails = new EulerWalk(network, none, none, oriented.free);
        for (int s = 0; s < network.nodeCount(); s++) {
            int v = s;
            for (int step = trails.step(v); step >= 0; step = trails.step(v)) {
                int e = step / 2;
                if (step % 2 == 1) {
                    oriented.along[e]++;
                } else {
                    oriented.against[e]++;
                }
                v = network.other(e, v);
            }
        }
        Arrays.fill(oriented.free, 0);
    }
}
