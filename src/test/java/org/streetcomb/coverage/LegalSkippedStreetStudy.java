package org.streetcomb.coverage;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Tour;

/**
 * The skipped-street study on networks with one-way streets and dual carriageways (simulated drives): a crew
 * skips a seeded random set of the streets its plan asks for, so it drives the plan of the layer without
 * them, which obeys every one-way street (the planner's tours are legal; TourValidator checks them). Its
 * recording is simulated ({@link SimulatedDrive}: timed fixes, noise, dropouts) and audited against the
 * whole layer. Truth is what the drive left out: every street of the plan's scope that the reduced plan
 * never drives (the skipped ones, and any that their loss cut off). Both plans leave out what one-way
 * streets cut off at the layer's edge and keep the depot's part only, as {@code plan --leave-out-cut-off
 * --depot-part-only} does.
 */
final class LegalSkippedStreetStudy {

    /** One run's agreement counts and the wrong-way metres the audit reported on the legal drive. */
    record Run(SkippedStreetStudy.Counts counts, double drivenM, double wrongWayM) {
    }

    private static final boolean DEBUG = Boolean.getBoolean("coverage.debug");

    private LegalSkippedStreetStudy() {
    }

    private static int firstEdge(StreetNetwork network, RoadFeature f) {
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.feature(e) == f) {
                return e;
            }
        }
        return -1;
    }

    /** A layer's plan and the crew's plan without the skipped streets, for one seed. */
    private record Crew(StreetNetwork full, List<RoadFeature> scope, Plan reduced) {
    }

    private static final Map<String, Crew> CREWS = new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * The streets the crew skips: {@code skips} of the plan's scope, drawn with the seed, each only if the
     * streets left can all still be driven from and back to the depot (a skip that cuts others off is not
     * drawn: the crew drives round what it skips).
     */
    static Run run(Path file, int skips, SimulatedDrive.Settings drive, MatchSettings matching, long seed) {
        Crew crew = CREWS.computeIfAbsent(file + "#" + skips + "#" + seed, key -> crew(file, skips, seed));
        StreetNetwork full = crew.full();
        List<RoadFeature> scope = crew.scope();
        Plan reduced = crew.reduced();
        Map<RoadFeature, Boolean> drivenByCrew = new IdentityHashMap<>();
        driven(reduced).forEach(f -> drivenByCrew.put(f, true));
        List<TrackSegment> segments = SimulatedDrive.drive(reduced.network(), reduced.tours(), drive, seed,
                SimulatedDrive.START);
        TrackCoverage coverage = new TrackCoverage(full, matching);
        segments.forEach(coverage::accept);
        CoverageReport report = coverage.report(0.9, false);
        Map<RoadFeature, StreetCoverage> byFeature = new IdentityHashMap<>();
        report.streets().forEach(s -> byFeature.put(s.feature(), s));
        int tp = 0, fp = 0, fn = 0, streets = 0;
        double tpM = 0, fpM = 0, fnM = 0;
        for (RoadFeature f : scope) {
            StreetCoverage s = byFeature.get(f);
            if (s == null) {
                continue;
            }
            streets++;
            boolean flagged = s.status() != CoverageStatus.COVERED;
            boolean truth = !drivenByCrew.containsKey(f);
            tp += flagged && truth ? 1 : 0;
            fp += flagged && !truth ? 1 : 0;
            fn += !flagged && truth ? 1 : 0;
            if (DEBUG && !flagged && truth) {
                System.out.printf(java.util.Locale.ROOT, "FN %s %s %.1f m driven %.1f %s%n", f.id(), f.name(), s.length(),
                        s.fraction(), full.travel(firstEdge(full, f)));
            }
            tpM += flagged && truth ? s.length() : 0;
            fpM += flagged && !truth ? s.length() : 0;
            fnM += !flagged && truth ? s.length() : 0;
        }
        int fixes = segments.stream().mapToInt(TrackSegment::size).sum();
        return new Run(new SkippedStreetStudy.Counts(tp, fp, fn, streets, fixes, tpM, fpM, fnM),
                reduced.tourLength(), report.wrongWay());
    }

    private static Crew crew(Path file, int skips, long seed) {
        RoadLayer layer = LayerReaders.read(file, ReadOptions.DEFAULTS);
        StreetNetwork full = new NetworkBuilder(0.5).build(layer);
        Plan plan = plan(file, layer, full, null);
        LonLat depot = new LonLat(full.lon(plan.depot()), full.lat(plan.depot()));
        List<RoadFeature> scope = driven(plan);
        List<RoadFeature> candidates = new ArrayList<>(scope);
        Collections.shuffle(candidates, new Random(seed));
        Map<RoadFeature, Boolean> skipped = new IdentityHashMap<>();
        for (int c = 0; c < candidates.size() && skipped.size() < skips; c++) {
            skipped.put(candidates.get(c), true);
            if (!allDrivable(without(layer, skipped), scope, skipped, depot)) {
                skipped.remove(candidates.get(c));
            }
        }
        RoadLayer reducedLayer = without(layer, skipped);
        return new Crew(full, scope, plan(file, reducedLayer, new NetworkBuilder(0.5).build(reducedLayer), depot));
    }

    /** Whether every edge of the scope's unskipped streets lies on a legal drive from and back to the depot. */
    private static boolean allDrivable(RoadLayer layer, List<RoadFeature> scope, Map<RoadFeature, Boolean> skipped,
                                       LonLat depot) {
        StreetNetwork network = new NetworkBuilder(0.5).build(layer);
        int start = NearestNode.of(network, depot.lon(), depot.lat()).node();
        boolean[] out = reached(network, start, Heading.OUTBOUND);
        boolean[] back = reached(network, start, Heading.INBOUND);
        Map<RoadFeature, Boolean> wanted = new IdentityHashMap<>();
        scope.stream().filter(f -> !skipped.containsKey(f)).forEach(f -> wanted.put(f, true));
        for (int e = 0; e < network.edgeCount(); e++) {
            if (!wanted.containsKey(network.feature(e))) {
                continue;
            }
            int u = network.from(e);
            int v = network.to(e);
            boolean along = network.travel(e) != Travel.BACKWARD && out[u] && back[v];
            boolean against = network.travel(e) != Travel.FORWARD && out[v] && back[u];
            if (!along && !against) {
                return false;
            }
        }
        return true;
    }

    private static boolean[] reached(StreetNetwork network, int start, Heading heading) {
        DijkstraSearch search = new DijkstraSearch(network, heading);
        search.start(start);
        boolean[] reached = new boolean[network.nodeCount()];
        for (int v = search.next(); v >= 0; v = search.next()) {
            reached[v] = true;
        }
        return reached;
    }

    private static Plan plan(Path file, RoadLayer layer, StreetNetwork network, LonLat depot) {
        PlanRequest request = new PlanRequest(file, depot, 0.5, 500, true, ReadOptions.DEFAULTS,
                new ServiceOptions(KerbMode.ONE_PASS, null, null, true));
        return Planner.plan(request, layer, network, RepairOptions.NONE, new StageClock(StageClock.SILENT));
    }

    /** The features every one of whose edges the plan's tours drive, in first-driven order. */
    private static List<RoadFeature> driven(Plan plan) {
        StreetNetwork network = plan.network();
        boolean[] edgeDriven = new boolean[network.edgeCount()];
        for (Tour tour : plan.tours()) {
            for (int e : tour.edges()) {
                edgeDriven[e] = true;
            }
        }
        Map<RoadFeature, Boolean> all = new IdentityHashMap<>();
        List<RoadFeature> order = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            RoadFeature f = network.feature(e);
            Boolean before = all.get(f);
            if (before == null) {
                order.add(f);
            }
            all.put(f, (before == null || before) && edgeDriven[e]);
        }
        order.removeIf(f -> !all.get(f));
        return order;
    }

    /** The layer without the skipped features (OpenStreetMap end-node ids kept for the rest). */
    private static RoadLayer without(RoadLayer layer, Map<RoadFeature, Boolean> skipped) {
        List<RoadFeature> kept = new ArrayList<>();
        long[] ends = layer.endNodes() == null ? null : new long[layer.endNodes().length];
        for (int i = 0; i < layer.features().size(); i++) {
            RoadFeature f = layer.features().get(i);
            if (skipped.containsKey(f)) {
                continue;
            }
            if (ends != null) {
                ends[2 * kept.size()] = layer.endNodes()[2 * i];
                ends[2 * kept.size() + 1] = layer.endNodes()[2 * i + 1];
            }
            kept.add(f);
        }
        return new RoadLayer(layer.source(), kept, layer.report(),
                ends == null ? null : java.util.Arrays.copyOf(ends, 2 * kept.size()), layer.gradeSeparation(),
                layer.crossingLimit());
    }
}
