package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.LonLat;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.timing.StageClock;
import org.streetcomb.trip.Trip;
import org.streetcomb.trip.TripLimit;
import org.streetcomb.trip.TripPlanner;

/** The layers drawn for the demo plan carry every step once, and the lines drawn are as long as the plan says. */
class PlanLayersTest {

    private static final Plan PLAN = Planner.plan(new PlanRequest(Path.of("fixtures/demo/brackenford.geojson"),
            new LonLat(-31.2, 44.6), 0.5, 500, false), new StageClock(StageClock.SILENT));

    @Test
    void serviceAndDeadheadRunsCoverEveryStepOnceInOrder() {
        List<MapLayer> layers = PlanLayers.of(PLAN);
        int steps = PLAN.tours().get(0).steps();
        boolean[] seen = new boolean[steps + 1];
        for (MapLayer layer : layers) {
            if (layer.id().equals("service") || layer.id().equals("deadhead")) {
                for (MapFeature run : layer.features()) {
                    String range = run.details().getOrDefault("Steps", run.details().get("Step"));
                    String[] ends = range.split("\u2013");
                    int first = Integer.parseInt(ends[0]);
                    int last = Integer.parseInt(ends[ends.length - 1]);
                    for (int s = first; s <= last; s++) {
                        assertTrue(!seen[s], "step " + s + " drawn twice");
                        seen[s] = true;
                    }
                    assertEquals(layer.id(), run.details().get("Pass"));
                }
            }
        }
        for (int s = 1; s <= steps; s++) {
            assertTrue(seen[s], "step " + s + " not drawn");
        }
    }

    @Test
    void drawnLinesMeasureTheServiceAndDeadheadLengths() {
        // reference: geodesic lengths on WGS84 from GeographicLib (Karney 2013), summed over the drawn vertices
        double service = 0;
        double deadhead = 0;
        for (MapLayer layer : PlanLayers.of(PLAN)) {
            for (MapFeature feature : layer.features()) {
                if (layer.id().equals("service")) {
                    service += geodesicLength(feature);
                } else if (layer.id().equals("deadhead")) {
                    deadhead += geodesicLength(feature);
                }
            }
        }
        assertEquals(PLAN.serviceLength(), service, 1e-6 * PLAN.serviceLength());
        assertEquals(PLAN.deadheadLength(), deadhead, 1e-6 * PLAN.serviceLength());
    }

    @Test
    void tripsCutFromTheTourEachGetTheirOwnGroupAndColour() {
        List<Trip> trips = new TripPlanner(PLAN.network(), PLAN.depot(),
                new TripPlanner.Settings(TripLimit.length(12_000), 0, 0, 1)).plan(PLAN.tours().get(0), null).trips();
        Plan cut = PLAN.withTours(trips.stream().map(Trip::tour).toList());
        assertTrue(trips.size() > 1, "the demo tour is longer than one 12 km trip");
        List<MapGroup> groups = PlanLayers.groups(cut);
        assertEquals(trips.size(), groups.size());
        assertEquals(groups.size(), groups.stream().map(MapGroup::colour).distinct().count(), "one colour per trip");
        assertTrue(groups.get(0).title().startsWith("Trip 1 "), groups.get(0).title());
        for (MapLayer layer : PlanLayers.of(cut)) {
            if (layer.id().equals("service")) {
                for (MapFeature run : layer.features()) {
                    MapGroup group = groups.get(Integer.parseInt(run.details().get("Trip")) - 1);
                    assertEquals(group.id(), run.group());
                    assertEquals(group.colour(), run.colour());
                }
            }
        }
    }

    /** Demo data (the invented town): two vehicles, trips of at most 8 km. */
    @Test
    void aFleetsTripsAreTitledByVehicleAndColouredByIt() {
        org.streetcomb.plan.FleetRequest two = new org.streetcomb.plan.FleetRequest(8.0, null, 2, null, null, null,
                null, null, List.of(), 10, 30, null);
        Plan fleet = Planner.plan(new PlanRequest(Path.of("fixtures/demo/brackenford.geojson"), new LonLat(-31.2, 44.6),
                0.5, 500, false, org.streetcomb.read.ReadOptions.DEFAULTS, org.streetcomb.plan.ServiceOptions.DEFAULTS,
                new org.streetcomb.plan.Arrangement(org.streetcomb.tour.TrafficSide.RIGHT, true, two)),
                new StageClock(StageClock.SILENT));
        List<org.streetcomb.report.MapGroup> groups = PlanLayers.groups(fleet);
        assertEquals(fleet.tours().size(), groups.size());
        assertTrue(groups.get(0).title().startsWith("Vehicle 1, trip 1 ("), groups.get(0).title());
        java.util.Map<Integer, String> colours = new java.util.HashMap<>();
        for (int t = 0; t < groups.size(); t++) {
            int vehicle = fleet.vehicleOf(t);
            assertTrue(vehicle == 1 || vehicle == 2, "trip " + t);
            String before = colours.putIfAbsent(vehicle, groups.get(t).colour());
            assertTrue(before == null || before.equals(groups.get(t).colour()), "one colour per vehicle");
        }
        assertEquals(2, colours.size());
        assertTrue(!colours.get(1).equals(colours.get(2)), "the vehicles differ in colour");
    }

    @Test
    void arrowheadPointsTheWayTheLineRunsOnTheRightOfTravel() {
        // a line due east: the tip is east of the base, both lie south of the line (on the right of travel), and
        // the base's corners lie either side of the tip's parallel
        double[] head = PlanLayers.arrowhead(new double[] {0.0, 0.0, 0.001, 0.0}, 10);
        assertEquals(8, head.length, "a closed triangle");
        assertEquals(head[0], head[6]);
        assertTrue(head[0] < head[2] && head[4] < head[2], "the tip points east");
        assertTrue(head[3] < 0, "beside the line on the right of eastward travel");
        assertTrue((head[1] - head[3]) * (head[5] - head[3]) < 0, "the base spans the tip's parallel");
        double baseX = (head[0] + head[4]) / 2;
        double baseY = (head[1] + head[5]) / 2;
        double length = Geodesic.WGS84.Inverse(baseY, baseX, head[3], head[2]).s12;
        assertEquals(10, length, 0.05, "length in metres (spherical frame against the ellipsoid)");
        double[] back = PlanLayers.arrowhead(new double[] {0.001, 0.0, 0.0, 0.0}, 10);
        assertTrue(back[3] > 0, "driven the other way, the head sits on the other side: the two never cross");
    }

    private static double geodesicLength(MapFeature feature) {
        double sum = 0;
        for (double[] part : feature.parts()) {
            for (int i = 2; i < part.length; i += 2) {
                sum += Geodesic.WGS84.Inverse(part[i - 1], part[i - 2], part[i + 1], part[i]).s12;
            }
        }
        return sum;
    }
}
