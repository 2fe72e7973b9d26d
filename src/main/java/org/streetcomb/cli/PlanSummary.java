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
import java.util.Map;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.report.MapReport;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Tour;
import org.streetcomb.write.FieldCaution;
import org.streetcomb.write.SheetHeading;

/**
 * The summary of a plan, built once and printed as text or as JSON, so both carry the same numbers.
 * Lengths are metres in JSON (3 decimals) and kilometres in text.
 */
final class PlanSummary {

    /**
     * Said where the bound is not reached: the bound is a relaxation (parity or connection left out), and
     * tests against exact solutions show true gaps well below it (docs/quality.md), so the figure is a
     * ceiling, not an estimate.
     */
    private static final String LOOSE = " (a ceiling: the bound leaves part of the problem out, so the true gap is"
            + " usually smaller)";

    static final String CAUTION = FieldCaution.TEXT;

    /** Tours listed one per line in the text summary; --json lists all. */
    private static final int TOURS_LISTED = 10;

    private final ObjectNode json = SummaryFormat.newObject();
    private final StringBuilder text = new StringBuilder();
    private final List<MapReport.Entry> glance = new ArrayList<>();

    private PlanSummary() {
    }

    static PlanSummary of(Plan plan, List<StageClock.Stage> stages, Path out) {
        PlanSummary s = new PlanSummary();
        StreetNetwork network = plan.network();
        ObjectNode input = s.json.putObject("input");
        input.put("file", plan.request().input().toString());
        input.put("features", plan.read().featuresRead());
        input.put("lines", plan.read().linesKept());
        ObjectNode skipped = input.putObject("skipped");
        plan.read().skippedByType().forEach(skipped::put);
        input.put("one_way_lines", plan.read().oneWayLines());
        ObjectNode notes = input.putObject("notes");
        plan.read().notes().forEach(notes::put);
        input.put("crs", plan.read().sourceCrs());

        ObjectNode net = s.json.putObject("network");
        net.put("edges", network.edgeCount());
        net.put("nodes", network.nodeCount());
        net.put("odd_nodes", plan.augmentation().oddNodes());
        net.put("parts", plan.components().count());
        net.put("length_m", metres(network.totalLength()));

        ObjectNode depot = s.json.putObject("depot");
        depot.put("node", plan.depot());
        depot.put("lon", network.lon(plan.depot()));
        depot.put("lat", network.lat(plan.depot()));
        depot.put("distance_m", metres(plan.depotDistance()));
        depot.put("given", plan.request().depot() != null);

        s.json.put("method", plan.augmentation().method());
        s.json.put("optimal", reachesBound(plan, network.hasCosts() ? cost(plan, network) : plan.tourLength()));
        ObjectNode totals = s.json.putObject("totals");
        double tour = plan.tourLength();
        double deadhead = plan.deadheadLength();
        totals.put("tour_m", metres(tour));
        totals.put("service_m", metres(plan.serviceLength()));
        totals.put("deadhead_m", metres(deadhead));
        totals.put("deadhead_share", share(deadhead, tour));
        totals.put("hours", BigDecimal.valueOf(plan.hours()).setScale(3, RoundingMode.HALF_EVEN));
        double objective = network.hasCosts() ? cost(plan, network) : tour;
        if (network.hasCosts()) {
            totals.put("network_cost", metres(network.weightedByCost().totalLength()));
            totals.put("tour_cost", metres(objective));
            totals.put("lower_bound_cost", metres(plan.augmentation().lowerBound()));
        } else {
            totals.put("lower_bound_m", metres(plan.augmentation().lowerBound()));
        }
        if (!plan.augmentation().boundSource().isEmpty()) {
            totals.put("lower_bound_from", plan.augmentation().boundSource());
        }
        totals.put("gap", share(objective - plan.augmentation().lowerBound(), plan.augmentation().lowerBound()));
        ArrayNode tours = s.json.putArray("tours");
        for (int t = 0; t < plan.tours().size(); t++) {
            Tour tr = plan.tours().get(t);
            ObjectNode node = tours.addObject();
            node.put("tour", t + 1);
            node.put("start_node", tr.start());
            node.put("steps", tr.steps());
            node.put("length_m", metres(tr.length(network)));
            node.put("deadhead_m", metres(tr.deadhead(network)));
        }
        ObjectNode time = s.json.putObject("seconds");
        for (StageClock.Stage stage : stages) {
            time.put(stage.name(), BigDecimal.valueOf(stage.seconds()).setScale(3, RoundingMode.HALF_EVEN));
        }
        s.json.putPOJO("warnings", plan.warnings());
        if (out != null) {
            s.json.put("output", out.toString());
        }
        s.json.put("caution", CAUTION);
        s.buildText(plan, stages, out);
        return s;
    }

