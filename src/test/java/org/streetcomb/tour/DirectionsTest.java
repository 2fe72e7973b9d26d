package org.streetcomb.tour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.streetcomb.FieldFixtures;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.Plan;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

class DirectionsTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    @Test
    void sheetAddsUpToTheTourAndMergesRunsOnOneStreet() {
        Plan plan = FieldFixtures.demoTown();
        Tour tour = plan.tours().get(0);
        List<Direction> sheet = Directions.of(plan.network(), EdgeBearings.of(plan.network()), TrafficSide.RIGHT, tour);
        assertEquals(tour.length(plan.network()), sheet.get(sheet.size() - 1).cumulative(), 1e-3);
        assertEquals(tour.steps(), sheet.stream().mapToInt(Direction::steps).sum());
        assertTrue(sheet.size() < tour.steps(), "runs on one street are merged");
        for (int i = 1; i < sheet.size() - 1; i++) {
            Direction before = sheet.get(i - 1);
            Direction line = sheet.get(i);
            boolean mergeable = !line.street().isEmpty() && line.street().equals(before.street())
                    && line.service() == before.service() && line.turn().kind() != TurnKind.U_TURN;
            assertFalse(mergeable, "line " + line.number() + " should have been merged into the one before");
        }
        assertTrue(sheet.get(0).instruction().startsWith("Start on "));
        assertEquals("Arrive back at the start", sheet.get(sheet.size() - 1).instruction());
    }

    /**
     * A street running north meeting one running east: driving north then east is a right turn of 90
     * degrees, north then west a left turn, and which of them crosses oncoming traffic depends on the
     * side traffic keeps to (geometry of the compass; the rule of the road is common practice).
     */
    @Test
    void rightAngleTurnsAreClassifiedBySideAndTraffic() {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                road("1", "North Road", 0, -0.001, 0, 0),
                road("2", "East Road", 0, 0, 0.001, 0),
                road("3", "West Road", 0, 0, -0.001, 0)));
        EdgeBearings bearings = EdgeBearings.of(network);
        int north = edgeNamed(network, "North Road");
        int east = edgeNamed(network, "East Road");
        int west = edgeNamed(network, "West Road");
        boolean northForward = network.lat(network.to(north)) > network.lat(network.from(north));
        boolean eastForward = network.lon(network.to(east)) > network.lon(network.from(east));
        boolean westForward = network.lon(network.to(west)) < network.lon(network.from(west));
        Turn right = Turn.between(bearings, TrafficSide.RIGHT, north, northForward, east, eastForward);
        Turn left = Turn.between(bearings, TrafficSide.RIGHT, north, northForward, west, westForward);
        assertEquals(90, right.angle(), 0.5);
        assertEquals(-90, left.angle(), 0.5);
        assertEquals(TurnKind.TURN, right.kind());
        assertFalse(right.crossing());
        assertTrue(left.crossing());
        assertTrue(Turn.between(bearings, TrafficSide.LEFT, north, northForward, east, eastForward).crossing());
        Turn back = Turn.between(bearings, TrafficSide.RIGHT, east, eastForward, east, !eastForward);
        assertEquals(TurnKind.U_TURN, back.kind());
        Turn straight = Turn.between(bearings, TrafficSide.RIGHT, west, !westForward, east, eastForward);
        assertEquals(TurnKind.CONTINUE, straight.kind());
        assertEquals(0, straight.angle(), 0.5);
    }

    /**
     * Monaco (OpenStreetMap, fixtures/benchmarks/mixed-osm, NOTICE) has many unnamed ways: slip roads, pieces of
     * dual carriageways, roundabouts. Each is told by its OSM class (https://wiki.openstreetmap.org/wiki/Key:highway,
     * Tag:junction=roundabout) and a named street nearby, and a line never spans two unnamed ways, except the
     * pieces of one roundabout.
     */
    @Test
    void unnamedWaysAreToldByClassAndNeverMerged() throws Exception {
        Plan plan = org.streetcomb.plan.Planner.plan(new org.streetcomb.plan.PlanRequest(
                java.nio.file.Path.of("fixtures/benchmarks/mixed-osm/monaco.osm.pbf"), null, 0.5, 500, true,
                org.streetcomb.read.ReadOptions.DEFAULTS, new org.streetcomb.plan.ServiceOptions(
                        org.streetcomb.solve.KerbMode.ONE_PASS, null, null, true)),
                org.streetcomb.check.RepairOptions.NONE, new org.streetcomb.timing.StageClock(
                        org.streetcomb.timing.StageClock.SILENT));
        StreetNetwork network = plan.network();
        Tour tour = plan.tours().get(0);
        List<Direction> sheet = Directions.of(network, EdgeBearings.of(network), TrafficSide.RIGHT, tour);
        int unnamed = 0;
        int tied = 0;
        for (Direction line : sheet.subList(0, sheet.size() - 1)) {
            RoadFeature first = network.feature(tour.edges()[line.firstStep()]);
            assertEquals(first.id(), line.feature());
            if (!first.name().isEmpty()) {
                assertEquals(first.name(), line.street());
                continue;
            }
            unnamed++;
            boolean roundabout = "roundabout".equals(first.properties().get("junction"));
            String kind = roundabout ? "unnamed roundabout" : "unnamed " + first.properties().get("highway").replace('_', ' ');
            assertTrue(line.street().startsWith(kind), line.street() + " for " + first.properties());
            assertTrue(line.instruction().contains("the " + line.street()), line.instruction());
            tied += line.street().contains(" towards ") || line.street().contains(" from ") ? 1 : 0;
            for (int k = line.firstStep(); k < line.firstStep() + line.steps(); k++) {
                RoadFeature step = network.feature(tour.edges()[k]);
                assertTrue(step.id().equals(first.id()) || roundabout && "roundabout".equals(step.properties().get("junction")),
                        "line " + line.number() + " spans " + first.id() + " and " + step.id());
            }
        }
        assertTrue(unnamed > 50, "Monaco has unnamed ways on the tour: " + unnamed);
        assertTrue(tied > unnamed / 2, "most are tied to a named street nearby: " + tied + " of " + unnamed);
    }

    private static RoadFeature road(String id, String name, double lon1, double lat1, double lon2, double lat2) {
        return new RoadFeature(id, name, GEOMETRY.createLineString(new Coordinate[] {
            new Coordinate(lon1, lat1), new Coordinate(lon2, lat2)}), Travel.BOTH, true, Map.of());
    }

    private static int edgeNamed(StreetNetwork network, String name) {
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.feature(e).name().equals(name)) {
                return e;
            }
        }
        throw new AssertionError(name);
    }
}
