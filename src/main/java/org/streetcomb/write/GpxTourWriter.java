package org.streetcomb.write;

import io.jenetics.jpx.GPX;
import io.jenetics.jpx.Route;
import io.jenetics.jpx.Track;
import io.jenetics.jpx.TrackSegment;
import io.jenetics.jpx.WayPoint;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.SafeText;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Direction;
import org.streetcomb.tour.Tour;

/**
 * Writes tours as GPX 1.1 (the open TopoGrafix schema) with the jpx library: a waypoint at the depot and
 * one where each tour starts servicing (unless that is the depot), one track per tour (split into numbered parts that overlap by one
 * point when a tour has more points than a unit holds), and optionally one route per tour with a point
 * at each turn of its direction sheet, split the same way. Names and descriptions carry the safety
 * caution. Coordinates have at most 7 decimals (about 1 cm); no timestamps, so the output is
 * reproducible.
 */
public final class GpxTourWriter {

    private static final String CREATOR = "streetcomb";
    private final GpxLimits limits;

    public GpxTourWriter(GpxLimits limits) {
        this.limits = limits;
    }

    /** What was written, for the summary and the tests. */
    public record Written(int tracks, int trackPoints, int routes, int routePoints, int waypoints) {
    }

    /**
     * @param tours      the tours in order
     * @param directions each tour's direction sheet (used for the routes)
     * @param label      what a tour is called in names ("Tour" or "Trip")
     */
    public Written write(Path target, StreetNetwork network, int depot, List<Tour> tours,
                         List<List<Direction>> directions, String label) {
        GPX.Builder gpx = GPX.builder().creator(CREATOR)
                .metadata(m -> m.name(SafeText.xml(label + "s from " + target.getFileName())).desc(FieldCaution.TEXT));
        int waypoints = 1;
        gpx.addWayPoint(WayPoint.builder().name("Depot").desc("Depot. " + FieldCaution.TEXT)
                .build(network.lat(depot), longitude(network.lon(depot))));
        for (int t = 0; t < tours.size(); t++) {
            Direction first = firstService(directions.get(t));
            if (first != null && first.node() != depot) {
                String name = label + " " + (t + 1) + " start";
                gpx.addWayPoint(WayPoint.builder().name(name)
                        .desc(name + ": service begins on " + streetName(first) + ". " + FieldCaution.TEXT)
                        .build(network.lat(first.node()), longitude(network.lon(first.node()))));
                waypoints++;
            }
        }
        int routes = 0;
        int routePoints = 0;
        if (limits.routes()) {
            for (int t = 0; t < tours.size(); t++) {
                List<Direction> lines = directions.get(t);
                int parts = parts(lines.size(), limits.maxRoutePoints());
                for (int p = 0; p < parts; p++) {
                    int from = p * (limits.maxRoutePoints() - 1);
                    int to = Math.min(lines.size(), from + limits.maxRoutePoints());
                    Route.Builder route = Route.builder().name(partName(label, t, p, parts)).number(routes + 1)
                            .desc(description(network, tours.get(t), label, t));
                    for (Direction d : lines.subList(from, to)) {
                        route.addPoint(WayPoint.builder().name(String.format(Locale.ROOT, "%03d", d.number()))
                                .desc(SafeText.xml(d.instruction())).build(network.lat(d.node()), longitude(network.lon(d.node()))));
                    }
                    gpx.addRoute(route.build());
                    routePoints += to - from;
                    routes++;
                }
            }
        }
        int tracks = 0;
        int trackPoints = 0;
        for (int t = 0; t < tours.size(); t++) {
            TourPoints points = TourPoints.of(network, tours.get(t), limits.simplifyMetres());
            int parts = parts(points.size(), limits.maxTrackPoints());
            for (int p = 0; p < parts; p++) {
                int from = p * (limits.maxTrackPoints() - 1);
                int to = Math.min(points.size(), from + limits.maxTrackPoints());
                TrackSegment.Builder segment = TrackSegment.builder();
                for (int i = from; i < to; i++) {
                    segment.addPoint(WayPoint.of(points.lat()[i], longitude(points.lon()[i])));
                }
                gpx.addTrack(Track.builder().name(partName(label, t, p, parts)).number(tracks + 1)
                        .desc(description(network, tours.get(t), label, t)).addSegment(segment.build()).build());
                trackPoints += to - from;
                tracks++;
            }
        }
        GPX document = gpx.build();
        AtomicFile.write(target, out -> GPX.Writer.of(GPX.Writer.Indent.NULL, 7).write(document, out));
        return new Written(tracks, trackPoints, routes, routePoints, waypoints);
    }

    /** Parts needed for {@code points} when each holds at most {@code max} and consecutive parts share a point. */
    static int parts(int points, int max) {
        return points <= max ? 1 : (points - 2) / (max - 1) + 1;
    }

    private static String partName(String label, int tour, int part, int parts) {
        String name = label + " " + (tour + 1);
        return parts == 1 ? name : name + " part " + (part + 1) + " of " + parts;
    }

    private static String description(StreetNetwork network, Tour tour, String label, int t) {
        double length = tour.length(network);
        double deadhead = tour.deadhead(network);
        return String.format(Locale.ROOT, "%s %d: %.2f km, of which %.2f km deadhead. %s", label, t + 1,
                length / 1000, deadhead / 1000, FieldCaution.TEXT);
    }

    private static Direction firstService(List<Direction> lines) {
        return lines.stream().filter(Direction::service).findFirst().orElse(null);
    }

    private static String streetName(Direction d) {
        return d.street().isEmpty() ? "an unnamed street" : SafeText.xml(d.street());
    }

    /** GPX longitudes lie in [-180, 180): the antimeridian is written as -180. */
    private static double longitude(double lon) {
        return lon >= 180 ? lon - 360 : lon;
    }
}
