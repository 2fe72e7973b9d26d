package org.streetcomb.coverage;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;

/**
 * Hidden-Markov map matching after P. Newson and J. Krumm, "Hear and There: Hidden Markov map matching
 * through noise and sparseness", ACM SIGSPATIAL GIS 2009, pp. 336-343.
 *
 * <p>The hidden states of a fix are the nearest points of the edges within the search radius, each taken
 * in both directions of travel, so the matched path says which way every stretch was driven (one-way
 * streets and both-kerb rounds need that; the matcher does not assume the driver obeyed one-way signs).
 * Emission: Gaussian in the distance from the fix to the street, log p = -(d / sigma)^2 / 2. Transition:
 * exponential in the difference between the straight-line distance of two fixes and the route distance
 * of the two states, log p = -|d_line - d_route| / beta; the route leaves the first state's edge in its
 * direction, follows the shortest path, and enters the second state's edge in its direction, so turning
 * back in the middle of a street costs the way round. Staying on one edge in one direction is a direct
 * move (a small step backwards, within 2 sigma, is noise). The most probable sequence is found by the
 * Viterbi algorithm. Routes are bounded by the gap limit and, for timed fixes, by the speed limit; where
 * no route is believable the match is split and nothing is credited across the split, as Newson &amp; Krumm
 * break the chain where the HMM cannot continue.
 *
 * <p>Written by hand: no library on Maven Central matches against a network of our own arrays. Cost per
 * fix pair: one bounded Dijkstra search per distinct exit node of the previous fix's states, plus
 * O(states^2).
 */
public final class HmmMapMatcher {

    private final StreetNetwork network;
    private final StreetIndex index;
    private final LocalFrame frame;
    private final MatchSettings settings;
    private final DijkstraSearch search;
    private final int[] entryStamp;
    private int stamp;

    public HmmMapMatcher(StreetNetwork network, StreetIndex index, MatchSettings settings) {
        this.network = network;
        this.index = index;
        this.frame = index.frame();
        this.settings = settings;
        this.search = new DijkstraSearch(network);
        this.entryStamp = new int[network.nodeCount()];
    }

    /** The candidate states of one fix and the Viterbi scores over them. */
    private static final class Layer {
        final double x;
        final double y;
        final double time;
        final int size;
        final int[] edge;
        final boolean[] along;
        final double[] offset;
        final double[] emission;
        final double[] score;
        final int[] back;

        Layer(double x, double y, double time, StreetIndex.Hits hits, double sigma) {
            this.x = x;
            this.y = y;
            this.time = time;
            this.size = 2 * hits.count();
            edge = new int[size];
            along = new boolean[size];
            offset = new double[size];
            emission = new double[size];
            score = new double[size];
            back = new int[size];
            for (int h = 0; h < hits.count(); h++) {
                double z = hits.distance()[h] / sigma;
                for (int d = 0; d < 2; d++) {
                    int s = 2 * h + d;
                    edge[s] = hits.edge()[h];
                    along[s] = d == 0;
                    offset[s] = hits.offset()[h];
                    emission[s] = -0.5 * z * z;
                }
            }
        }
    }

    /**
     * Matches one cleaned run of fixes and records the stretches driven.
     *
     * @param run indices into the segment of the fixes to use, in order
     */
    public void match(TrackSegment segment, int[] run, DrivenIntervals driven, MatchTally tally) {
        List<Layer> chain = new ArrayList<>();
        for (int i : run) {
            double x = frame.x(segment.lon()[i]);
            double y = frame.y(segment.lat()[i]);
            StreetIndex.Hits hits = index.near(x, y, settings.radius());
            if (hits.count() == 0) {
                tally.offNetwork++;
                continue;
            }
            Layer layer = new Layer(x, y, segment.time()[i], hits, settings.sigma());
            if (chain.isEmpty() || !advance(chain.get(chain.size() - 1), layer)) {
                if (!chain.isEmpty()) {
                    tally.breaks++;
                    finish(chain, driven, tally);
                    chain.clear();
                }
                System.arraycopy(layer.emission, 0, layer.score, 0, layer.size);
                Arrays.fill(layer.back, -1);
            }
            chain.add(layer);
        }
        finish(chain, driven, tally);
    }

