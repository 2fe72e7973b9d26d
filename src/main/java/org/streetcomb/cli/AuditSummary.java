package org.streetcomb.cli;

import static org.streetcomb.cli.SummaryFormat.metres;
import static org.streetcomb.cli.SummaryFormat.share;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.plan.Audit;
import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.match.MatchTally;
import org.streetcomb.coverage.StreetCoverage;
import org.streetcomb.plan.TrackFileResult;
import org.streetcomb.report.MapReport;
import org.streetcomb.timing.StageClock;

/**
 * The summary of a coverage audit, built once and printed as text or as JSON, so both carry the same
 * numbers. Lengths are metres in JSON (3 decimals) and kilometres in text.
 */
final class AuditSummary {

    static final String CAUTION = "Coverage is inferred from GPS tracks, which wander and drop out, and from map data, "
            + "which may be out of date: check doubtful streets on the ground. Obey traffic law and signs and never "
            + "handle a device while driving.";
    /** Streets not covered that the text lists by name; --json lists all. */
    private static final int STREETS_LISTED = 10;

    private final ObjectNode json = SummaryFormat.newObject();
    private final StringBuilder text = new StringBuilder();
    private final List<MapReport.Entry> glance = new ArrayList<>();

    private AuditSummary() {
    }

    static AuditSummary of(Audit audit, List<StageClock.Stage> stages, Path streetsOut, Path missedOut) {
        AuditSummary s = new AuditSummary();
        CoverageReport coverage = audit.coverage();
        MatchTally tally = audit.tally();
        MatchSettings settings = audit.request().matching();

        ObjectNode input = s.json.putObject("input");
        input.put("file", audit.request().layer().toString());
        input.put("features", audit.read().featuresRead());
        input.put("lines", audit.read().linesKept());
        input.put("one_way_lines", audit.read().oneWayLines());
        ObjectNode net = s.json.putObject("network");
        net.put("edges", coverage.network().edgeCount());
        net.put("nodes", coverage.network().nodeCount());
        net.put("length_m", metres(coverage.network().totalLength()));

        ObjectNode tracks = s.json.putObject("tracks");
        ArrayNode files = tracks.putArray("files");
        int points = 0, untimed = 0, segments = 0;
        for (TrackFileResult f : audit.files()) {
            ObjectNode node = files.addObject();
            node.put("file", f.file().toString());
            node.put("tracks", f.contents().tracks());
            node.put("segments", f.contents().segments());
            node.put("points", f.contents().points());
            node.put("untimed_points", f.contents().untimed());
            node.put("matched_points", f.matched());
            node.put("off_network_points", f.offNetwork());
            points += f.contents().points();
            untimed += f.contents().untimed();
            segments += f.contents().segments();
        }
        tracks.put("points", points);
        tracks.put("untimed_points", untimed);
        ObjectNode cleaning = s.json.putObject("cleaning");
        cleaning.put("time_not_forward", tally.backwards());
        cleaning.put("speed_spikes", tally.spikes());
        cleaning.put("speed_splits", tally.splits());
        cleaning.put("thinned", tally.thinned());

        ObjectNode matching = s.json.putObject("matching");
        matching.put("method", "hidden Markov model (Newson & Krumm 2009), drives within the doubt odds of the best");
        matching.put("doubt_odds", settings.doubtOdds());
        matching.put("drift_window_s", settings.driftWindow());
        matching.put("gps_sigma_m", settings.sigma());
        matching.put("gps_sigma_estimated", settings.estimateSigma());
        if (tally.sigmaSegments() > 0) {
            matching.put("gps_sigma_estimated_segments", tally.sigmaSegments());
            matching.put("gps_sigma_estimated_low_m", round1(tally.sigmaLow()));
            matching.put("gps_sigma_estimated_high_m", round1(tally.sigmaHigh()));
        }
        matching.put("search_radius_m", settings.radius());
        matching.put("route_scale_m", settings.beta());
        matching.put("max_gap_m", settings.maxGap());
        matching.put("max_speed_kmh", BigDecimal.valueOf(settings.maxSpeed() * 3.6).setScale(1, RoundingMode.HALF_EVEN));
        matching.put("matched_points", tally.matched());
        matching.put("off_network_points", tally.offNetwork());
        matching.put("chains", tally.chains());
        matching.put("breaks", tally.breaks());

        ObjectNode cov = s.json.putObject("coverage");
        cov.put("covered_at", coverage.threshold());
        cov.put("both_kerbs", coverage.bothKerbs());
        cov.put("required_m", metres(coverage.needed()));
        cov.put("driven_m", metres(coverage.driven()));
        cov.put("share", share(coverage.driven(), coverage.needed()));
        ObjectNode counts = cov.putObject("streets");
        for (CoverageStatus status : CoverageStatus.values()) {
            counts.put(status.label().replace(' ', '_'), coverage.count(status));
        }
        cov.put("missed_m", metres(coverage.missedLength()));
        cov.put("missed_parts", coverage.missed().size());
        cov.put("wrong_way_m", metres(coverage.wrongWay()));
        ArrayNode notCovered = cov.putArray("not_covered");
        for (StreetCoverage street : notCovered(coverage)) {
            ObjectNode node = notCovered.addObject();
            node.put("feature_id", street.feature().id());
            node.put("street", street.feature().name());
            node.put("status", street.status().label());
            node.put("fraction", BigDecimal.valueOf(street.fraction()).setScale(4, RoundingMode.HALF_EVEN));
            node.put("needed_m", metres(street.needed()));
            node.put("driven_m", metres(street.driven()));
        }

        ObjectNode time = s.json.putObject("seconds");
        for (StageClock.Stage stage : stages) {
            time.put(stage.name(), BigDecimal.valueOf(stage.seconds()).setScale(3, RoundingMode.HALF_EVEN));
        }
        s.json.putPOJO("warnings", audit.warnings());
        ObjectNode outputs = s.json.putObject("outputs");
        if (streetsOut != null) {
            outputs.put("streets", streetsOut.toString());
        }
        if (missedOut != null) {
            outputs.put("missed", missedOut.toString());
        }
        s.json.put("caution", CAUTION);

        s.line("Layer", "%s: %d features, %d road lines (%d one-way)", audit.request().layer(), audit.read().featuresRead(),
                audit.read().linesKept(), audit.read().oneWayLines());
        s.line("Network", "%.3f km in %d edges", coverage.network().totalLength() / 1000, coverage.network().edgeCount());
        s.line("Tracks", "%d file%s, %d segment%s, %d points%s", audit.files().size(), plural(audit.files().size()),
                segments, plural(segments), points, untimed == 0 ? "" : " (" + untimed + " without time)");
        s.line("Cleaning", "%d thinned (within half a sigma of the fix before), %d with time not moving forward, "
                + "%d speed spikes, %d splits at impossible speed", tally.thinned(), tally.backwards(), tally.spikes(),
                tally.splits());
        s.line("Matching", "%d points on streets in %d stretch%s, %d off the network (> %.0f m), %d dropouts or jumps "
                + "not bridged; sigma %s, doubt odds %.0f, drift window %.0f s", tally.matched(), tally.chains(),
                tally.chains() == 1 ? "" : "es", tally.offNetwork(), settings.radius(), tally.breaks(), sigmaText(settings, tally),
                settings.doubtOdds(), settings.driftWindow());
        s.line("Coverage", "%.3f km of %.3f km required driven (%.1f %%)%s", coverage.driven() / 1000,
                coverage.needed() / 1000, 100 * share(coverage.driven(), coverage.needed()).doubleValue(),
                coverage.bothKerbs() ? ", both kerbs of two-way streets" : "");
        s.line("Streets", "%d covered (at least %.0f %%), %d partly, %d missed, %d not required",
                coverage.count(CoverageStatus.COVERED), 100 * coverage.threshold(), coverage.count(CoverageStatus.PARTLY),
                coverage.count(CoverageStatus.MISSED), coverage.count(CoverageStatus.NOT_REQUIRED));
        if (coverage.count(CoverageStatus.LEFT_OUT) > 0) {
            s.line("Left out", "%d streets the plan did not ask for (cut off by one-way streets, another part, not "
                    + "listed): not counted, not missed", coverage.count(CoverageStatus.LEFT_OUT));
        }
        s.line("Missed", "%.3f km in %d part%s", coverage.missedLength() / 1000, coverage.missed().size(),
                plural(coverage.missed().size()));
        if (coverage.wrongWay() > 0) {
            s.line("Wrong way", "%.3f km of one-way streets driven against their direction (not counted)",
                    coverage.wrongWay() / 1000);
        }
        s.glance.add(new MapReport.Entry("Covered", String.format(Locale.ROOT, "%.1f %% of %.1f km asked for",
                100 * share(coverage.driven(), coverage.needed()).doubleValue(), coverage.needed() / 1000)));
        s.glance.add(new MapReport.Entry("Missed", String.format(Locale.ROOT, "%.1f km: %d streets missed, %d partly",
                coverage.missedLength() / 1000, coverage.count(CoverageStatus.MISSED), coverage.count(CoverageStatus.PARTLY))));
        if (coverage.wrongWay() > 0) {
            s.glance.add(new MapReport.Entry("Wrong way", String.format(Locale.ROOT,
                    "%.1f km of one-way streets against their direction", coverage.wrongWay() / 1000)));
        }
        if (coverage.count(CoverageStatus.LEFT_OUT) > 0) {
            s.glance.add(new MapReport.Entry("Left out", coverage.count(CoverageStatus.LEFT_OUT)
                    + " streets the plan did not ask for (not counted)"));
        }
        List<StreetCoverage> listed = notCovered(coverage);
        for (StreetCoverage street : listed.subList(0, Math.min(STREETS_LISTED, listed.size()))) {
            s.line("", "%-7s %5.1f %%  %s %s", street.status().label(), 100 * street.fraction(), street.feature().id(),
                    street.feature().name().isEmpty() ? "(no name)" : street.feature().name());
        }
        if (listed.size() > STREETS_LISTED) {
            s.line("", "... and %d more (all are listed by --json and --streets-out)", listed.size() - STREETS_LISTED);
        }
        StringBuilder times = new StringBuilder();
        for (StageClock.Stage stage : stages) {
            times.append(times.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.2f s", stage.name(), stage.seconds()));
        }
        s.line("Time", "%s", times);
        for (String warning : audit.warnings()) {
            s.line("Warning", "%s", warning);
        }
        if (streetsOut != null) {
            s.line("Written", "%s", streetsOut);
        }
        if (missedOut != null) {
            s.line("Written", "%s", missedOut);
        }
        return s;
    }

    /** Adds a part to the summary (the mop-up tour), after what is there. */
    void add(PlanSummary.Section section) {
        json.set(section.key(), section.json());
        if (section.key().equals("mop_up")) {
            glance.add(new MapReport.Entry("Mop-up", section.json().has("length_m")
                    ? String.format(Locale.ROOT, "%.1f km, %.1f km of it service", section.json().get("length_m").asDouble() / 1000,
                            section.json().get("service_m").asDouble() / 1000)
                    : "none needed"));
        }
        for (String[] labelled : section.lines()) {
            line(labelled[0], "%s", labelled[1]);
        }
    }

    /** Required streets that are not covered, least driven first, then in layer order. */
    private static List<StreetCoverage> notCovered(CoverageReport coverage) {
        return coverage.streets().stream()
                .filter(st -> st.status() == CoverageStatus.PARTLY || st.status() == CoverageStatus.MISSED)
                .sorted((a, b) -> Double.compare(a.fraction(), b.fraction()))
                .toList();
    }

    private static String plural(int n) {
        return n == 1 ? "" : "s";
    }

    private void line(String label, String format, Object... args) {
        SummaryFormat.line(text, label, format, args);
    }

    /** The few figures a report shows first: coverage, what was missed, the mop-up. */
    List<MapReport.Entry> glance() {
        return glance;
    }

    /** The summary as a JSON tree, the one {@link #toJson} prints. */
    ObjectNode json() {
        return json;
    }

    String toText() {
        return text + String.format(Locale.ROOT, "%-9s %s%n", "Caution", CAUTION);
    }

    String toJson() {
        return SummaryFormat.json(json);
    }

    /** The noise the match used: the given sigma, or the range estimated over the track segments. */
    private static String sigmaText(MatchSettings settings, MatchTally tally) {
        if (!settings.estimateSigma()) {
            return String.format(Locale.ROOT, "%.1f m", settings.sigma());
        }
        if (tally.sigmaSegments() == 0) {
            return String.format(Locale.ROOT, "%.1f m (too few points to estimate it)", settings.sigma());
        }
        return tally.sigmaSegments() == 1
                ? String.format(Locale.ROOT, "%.1f m estimated from the track", tally.sigmaLow())
                : String.format(Locale.ROOT, "%.1f to %.1f m estimated over %d segments", tally.sigmaLow(), tally.sigmaHigh(),
                        tally.sigmaSegments());
    }

    private static BigDecimal round1(double value) {
        return BigDecimal.valueOf(value).setScale(1, RoundingMode.HALF_EVEN);
    }
}
