package org.streetcomb.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.plan.Arranged;
import org.streetcomb.plan.Arrangement;
import org.streetcomb.plan.FieldFiles;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanFiles;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.tour.TurnCounts;
import org.streetcomb.write.DirectionSheetWriter;
import org.streetcomb.write.GpxLimits;
import org.streetcomb.write.GpxTourWriter;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The plan options for taking tours to the field: the turn-aware order, GPX and KML files, a direction
 * sheet, and the side of the road traffic keeps to. A picocli mixin: it turns options into an
 * {@link Arrangement} and {@link FieldFiles} for the planner, and formats what was planned and written.
 */
public final class FieldOutputOptions {

    @Option(names = "--gpx", paramLabel = "FILE", description = "Write the tours as GPX 1.1 for handheld units.")
    @Writes
    Path gpx;

    @Option(names = "--gpx-simplify", paramLabel = "METRES", defaultValue = "2",
            description = "Simplify GPX and KML geometry within this many metres (Douglas-Peucker; 0 keeps every "
                    + "vertex; default: ${DEFAULT-VALUE}).")
    double simplify;

    @Option(names = "--gpx-track-points", paramLabel = "N", defaultValue = "" + GpxLimits.DEFAULT_TRACK_POINTS,
            description = "Most points per GPX track; longer tours are split into numbered parts "
                    + "(default: ${DEFAULT-VALUE}).")
    int trackPoints;

    @Option(names = "--gpx-route-points", paramLabel = "N", defaultValue = "" + GpxLimits.DEFAULT_ROUTE_POINTS,
            description = "Most points per GPX route (default: ${DEFAULT-VALUE}).")
    int routePoints;

    @Option(names = "--gpx-routes", description = "Also write a GPX route per tour with a point at every turn.")
    boolean routes;

    @Option(names = "--kml", paramLabel = "FILE", description = "Write the tours as KML 2.2 for globe viewers.")
    @Writes
    Path kml;

    @Option(names = "--directions", paramLabel = "FILE",
            description = "Write a direction sheet: .csv for a table, .html for a printable page.")
    @Writes
    Path directions;

    @Option(names = "--traffic-side", paramLabel = "SIDE", defaultValue = "right",
            converter = TrafficSideConverter.class,
            description = "The side of the road traffic keeps to: right or left (default: ${DEFAULT-VALUE}). "
                    + "Decides which turns cross oncoming traffic.")
    TrafficSide side;

    @Option(names = "--plain-order",
            description = "Keep the tour in the order first found instead of reordering it for fewer U-turns and "
                    + "crossing turns (the length is the same either way).")
    boolean plainOrder;

    @CommandLine.Mixin
    TripOptions tripOptions;

    /** Checks the option values; call before planning so a bad value fails fast. */
    void check(CommandLine commandLine) {
        if (!(simplify >= 0) || simplify > 1000) {
            throw new CommandLine.ParameterException(commandLine, "--gpx-simplify must be 0 to 1000 metres");
        }
        if (trackPoints < 2 || routePoints < 2) {
            throw new CommandLine.ParameterException(commandLine, "--gpx-track-points and --gpx-route-points must be at least 2");
        }
        tripOptions.check(commandLine);
        if (directions != null && DirectionSheetWriter.isHtml(directions) == null) {
            throw new CommandLine.ParameterException(commandLine, "--directions " + directions
                    + ": name the file .csv or .html");
        }
    }

    /** How the planner should cut and order the tours, from these options. */
    Arrangement arrangement() {
        return new Arrangement(side, !plainOrder, tripOptions.request());
    }

    /**
     * The files to write, with the tours' GeoJSON at {@code tours} (null for none), keeping the plan's scope
     * in it when {@code recordScope}.
     */
    FieldFiles files(Path tours, boolean steps, boolean recordScope) {
        return new FieldFiles(tours, steps, gpx, new GpxLimits(simplify, trackPoints, routePoints, routes), kml,
                directions, recordScope);
    }

    /** Whether any file for the field was asked for. */
    boolean anyFile() {
        return gpx != null || kml != null || directions != null;
    }

