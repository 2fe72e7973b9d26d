package org.streetcomb.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.plan.Plan;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Direction;
import org.streetcomb.tour.Directions;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.tour.TurnAwareOrder;
import org.streetcomb.tour.TurnCounts;
import org.streetcomb.trip.Trip;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.write.DirectionSheetWriter;
import org.streetcomb.write.GpxLimits;
import org.streetcomb.write.GpxTourWriter;
import org.streetcomb.write.KmlTourWriter;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The plan options for taking tours to the field: the turn-aware order, GPX and KML files, a direction
 * sheet, and the side of the road traffic keeps to. A picocli mixin, so {@code plan} only wires it in.
 */
public final class FieldOutputOptions {

    @Option(names = "--gpx", paramLabel = "FILE", description = "Write the tours as GPX 1.1 for handheld units.")
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
    Path kml;

    @Option(names = "--directions", paramLabel = "FILE",
            description = "Write a direction sheet: .csv for a table, .html for a printable page.")
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

    private EdgeBearings bearings;
    private TurnCounts plainCounts;
    private Fleet trips;

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

    /**
     * Cuts the plan's tour into trips when asked, then reorders the tours (or trips) for fewer U-turns and
     * crossing turns, unless asked to keep them as found.
     */
    Plan arrange(Plan solved, StageClock clock) {
        Plan plan;
        if (tripOptions.requested()) {
            trips = clock.time("trips", () -> tripOptions.cut(solved));
            plan = solved.withTours(trips.trips().stream().map(Trip::tour).toList());
        } else {
            plan = solved;
        }
        return clock.time("turns", () -> {
            bearings = EdgeBearings.of(plan.network());
            plainCounts = counts(plan, plan.tours());
            if (plainOrder) {
                return plan;
            }
            List<Tour> reordered = new ArrayList<>();
            for (Tour tour : plan.tours()) {
                reordered.add(TurnAwareOrder.of(plan.network(), bearings, side, tour));
            }
            return plan.withTours(reordered);
        });
    }

    private TurnCounts counts(Plan plan, List<Tour> tours) {
        TurnCounts counts = TurnCounts.none();
        for (Tour tour : tours) {
            counts = counts.plus(TurnCounts.of(plan.network(), bearings, side, tour));
        }
        return counts;
    }

    /**
     * Writes the requested files for a plan from {@link #arrange}; returns what was written and the turn
     * counts, for the summary.
     */
    PlanSummary.Section write(Plan plan, StageClock clock) {
        List<Tour> tours = plan.tours();
        List<List<Direction>> sheets = new ArrayList<>();
        for (Tour tour : tours) {
            sheets.add(Directions.of(plan.network(), bearings, side, tour));
        }
        TurnCounts counts = counts(plan, tours);
        String label = trips == null ? "Tour" : "Trip";
        List<String[]> text = new ArrayList<>();
        ObjectNode json = JsonNodeFactory.instance.objectNode();
        if (trips != null) {
            List<Trip> ordered = new ArrayList<>();
            List<Trip> cut = trips.trips();
            for (int t = 0; t < tours.size(); t++) {
                ordered.add(new Trip(tours.get(t), cut.get(t).length(), cut.get(t).service(), cut.get(t).demand(),
                        cut.get(t).overLimit()));
            }
            tripOptions.report(trips, ordered, plan.network(), plan.depot(), json, text);
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
        if (!plainOrder) {
            text.add(new String[] {"", String.format(Locale.ROOT,
                    "reordered for fewer turns from %d U-turns, %d crossing turns, %d straight on; same length",
                    plainCounts.uTurns(), plainCounts.crossingTurns(), plainCounts.straightOns())});
        }
        List<int[]> groups = groups(tours.size());
        if (gpx != null) {
            ArrayNode files = json.putArray("gpx_files");
            for (int g = 0; g < groups.size(); g++) {
                int[] range = groups.get(g);
                if (range[0] == range[1]) {
                    continue;
                }
                Path file = groups.size() == 1 ? gpx : perVehicle(gpx, g + 1);
                GpxTourWriter.Written written = clock.time("gpx", () -> new GpxTourWriter(
                        new GpxLimits(simplify, trackPoints, routePoints, routes))
                        .write(file, plan.network(), plan.depot(), tours.subList(range[0], range[1]),
                                sheets.subList(range[0], range[1]), label));
                ObjectNode node = files.addObject();
                if (!json.has("gpx")) {
                    json.set("gpx", node);
                }
                node.put("file", file.toString());
                node.put("tracks", written.tracks());
                node.put("track_points", written.trackPoints());
                node.put("routes", written.routes());
                node.put("route_points", written.routePoints());
                node.put("waypoints", written.waypoints());
                text.add(new String[] {"GPX", String.format(Locale.ROOT, "%s: %d track(s) with %d points%s, %d waypoint(s)",
                        file, written.tracks(), written.trackPoints(), routes ? String.format(Locale.ROOT,
                        ", %d route(s) with %d points", written.routes(), written.routePoints()) : "", written.waypoints())});
            }
        }
        if (kml != null) {
            clock.run("kml", () -> new KmlTourWriter(simplify).write(kml, plan.network(), plan.depot(), tours, label));
            json.put("kml", kml.toString());
            text.add(new String[] {"KML", kml.toString()});
        }
        if (directions != null) {
            ArrayNode files = json.putArray("directions_files");
            for (int g = 0; g < groups.size(); g++) {
                int[] range = groups.get(g);
                if (range[0] == range[1]) {
                    continue;
                }
                Path file = groups.size() == 1 ? directions : perVehicle(directions, g + 1);
                List<List<Direction>> mine = sheets.subList(range[0], range[1]);
                clock.run("directions", () -> DirectionSheetWriter.write(file, mine, label));
                if (!json.has("directions")) {
                    json.put("directions", file.toString());
                }
                files.add(file.toString());
                int lines = mine.stream().mapToInt(List::size).sum();
                text.add(new String[] {"Sheet", String.format(Locale.ROOT, "%s: %d lines", file, lines)});
            }
        }
        return new PlanSummary.Section("field", json, text);
    }

    /**
     * The tours written to one file each: every vehicle's trips when a fleet of several vehicles was planned,
     * else all tours together; as {from, to} index ranges into the tours.
     */
    private List<int[]> groups(int tours) {
        List<int[]> groups = new ArrayList<>();
        if (trips == null || trips.vehicles().size() == 1) {
            groups.add(new int[] {0, tours});
            return groups;
        }
        int from = 0;
        for (var day : trips.vehicles()) {
            groups.add(new int[] {from, from + day.trips().size()});
            from += day.trips().size();
        }
        return groups;
    }

    /** {@code name.ext} becomes {@code name-vehicle-N.ext}: one file per vehicle. */
    static Path perVehicle(Path file, int vehicle) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String renamed = dot > 0 ? name.substring(0, dot) + "-vehicle-" + vehicle + name.substring(dot)
                : name + "-vehicle-" + vehicle;
        return file.resolveSibling(renamed);
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
