package org.streetcomb.match;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.jgrapht.alg.util.UnionFind;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.read.Travel;

/**
 * Hidden-Markov map matching after P. Newson and J. Krumm, "Hear and There: Hidden Markov map matching
 * through noise and sparseness", ACM SIGSPATIAL GIS 2009, pp. 336-343.
 *
 * <p>The hidden states of a fix are the nearest points of the edges within the search radius (one per pass of an
 * edge near the fix, {@link StreetIndex}), each taken
 * in both directions of travel, so the matched path says which way every stretch was driven (one-way
 * streets and both-kerb rounds need that). Legal travel is the rule, not a ban: a state against a one-way
 * street loses {@value #WRONG_WAY} of log-probability per fix, and a route between fixes that drives a one-way
 * street against its direction is charged {@value #WRONG_WAY_ROUTE} route metres once (an addition
 * to the published model, in the spirit of the direction-aware emission of Lou et al., "Map-matching for
 * low-sampling-rate GPS trajectories", ACM SIGSPATIAL GIS 2009: a crew is rarely waved through against a
 * one-way street, and GPS noise across a street, or across the two carriageways of a dual carriageway, makes
 * the wrong direction look nearly as likely as the right one). A steady drive against the direction still
 * reads as one where the fixes are more than about 25 m apart (the permitted direction is then charged twice
 * each backward step over beta, more than the penalty); denser fixes crawling against the arrows may be read
 * as the permitted direction.
 * Emission: Gaussian in the distance from the fix to the street, log p = -(d / sigma)^2 / 2. Transition:
 * exponential in the difference between the straight-line distance of two fixes and the route distance
 * of the two states, log p = -|d_line - d_route| / beta. For timed fixes after a gap (a dropout) the vehicle
 * may have driven farther than the straight line, into a close and back, say: routes up to the distance
 * its recent speed covers in the gap are not charged (an addition to the published model, which is the
 * special case of no gap). A move between two edges leaves the first state's edge in its direction,
 * follows the shortest path and enters the second state's edge in its direction. Staying on one edge in
 * one direction is charged for its signed step, so the backward steps of noise cost little and steady
 * backward motion loses to the other direction. Turning back at a node where the street goes on costs
 * {@value #U_TURN} m more (an addition to the published model: noise makes such turns look cheap, crews
 * rarely make them, and without it a turning loop is read as a turn at its mouth; a route between two fixes
 * that leaves by the first state's own street or arrives by the second's turns back there too, and is charged
 * the same, or a lone noisy fix beside a side street reads as a drive into it and back), and in the middle of
 * an edge (at roadworks, say) {@value #MID_STREET_TURN} m more; such a turn is placed at the farther of
 * the two fixes' positions, so only the stretch the fixes show is credited, and is not considered where
 * the edge leads to a dead end or a turning pocket, where crews drive to the end. Routes are bounded by
 * the gap limit and, for timed fixes, by the speed limit; where no route is believable the match is
 * split and nothing is credited across the split, as Newson &amp; Krumm
 * break the chain where the HMM cannot continue. The gap limit counts the metres driven in the open: a
 * receiver gets no fix in a tunnel (common practice), so a route through one may be as much longer as the
 * tunnel, and the metres the vehicle's pace covers in the gap are not charged there either.
 *
 * <p>What is credited: not only the most probable drive (Newson &amp; Krumm's Viterbi path) but every move
 * that lies on some drive at most {@link MatchSettings#doubtOdds} times less probable, found by a forward
 * (Viterbi) and a backward max-product pass, as for max-marginals. Coverage asks a different question from
 * navigation: not "which way did it go" but "could it have gone here". Where the track cannot tell, in a
 * dropout beside a loop or between two fixes at the mouth of a short dead end, the single best path picks
 * one way arbitrarily and reports the other as missed; a street 20 m beside the driven one, which the fixes
 * speak against, stays uncredited. A drive that is only believable is credited where it went legally: wrong-way
 * metres, an accusation, come from the most probable drive alone.
 *
 * <p>Written by hand: no library on Maven Central matches against a network of our own arrays. Cost per
 * fix pair: one bounded Dijkstra search per distinct exit node of the previous fix's states, plus
 * O(states^2).
 */
public final class HmmMapMatcher {

