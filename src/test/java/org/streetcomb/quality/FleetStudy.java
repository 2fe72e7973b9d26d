package org.streetcomb.quality;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.docs.GeneratedSection;
import org.streetcomb.fleet.Fleet;
import org.streetcomb.fleet.FleetPlanner;
import org.streetcomb.fleet.FleetSettings;
import org.streetcomb.fleet.ServiceOverlap;
import org.streetcomb.fleet.VehicleDay;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.timing.StageClock;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.tour.TurnAwareOrder;
import org.streetcomb.tour.TurnCounts;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripLimit;
import org.streetcomb.trip.TripPlanner;

/**
 * Two vehicles on real towns (OpenStreetMap data in ../shared/realdata, see its SOURCES.md): the previous
 * cut of the one tour into two trips (min-max split of its order, Frederickson, Hecht &amp; Kim 1978) against
 * the fleet's swept areas, each with the turn-aware order the command line applies. Measures the overlap
 * share ({@link ServiceOverlap}) and U-turns outside dead ends per 100 km, counted over each vehicle's
 * trips as driven; the single tour's count is the reference a cut should not exceed. Rewrites its section
 * of docs/quality.md:
 *
 * <pre>
 * mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.quality.FleetStudy -Dexec.classpathScope=test
 * </pre>
 */
public final class FleetStudy {

    static final GeneratedSection SECTION = new GeneratedSection("fleet study", "FleetStudy");

    private FleetStudy() {
    }

    public static void main(String[] args) throws IOException {
        StringBuilder doc = new StringBuilder("### Two vehicles on real towns: areas and U-turns\n\n")
                .append("Produced by `mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.quality.FleetStudy ")
                .append("-Dexec.classpathScope=test` (reads ../shared/realdata). Two vehicles, no trip limit, default ")
                .append("effort, right-hand traffic, each trip in the turn-aware order. *Before*: the one tour cut into two ")
                .append("trips by the min-max split of its order (the previous `--vehicles 2`); *after*: two swept areas ")
                .append("(`--vehicles 2` now). Overlap: share of the service length with the other vehicle's streets ")
                .append("within 200 m. U-turns outside dead ends per 100 km, over each vehicle's trips; the single tour's ")
                .append("figure (turn-aware too) for reference. Seconds: trip planning on the shared 2-core machine, for orientation.\n\n")
                .append("| town | streets | single tour km (U/100 km) | before: km, longest km, overlap, U/100 km, s ")
                .append("| after: km, longest km, overlap, U/100 km, s |\n|---|---|---|---|---|\n");
        List<Object[]> towns = List.of(
                new Object[] {"Aurich (shapefile)", "../shared/realdata/shp-aurich-osm-roads-dhdn-gk2/roads.shp"},
                new Object[] {"Monaco (OSM)", "../shared/realdata/osm-monaco-2021/monaco-latest.osm.pbf"},
                new Object[] {"Vienna (GeoJSON)", "../shared/realdata/geojson-vienna-streets/vienna-streets.geojson"});
        for (Object[] town : towns) {
            doc.append(row((String) town[0], Path.of((String) town[1])));
            System.out.println(doc);
        }
        doc.append('\n');
        SECTION.write(Path.of("docs/quality.md"), doc.toString());
    }

    private static String row(String name, Path layer) {
        Plan plan = Planner.plan(new PlanRequest(layer, null, 0.5, 500, true, ReadOptions.DEFAULTS,
                new ServiceOptions(org.streetcomb.solve.KerbMode.ONE_PASS, null, null, true)), new StageClock(StageClock.SILENT));
        EdgeBearings bearings = EdgeBearings.of(plan.network());
        Tour tour = plan.tours().get(0);
        TurnCounts single = counts(plan, bearings, List.of(List.of(
                TurnAwareOrder.of(plan.network(), bearings, TrafficSide.RIGHT, tour))));
        long start = System.nanoTime();
        TripPlanner.Result cut = new TripPlanner(plan.network(), plan.depot(), new TripPlanner.Settings(
                TripLimit.length(Double.POSITIVE_INFINITY), 2, TripPlanner.AUTO, 1)).plan(tour, null);
        double beforeSeconds = (System.nanoTime() - start) / 1e9;
        List<VehicleDay> before = new ArrayList<>();
        for (int v = 0; v < cut.trips().size(); v++) {
            before.add(new VehicleDay(v + 1, List.of(cut.trips().get(v)), 0));
        }
        start = System.nanoTime();
        Fleet after = new FleetPlanner(plan.network(), plan.depot(), new FleetSettings(2,
                TripLimit.length(Double.POSITIVE_INFINITY), Double.POSITIVE_INFINITY, 10, 30, TripPlanner.AUTO, 1))
                .plan(tour, null);
        double afterSeconds = (System.nanoTime() - start) / 1e9;
        return String.format(Locale.ROOT, "| %s | %d | %.1f (%.1f) | %s, %.0f | %s, %.0f |%n", name,
                plan.network().edgeCount(), tour.length(plan.network()) / 1000,
                single.per100Km(single.uTurnsOutsideDeadEnds()),
                figures(plan, bearings, before), beforeSeconds, figures(plan, bearings, after.vehicles()), afterSeconds);
    }

    private static String figures(Plan plan, EdgeBearings bearings, List<VehicleDay> days) {
        List<List<Tour>> tours = new ArrayList<>();
        double km = 0;
        double longest = 0;
        for (VehicleDay day : days) {
            List<Tour> reordered = new ArrayList<>();
            for (Trip trip : day.trips()) {
                reordered.add(TurnAwareOrder.of(plan.network(), bearings, TrafficSide.RIGHT, trip.tour()));
                km += trip.length() / 1000;
                longest = Math.max(longest, trip.length() / 1000);
            }
            tours.add(reordered);
        }
        TurnCounts counts = counts(plan, bearings, tours);
        return String.format(Locale.ROOT, "%.1f, %.1f, %.1f %%, %.1f", km, longest,
                100 * ServiceOverlap.share(plan.network(), days), counts.per100Km(counts.uTurnsOutsideDeadEnds()));
    }

    /** Turn counts over each vehicle's trips driven one after the other (the joins between trips count too). */
    private static TurnCounts counts(Plan plan, EdgeBearings bearings, List<List<Tour>> vehicles) {
        TurnCounts total = TurnCounts.none();
        for (List<Tour> trips : vehicles) {
            List<Integer> edges = new ArrayList<>();
            List<Boolean> forward = new ArrayList<>();
            for (Tour t : trips) {
                for (int i = 0; i < t.steps(); i++) {
                    edges.add(t.edges()[i]);
                    forward.add(t.forward()[i]);
                }
            }
            int[] e = edges.stream().mapToInt(Integer::intValue).toArray();
            boolean[] f = new boolean[e.length];
            for (int i = 0; i < f.length; i++) {
                f[i] = forward.get(i);
            }
            Tour day = new Tour(trips.isEmpty() ? plan.depot() : trips.get(0).start(), e, f, new boolean[e.length]);
            total = total.plus(TurnCounts.of(plan.network(), bearings, TrafficSide.RIGHT, day));
        }
        return total;
    }
}
