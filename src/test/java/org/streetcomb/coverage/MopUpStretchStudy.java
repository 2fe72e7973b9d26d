package org.streetcomb.coverage;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.streetcomb.docs.GeneratedSection;
import org.streetcomb.match.DrivenIntervals;
import org.streetcomb.mopup.MopUpPlanner;
import org.streetcomb.network.Components;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.PostmanVariants;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * What servicing only the missed stretches saves against servicing every flagged edge whole (the mop-up as
 * it was), on the demo town and the Seoul extract. Invented data: per seed, a crew skips 10 % of the street
 * lines and turns back part of the way along another 10 % (at 20-80 % of the line, drawn per line); the
 * rest is credited as driven, exactly, with no GPS, so the figures measure the planning alone. Each
 * variant is planned from the same audit: whole edges (the rural postman over the flagged edges, each
 * serviced whole), stretches driven on to the next junction (the default), and stretches with turning back
 * allowed ({@code --mop-up-turn-back}). Times (the fastest of five runs per seed, summed over the seeds) are
 * given as ratios to the whole-edge plan measured in the same run. Writes target/quality/mop-up-stretches.md:
 *
 * <pre>mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.coverage.MopUpStretchStudy -Dexec.classpathScope=test</pre>
 */
public final class MopUpStretchStudy {

    private static final int SEEDS = 10;
    /** Service and travel speeds of the duration columns, km/h: the trip options' defaults. */
    private static final double SERVICE_KMH = 10;
    private static final double TRAVEL_KMH = 30;

    private MopUpStretchStudy() {
    }

    /** Where the table lives in docs/quality.md. */
    public static final GeneratedSection SECTION = new GeneratedSection("mop-up study", "MopUpStretchStudy");