    /** Weight of the newest move in the smoothed speed. */
    private static final double PACE_WEIGHT = 0.2;
    /** Log-probability lost to rounding when a chain's score is summed forward and taken apart backward. */
    private static final double ROUNDING = 1e-6;
    /** How a move went: on along one edge, turning back on one edge, or through the nodes. */
    private static final byte ON = 0, TURN = 1, VIA = 2;
    /**
     * Extra route metres charged for turning back at a node where the street goes on: 35 m, chosen with 50 and
     * 25 m on the tuning seeds of the legal-drive study (docs/quality.md) once routes that double back pay it.
     */
    static final double U_TURN = 35;
    /**
     * Extra route metres charged for turning back in the middle of an edge: more than at a node, where a
     * side street helps the turn, so fixes that stop short of a junction read as a turn at the junction.
     */
    static final double MID_STREET_TURN = 2 * U_TURN;
    /**
     * Log-probability lost per fix placed against a one-way street: odds of about 22,000 to 1, far above the
     * default doubt odds (20), so noise alone does not credit a wrong-way drive. Chosen by trying 4, 6 and 10
     * on the plan's own drive of Monaco (wrong-way 0.56, 0.32 and 0 km) and checked by {@code LegalDriveTest}.
     */
    static final double WRONG_WAY = 10;
    /**
     * Route metres charged once for a route between two fixes that drives a one-way street against its
     * direction: more than the way round a roundabout or a block, which a legal drive takes where the
     * fixes would allow a short cut against the arrows.
     */
    static final double WRONG_WAY_ROUTE = 200;

    private final StreetNetwork network;
    private final StreetIndex index;
    private final LocalFrame frame;
    private final MatchSettings settings;
    private final DijkstraSearch search;
    private final DijkstraSearch legalSearch;
    private final int[] entryStamp;
    private final boolean[] pocketNodes;
    /** Edges that run underground, where a receiver gets no fix. */
    private final boolean[] underground;
    /** The longest run of connected tunnel edges, metres: how far a route may go beyond the gap limit. */
    private final double tunnelReach;
    private final Moves scratch = new Moves(256);
    private int stamp;
    /** Recent speed of the vehicle, metres per second (0 until known): a smoothed mean over matched moves. */
    private double pace;
    /** How far the vehicle may have driven between the two fixes being joined, before the gap limit, metres. */
    private double gapReach;
    /** GPS noise of the run being matched, metres (Newson &amp; Krumm's sigma_z). */
    private double sigma;

    /**
     * @param pocketNodes nodes on a turning pocket ({@link TurningPockets}): a crew heading for one drives
     *                    on to it and turns there, not in the street before it
     */
    public HmmMapMatcher(StreetNetwork network, StreetIndex index, MatchSettings settings, boolean[] pocketNodes) {
        this.network = network;
        this.pocketNodes = pocketNodes;
        this.index = index;
        this.frame = index.frame();
        this.settings = settings;
        this.search = new DijkstraSearch(network);
        this.legalSearch = new DijkstraSearch(network, Heading.OUTBOUND);
        this.entryStamp = new int[network.nodeCount()];
        this.underground = new boolean[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            underground[e] = network.feature(e).tunnel();
        }
        this.tunnelReach = longestTunnelRun(network, underground);
    }

    /**
     * The total length of the largest connected set of tunnel edges: JGraphT's union-find over the tunnels'
     * end nodes, O(tunnel edges) amortised.
     */
    private static double longestTunnelRun(StreetNetwork network, boolean[] underground) {
        Set<Integer> ends = new HashSet<>();
        for (int e = 0; e < underground.length; e++) {
            if (underground[e]) {
                ends.add(network.from(e));
                ends.add(network.to(e));
            }
        }
        UnionFind<Integer> runs = new UnionFind<>(ends);
        for (int e = 0; e < underground.length; e++) {
            if (underground[e]) {
                runs.union(network.from(e), network.to(e));
            }
        }
        Map<Integer, Double> length = new HashMap<>();
        for (int e = 0; e < underground.length; e++) {
            if (underground[e]) {
                length.merge(runs.find(network.from(e)), network.length(e), Double::sum);
            }
        }
        return length.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
    }

    /** The candidate states of one fix and the Viterbi scores over them. */
    private static final class Layer {
        /** Position of the fix in the segment. */
        final int fix;
        final double x;
        final double y;
        final double time;
        final int size;
        final int[] edge;
        final boolean[] along;
        final double[] offset;
        /** The nearest point of each state's edge to the fix, in the plane. */
        final double[] nearX;
        final double[] nearY;
        final double[] emission;
        /** Forward (Viterbi) score: log-probability of the best drive ending in each state. */
        final double[] score;
        /** The moves into this layer kept for crediting; see {@link Moves}. */
        Moves moves = Moves.NONE;

