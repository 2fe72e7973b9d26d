package org.streetcomb.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripPlanner;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.plan.FleetRequest;
import org.streetcomb.fleet.ServiceOverlap;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.fleet.VehicleDay;
import org.streetcomb.read.PlaceLayerReader;
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
            description = "Share the streets among K vehicles, each working an area of its own around the depot and "
                    + "driving as many trips as the trip limit needs (default: 1).")
    Integer vehicles;

    @Option(names = "--shift-hours", paramLabel = "HOURS",
            description = "Each vehicle's trips together may take at most this many hours; the summary says by how "
                    + "much the fleet falls short when they do not fit.")
    Double shiftHours;

    @Option(names = "--capacity", paramLabel = "LOAD",
            description = "What one vehicle carries, in the unit of --demand-field or --demand-per-km (tonnes of "
                    + "salt, bins); a trip ends when its load is used up.")
    Double capacity;

    @Option(names = "--demand-field", paramLabel = "FIELD",
            description = "The field holding what servicing each street uses of the load (shared along the street "
                    + "by length).")
    String demandField;

    @Option(names = "--demand-per-km", paramLabel = "RATE",
            description = "What servicing uses of the load per kilometre and lane (e.g. tonnes of salt per km).")
    Double demandPerKm;

    @Option(names = "--lanes-field", paramLabel = "FIELD",
            description = "The field holding each street's lanes, for --demand-per-km (empty values count as one).")
    String lanesField;

    @Option(names = "--reload-at", paramLabel = "LON,LAT", converter = LonLatConverter.class,
            description = "A place besides the depot where vehicles may reload between trips (a salt barn, a tip), "
                    + "as longitude,latitude; repeat for several. Each trip ends where the way on is shortest.")
    List<LonLat> reloadAt = new ArrayList<>();

    @Option(names = "--reload-points", paramLabel = "FILE",
            description = "A layer of points where vehicles may reload (GeoJSON, a shapefile or a GeoPackage, in any "
                    + "CRS the readers take), used as --reload-at uses its places, after them.")
    Path reloadPoints;

    @Option(names = "--service-speed", paramLabel = "KMH", defaultValue = "" + FleetRequest.DEFAULT_SERVICE_KMH,
            description = "Average speed while servicing, for trip durations (default: ${DEFAULT-VALUE} km/h).")
    double serviceSpeed;

    @Option(names = "--travel-speed", paramLabel = "KMH", defaultValue = "" + FleetRequest.DEFAULT_TRAVEL_KMH,
            description = "Average speed on deadhead, for trip durations (default: ${DEFAULT-VALUE} km/h).")
    double travelSpeed;

    @Option(names = "--turn-back-metres", paramLabel = "METRES", defaultValue = "0",
            description = "What a U-turn where the street goes on costs when trips are driven between their services, "
                    + "in metres of driving: a detour round a block up to that long is taken instead (a lorry crew "
                    + "might give 400); 0, the default, drives the shortest way. Turning back at a dead end costs nothing.")
    double turnBackMetres;

    @Option(names = "--trip-restarts", paramLabel = "N",
            description = "Search effort when cutting trips: each unit breeds 25 more candidate solutions; more can "
                    + "find shorter trips, 0 only improves the tour's own order (default: " + TripPlanner.SMALL_RESTARTS
                    + " for a vehicle's " + TripPlanner.SMALL_TASKS + " streets or fewer, " + TripPlanner.DEFAULT_RESTARTS
                    + " up to " + TripPlanner.LARGE_TASKS + ", 0 beyond).")
    Integer restarts;

    boolean requested() {
        return request().requested();
    }

    void check(CommandLine commandLine) {
        if (maxKm != null && maxHours != null) {
            throw new CommandLine.ParameterException(commandLine, "give --max-trip-km or --max-trip-hours, not both");
        }
        if ((maxKm != null && !(maxKm > 0)) || (maxHours != null && !(maxHours > 0))
                || (shiftHours != null && !(shiftHours > 0))) {
            throw new CommandLine.ParameterException(commandLine, "trip limits must be above 0");
        }
        if (vehicles != null && (vehicles < 1 || vehicles > 1000)) {
            throw new CommandLine.ParameterException(commandLine, "--vehicles must be 1 to 1000");
        }
        if ((capacity == null) != (demandField == null && demandPerKm == null)) {
            throw new CommandLine.ParameterException(commandLine, capacity == null
                    ? "--demand-field and --demand-per-km need --capacity" : "--capacity needs --demand-field or --demand-per-km");
        }
        if (demandField != null && demandPerKm != null) {
            throw new CommandLine.ParameterException(commandLine, "give --demand-field or --demand-per-km, not both");
        }
        if (lanesField != null && demandPerKm == null) {
            throw new CommandLine.ParameterException(commandLine, "--lanes-field goes with --demand-per-km");
        }
        if ((capacity != null && !(capacity > 0 && capacity < Double.POSITIVE_INFINITY))
                || (demandPerKm != null && !(demandPerKm >= 0 && demandPerKm < Double.POSITIVE_INFINITY))) {
            throw new CommandLine.ParameterException(commandLine, "--capacity must be above 0 and --demand-per-km 0 or more");
        }
        if (!(serviceSpeed > 0) || !(travelSpeed > 0)) {
            throw new CommandLine.ParameterException(commandLine, "speeds must be above 0 km/h");
        }
        if (!(turnBackMetres >= 0 && turnBackMetres < Double.POSITIVE_INFINITY)) {
            throw new CommandLine.ParameterException(commandLine, "--turn-back-metres must be 0 or more");
        }
        if (restarts != null && restarts < 0) {
            throw new CommandLine.ParameterException(commandLine, "--trip-restarts must be 0 or more");
        }
    }

    /** The fleet and trip limits asked for. */
    FleetRequest request() {
        List<LonLat> reloads = new ArrayList<>(reloadAt);
        if (reloadPoints != null) {
            PlaceLayerReader.points(reloadPoints, "--reload-points").forEach(p -> reloads.add(new LonLat(p[0], p[1])));
        }
        return new FleetRequest(maxKm, maxHours, vehicles, shiftHours, capacity, demandField, demandPerKm, lanesField,
                reloads, serviceSpeed, travelSpeed, restarts, turnBackMetres);
    }

    private static int services(Trip trip) {
        int n = 0;
        for (boolean s : trip.tour().service()) {
            n += s ? 1 : 0;
        }
        return n;
    }

    /**
     * Summary lines and JSON for the fleet; {@code driven} are the trips as driven (reordered for turns), vehicle
     * by vehicle in the fleet's order.
     */
    void report(Fleet fleet, List<Trip> driven, StreetNetwork network, int depot, ObjectNode json, List<String[]> text) {
        ArrayNode list = json.putArray("trips");
        ArrayNode days = json.putArray("vehicles");
        List<String[]> lines = new ArrayList<>();
        int t = 0;
        boolean several = fleet.vehicles().size() > 1;
        for (VehicleDay day : fleet.vehicles()) {
            ObjectNode vehicle = days.addObject();
            vehicle.put("vehicle", day.vehicle());
            vehicle.put("trips", day.trips().size());
            vehicle.put("length_m", scaled(day.length(), 3));
            vehicle.put("hours", scaled(day.hours(), 3));
            vehicle.put("hours_over_shift", scaled(Math.max(0, day.hours() - fleet.shiftHours()), 3));
            if (several) {
                lines.add(new String[] {"  vehicle " + day.vehicle(), String.format(Locale.ROOT,
                        "%d trip(s), %.3f km, %.2f h%s", day.trips().size(), day.length() / 1000, day.hours(),
                        day.hours() > fleet.shiftHours() + 1e-9 ? String.format(Locale.ROOT, " [%.2f h over the shift]",
                                day.hours() - fleet.shiftHours()) : "")});
            }
            for (int i = 0; i < day.trips().size(); i++, t++) {
                Trip trip = driven.get(t);
                double hours = fleet.settings().hours(trip);
                ObjectNode node = list.addObject();
                node.put("trip", t + 1);
                node.put("vehicle", day.vehicle());
                node.put("vehicle_trip", i + 1);
                node.put("length_m", scaled(trip.length(), 3));
                node.put("service_m", scaled(trip.service(), 3));
                node.put("deadhead_share", scaled(trip.deadheadShare(), 6));
                node.put("hours", scaled(hours, 3));
                node.put("over_limit", trip.overLimit());
                if (capacity != null) {
                    node.put("load", scaled(trip.demand(), 3));
                }
                int end = trip.tour().end(network);
                int reload = fleet.settings().reloads().indexOf(end);
                node.put("ends_at", end == depot ? "depot" : reload >= 0 ? "reload " + (reload + 1) : "node " + end);
                lines.add(new String[] {several ? "    trip " + (i + 1) : "  trip " + (t + 1), String.format(Locale.ROOT,
                        "%.3f km, %.2f h, deadhead %.1f %%%s%s%s", trip.length() / 1000, hours, 100 * trip.deadheadShare(),
                        capacity != null ? String.format(Locale.ROOT, ", load %.2f of %.2f", trip.demand(), capacity) : "",
                        end != depot && reload >= 0 ? ", then reloads at reload place " + (reload + 1) : "",
                        trip.overLimit() ? " [over the limit]" : "")});
                if (trip.overLimit() && services(trip) == 1) {
                    lines.add(new String[] {"Warning", (several ? "vehicle " + day.vehicle() + " trip " + (i + 1) : "trip " + (t + 1))
                            + " exceeds the limit because one street alone does"});
                }
            }
        }
        double total = fleet.length();
        text.add(new String[] {"Trips", String.format(Locale.ROOT,
                "%d vehicle(s), %d trip(s) from the depot, %.3f km in all, longest day %.2f h%s (service %.0f km/h, "
                        + "travel %.0f km/h)%s",
                fleet.vehicles().size(), fleet.trips().size(), total / 1000, fleet.longestHours(),
                fleet.shiftHours() < Double.POSITIVE_INFINITY ? String.format(Locale.ROOT, " of a %.2f h shift",
                        fleet.shiftHours()) : "",
                serviceSpeed, travelSpeed,
                fleet.improved() ? "" : "; local improvement skipped: too many streets for the distance table")});
        text.addAll(lines);
        if (several) {
            text.add(new String[] {"Overlap", String.format(Locale.ROOT,
                    "%.1f %% of the service has another vehicle's streets within %.0f m", 100 * fleet.overlapShare(),
                    ServiceOverlap.RADIUS_METRES)});
        }
        if (fleet.hoursOverShift() > 1e-9) {
            long over = fleet.vehicles().stream().filter(v -> v.hours() > fleet.shiftHours() + 1e-9).count();
            text.add(new String[] {"Warning", String.format(Locale.ROOT,
                    "%d vehicle(s) cannot cover the network within a %.2f h shift: %d vehicle(s) over by %.2f h in all "
                            + "(longest day %.2f h); add vehicles or lengthen the shift",
                    fleet.vehicles().size(), fleet.shiftHours(), over, fleet.hoursOverShift(), fleet.longestHours())});
        }
        json.put("trips_limit", maxKm != null ? maxKm + " km" : maxHours != null ? maxHours + " h" : "none");
        json.put("vehicle_count", fleet.vehicles().size());
        if (shiftHours != null) {
            json.put("shift_hours", shiftHours);
        }
        json.put("hours_over_shift", scaled(fleet.hoursOverShift(), 3));
        json.put("overlap_share", scaled(fleet.overlapShare(), 6));
    }

    private static BigDecimal scaled(double value, int places) {
        return BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_EVEN);
    }
}
