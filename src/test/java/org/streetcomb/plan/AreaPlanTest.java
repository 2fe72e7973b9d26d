package org.streetcomb.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.streetcomb.InputError;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.PlaceLayerReader;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.scope.AreaChoice;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.timing.StageClock;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourValidator;

/**
 * Planning an area (an invented ward drawn over the Baltimore OpenStreetMap extract in fixtures/osm, ODbL):
 * the whole extract is refused for one-way streets cut at its edge, the ward well inside it is not; the
 * service equals the length of the streets inside the ward as JTS's overlay clip (an outside reference,
 * measured on the ellipsoid by GeographicLib) gives it; no street outside is serviced.
 */
class AreaPlanTest {

    private static final Path ROADS = Path.of("fixtures/osm/baltimore.osm.pbf");
    private static final Path WARDS = Path.of("fixtures/areas/baltimore-ward.geojson");

    private static Plan plan(ServiceArea area) {
        PlanRequest request = new PlanRequest(ROADS, null, 0.5, 500, false, org.streetcomb.read.ReadOptions.DEFAULTS,
                ServiceOptions.DEFAULTS.withArea(area));
        return Planner.plan(request, new StageClock(StageClock.SILENT));
    }

    @Test
    void aWardWellInsideIsPlannedWithEveryStreetInsideItServicedAndNoneOutside() {
        ServiceArea ward = AreaChoice.pick(PlaceLayerReader.read(WARDS, null, null), WARDS, "ward", "N", 1000);
        Plan plan = plan(ward);
        assertEquals(0, plan.leftOut().length, "nothing cut off well inside the extract");

        ServiceDemand demand = ServiceDemand.of(plan.network(), servicedEdges(plan), org.streetcomb.solve.KerbMode.ONE_PASS);
        for (Tour tour : plan.tours()) {
            assertEquals(List.of(), TourValidator.problems(plan.network(), tour, demand,
                    java.util.stream.IntStream.range(0, plan.network().edgeCount())
                            .filter(e -> plan.network().from(e) >= 0 && inTour(tour, e)).toArray(), tour.start()));
        }
        // no service outside: the middle of every serviced edge lies in the ward (1 m of slack for the cut points)
        PreparedGeometry slack = PreparedGeometryFactory.prepare(ward.polygon().buffer(1e-5));
        GeometryFactory gf = new GeometryFactory();
        for (Tour tour : plan.tours()) {
            for (int i = 0; i < tour.steps(); i++) {
                if (tour.service()[i]) {
                    int e = tour.edges()[i];
                    int mid = plan.network().pointCount(e) / 2;
                    double lon = (plan.network().pointLon(e, mid) + plan.network().pointLon(e, Math.max(0, mid - 1))) / 2;
                    double lat = (plan.network().pointLat(e, mid) + plan.network().pointLat(e, Math.max(0, mid - 1))) / 2;
                    assertTrue(slack.covers(gf.createPoint(new Coordinate(lon, lat))), "edge " + e + " serviced outside");
                }
            }
        }
        // reference: JTS clip of the read road lines by the ward, lengths on the WGS84 ellipsoid (GeographicLib)
        double clipped = 0;
        for (RoadFeature f : LayerReaders.read(ROADS).features()) {
            Geometry inside = f.line().intersection(ward.polygon());
            for (int g = 0; g < inside.getNumGeometries(); g++) {
                Coordinate[] c = inside.getGeometryN(g).getCoordinates();
                for (int k = 0; k + 1 < c.length; k++) {
                    clipped += Geodesic.WGS84.Inverse(c[k].y, c[k].x, c[k + 1].y, c[k + 1].x).s12;
                }
            }
        }
        assertEquals(clipped, plan.serviceLength(), clipped * 1e-4, "service = clipped street length");
    }

    @Test
    void aFeatureThatIsNotAPolygonIsRefusedByName() {
        InputError error = assertThrows(InputError.class,
                () -> AreaChoice.pick(PlaceLayerReader.read(WARDS, null, null), WARDS, "ward", "L", 1000));
        assertTrue(error.getMessage().contains("feature line") && error.getMessage().contains("not a polygon"),
                error.getMessage());
    }

    private static boolean inTour(Tour tour, int e) {
        for (int i = 0; i < tour.steps(); i++) {
            if (tour.service()[i] && tour.edges()[i] == e) {
                return true;
            }
        }
        return false;
    }

    private static boolean[] servicedEdges(Plan plan) {
        boolean[] s = new boolean[plan.network().edgeCount()];
        for (Tour tour : plan.tours()) {
            for (int i = 0; i < tour.steps(); i++) {
                s[tour.edges()[i]] |= tour.service()[i];
            }
        }
        return s;
    }
}