        Layer(StreetNetwork network, int fix, double x, double y, double time, StreetIndex.Hits hits, double sigma) {
            this.fix = fix;
            this.x = x;
            this.y = y;
            this.time = time;
            this.size = 2 * hits.count();
            edge = new int[size];
            along = new boolean[size];
            offset = new double[size];
            nearX = new double[size];
            nearY = new double[size];
            emission = new double[size];
            score = new double[size];
            for (int h = 0; h < hits.count(); h++) {
                double z = hits.distance()[h] / sigma;
                for (int d = 0; d < 2; d++) {
                    int s = 2 * h + d;
                    edge[s] = hits.edge()[h];
                    along[s] = d == 0;
                    offset[s] = hits.offset()[h];
                    nearX[s] = hits.nearX()[h];
                    nearY[s] = hits.nearY()[h];
                    emission[s] = -0.5 * z * z - (legal(network, edge[s], along[s]) ? 0 : WRONG_WAY);
                }
            }
        }
    }

    /**
     * Matches one cleaned run of fixes and records the stretches driven.
     *
     * @param run   indices into the segment of the fixes to use, in order
     * @param sigma the GPS noise of the run, metres: the settings' or one estimated from the track
     */
    public void match(TrackSegment segment, int[] run, double sigma, DrivenIntervals driven, MatchTally tally) {
        this.sigma = sigma;
        chains(segment, run, tally, chain -> credit(chain, driven));
    }

    /**
     * The offset of each fix of the run from the street position the most probable drive puts it at
     * (fix minus matched point, metres east and north in the plane), NaN for fixes left unmatched.
     */
    public double[][] residuals(TrackSegment segment, int[] run, double sigma) {
        this.sigma = sigma;
        double[][] residual = new double[2][segment.size()];
        Arrays.fill(residual[0], Double.NaN);
        Arrays.fill(residual[1], Double.NaN);
        chains(segment, run, new MatchTally(), chain -> {
            int[] states = mostProbable(chain);
            for (int k = 0; k < chain.size(); k++) {
                Layer layer = chain.get(k);
                residual[0][layer.fix] = layer.x - layer.nearX[states[k]];
                residual[1][layer.fix] = layer.y - layer.nearY[states[k]];
            }
        });
        return residual;
    }

    /** Runs the forward pass over the fixes and hands each finished chain (two fixes or more) to {@code sink}. */
    private void chains(TrackSegment segment, int[] run, MatchTally tally, java.util.function.Consumer<List<Layer>> sink) {
        List<Layer> chain = new ArrayList<>();
        pace = 0;
        for (int i : run) {
            double x = frame.x(segment.lon()[i]);
            double y = frame.y(segment.lat()[i]);
            StreetIndex.Hits hits = index.near(x, y, settings.radius());
            if (hits.count() == 0) {
                tally.offNetwork++;
                continue;
            }
            Layer layer = new Layer(network, i, x, y, segment.time()[i], hits, sigma);
            if (chain.isEmpty() || !advance(chain.get(chain.size() - 1), layer)) {
                if (!chain.isEmpty()) {
                    tally.breaks++;
                    finish(chain, tally, sink);
                    chain.clear();
                }
                System.arraycopy(layer.emission, 0, layer.score, 0, layer.size);
            }
            chain.add(layer);
        }
        finish(chain, tally, sink);
    }

    private static void finish(List<Layer> chain, MatchTally tally, java.util.function.Consumer<List<Layer>> sink) {
        if (chain.size() < 2) {
            return;
        }
        tally.chains++;
        tally.matched += chain.size();
        sink.accept(chain);
    }

    /** The states of the most probable drive (the Viterbi path), read back through the best move into each. */
    private static int[] mostProbable(List<Layer> chain) {
        int n = chain.size();
        int[] states = new int[n];
        Layer last = chain.get(n - 1);
        for (int s = 1; s < last.size; s++) {
            if (last.score[s] > last.score[states[n - 1]]) {
                states[n - 1] = s;
            }
        }
        for (int k = n - 1; k > 0; k--) {
            Layer layer = chain.get(k);
            Moves moves = layer.moves;
            int from = -1;
            for (int m = 0; m < moves.size && from < 0; m++) {
                if (moves.to[m] == states[k] && moves.score[m] == layer.score[states[k]]) {
                    from = moves.from[m];
                }
            }
            states[k - 1] = from;
        }
        return states;
    }

