package org.streetcomb.mopup;

import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.StreetCoverageAccounting;
import org.streetcomb.match.DrivenIntervals;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.PolylineGeodesics;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.ServiceDemand;

/**
 * The mop-up network: only the missed stretches need service, in the way they were missed. Lengths are
 * checked with GeographicLib's geodesic inverse (Karney 2013) on the pieces' polylines, computed here
 * independently of the classes under test. Invented streets near the demo town.
 */
class MissedStretchNetworkTest {

    /** Long Street runs about 400 m east from the corner; two streets close the triangle. */
    private static StreetNetwork triangle(Travel longStreet) {
        double east = StreetGrid.LON0 + 0.00505;
        return new NetworkBuilder(0.5).build(List.of(
                StreetGrid.line("long", "Long Street", longStreet, StreetGrid.LON0, StreetGrid.LAT0, east, StreetGrid.LAT0),
                StreetGrid.line("back", "Back Lane", Travel.BOTH, east, StreetGrid.LAT0, east, StreetGrid.LAT0 + 0.002),
                StreetGrid.line("cut", "Cut Way", Travel.BOTH, east, StreetGrid.LAT0 + 0.002, StreetGrid.LON0, StreetGrid.LAT0)));
    }

    private static int edgeOf(StreetNetwork network, String id) {
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.feature(e).id().equals(id)) {
                return e;
            }
        }
        throw new AssertionError(id);
    }

    /** The coverage when every other street was driven whole and Long Street as {@code drive} records. */
    private static CoverageReport audit(StreetNetwork network, boolean bothKerbs, Consumer<DrivenIntervals> drive) {
        DrivenIntervals driven = new DrivenIntervals(network);
        for (int e = 0; e < network.edgeCount(); e++) {
            if (!network.feature(e).id().equals("long")) {
                driven.addWhole(e, true);
                driven.addWhole(e, false);
            }
        }
        drive.accept(driven);
        driven.merge();
        return StreetCoverageAccounting.account(network, driven, 0.9, bothKerbs);
    }


    /** Pieces with a service demand. */
    private static List<Integer> serviced(MissedStretchNetwork stretches) {
        List<Integer> out = new ArrayList<>();
        for (int p = 0; p < stretches.network().edgeCount(); p++) {
            if (stretches.demand().needs(p)) {
                out.add(p);
            }
        }
        return out;
    }

    @Test
    void theLastSixtyMetresOfALongStreetAreTheOnlyService() {
        StreetNetwork network = triangle(Travel.BOTH);
        int e = edgeOf(network, "long");
        double length = network.length(e);
        assertEquals(400, length, 5);
        CoverageReport report = audit(network, false, d -> d.add(e, true, 0, length - 60));
        assertTrue(report.mopUp()[e], "85 % driven is below the 90 % threshold");
        MissedStretchNetwork stretches = MissedStretchNetwork.of(report);
        List<Integer> serviced = serviced(stretches);
        assertEquals(1, serviced.size());
        int p = serviced.get(0);
        assertEquals(60, PolylineGeodesics.length(stretches.network(), p), 1e-6);
        assertEquals(length - 60, stretches.split().start()[p], 1e-9);
        assertEquals(1, stretches.demand().either()[p], "a two-way street passed once: either way");
        assertEquals(network.edgeCount() + 1, stretches.network().edgeCount(), "the driven 340 m are one piece to travel on");
        assertEquals(60, stretches.demand().length(stretches.network()), 1e-6);
    }

    @Test
    void aOneWayStreetNeedsItsPermittedDirection() {
        for (Travel travel : new Travel[] {Travel.FORWARD, Travel.BACKWARD}) {
            StreetNetwork network = triangle(travel);
            int e = edgeOf(network, "long");
            double length = network.length(e);
            boolean along = travel == Travel.FORWARD;
            // driven the wrong way over its whole length, and the right way over its first (in travel order) 200 m
            CoverageReport report = audit(network, false, d -> {
                d.addWhole(e, !along);
                d.add(e, along, along ? 0 : length - 200, along ? 200 : length);
            });
            MissedStretchNetwork stretches = MissedStretchNetwork.of(report);
            ServiceDemand demand = stretches.demand();
            int p = serviced(stretches).get(0);
            assertEquals(1, serviced(stretches).size());
            assertEquals(along ? 1 : 0, demand.along()[p], travel.name());
            assertEquals(along ? 0 : 1, demand.against()[p], travel.name());
            assertEquals(length - 200, PolylineGeodesics.length(stretches.network(), p), 1e-6);
            assertEquals(along ? 200 : 0, stretches.split().start()[p], 1e-9, "the missed end is the far end in travel order");
        }
    }

    @Test
    void bothKerbsNeedOnlyTheMissedSide() {
        StreetNetwork network = triangle(Travel.BOTH);
        int e = edgeOf(network, "long");
        double length = network.length(e);
        // the along side driven whole, the against side only over its last 150 m (offsets 0..150)
        CoverageReport report = audit(network, true, d -> {
            d.addWhole(e, true);
            d.add(e, false, 0, 150);
        });
        MissedStretchNetwork stretches = MissedStretchNetwork.of(report);
        List<Integer> serviced = serviced(stretches);
        assertEquals(1, serviced.size());
        int p = serviced.get(0);
        assertEquals(1, stretches.demand().against()[p]);
        assertEquals(0, stretches.demand().along()[p] + stretches.demand().either()[p]);
        assertEquals(length - 150, PolylineGeodesics.length(stretches.network(), p), 1e-6);
    }

    @Test
    void drivenSliversShorterThanTheMergeGapAreServicedWithTheirNeighbours() {
        StreetNetwork network = triangle(Travel.BOTH);
        int e = edgeOf(network, "long");
        double length = network.length(e);
        double sliver = MissedStretchNetwork.MERGE_GAP / 2;
        // a short driven sliver in the middle and another at the start: one stretch, the whole street
        MissedStretchNetwork merged = MissedStretchNetwork.of(audit(network, false, d -> {
            d.add(e, true, 0, sliver);
            d.add(e, true, 200, 200 + sliver);
        }));
        assertEquals(network.edgeCount(), merged.network().edgeCount(), "nothing to cut");
        assertEquals(length, merged.demand().length(merged.network()), 1e-6);
        // a driven stretch longer than the gap stays a stretch to travel on, between two to service
        double kept = 2 * MissedStretchNetwork.MERGE_GAP;
        MissedStretchNetwork apart = MissedStretchNetwork.of(audit(network, false, d -> d.add(e, true, 200, 200 + kept)));
        assertEquals(2, serviced(apart).size());
        assertEquals(length - kept, apart.demand().length(apart.network()), 1e-6);
    }

    @Test
    void streetsCoveredAboveTheThresholdAreNotMoppedUp() {
        StreetNetwork network = triangle(Travel.BOTH);
        int e = edgeOf(network, "long");
        double length = network.length(e);
        MissedStretchNetwork stretches = MissedStretchNetwork.of(audit(network, false, d -> d.add(e, true, 0, length - 30)));
        assertEquals(0, serviced(stretches).size(), "93 % driven is above the 90 % threshold: covered");
    }

    @Test
    void aShortDrivenBlockBetweenMissedStretchesOfTheSameStreetIsServicedWithThem() {
        for (double apart : new double[] {15, 30}) {
            // Long Street crossed by two roads `apart` metres from each other (a staggered crossroads)
            double east = StreetGrid.LON0 + 0.00505;
            double x1 = StreetGrid.LON0 + 0.0025;
            double x2 = x1 + apart / (Math.PI / 180 * 6_378_137 * Math.cos(Math.toRadians(StreetGrid.LAT0)));
            StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                    StreetGrid.line("long", "Long Street", Travel.BOTH, StreetGrid.LON0, StreetGrid.LAT0, east, StreetGrid.LAT0),
                    StreetGrid.line("x1", "First Cross", Travel.BOTH, x1, StreetGrid.LAT0 - 0.001, x1, StreetGrid.LAT0 + 0.001),
                    StreetGrid.line("x2", "Second Cross", Travel.BOTH, x2, StreetGrid.LAT0 - 0.001, x2, StreetGrid.LAT0 + 0.001)));
            DrivenIntervals driven = new DrivenIntervals(network);
            double longLength = 0;
            for (int e = 0; e < network.edgeCount(); e++) {
                boolean isLong = network.feature(e).id().equals("long");
                longLength += isLong ? network.length(e) : 0;
                // the crew crossed from one cross road to the other along Long Street, and drove no more of it
                if (!isLong || network.length(e) < 2 * apart) {
                    driven.addWhole(e, true);
                }
            }
            driven.merge();
            MissedStretchNetwork stretches = MissedStretchNetwork.of(StreetCoverageAccounting.account(network, driven, 0.9, false));
            double service = stretches.demand().length(stretches.network());
            if (apart < MissedStretchNetwork.MERGE_GAP) {
                assertEquals(longLength, service, 1e-6, "the 15 m block is serviced with the stretches either side");
            } else {
                assertEquals(longLength - PolylineGeodesics.length(network, shortest(network)), service, 1e-6,
                        "a 30 m block driven stays deadhead");
            }
        }
    }

    private static int shortest(StreetNetwork network) {
        int best = 0;
        for (int e = 1; e < network.edgeCount(); e++) {
            best = network.length(e) < network.length(best) ? e : best;
        }
        return best;
    }
}
