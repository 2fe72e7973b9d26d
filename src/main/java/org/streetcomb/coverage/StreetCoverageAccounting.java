package org.streetcomb.coverage;

import org.streetcomb.match.DrivenIntervals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * Turns the stretches driven on each edge into coverage per street line.
 *
 * <p>What counts as driven depends on the street: a two-way street is covered by driving it either way
 * (or, when both kerbs are required, each way once: half its need per direction); a one-way street only
 * by driving it in its permitted direction, and what was driven against it is reported as wrong-way, not
 * credited. A street is covered when the share of its need that was driven reaches the threshold, missed
 * when the share is below {@link #MISSED_BELOW}, partly covered in between. O(edges + stretches).
 */
public final class StreetCoverageAccounting {

    /** Below this share a street counts as missed rather than partly covered (glancing at a junction). */
    public static final double MISSED_BELOW = 0.1;
    /** Missed stretches shorter than this (metres) are left out of the list of missed parts. */
    static final double SHORTEST_PART = 1.0;

    private StreetCoverageAccounting() {
    }

    public static CoverageReport account(StreetNetwork network, DrivenIntervals driven, double threshold,
                                         boolean bothKerbs) {
        return account(network, driven, threshold, bothKerbs, null);
    }

    /**
     * @param scope the edges the plan asked for, or null for every edge the layer requires; a required edge
     *              outside it is not counted, and a street with no edge in it is {@link CoverageStatus#LEFT_OUT}
     */
    public static CoverageReport account(StreetNetwork network, DrivenIntervals driven, double threshold,
                                         boolean bothKerbs, boolean[] scope) {
        List<RoadFeature> features = network.features();
        Map<RoadFeature, Integer> indexOf = new IdentityHashMap<>();
        for (int f = 0; f < features.size(); f++) {
            indexOf.put(features.get(f), f);
        }
        int k = features.size();
        double[] length = new double[k];
        double[] needed = new double[k];
        double[] done = new double[k];
        double[] wrong = new double[k];
        boolean[] hasEdges = new boolean[k];
        boolean[] leftOut = new boolean[k];
        double[] edgeShare = new double[network.edgeCount()];
        List<MissedPart> missed = new ArrayList<>();
        List<WrongWayPart> wrongWay = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            int f = indexOf.get(network.feature(e));
            hasEdges[f] = true;
            double len = network.length(e);
            double[] along = driven.of(e, true);
            double[] against = driven.of(e, false);
            Travel travel = network.travel(e);
            double need;
            double got;
            List<MissedPart> parts = new ArrayList<>();
            if (travel == Travel.BOTH && !bothKerbs) {
                double[] either = union(along, against);
                need = len;
                got = total(either);
                gaps(e, len, either, MissedPart.Way.EITHER, parts);
            } else if (travel == Travel.BOTH) {
                need = 2 * len;
                got = total(along) + total(against);
                gaps(e, len, along, MissedPart.Way.ALONG, parts);
                gaps(e, len, against, MissedPart.Way.AGAINST, parts);
            } else {
                boolean forward = travel == Travel.FORWARD;
                need = len;
                got = total(forward ? along : against);
                double[] wrongIntervals = forward ? against : along;
                wrong[f] += total(wrongIntervals);
                for (int i = 0; i < wrongIntervals.length; i += 2) {
                    wrongWay.add(new WrongWayPart(e, wrongIntervals[i], wrongIntervals[i + 1], !forward));
                }
                gaps(e, len, forward ? along : against, forward ? MissedPart.Way.ALONG : MissedPart.Way.AGAINST, parts);
            }
            length[f] += len;
            edgeShare[e] = need > 0 ? got / need : 1;
            leftOut[f] |= network.required(e) && !inScope(scope, e);
            if (network.required(e) && inScope(scope, e)) {
                needed[f] += need;
                done[f] += got;
                missed.addAll(parts);
            }
        }
        List<StreetCoverage> streets = new ArrayList<>();
        CoverageStatus[] status = new CoverageStatus[k];
        for (int f = 0; f < k; f++) {
            if (!hasEdges[f]) {
                continue;
            }
            double share = needed[f] > 0 ? done[f] / needed[f] : 1;
            status[f] = needed[f] == 0 ? (leftOut[f] ? CoverageStatus.LEFT_OUT : CoverageStatus.NOT_REQUIRED)
                    : share >= threshold ? CoverageStatus.COVERED
                    : share < MISSED_BELOW ? CoverageStatus.MISSED : CoverageStatus.PARTLY;
            streets.add(new StreetCoverage(features.get(f), length[f], needed[f], done[f], wrong[f], status[f]));
        }
        boolean[] mopUp = new boolean[network.edgeCount()];
        for (int e = 0; e < network.edgeCount(); e++) {
            CoverageStatus s = status[indexOf.get(network.feature(e))];
            mopUp[e] = network.required(e) && inScope(scope, e) && s != CoverageStatus.COVERED && edgeShare[e] < threshold;
        }
        return new CoverageReport(network, List.copyOf(streets), List.copyOf(missed), List.copyOf(wrongWay), mopUp,
                threshold, bothKerbs);
    }

    private static boolean inScope(boolean[] scope, int edge) {
        return scope == null || scope[edge];
    }

    /** Union of two sorted lists of disjoint intervals. */
    static double[] union(double[] a, double[] b) {
        double[] merged = new double[a.length + b.length];
        int i = 0, j = 0, n = 0;
        while (i < a.length || j < b.length) {
            double s, t;
            if (j >= b.length || (i < a.length && a[i] <= b[j])) {
                s = a[i];
                t = a[i + 1];
                i += 2;
            } else {
                s = b[j];
                t = b[j + 1];
                j += 2;
            }
            if (n > 0 && s <= merged[n - 1]) {
                merged[n - 1] = Math.max(merged[n - 1], t);
            } else {
                merged[n++] = s;
                merged[n++] = t;
            }
        }
        return Arrays.copyOf(merged, n);
    }

    static double total(double[] intervals) {
        double sum = 0;
        for (int i = 0; i < intervals.length; i += 2) {
            sum += intervals[i + 1] - intervals[i];
        }
        return sum;
    }

    /** Adds the stretches of [0, len] not in {@code intervals}. */
    private static void gaps(int edge, double len, double[] intervals, MissedPart.Way way, List<MissedPart> out) {
        double at = 0;
        for (int i = 0; i <= intervals.length; i += 2) {
            double next = i < intervals.length ? intervals[i] : len;
            if (next - at >= SHORTEST_PART) {
                out.add(new MissedPart(edge, at, next, way));
            }
            if (i < intervals.length) {
                at = Math.max(at, intervals[i + 1]);
            }
        }
    }
}