    /** Fills the scores of {@code next} from {@code previous}; false when no believable route joins them. */
    private boolean advance(Layer previous, Layer next) {
        double line = Math.hypot(next.x - previous.x, next.y - previous.y);
        double limit = limit(previous, next, line);
        double seconds = next.time - previous.time;
        gapReach = seconds > 0 && pace > 0 ? Math.max(line, pace * seconds) : line;
        double reach = Math.min(limit, gapReach);
        Arrays.fill(next.score, Double.NEGATIVE_INFINITY);
        scratch.clear();
        stamp++;
        for (int j = 0; j < next.size; j++) {
            entryStamp[entry(next, j)] = stamp;
        }
        Routes any = new Routes(next.size);
        Routes legal = new Routes(next.size);
        boolean[] done = new boolean[previous.size];
        for (int i = 0; i < previous.size; i++) {
            if (done[i] || previous.score[i] == Double.NEGATIVE_INFINITY) {
                continue;
            }
            int exit = exit(previous, i);
            routesFrom(search, exit, limit, next, any);
            routesFrom(legalSearch, exit, limit, next, legal);
            // every state leaving by the same node shares this search
            for (int k = i; k < previous.size; k++) {
                if (!done[k] && exit(previous, k) == exit && previous.score[k] != Double.NEGATIVE_INFINITY) {
                    done[k] = true;
                    for (int j = 0; j < next.size; j++) {
                        score(previous, k, next, j, line, reach, limit, any, legal);
                    }
                }
            }
        }
        if (scratch.size == 0) {
            return false;
        }
        next.moves = scratch.within(next.score, settings.margin());
        if (seconds > 0) {
            pace = pace == 0 ? line / seconds : (1 - PACE_WEIGHT) * pace + PACE_WEIGHT * line / seconds;
        }
        return true;
    }

    /**
     * Scores the move from state k of a to state j of b. A move along one edge in one direction is charged
     * |line - step| for its signed step, so noise that steps a few metres back costs a little, while steady
     * backward motion costs twice its length and loses to the opposite direction. Any other move follows
     * the route through the nodes.
     */
    private void score(Layer a, int k, Layer b, int j, double line, double reach, double limit, Routes any,
                       Routes legal) {
        double viaCost = Math.min(viaCost(a, k, b, j, line, reach, limit, legal),
                viaCost(a, k, b, j, line, reach, limit, any) + WRONG_WAY_ROUTE);
        double step = step(a, k, b, j);
        double onCost = Math.abs(step) <= limit ? deviation(step, line, reach) : Double.POSITIVE_INFINITY;
        double turn = a.edge[k] == b.edge[j] && a.along[k] != b.along[j] && goesOn(exit(a, k))
                ? Math.abs(a.offset[k] - b.offset[j]) : Double.NaN;
        double turnCost = turn <= limit ? deviation(turn, line, reach) + MID_STREET_TURN : Double.POSITIVE_INFINITY;
        double cost = Math.min(viaCost, Math.min(onCost, turnCost));
        if (cost == Double.POSITIVE_INFINITY) {
            return;
        }
        double score = a.score[k] - cost / settings.beta() + b.emission[j];
        scratch.add(k, j, score, cost == onCost ? ON : cost == turnCost ? TURN : VIA);
        b.score[j] = Math.max(b.score[j], score);
    }

    /** The cost of the move from state k of a to state j of b through the nodes, by the given routes. */
    private double viaCost(Layer a, int k, Layer b, int j, double line, double reach, double limit, Routes routes) {
        double nodeDistance = routes.distance[j];
        double rest = network.length(a.edge[k]) - progress(a, k);
        double via = rest + nodeDistance + progress(b, j);
        // the gap limit counts the metres in the open: in a tunnel no fix is to be had
        double open = (underground[a.edge[k]] ? 0 : rest) + routes.open[j] + (underground[b.edge[j]] ? 0 : progress(b, j));
        if (open > limit) {
            return Double.POSITIVE_INFINITY;
        }
        // a route that leaves by a's own edge, or arrives by b's, turns back at that end where the street goes on
        boolean turnsBack = uTurn(a, k, b, j, nodeDistance)
                || routes.first[j] == a.edge[k] && goesOn(exit(a, k))
                || routes.last[j] == b.edge[j] && goesOn(entry(b, j));
        // in a tunnel the vehicle drives on unseen: its metres there may take the route past the gap limit
        double within = via > open ? Math.min(gapReach, limit + via - open) : reach;
        return deviation(via, line, within) + (turnsBack ? U_TURN : 0);
    }