    /** Fills the scores of {@code next} from {@code previous}; false when no believable route joins them. */
    private boolean advance(Layer previous, Layer next) {
        double line = Math.hypot(next.x - previous.x, next.y - previous.y);
        double limit = limit(previous, next);
        Arrays.fill(next.score, Double.NEGATIVE_INFINITY);
        Arrays.fill(next.back, -1);
        stamp++;
        for (int j = 0; j < next.size; j++) {
            entryStamp[entry(next, j)] = stamp;
        }
        double[] toEntry = new double[next.size];
        boolean[] done = new boolean[previous.size];
        for (int i = 0; i < previous.size; i++) {
            if (done[i] || previous.score[i] == Double.NEGATIVE_INFINITY) {
                continue;
            }
            int exit = exit(previous, i);
            routesFrom(exit, limit, next, toEntry);
            // every state leaving by the same node shares this search
            for (int k = i; k < previous.size; k++) {
                if (!done[k] && exit(previous, k) == exit && previous.score[k] != Double.NEGATIVE_INFINITY) {
                    done[k] = true;
                    for (int j = 0; j < next.size; j++) {
                        double route = route(previous, k, next, j, toEntry[j]);
                        if (route > limit) {
                            continue;
                        }
                        double score = previous.score[k] - Math.abs(line - route) / settings.beta() + next.emission[j];
                        if (score > next.score[j]) {
                            next.score[j] = score;
                            next.back[j] = k;
                        }
                    }
                }
            }
        }
        for (int j = 0; j < next.size; j++) {
            if (next.back[j] >= 0) {
                return true;
            }
        }
        return false;
    }

    /** The longest believable route between two fixes. */
    private double limit(Layer previous, Layer next) {
        double seconds = next.time - previous.time;
        return seconds > 0 ? Math.min(settings.maxGap(), settings.maxSpeed() * seconds) : settings.maxGap();
    }

    /** Distances from {@code exit} to the entry nodes of the next states, up to {@code limit}. */
    private void routesFrom(int exit, double limit, Layer next, double[] toEntry) {
        Arrays.fill(toEntry, Double.POSITIVE_INFINITY);
        search.start(exit);
        int remaining = next.size;
        for (int v = search.next(); v >= 0 && remaining > 0; v = search.next()) {
            double d = search.distance(v);
            if (d > limit) {
                break;
            }
            if (entryStamp[v] == stamp) {
                for (int j = 0; j < next.size; j++) {
                    if (entry(next, j) == v) {
                        toEntry[j] = d;
                        remaining--;
                    }
                }
            }
        }
    }

    /** Route distance from state i of a to state j of b, given the shortest distance between their nodes. */
    private double route(Layer a, int i, Layer b, int j, double nodeDistance) {
        double via = network.length(a.edge[i]) - progress(a, i) + nodeDistance + progress(b, j);
        return Math.min(via, direct(a, i, b, j));
    }

    /** The distance of a move that stays on one edge in one direction, or infinity. */
    private double direct(Layer a, int i, Layer b, int j) {
        if (a.edge[i] != b.edge[j] || a.along[i] != b.along[j]) {
            return Double.POSITIVE_INFINITY;
        }
        double step = progress(b, j) - progress(a, i);
        return step >= -2 * settings.sigma() ? Math.abs(step) : Double.POSITIVE_INFINITY;
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

    /** Backtracks the most probable states of a chain and records the stretches between them. */
    private void finish(List<Layer> chain, DrivenIntervals driven, MatchTally tally) {
        if (chain.size() < 2) {
            return;
        }
        tally.chains++;
        tally.matched += chain.size();
        Layer last = chain.get(chain.size() - 1);
        int state = 0;
        for (int s = 1; s < last.size; s++) {
            if (last.score[s] > last.score[state]) {
                state = s;
            }
        }
        int[] states = new int[chain.size()];
        for (int k = chain.size() - 1; k >= 0; k--) {
            states[k] = state;
            state = chain.get(k).back[state];
        }
        for (int k = 1; k < chain.size(); k++) {
            credit(chain.get(k - 1), states[k - 1], chain.get(k), states[k], driven);
        }
    }

    /**
     * Records the stretch from state i of a to state j of b. A direct move is never longer than the way
     * round (except on a closed loop shorter than 4 sigma), so it is taken whenever it exists.
     */
    private void credit(Layer a, int i, Layer b, int j, DrivenIntervals driven) {
        if (direct(a, i, b, j) < Double.POSITIVE_INFINITY) {
            driven.add(a.edge[i], a.along[i], a.offset[i], b.offset[j]);
            return;
        }
        int exit = exit(a, i);
        int entry = entry(b, j);
        search.start(exit);
        search.runTo(entry);
        int ea = a.edge[i];
        if (a.along[i]) {
            driven.add(ea, true, a.offset[i], network.length(ea));
        } else {
            driven.add(ea, false, 0, a.offset[i]);
        }
        int node = exit;
        for (int e : search.pathTo(entry)) {
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
}
