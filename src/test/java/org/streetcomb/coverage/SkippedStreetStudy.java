package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;

import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.streetcomb.network.Components;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.solve.UndirectedPostman;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * One run of the skipped-street study (simulated data): a crew skips a seeded random set of streets (any
 * street whose loss leaves the network in one piece), so the tour it drives is the postman tour of the
 * network without them; its recording is simulated with noise and
 * dropouts and audited against the full network. Counts, per street, how the audit's "not covered" agrees
 * with the streets really skipped.
 */
final class SkippedStreetStudy {

    /** Agreement of "not covered" with "skipped", per street and weighted by street length (metres). */
    record Counts(int truePositive, int falsePositive, int falseNegative, int streets, int fixes,
                  double truePositiveM, double falsePositiveM, double falseNegativeM) {

        Counts plus(Counts o) {
            return new Counts(truePositive + o.truePositive, falsePositive + o.falsePositive,
                    falseNegative + o.falseNegative, streets + o.streets, fixes + o.fixes,
                    truePositiveM + o.truePositiveM, falsePositiveM + o.falsePositiveM,
                    falseNegativeM + o.falseNegativeM);
        }

        double precisionByLength() {
            return truePositiveM + falsePositiveM == 0 ? 1 : truePositiveM / (truePositiveM + falsePositiveM);
        }

        double recallByLength() {
            return truePositiveM + falseNegativeM == 0 ? 1 : truePositiveM / (truePositiveM + falseNegativeM);
        }

        double precision() {
            return truePositive + falsePositive == 0 ? 1 : truePositive / (double) (truePositive + falsePositive);
        }

        double recall() {
            return truePositive + falseNegative == 0 ? 1 : truePositive / (double) (truePositive + falseNegative);
        }
    }

    static final Counts NONE = new Counts(0, 0, 0, 0, 0, 0, 0, 0);

    private SkippedStreetStudy() {
    }

    /**
     * @param lines        the street lines (all required)
     * @param skipShare    share of the streets the crew skips
     * @param drive        how the recording is simulated
     * @param matching     the audit's matching settings
     */
    static Counts run(List<RoadFeature> lines, double skipShare, SimulatedDrive.Settings drive, MatchSettings matching,
                      long seed) {
        Random random = new Random(seed);
        StreetNetwork full = new NetworkBuilder(0.5).build(lines);
        List<RoadFeature> candidates = new ArrayList<>(lines);
        Collections.shuffle(candidates, random);
        int k = Math.max(3, (int) Math.round(skipShare * lines.size()));
        Set<RoadFeature> skipped = Collections.newSetFromMap(new IdentityHashMap<>());
        int parts = Components.of(full).count();
        StreetNetwork reduced = full;
        // the crew drives round what it skips: a skip that would cut the network apart is not drawn
        for (int c = 0; c < candidates.size() && skipped.size() < k; c++) {
            skipped.add(candidates.get(c));
            StreetNetwork trial = new NetworkBuilder(0.5).build(lines.stream().filter(f -> !skipped.contains(f)).toList());
            if (Components.of(trial).count() > parts) {
                skipped.remove(candidates.get(c));
            } else {
                reduced = trial;
            }
        }
        var depot = NearestNode.of(reduced, lines.get(0).line().getCoordinateN(0).x, lines.get(0).line().getCoordinateN(0).y);
        List<Tour> tours = TourPlanner.tours(reduced, Components.of(reduced), UndirectedPostman.solve(reduced),
                depot.node(), false);
        List<TrackSegment> segments = SimulatedDrive.drive(reduced, tours, drive, seed, SimulatedDrive.START);
        TrackCoverage coverage = new TrackCoverage(full, matching);
        segments.forEach(coverage::accept);
        CoverageReport report = coverage.report(0.9, false);
        Map<RoadFeature, StreetCoverage> byFeature = new IdentityHashMap<>();
        report.streets().forEach(s -> byFeature.put(s.feature(), s));
        int tp = 0, fp = 0, fn = 0, streets = 0;
        double tpM = 0, fpM = 0, fnM = 0;
        for (RoadFeature f : lines) {
            StreetCoverage s = byFeature.get(f);
            if (s == null) {
                continue;
            }
            streets++;
            boolean flagged = s.status() != CoverageStatus.COVERED;
            boolean truth = skipped.contains(f);
            tp += flagged && truth ? 1 : 0;
            fp += flagged && !truth ? 1 : 0;
            fn += !flagged && truth ? 1 : 0;
            tpM += flagged && truth ? s.length() : 0;
            fpM += flagged && !truth ? s.length() : 0;
            fnM += !flagged && truth ? s.length() : 0;
        }
        int fixes = segments.stream().mapToInt(TrackSegment::size).sum();
        return new Counts(tp, fp, fn, streets, fixes, tpM, fpM, fnM);
    }
}
