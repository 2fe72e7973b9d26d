package org.streetcomb.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.streetcomb.check.Finding;
import org.streetcomb.check.FindingKind;
import org.streetcomb.check.HealthReport;
import org.streetcomb.check.Severity;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.report.MapReport;
import org.streetcomb.timing.StageClock;

/**
 * The summary of a health check, built once and printed as text or JSON, so both carry the same
 * findings. The text lists the first findings of each kind; the JSON lists all of them, each with a
 * representative point (the GeoJSON output has the full geometry).
 */
final class HealthSummary {


    /** Findings of each kind listed in the text summary; --json and --out list all. */
    private static final int LISTED = 10;

    private final ObjectNode json = SummaryFormat.newObject();
    private final StringBuilder text = new StringBuilder();
    private final List<MapReport.Entry> glance = new ArrayList<>();

    private HealthSummary() {
    }

    static HealthSummary of(HealthReport report, List<StageClock.Stage> stages, Path out) {
        HealthSummary s = new HealthSummary();
        s.buildJson(report, stages);
        s.buildText(report, stages, out);
        return s;
    }

    private void buildJson(HealthReport report, List<StageClock.Stage> stages) {
        StreetNetwork network = report.network();
        ObjectNode input = json.putObject("input");
        input.put("file", report.input().toString());
        input.put("features", report.read().featuresRead());
        input.put("lines", report.read().linesKept());
        input.put("crs", report.read().sourceCrs());
        ObjectNode notes = input.putObject("notes");
        report.read().notes().forEach(notes::put);
        ObjectNode net = json.putObject("network");
        net.put("edges", network.edgeCount());
        net.put("nodes", network.nodeCount());
        net.put("length_m", round(network.totalLength(), 3));
        if (report.depot() >= 0) {
            net.putArray("depot").add(network.lon(report.depot())).add(network.lat(report.depot()));
        }
        ObjectNode thresholds = json.putObject("thresholds_m");
        thresholds.put("snap", report.options().snap());
        thresholds.put("near_miss", report.options().nearMiss());
        thresholds.put("stub", report.options().stub());
        thresholds.put("duplicate", report.options().duplicate());
        json.put("blocking", report.blocking());
        ObjectNode counts = json.putObject("counts");
        report.counts().forEach((kind, n) -> counts.put(kind.code(), n));
        ArrayNode findings = json.putArray("findings");
        for (Finding f : report.findings()) {
            ObjectNode node = findings.addObject();
            node.put("kind", f.kind().code());
            node.put("severity", f.severity().code());
            node.put("value", round(f.value(), 3));
            node.put("unit", f.unit());
            ArrayNode ids = node.putArray("feature_ids");
            f.featureIds().forEach(ids::add);
            if (f.location() != null) {
                Coordinate at = f.location().getCoordinate();
                node.putArray("at").add(round(at.x, 7)).add(round(at.y, 7));
            }
            node.put("problem", f.problem());
            node.put("fix", f.fix());
        }
        ObjectNode seconds = json.putObject("seconds");
        stages.forEach(stage -> seconds.put(stage.name(), round(stage.seconds(), 3)));
    }

    private void buildText(HealthReport report, List<StageClock.Stage> stages, Path out) {
        StreetNetwork network = report.network();
        line("Layer", "%s: %d features, %d road lines", report.input(), report.read().featuresRead(), report.read().linesKept());
        line("CRS", "%s", report.read().sourceCrs());
        report.read().notes().forEach((what, n) -> line("Note", "%d x %s", n, what));
        line("Network", "%.3f km in %d edges, %d nodes", network.totalLength() / 1000, network.edgeCount(), network.nodeCount());
        if (report.depot() >= 0) {
            line("Depot", "node %d at %.7f,%.7f", report.depot(), network.lon(report.depot()), network.lat(report.depot()));
        }
        line("Findings", "%d: %d blocking, %d warning%s, %d note%s", report.findings().size(), report.count(Severity.BLOCKING),
                report.count(Severity.WARNING), report.count(Severity.WARNING) == 1 ? "" : "s",
                report.count(Severity.NOTE), report.count(Severity.NOTE) == 1 ? "" : "s");
        glance.add(new MapReport.Entry("Findings", String.format(Locale.ROOT, "%d: %d blocking, %d warnings, %d notes",
                report.findings().size(), report.count(Severity.BLOCKING), report.count(Severity.WARNING),
                report.count(Severity.NOTE))));
        StringBuilder kinds = new StringBuilder();
        report.counts().forEach((kind, n) -> kinds.append(kinds.length() == 0 ? "" : ", ")
                .append(kind.code().replace('_', ' ')).append(' ').append(n));
        if (kinds.length() > 0) {
            glance.add(new MapReport.Entry("Kinds", kinds.toString()));
        }
        glance.add(new MapReport.Entry("Verdict", report.blocking()
                ? "fix the blocking findings before planning" : "ready to plan; warnings and notes are worth a look"));
        for (var entry : report.counts().entrySet()) {
            FindingKind kind = entry.getKey();
            List<Finding> ofKind = report.findings().stream().filter(f -> f.kind() == kind).toList();
            text.append(String.format(Locale.ROOT, "%n%s: %d%n", kind.code(), entry.getValue()));
            for (Finding f : ofKind.subList(0, Math.min(LISTED, ofKind.size()))) {
                String at = "";
                if (f.location() != null) {
                    Coordinate c = f.location().getCoordinate();
                    at = String.format(Locale.ROOT, " at %.7f,%.7f:", c.x, c.y);
                }
                text.append(String.format(Locale.ROOT, "  [%s]%s %s%n      fix: %s%n", f.severity().code(), at, f.problem(), f.fix()));
            }
            if (ofKind.size() > LISTED) {
                text.append(String.format(Locale.ROOT, "  ... and %d more (all are listed by --json and --out)%n",
                        ofKind.size() - LISTED));
            }
        }
        text.append(System.lineSeparator());
        line("Limits", "snap %s m, near miss %s m, stub %s m, duplicate %s m", plain(report.options().snap()),
                plain(report.options().nearMiss()), plain(report.options().stub()), plain(report.options().duplicate()));
        StringBuilder times = new StringBuilder();
        for (StageClock.Stage stage : stages) {
            times.append(times.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.2f s", stage.name(), stage.seconds()));
        }
        line("Time", "%s", times);
        if (out != null) {
            line("Written", "%s", out);
        }
        line("Result", "%s", report.blocking()
                ? "blocking findings: no tour can drive every street and return until they are fixed"
                : "nothing blocks a tour");
    }

    private void line(String label, String format, Object... args) {
        SummaryFormat.line(text, label, format, args);
    }

    private static BigDecimal round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN);
    }

    private static String plain(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    String toText() {
        return text.toString();
    }

    /** The summary tree that {@link #toJson()} prints, for the report's tables. */
    ObjectNode json() {
        return json;
    }

    String toJson() {
        return SummaryFormat.json(json);
    }

    /** The few figures a report shows first. */
    List<MapReport.Entry> glance() {
        return glance;
    }
}