    private void buildText(Plan plan, List<StageClock.Stage> stages, Path out) {
        StreetNetwork network = plan.network();
        line("Layer", "%s: %d features, %d road lines (%d one-way)%s", plan.request().input(), plan.read().featuresRead(),
                plan.read().linesKept(), plan.read().oneWayLines(), skippedText(plan.read().skippedByType()));
        line("CRS", "%s", plan.read().sourceCrs());
        plan.read().notes().forEach((what, n) -> line("Note", "%d x %s", n, what));
        line("Network", "%.3f km in %d edges, %d nodes (%d odd), %d part%s", network.totalLength() / 1000,
                network.edgeCount(), network.nodeCount(), plan.augmentation().oddNodes(), plan.components().count(),
                plan.components().count() == 1 ? "" : "s");
        line("Depot", "node %d at %.7f,%.7f%s", plan.depot(), network.lon(plan.depot()), network.lat(plan.depot()),
                plan.request().depot() == null ? " (default: main network, nearest the layer's first point)"
                        : String.format(Locale.ROOT, ", %.1f m from the given position", plan.depotDistance()));
        line("Method", "%s%s", plan.augmentation().method(), plan.augmentation().certified() ? "" : " [optimality not proved]");
        double tour = plan.tourLength();
        double deadhead = plan.deadheadLength();
        line("Tour", "%.3f km: service %.3f km, deadhead %.3f km (%.1f %%)", tour / 1000, plan.serviceLength() / 1000,
                deadhead / 1000, tour == 0 ? 0 : 100 * deadhead / tour);
        String speeds = String.format(Locale.ROOT, "service at %s km/h, deadhead at %s km/h",
                speed(plan.request().arrangement().serviceKmh()), speed(plan.request().arrangement().travelKmh()));
        line("Duration", "about %s driving (%s)", SheetHeading.duration(plan.hours()), speeds);
        glance("Distance", "%.1f km: %.1f km service, %.1f km deadhead (%.0f %%)", tour / 1000, plan.serviceLength() / 1000,
                deadhead / 1000, tour == 0 ? 0 : 100 * deadhead / tour);
        if (plan.hasTrips()) {
            Fleet fleet = plan.arranged().fleet();
            int vehicles = fleet.vehicles().size();
            glance("Time", "%d vehicle%s, %d trip%s; the longest day about %s (%s)", vehicles, vehicles == 1 ? "" : "s",
                    fleet.trips().size(), fleet.trips().size() == 1 ? "" : "s",
                    SheetHeading.duration(fleet.longestHours()), speeds);
        } else {
            glance("Time", "about %s (%s)", SheetHeading.duration(plan.hours()), speeds);
        }
        double bound = plan.augmentation().lowerBound();
        String source = plan.augmentation().boundSource().isEmpty() ? "" : " (" + plan.augmentation().boundSource() + ")";
        double objective = tour;
        if (network.hasCosts()) {
            objective = cost(plan, network);
            line("Cost", "%.3f for the tour, %.3f for the streets (the cost field's units); tours minimise cost",
                    objective, network.weightedByCost().totalLength());
            line("Bound", "cost %.3f%s: no tour can cost less%s", bound, source, reachesBound(plan, objective)
                    ? "; this one is optimal"
                    : String.format(Locale.ROOT, "; this one costs at most %.2f %% more than the optimum%s",
                            bound == 0 ? 0 : 100 * (objective - bound) / bound, LOOSE));
        } else {
            line("Bound", "%.3f km%s: no tour can be shorter%s", bound / 1000, source, reachesBound(plan, objective)
                    ? "; this one is optimal"
                    : plan.hasTrips()
                    ? String.format(Locale.ROOT, "; the trips together are at most %.2f %% longer than the shortest single"
                            + " tour (cutting into trips adds the drives back to the depot)", bound == 0 ? 0
                            : 100 * (objective - bound) / bound)
                    : String.format(Locale.ROOT, "; this one is at most %.2f %% longer than the optimum%s",
                            bound == 0 ? 0 : 100 * (objective - bound) / bound, LOOSE));
        }
        String unit = network.hasCosts() ? "cheaper" : "shorter";
        glance("Quality", "%s", reachesBound(plan, objective) ? "optimal: no tour can be " + unit
                : plan.hasTrips() ? String.format(Locale.ROOT, "the trips together are %.1f %% above the best single tour's"
                        + " bound", bound == 0 ? 0 : 100 * (objective - bound) / bound)
                : String.format(Locale.ROOT, "at most %.1f %% above the best possible", bound == 0 ? 0
                        : 100 * (objective - bound) / bound));
        Tour first = plan.tours().get(0);
        if (first.end(network) != first.start()) {
            int end = first.end(network);
            line("End", "open route: the depot's tour ends at node %d at %.7f,%.7f", end, network.lon(end), network.lat(end));
        }
        // tours from different starts are separate parts; trips all leave the depot and have their own lines
        if (plan.tours().stream().map(Tour::start).distinct().count() > 1) {
            int shown = Math.min(plan.tours().size(), TOURS_LISTED);
            for (int t = 0; t < shown; t++) {
                Tour tr = plan.tours().get(t);
                line("  tour " + (t + 1), "%.3f km, deadhead %.3f km, %d steps, from node %d", tr.length(network) / 1000,
                        tr.deadhead(network) / 1000, tr.steps(), tr.start());
            }
            if (shown < plan.tours().size()) {
                line("", "... and %d smaller tours (all are listed by --json)", plan.tours().size() - shown);
            }
        } else if (plan.tours().size() == 1) {
            line("Steps", "%d", plan.tours().get(0).steps());
        }
        if (plan.area() != null) {
            line("Area", "%s: streets inside serviced, roads within %.0f m of it used only to travel", plan.area().label(),
                    plan.area().margin());
        }
        if (plan.leftOut().length > 0) {
            double left = 0;
            for (int e : plan.leftOut()) {
                left += network.length(e);
            }
            boolean[] served = new boolean[network.edgeCount()];
            double servedLength = 0;
            for (Tour walk : plan.tours()) {
                for (int i = 0; i < walk.steps(); i++) {
                    int e = walk.edges()[i];
                    if (walk.service()[i] && !served[e]) {
                        served[e] = true;
                        servedLength += network.length(e);
                    }
                }
            }
            line("Left out", "%.3f km (%.1f %% of the streets asked for) in %d edges: one-way streets cut them off",
                    left / 1000, 100 * left / (left + servedLength), plan.leftOut().length);
            glance("Left out", "%.1f km (%.1f %% of the streets asked for): one-way streets cut them off", left / 1000,
                    100 * left / (left + servedLength));
        }
        StringBuilder times = new StringBuilder();
        for (StageClock.Stage stage : stages) {
            times.append(times.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.2f s", stage.name(), stage.seconds()));
        }
        line("Time", "%s", times);
        for (String warning : plan.warnings()) {
            line("Warning", "%s", warning);
        }
        if (!plan.warnings().isEmpty()) {
            glance("Warnings", "%d, listed under All figures", plan.warnings().size());
        }
        if (out != null) {
            line("Written", "%s", out);
        }
    }

    /** The tours' total cost, from the cost field, for a network that has costs. */
    private static double cost(Plan plan, StreetNetwork network) {
        StreetNetwork costs = network.weightedByCost();
        return plan.tours().stream().mapToDouble(t -> t.length(costs)).sum();
    }

    /** Whether the solver proved its result optimal and the tours as driven (trips included) still meet the bound. */
    private static boolean reachesBound(Plan plan, double objective) {
        double bound = plan.augmentation().lowerBound();
        // an LP bound carries its solver's relative tolerance (MixedLpBound takes 1e-6 off): within 1e-5 is reached
        return plan.augmentation().certified() && objective <= bound + 1e-6 + 1e-5 * bound;
    }

    private static String skippedText(Map<String, Integer> skipped) {
        if (skipped.isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder(", skipped ");
        skipped.forEach((type, n) -> b.append(b.length() > 10 ? ", " : "").append(n).append(' ').append(type));
        return b.toString();
    }

    private static String speed(double kmh) {
        return kmh == Math.rint(kmh) ? String.valueOf((long) kmh) : String.valueOf(kmh);
    }

    private void glance(String label, String format, Object... args) {
        glance.add(new MapReport.Entry(label, String.format(Locale.ROOT, format, args)));
    }

    /** The few figures a report shows first: distance, time, quality, what was left out. */
    List<MapReport.Entry> glance() {
        return glance;
    }

    private void line(String label, String format, Object... args) {
        SummaryFormat.line(text, label, format, args);
    }



    /**
     * What a later stage reports: a JSON member, and text lines shown before the caution.
     *
     * @param lines label and text of each line
     */
    record Section(String key, ObjectNode json, List<String[]> lines) {
    }

    void add(Section section) {
        json.set(section.key(), section.json());
        for (String[] labelled : section.lines()) {
            line(labelled[0], "%s", labelled[1]);
        }
    }

    String toText() {
        return text + String.format(Locale.ROOT, "%-9s %s%n", "Caution", CAUTION);
    }

    /** The summary tree that {@link #toJson()} prints, for reports that show the same numbers. */
    ObjectNode json() {
        return json;
    }

    String toJson() {
        return SummaryFormat.json(json);
    }
}
