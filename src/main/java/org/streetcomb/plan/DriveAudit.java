package org.streetcomb.plan;

import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.TrackCoverage;
import org.streetcomb.match.MatchTally;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Consumer;
import org.streetcomb.InputError;
import org.streetcomb.network.Components;
import org.streetcomb.network.DepotPlacement;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.ReachabilityCheck;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.GpxContents;
import org.streetcomb.read.GpxTrackReader;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.TrackSegment;

/**
 * Runs a coverage check: reads the layer and builds its network, streams every GPX file segment by segment
 * into a {@link TrackCoverage}, checks that the tracks and the layer overlap, and accounts the result per
 * street. Memory is bounded by the network and the longest
 * segment window, not by the size of the tracks.
 */
public final class DriveAudit {

    private DriveAudit() {
    }

    public static Audit run(AuditRequest request, StageClock clock) {
        return run(request, clock, segment -> { });
    }

    /** As {@link #run(AuditRequest, StageClock)}, also handing every track segment read to {@code seen} (for a map). */
    public static Audit run(AuditRequest request, StageClock clock, Consumer<TrackSegment> seen) {
        RoadLayer layer = clock.time("read", () -> LayerReaders.read(request.layer(), request.readOptions()));
        StreetNetwork network = clock.time("network",
                () -> new NetworkBuilder(request.snapTolerance()).build(layer));
        if (network.edgeCount() == 0) {
            throw InputError.at(request.layer(), null, "no street of positive length after noding");
        }
        List<String> warnings = new ArrayList<>();
        boolean[] scope = request.scope() == null ? null : scope(request, network, warnings);
        TrackCoverage coverage = clock.time("index", () -> new TrackCoverage(network, request.matching()));
        MatchTally tally = coverage.tally();
        List<TrackExtent> extents = new ArrayList<>();
        List<TrackFileResult> files = clock.time("match", () -> {
            List<TrackFileResult> results = new ArrayList<>();
            for (Path file : request.tracks()) {
                int matchedBefore = tally.matched();
                int offBefore = tally.offNetwork();
                TrackExtent extent = new TrackExtent();
                extents.add(extent);
                GpxContents contents = new GpxTrackReader().read(file, segment -> {
                    extent.add(segment);
                    seen.accept(segment);
                    coverage.accept(segment);
                });
                results.add(new TrackFileResult(file, contents, tally.matched() - matchedBefore, tally.offNetwork() - offBefore));
            }
            return results;
        });
        checkOverlap(request, files, network, extents, tally, warnings);
        noteTunnels(network, scope, warnings);
        CoverageReport report = clock.time("account", () -> coverage.report(request.threshold(), request.bothKerbs(),
                scope));
        return new Audit(request, layer.report(), List.copyOf(files), tally, report, List.copyOf(warnings));
    }

