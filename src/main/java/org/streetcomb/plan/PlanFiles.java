package org.streetcomb.plan;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.streetcomb.fleet.VehicleDay;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Direction;
import org.streetcomb.tour.Directions;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.write.DirectionSheetWriter;
import org.streetcomb.write.GpxTourWriter;
import org.streetcomb.write.KmlTourWriter;
import org.streetcomb.write.SheetHeading;
import org.streetcomb.write.TourGeoJsonWriter;

/**
 * Writes a plan's files for the field: the tours as GeoJSON, GPX, KML and direction sheets, one GPX and one
 * sheet per vehicle when a fleet of several vehicles was planned. The command line and the districts batch
 * both write through here.
 */
public final class PlanFiles {

    /** One GPX file written and what it holds. */
    public record GpxFile(Path file, GpxTourWriter.Written counts) {
    }

    /** One direction sheet written and its number of lines. */
    public record SheetFile(Path file, int lines) {
    }

    /** What was written. */
    public record Written(List<GpxFile> gpx, Path kml, List<SheetFile> sheets) {
    }

    private PlanFiles() {
    }

    public static Written write(Plan plan, FieldFiles files, StageClock clock) {
        return write(plan, files, clock, "write");
    }

    /** As {@link #write(Plan, FieldFiles, StageClock)}, timing the tours' GeoJSON under the stage {@code toursStage}. */
    public static Written write(Plan plan, FieldFiles files, StageClock clock, String toursStage) {
        List<Tour> tours = plan.tours();
        if (files.tours() != null) {
            clock.run(toursStage, () -> new TourGeoJsonWriter(files.steps()).write(files.tours(), plan.network(), tours,
                    files.recordScope() ? ScopeRecord.MEMBER : null, files.recordScope() ? ScopeRecord.of(plan) : null));
        }
        EdgeBearings bearings = EdgeBearings.of(plan.network());
        List<List<Direction>> sheets = new ArrayList<>();
        for (Tour tour : tours) {
            sheets.add(Directions.of(plan.network(), bearings, side(plan), tour));
        }
        String label = plan.hasTrips() ? "Trip" : "Tour";
        List<int[]> groups = groups(plan);
        List<GpxFile> gpx = new ArrayList<>();
        if (files.gpx() != null) {
            for (int[] range : groups) {
                Path file = fileOf(files.gpx(), range);
                GpxTourWriter.Written written = clock.time("gpx", () -> new GpxTourWriter(files.gpxLimits())
                        .write(file, plan.network(), plan.depot(), tours.subList(range[0], range[1]),
                                sheets.subList(range[0], range[1]), label));
                gpx.add(new GpxFile(file, written));
            }
        }
        if (files.kml() != null) {
            clock.run("kml", () -> new KmlTourWriter(files.gpxLimits().simplifyMetres())
                    .write(files.kml(), plan.network(), plan.depot(), tours, label));
        }
        List<SheetFile> written = new ArrayList<>();
        if (files.directions() != null) {
            for (int[] range : groups) {
                Path file = fileOf(files.directions(), range);
                List<List<Direction>> mine = sheets.subList(range[0], range[1]);
                // the streets left out go on every sheet: each crew should know they are not forgotten
                SheetHeading heading = heading(plan, files, range[2], label);
                clock.run("directions", () -> DirectionSheetWriter.write(file, mine, heading, leftOut(plan)));
                written.add(new SheetFile(file, mine.stream().mapToInt(List::size).sum()));
            }
        }
        return new Written(List.copyOf(gpx), files.kml(), List.copyOf(written));
    }

    private static SheetHeading heading(Plan plan, FieldFiles files, int vehicle, String label) {
        Arrangement arrangement = plan.request().arrangement();
        return new SheetHeading(plan.request().input().getFileName().toString(), plan.network().lat(plan.depot()),
                plan.network().lon(plan.depot()), files.planned(), vehicle, label, arrangement.serviceKmh(),
                arrangement.travelKmh());
    }

    private static TrafficSide side(Plan plan) {
        return plan.arranged() == null ? Arrangement.DEFAULT.side() : plan.arranged().side();
    }

    /**
     * The tours written to one file each: every vehicle's trips when a fleet of several vehicles was planned,
     * else all tours together; as {from, to, vehicle} with index ranges into the tours, vehicles without trips
     * left out.
     */
    private static List<int[]> groups(Plan plan) {
        List<int[]> groups = new ArrayList<>();
        if (!plan.hasTrips() || plan.arranged().fleet().vehicles().size() == 1) {
            groups.add(new int[] {0, plan.tours().size(), 0});
            return groups;
        }
        int from = 0;
        int vehicle = 0;
        for (VehicleDay day : plan.arranged().fleet().vehicles()) {
            vehicle++;
            if (!day.trips().isEmpty()) {
                groups.add(new int[] {from, from + day.trips().size(), vehicle});
            }
            from += day.trips().size();
        }
        return groups;
    }

    /** The file for one group: the file asked for, or one per vehicle when there are several vehicles. */
    private static Path fileOf(Path asked, int[] group) {
        return group[2] == 0 ? asked : perVehicle(asked, group[2]);
    }

    /** The streets one-way streets cut off, by feature id, in the order of their first edge. */
    static List<DirectionSheetWriter.LeftOut> leftOut(Plan plan) {
        java.util.Map<String, double[]> metres = new java.util.LinkedHashMap<>();
        java.util.Map<String, String> names = new java.util.HashMap<>();
        for (int e : plan.leftOut()) {
            org.streetcomb.read.RoadFeature f = plan.network().feature(e);
            metres.computeIfAbsent(f.id(), id -> new double[1])[0] += plan.network().length(e);
            names.putIfAbsent(f.id(), f.name() == null || f.name().isBlank() ? "(unnamed)" : f.name());
        }
        List<DirectionSheetWriter.LeftOut> list = new ArrayList<>();
        metres.forEach((id, m) -> list.add(new DirectionSheetWriter.LeftOut(names.get(id), id, m[0],
                "cut off by one-way streets")));
        return list;
    }

    /** {@code name.ext} becomes {@code name-vehicle-N.ext}: one file per vehicle. */
    public static Path perVehicle(Path file, int vehicle) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String renamed = dot > 0 ? name.substring(0, dot) + "-vehicle-" + vehicle + name.substring(dot)
                : name + "-vehicle-" + vehicle;
        return file.resolveSibling(renamed);
    }
}