    /** The summary's account of the arranged plan (trips, turns) and of the files written. */
    PlanSummary.Section section(Plan plan, PlanFiles.Written written) {
        Arranged arranged = plan.arranged();
        TurnCounts counts = arranged.asDriven();
        TurnCounts plainCounts = arranged.asFound();
        List<String[]> text = new ArrayList<>();
        ObjectNode json = JsonNodeFactory.instance.objectNode();
        if (arranged.fleet() != null) {
            tripOptions.report(arranged.fleet(), arranged.trips(), plan.network(), plan.depot(), json, text);
        }
        ObjectNode turns = json.putObject("turns");
        turns.put("traffic_side", side.name().toLowerCase(Locale.ROOT));
        turns.put("u_turns", counts.uTurns());
        turns.put("crossing_turns", counts.crossingTurns());
        turns.put("straight_ons", counts.straightOns());
        turns.put("transitions", counts.transitions());
        turns.put("u_turns_per_100km", round(counts.per100Km(counts.uTurns())));
        turns.put("u_turns_outside_dead_ends", counts.uTurnsOutsideDeadEnds());
        turns.put("u_turns_outside_dead_ends_per_100km", round(counts.per100Km(counts.uTurnsOutsideDeadEnds())));
        turns.put("crossing_turns_per_100km", round(counts.per100Km(counts.crossingTurns())));
        turns.put("straight_ons_per_100km", round(counts.per100Km(counts.straightOns())));
        turns.put("order", plainOrder ? "plain" : "turn-aware");
        turns.put("plain_order_u_turns", plainCounts.uTurns());
        turns.put("plain_order_crossing_turns", plainCounts.crossingTurns());
        turns.put("plain_order_straight_ons", plainCounts.straightOns());
        text.add(new String[] {"Turns", String.format(Locale.ROOT,
                "%d U-turns (%d outside dead ends), %d crossing turns (%s-hand traffic), %d straight on; per 100 km: "
                        + "%.1f (%.1f), %.1f, %.1f",
                counts.uTurns(), counts.uTurnsOutsideDeadEnds(), counts.crossingTurns(),
                side.name().toLowerCase(Locale.ROOT), counts.straightOns(), counts.per100Km(counts.uTurns()),
                counts.per100Km(counts.uTurnsOutsideDeadEnds()), counts.per100Km(counts.crossingTurns()),
                counts.per100Km(counts.straightOns()))});
        if (!plainOrder && plainCounts.equals(counts)) {
            text.add(new String[] {"", "the first order found had no more turns than any reorder tried: kept"});
        } else if (!plainOrder) {
            text.add(new String[] {"", String.format(Locale.ROOT,
                    "reordered for fewer turns from %d U-turns, %d crossing turns, %d straight on; same length",
                    plainCounts.uTurns(), plainCounts.crossingTurns(), plainCounts.straightOns())});
        }
        if (gpx != null) {
            ArrayNode files = json.putArray("gpx_files");
            for (PlanFiles.GpxFile file : written.gpx()) {
                GpxTourWriter.Written counted = file.counts();
                ObjectNode node = files.addObject();
                if (!json.has("gpx")) {
                    json.set("gpx", node);
                }
                node.put("file", file.file().toString());
                node.put("tracks", counted.tracks());
                node.put("track_points", counted.trackPoints());
                node.put("routes", counted.routes());
                node.put("route_points", counted.routePoints());
                node.put("waypoints", counted.waypoints());
                text.add(new String[] {"GPX", String.format(Locale.ROOT, "%s: %d track(s) with %d points%s, %d waypoint(s)",
                        file.file(), counted.tracks(), counted.trackPoints(), routes ? String.format(Locale.ROOT,
                        ", %d route(s) with %d points", counted.routes(), counted.routePoints()) : "",
                        counted.waypoints())});
            }
        }
        if (kml != null) {
            json.put("kml", kml.toString());
            text.add(new String[] {"KML", kml.toString()});
        }
        if (directions != null) {
            ArrayNode files = json.putArray("directions_files");
            for (PlanFiles.SheetFile file : written.sheets()) {
                if (!json.has("directions")) {
                    json.put("directions", file.file().toString());
                }
                files.add(file.file().toString());
                text.add(new String[] {"Sheet", String.format(Locale.ROOT, "%s: %d lines", file.file(), file.lines())});
            }
        }
        return new PlanSummary.Section("field", json, text);
    }

    private static double round(double value) {
        return Math.round(value * 100) / 100.0;
    }

    /** Parses "right" or "left". */
    static final class TrafficSideConverter implements CommandLine.ITypeConverter<TrafficSide> {
        @Override
        public TrafficSide convert(String value) {
            return switch (value.trim().toLowerCase(Locale.ROOT)) {
                case "right" -> TrafficSide.RIGHT;
                case "left" -> TrafficSide.LEFT;
                default -> throw new CommandLine.TypeConversionException("expected right or left; got '" + value + "'");
            };
        }
    }
}