    public static void main(String[] args) throws IOException {
        List<String> rows = new ArrayList<>();
        rows.add("| network | seeds | street lines missed (skipped + turned back) | missed km | whole edges: tour km | "
                + "service km | hours | stretches, driving on: tour km | service km | hours | turning back: tour km | "
                + "hours | time, driving on | time, turning back | ms, driving on | driving on: less service | less time |");
        rows.add("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
        rows.add(row("Brackenford (invented demo town)", Path.of("fixtures/demo/brackenford.geojson")));
        rows.add(row("Yongsan, Seoul (OSM extract)", Path.of("fixtures/real/roads-seoul.geojson")));
        String table = String.join("\n", rows) + "\n";
        Path out = Path.of("target/quality/mop-up-stretches.md");
        Files.createDirectories(out.getParent());
        Files.writeString(out, table);
        SECTION.write(Path.of("docs/quality.md"), table);
        System.out.print(table);
    }

    private static String row(String name, Path layer) {
        List<RoadFeature> lines = LayerReaders.read(layer).features();
        StreetNetwork network = new NetworkBuilder(0.5).build(lines);
        Coordinate first = lines.get(0).line().getCoordinateN(0);
        int depot = NearestNode.of(network, first.x, first.y).node();
        int missedLines = 0;
        double missed = 0;
        double[] whole = new double[3];
        double[] onward = new double[3];
        double[] turning = new double[2];
        long wholeNanos = 0;
        long onwardNanos = 0;
        long turningNanos = 0;
        for (int seed = 1; seed <= SEEDS; seed++) {
            CoverageReport report = audit(network, lines, seed);
            missedLines += (int) report.streets().stream().filter(s -> s.status() != CoverageStatus.COVERED
                    && s.status() != CoverageStatus.NOT_REQUIRED).count();
            missed += report.missed().stream().filter(p -> report.mopUp()[p.edge()]).mapToDouble(MissedPart::length).sum();
            double[] w = wholeEdges(report, depot);
            MopUpPlanner.MopUp on = MopUpPlanner.plan(report, depot, depot, false, name);
            MopUpPlanner.MopUp back = MopUpPlanner.plan(report, depot, depot, true, name);
            wholeNanos += fastest(() -> wholeEdges(report, depot));
            onwardNanos += fastest(() -> MopUpPlanner.plan(report, depot, depot, false, name));
            turningNanos += fastest(() -> MopUpPlanner.plan(report, depot, depot, true, name));
            add(whole, w[0], w[1]);
            add(onward, on.length(), on.length() - on.deadhead());
            turning[0] += back.length();
            turning[1] += hours(back.length(), back.length() - back.deadhead());
        }
        return String.format(Locale.ROOT, "| %s | 1-%d | %d | %.1f | %.1f | %.1f | %.1f | %.1f | %.1f | %.1f | %.1f | %.1f "
                        + "| %.2f | %.2f | %.1f | %.1f %% | %.1f %% |", name, SEEDS, missedLines, missed / 1000, whole[0] / 1000, whole[1] / 1000,
                whole[2], onward[0] / 1000, onward[1] / 1000, onward[2], turning[0] / 1000, turning[1],
                onwardNanos / (double) wholeNanos, turningNanos / (double) wholeNanos, onwardNanos / 1e6,
                100 * (1 - onward[1] / whole[1]), 100 * (1 - onward[2] / whole[2]));
    }

    /** The fastest of five runs, nanoseconds: the others met a busy machine. */
    private static long fastest(Runnable plan) {
        long best = Long.MAX_VALUE;
        for (int run = 0; run < 5; run++) {
            long t0 = System.nanoTime();
            plan.run();
            best = Math.min(best, System.nanoTime() - t0);
        }
        return best;
    }

    private static void add(double[] sums, double length, double service) {
        sums[0] += length;
        sums[1] += service;
        sums[2] += hours(length, service);
    }

    private static double hours(double length, double service) {
        return service / 1000 / SERVICE_KMH + (length - service) / 1000 / TRAVEL_KMH;
    }

    /** The mop-up as it was: every flagged edge serviced whole, in each way one of its parts was missed. */
    private static double[] wholeEdges(CoverageReport report, int depot) {
        StreetNetwork network = report.network();
        int m = network.edgeCount();
        int[] along = new int[m];
        int[] against = new int[m];
        int[] either = new int[m];
        for (MissedPart part : report.missed()) {
            int e = part.edge();
            if (report.mopUp()[e]) {
                switch (part.way()) {
                    case ALONG -> along[e] = 1;
                    case AGAINST -> against[e] = 1;
                    case EITHER -> either[e] = 1;
                }
            }
        }
        ServiceDemand demand = new ServiceDemand(along, against, either);
        Components components = Components.of(network);
        PostmanProblem problem = new PostmanProblem(network, demand,
                TourPlanner.starts(network, components, demand, depot, false), depot);
        Augmentation augmentation = PostmanVariants.solve(problem);
        double length = 0;
        double deadhead = 0;
        for (Tour tour : TourPlanner.tours(problem, components, augmentation)) {
            length += tour.length(network);
            deadhead += tour.deadhead(network);
        }
        return new double[] {length, length - deadhead};
    }

    /** Coverage of a drive that skips 10 % of the lines and turns back part of the way along another 10 %. */
    static CoverageReport audit(StreetNetwork network, List<RoadFeature> lines, long seed) {
        Random random = new Random(seed);
        List<RoadFeature> order = new ArrayList<>(lines);
        Collections.shuffle(order, random);
        int k = Math.max(1, lines.size() / 10);
        java.util.Map<RoadFeature, Double> drivenShare = new java.util.IdentityHashMap<>();
        for (int i = 0; i < 2 * k && i < order.size(); i++) {
            drivenShare.put(order.get(i), i < k ? 0.0 : 0.2 + 0.6 * random.nextDouble());
        }
        DrivenIntervals driven = new DrivenIntervals(network);
        for (int e = 0; e < network.edgeCount(); e++) {
            RoadFeature f = network.feature(e);
            Double share = drivenShare.get(f);
            if (share == null) {
                driven.addWhole(e, true);
                continue;
            }
            // where the edge lies along its line, as shares of the line (edges keep their line's direction)
            LengthIndexedLine line = new LengthIndexedLine(f.line());
            double total = f.line().getLength();
            double a = line.project(new Coordinate(network.pointLon(e, 0), network.pointLat(e, 0))) / total;
            double b = line.project(new Coordinate(network.pointLon(e, network.pointCount(e) - 1),
                    network.pointLat(e, network.pointCount(e) - 1))) / total;
            if (b <= share) {
                driven.addWhole(e, true);
            } else if (a < share && b > a) {
                driven.add(e, true, 0, (share - a) / (b - a) * network.length(e));
            }
        }
        driven.merge();
        return StreetCoverageAccounting.account(network, driven, 0.9, false);
    }
}
