package org.streetcomb.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.plan.Plan;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripLimit;
import org.streetcomb.trip.TripPlanner;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** The plan options that cut the tour into shift-sized trips from the depot. */
public final class TripOptions {

    @Option(names = "--max-trip-km", paramLabel = "KM",
            description = "Cut the tour into trips from the depot of at most this many kilometres each.")
    Double maxKm;

    @Option(names = "--max-trip-hours", paramLabel = "HOURS",
            description = "Cut the tour into trips from the depot of at most this many hours each, at the service "
                    + "and travel speeds.")
    Double maxHours;

    @Option(names = "--vehicles", paramLabel = "K",
            description = "Cut the tour into at most K trips, one per vehicle, keeping the longest as short as "
                    + "possible (by duration when --max-trip-hours is given, else by length).")
    Integer vehicles;

    @Option(names = "--service-speed", paramLabel = "KMH", defaultValue = "10",
            description = "Average speed while servicing, for trip durations (default: ${DEFAULT-VALUE} km/h).")
    double serviceSpeed;

    @Option(names = "--travel-speed", paramLabel = "KMH", defaultValue = "30",
            description = "Average speed on deadhead, for trip durations (default: ${DEFAULT-VALUE} km/h).")
    double travelSpeed;

    @Option(names = "--trip-restarts", paramLabel = "N", defaultValue = "20",
            description = "Search effort when cutting trips: each unit breeds 25 more candidate solutions; "
                    + "more can find shorter trips, 0 only improves the tour's own order (default: ${DEFAULT-VALUE}).")
    int restarts;

    boolean requested() {
        return maxKm != null || maxHours != null || vehicles != null;
    }

    void check(CommandLine commandLine) {
        if (maxKm != null && maxHours != null) {
            throw new CommandLine.ParameterException(commandLine, "give --max-trip-km or --max-trip-hours, not both");
        }
        if ((maxKm != null && !(maxKm > 0)) || (maxHours != null && !(maxHours > 0))) {
            throw new CommandLine.ParameterException(commandLine, "trip limits must be above 0");
        }
        if (vehicles != null && (vehicles < 1 || vehicles > 1000)) {
            throw new CommandLine.ParameterException(commandLine, "--vehicles must be 1 to 1000");
        }
        if (!(serviceSpeed > 0) || !(travelSpeed > 0)) {
            throw new CommandLine.ParameterException(commandLine, "speeds must be above 0 km/h");
        }
        if (restarts < 0) {
            throw new CommandLine.ParameterException(commandLine, "--trip-restarts must be 0 or more");
        }
    }

    /** The trips of the plan's single tour from the depot. */
    TripPlanner.Result cut(Plan plan) {
        if (plan.tours().size() != 1 || plan.tours().get(0).start() != plan.depot()) {
            throw new InputError(plan.request().input() + ": trips must start at the depot, but the network has "
                    + plan.components().count() + " separate parts: add --depot-part-only to cut the depot's part "
                    + "into trips");
        }
        TripLimit limit = maxKm != null ? TripLimit.length(maxKm * 1000)
                : maxHours != null ? TripLimit.hours(maxHours, serviceSpeed, travelSpeed)
                : TripLimit.length(Double.POSITIVE_INFINITY);
        return new TripPlanner(plan.network(), plan.depot(),
                new TripPlanner.Settings(limit, vehicles == null ? 0 : vehicles, restarts, 1)).plan(plan.tours().get(0), null);
    }

    double hours(Trip trip) {
        return trip.service() / (1000 * serviceSpeed) + trip.deadhead() / (1000 * travelSpeed);
    }

    private static int services(Trip trip) {
        int n = 0;
        for (boolean s : trip.tour().service()) {
            n += s ? 1 : 0;
        }
        return n;
    }

    /** Summary lines and JSON for the trips. */
    void report(TripPlanner.Result result, List<Trip> trips, ObjectNode json, List<String[]> text) {
        ArrayNode list = json.putArray("trips");
        double longest = 0;
        for (int t = 0; t < trips.size(); t++) {
            Trip trip = trips.get(t);
            double hours = hours(trip);
            longest = Math.max(longest, hours);
            ObjectNode node = list.addObject();
            node.put("trip", t + 1);
            node.put("length_m", BigDecimal.valueOf(trip.length()).setScale(3, RoundingMode.HALF_EVEN));
            node.put("service_m", BigDecimal.valueOf(trip.service()).setScale(3, RoundingMode.HALF_EVEN));
            node.put("deadhead_share", BigDecimal.valueOf(trip.deadheadShare()).setScale(6, RoundingMode.HALF_EVEN));
            node.put("hours", BigDecimal.valueOf(hours).setScale(3, RoundingMode.HALF_EVEN));
            node.put("over_limit", trip.overLimit());
            text.add(new String[] {"  trip " + (t + 1), String.format(Locale.ROOT,
                    "%.3f km, %.2f h, deadhead %.1f %%%s", trip.length() / 1000, hours, 100 * trip.deadheadShare(),
                    trip.overLimit() ? " [over the limit]" : "")});
            if (trip.overLimit()) {
                boolean single = services(trip) == 1;
                text.add(new String[] {"Warning", single
                        ? "trip " + (t + 1) + " exceeds the limit because one street alone does"
                        : "trip " + (t + 1) + " exceeds the limit: " + vehicles + " vehicles cannot cover the network "
                        + "within it; add vehicles or raise the limit"});
            }
        }
        double total = trips.stream().mapToDouble(Trip::length).sum();
        text.add(0, new String[] {"Trips", String.format(Locale.ROOT,
                "%d trips from the depot, %.3f km in all, longest %.2f h (service %.0f km/h, travel %.0f km/h)%s",
                trips.size(), total / 1000, longest, serviceSpeed, travelSpeed,
                result.improved() ? "" : "; local improvement skipped: too many streets for the distance table")});
        json.put("trips_limit", maxKm != null ? maxKm + " km" : maxHours != null ? maxHours + " h" : "none");
        if (vehicles != null) {
            json.put("vehicles", vehicles);
        }
    }
}