    /** Per state of the next fix: the route distance to its entry node, and the route's first and last edge (-1: none). */
    private static final class Routes {
        final double[] distance;
        /** The route's metres outside tunnels. */
        final double[] open;
        final int[] first;
        final int[] last;

        Routes(int size) {
            distance = new double[size];
            open = new double[size];
            first = new int[size];
            last = new int[size];
        }
    }

    /** Whether driving {@code edge} in the given direction obeys its one-way rule. */
    static boolean legal(StreetNetwork network, int edge, boolean along) {
        Travel travel = network.travel(edge);
        return travel == Travel.BOTH || (travel == Travel.FORWARD) == along;
    }

    /** How far a route falls outside [line, reach]: Newson &amp; Krumm's |line - route| when reach = line. */
    private static double deviation(double route, double line, double reach) {
        return route < line ? line - route : route > reach ? route - reach : 0;
    }

    /** The signed metres moved along one edge in one direction, or NaN when the states are not so placed. */
    private double step(Layer a, int k, Layer b, int j) {
        if (a.edge[k] != b.edge[j] || a.along[k] != b.along[j]) {
            return Double.NaN;
        }
        return progress(b, j) - progress(a, k);
    }

    /**
     * Whether the move turns back onto the same edge at a node where the street goes on, which a crew does
     * far less often than noise suggests (at a dead end it must, and that is not penalised).
     */
    private boolean uTurn(Layer a, int i, Layer b, int j, double nodeDistance) {
        return a.edge[i] == b.edge[j] && a.along[i] != b.along[j] && nodeDistance == 0
                && network.degree(exit(a, i)) > 1;
    }

    /** Whether the street goes on beyond {@code node}: not a dead end, nor the way into a turning pocket. */
    private boolean goesOn(int node) {
        return network.degree(node) > 1 && !pocketNodes[node];
    }

    /**
     * The longest believable route between two fixes {@code line} metres apart. Fixes without times (a
     * planned route, a line drawn by hand) stand only where the line bends, so a gap between them is no sign
     * of a dropout: a route about as long as the straight line (within 2 sigma) is believed however long.
     */
    private double limit(Layer previous, Layer next, double line) {
        double seconds = next.time - previous.time;
        if (seconds > 0) {
            return Math.min(settings.maxGap(), settings.maxSpeed() * seconds + TrackCleaner.NOISE_SIGMAS * sigma);
        }
        return Double.isNaN(seconds) ? Math.max(settings.maxGap(), line + 2 * sigma) : settings.maxGap();
    }

    /** Routes from {@code exit} to the entry nodes of the next states, up to {@code limit}. */
    private void routesFrom(DijkstraSearch search, int exit, double limit, Layer next, Routes routes) {
        Arrays.fill(routes.distance, Double.POSITIVE_INFINITY);
        search.start(exit);
        int remaining = next.size;
        for (int v = search.next(); v >= 0 && remaining > 0; v = search.next()) {
            double d = search.distance(v);
            if (d > limit + tunnelReach) {
                break;
            }
            if (entryStamp[v] == stamp) {
                double open = d;
                int first = -1;
                for (int u = v; search.parentEdge(u) >= 0; u = network.other(search.parentEdge(u), u)) {
                    first = search.parentEdge(u);
                    open -= underground[first] ? network.length(first) : 0;
                }
                for (int j = 0; j < next.size; j++) {
                    if (entry(next, j) == v) {
                        routes.distance[j] = d;
                        routes.open[j] = open;
                        routes.last[j] = search.parentEdge(v);
                        routes.first[j] = first;
                        remaining--;
                    }
                }
            }
        }
    }

    /** Metres from the edge's entry node to the state, in its direction of travel. */
    private double progress(Layer layer, int s) {
        return layer.along[s] ? layer.offset[s] : network.length(layer.edge[s]) - layer.offset[s];
    }

    private int exit(Layer layer, int s) {
        return layer.along[s] ? network.to(layer.edge[s]) : network.from(layer.edge[s]);
    }