    /**
     * A caution where required streets run in tunnels: a receiver gets no fix underground, so the audit
     * credits a tunnel from the fixes at its ends (the shortest way between them) and cannot tell which
     * branches of an underground junction were driven.
     */
    private static void noteTunnels(StreetNetwork network, boolean[] scope, List<String> warnings) {
        Set<RoadFeature> tunnels = new HashSet<>();
        double metres = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.required(e) && (scope == null || scope[e]) && network.feature(e).tunnel()) {
                tunnels.add(network.feature(e));
                metres += network.length(e);
            }
        }
        if (!tunnels.isEmpty()) {
            warnings.add(String.format(Locale.ROOT, "%d street line%s (%.3f km) run in tunnels, where a receiver gets no "
                    + "fix: they are credited from the fixes at their ends, by the shortest way between them; check "
                    + "tunnels that branch underground another way", tunnels.size(), tunnels.size() == 1 ? "" : "s",
                    metres / 1000));
        }
    }

    /**
     * The edges the plan asked to service, derived as {@link Planner} derives them: the required streets (or
     * the listed ids), the depot's part only if asked, less the streets one-way streets cut off when the plan
     * left those out. The plan's warnings about what it left out are the audit's too.
     */
    private static boolean[] scope(AuditRequest request, StreetNetwork network, List<String> warnings) {
        PlanScope scope = request.scope();
        PlanRequest asked = new PlanRequest(request.layer(), scope.depot(), request.snapTolerance(), scope.depotReach(),
                scope.depotOnly(), request.readOptions(), scope.service());
        Components components = Components.of(network);
        int depot = DepotPlacement.place(network, network.features(), scope.depot(), scope.depotReach(),
                request.layer()).node();
        PostmanProblem problem = ReachabilityCheck.check(PostmanSetup.problem(asked, network, components, depot, null, warnings),
                request.layer().getFileName().toString(), scope.service().leaveOutCutOff(), warnings);
        boolean[] inScope = new boolean[network.edgeCount()];
        for (int e = 0; e < inScope.length; e++) {
            inScope[e] = problem.demand().needs(e);
        }
        return inScope;
    }

    /** Refuses tracks that miss the network entirely, and warns about single files that do. */
    private static void checkOverlap(AuditRequest request, List<TrackFileResult> files, StreetNetwork network,
                                     List<TrackExtent> extents, MatchTally tally, List<String> warnings) {
        int points = files.stream().mapToInt(f -> f.contents().points()).sum();
        if (points == 0) {
            throw new InputError(files.size() == 1
                    ? InputError.at(files.get(0).file(), null, "no track points (<trkpt>): nothing to check").getMessage()
                    : "none of the " + files.size() + " GPX files holds a track point (<trkpt>): nothing to check");
        }
        int matched = files.stream().mapToInt(TrackFileResult::matched).sum();
        int cleanedAway = tally.backwards() + tally.thinned() + tally.spikes();
        if (matched == 0 && (tally.offNetwork() == 0 || tally.offNetwork() < points - cleanedAway)) {
            throw new InputError(noDriveShown(request, files, tally, points));
        }
        if (matched == 0) {
            var layer = LocalFrame.covering(network);
            throw new InputError(String.format(Locale.ROOT,
                    "no track point could be placed on a street of %s: none of the %d points lies within %.0f m of a "
                    + "street; %s and the layer around %.5f,%.5f: check that they cover the same place",
                    request.layer().getFileName(), points, request.matching().radius(), whereTracksAre(files, extents),
                    layer.lon0(), layer.lat0()));
        }
        for (TrackFileResult f : files) {
            if (f.contents().points() == 0) {
                warnings.add(f.file() + ": no track points");
            } else if (f.matched() == 0) {
                TrackExtent extent = extents.get(files.indexOf(f));
                warnings.add(String.format(Locale.ROOT, "%s: none of its %d points could be placed on a street "
                        + "(%d farther than %.0f m from every street; the track is around %.5f,%.5f)", f.file(),
                        f.contents().points(), f.offNetwork(), request.matching().radius(), extent.centreLon(),
                        extent.centreLat()));
            }
        }
    }

    /**
     * The message when fixes lie near streets but none shows a drive along one: cleaning dropped them (a
     * clock that does not move forward, a receiver standing still, spikes) or too few were left, so the
     * message says which, instead of blaming the distance to the streets.
     */
    private static String noDriveShown(AuditRequest request, List<TrackFileResult> files, MatchTally tally, int points) {
        List<String> reasons = new ArrayList<>();
        if (tally.backwards() > 0) {
            reasons.add(tally.backwards() + " have a time that does not move forward");
        }
        if (tally.thinned() > 0) {
            reasons.add(tally.thinned() + " lie within half a sigma of the fix before (the receiver standing still)");
        }
        if (tally.spikes() > 0) {
            reasons.add(tally.spikes() + " are speed spikes");
        }
        if (tally.offNetwork() > 0) {
            reasons.add(String.format(Locale.ROOT, "%d lie farther than %.0f m from every street", tally.offNetwork(),
                    request.matching().radius()));
        }
        int left = points - tally.backwards() - tally.thinned() - tally.spikes() - tally.offNetwork();
        String named = files.stream().filter(f -> f.contents().points() > 0).limit(5)
                .map(f -> f.file().getFileName().toString()).collect(java.util.stream.Collectors.joining(", "));
        String kept = reasons.isEmpty() ? (points == 1 ? "a single point is" : "the " + points + " points are")
                : "of the " + points + " points, " + String.join(", ", reasons) + ", and the " + Math.max(left, 0)
                + " left " + (left == 1 ? "is" : "are");
        return String.format(Locale.ROOT, "%s: no drive along a street of %s can be read from the track: %s too few "
                        + "to follow a street; check the receiver's clock and that it recorded while moving", named,
                request.layer().getFileName(), kept);
    }

    /**
     * Where each file's fixes are, for the message when none lies on the layer: a centre per file, since the
     * centre of files far apart would lie between them, where no track is.
     */
    private static String whereTracksAre(List<TrackFileResult> files, List<TrackExtent> extents) {
        List<String> places = new ArrayList<>();
        int withPoints = 0;
        for (int i = 0; i < files.size(); i++) {
            if (files.get(i).contents().points() > 0 && withPoints++ < 5) {
                places.add(String.format(Locale.ROOT, "%s %.5f,%.5f", files.get(i).file().getFileName(),
                        extents.get(i).centreLon(), extents.get(i).centreLat()));
            }
        }
        if (withPoints == 1) {
            int only = files.indexOf(files.stream().filter(f -> f.contents().points() > 0).findFirst().orElseThrow());
            return String.format(Locale.ROOT, "%s lies around %.5f,%.5f", files.get(only).file().getFileName(),
                    extents.get(only).centreLon(), extents.get(only).centreLat());
        }
        String more = withPoints > places.size() ? " and " + (withPoints - places.size()) + " more files" : "";
        return "the tracks lie around " + String.join("; ", places) + more + ",";
    }

    /** The box around the fixes of one file, for messages. */
    private static final class TrackExtent {
        private double minLon = Double.POSITIVE_INFINITY;
        private double maxLon = Double.NEGATIVE_INFINITY;
        private double minLat = Double.POSITIVE_INFINITY;
        private double maxLat = Double.NEGATIVE_INFINITY;

        void add(TrackSegment segment) {
            for (int i = 0; i < segment.size(); i++) {
                minLon = Math.min(minLon, segment.lon()[i]);
                maxLon = Math.max(maxLon, segment.lon()[i]);
                minLat = Math.min(minLat, segment.lat()[i]);
                maxLat = Math.max(maxLat, segment.lat()[i]);
            }
        }

        double centreLon() {
            return (minLon + maxLon) / 2;
        }

        double centreLat() {
            return (minLat + maxLat) / 2;
        }
    }
}