    private int entry(Layer layer, int s) {
        return layer.along[s] ? network.from(layer.edge[s]) : network.to(layer.edge[s]);
    }

    /**
     * Credits every move that some drive within the margin of the most probable one makes. A backward pass
     * over the kept moves gives, per state, the best log-probability of the rest of the chain; a move's best
     * whole drive is its forward score plus that of the state it reaches. With a zero margin these are the
     * moves of the Viterbi path (and of drives tied with it).
     */
    private void credit(List<Layer> chain, DrivenIntervals driven) {
        int n = chain.size();
        double[][] rest = new double[n][];
        rest[n - 1] = new double[chain.get(n - 1).size];
        double best = Double.NEGATIVE_INFINITY;
        for (double s : chain.get(n - 1).score) {
            best = Math.max(best, s);
        }
        for (int k = n - 2; k >= 0; k--) {
            Layer a = chain.get(k);
            Moves moves = chain.get(k + 1).moves;
            rest[k] = new double[a.size];
            Arrays.fill(rest[k], Double.NEGATIVE_INFINITY);
            for (int m = 0; m < moves.size; m++) {
                int i = moves.from[m];
                rest[k][i] = Math.max(rest[k][i], moves.score[m] - a.score[i] + rest[k + 1][moves.to[m]]);
            }
        }
        for (int k = 1; k < n; k++) {
            Layer b = chain.get(k);
            Moves moves = b.moves;
            for (int m = 0; m < moves.size; m++) {
                double whole = moves.score[m] + rest[k][moves.to[m]];
                if (whole >= best - settings.margin() - ROUNDING) {
                    // a drive that is only believable, not the most probable, is credited where it went legally:
                    // a wrong-way metre is reported only where the most probable drive went against the arrows
                    credit(chain.get(k - 1), moves.from[m], b, moves.to[m], moves.kind[m], driven,
                            whole < best - ROUNDING);
                }
            }
        }
    }

    /**
     * Records the stretch from state i of a to state j of b, by the way the move went; with {@code legalOnly},
     * only what it drove in the permitted direction.
     */
    private void credit(Layer a, int i, Layer b, int j, byte how, DrivenIntervals all, boolean legalOnly) {
        Credit driven = new Credit(all, legalOnly);
        if (how == ON) {
            driven.add(a.edge[i], a.along[i], a.offset[i], b.offset[j]);
            return;
        }
        if (how == TURN) {
            // on to the farther of the two positions in a's direction, and back
            double turn = a.along[i] ? Math.max(a.offset[i], b.offset[j]) : Math.min(a.offset[i], b.offset[j]);
            driven.add(a.edge[i], a.along[i], a.offset[i], turn);
            driven.add(b.edge[j], b.along[j], turn, b.offset[j]);
            return;
        }
        int exit = exit(a, i);
        int entry = entry(b, j);
        // the route scored: the legal one unless a wrong-way one is shorter by more than its penalty
        legalSearch.start(exit);
        double legalRoute = legalSearch.runTo(entry);
        search.start(exit);
        double anyRoute = search.runTo(entry);
        DijkstraSearch route = legalRoute <= anyRoute + WRONG_WAY_ROUTE ? legalSearch : search;
        int ea = a.edge[i];
        if (a.along[i]) {
            driven.add(ea, true, a.offset[i], network.length(ea));
        } else {
            driven.add(ea, false, 0, a.offset[i]);
        }
        int node = exit;
        for (int e : route.pathTo(entry)) {
            boolean along = network.from(e) == node;
            driven.addWhole(e, along);
            node = network.other(e, node);
        }
        int eb = b.edge[j];
        if (b.along[j]) {
            driven.add(eb, true, 0, b.offset[j]);
        } else {
            driven.add(eb, false, b.offset[j], network.length(eb));
        }
    }

    /** The driven intervals, optionally keeping only what was driven in a street's permitted direction. */
    private final class Credit {
        private final DrivenIntervals driven;
        private final boolean legalOnly;

        Credit(DrivenIntervals driven, boolean legalOnly) {
            this.driven = driven;
            this.legalOnly = legalOnly;
        }

        void add(int edge, boolean along, double from, double to) {
            if (!legalOnly || legal(network, edge, along)) {
                driven.add(edge, along, from, to);
            }
        }

        void addWhole(int edge, boolean along) {
            if (!legalOnly || legal(network, edge, along)) {
                driven.addWhole(edge, along);
            }
        }
    }
}
