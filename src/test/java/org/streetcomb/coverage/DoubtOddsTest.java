package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.coverage.TrackCoverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.streetcomb.coverage.MetreStreets.LAT;
import static org.streetcomb.coverage.MetreStreets.M_LAT;
import static org.streetcomb.coverage.MetreStreets.street;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.TrackSegment;
import org.streetcomb.tour.Tour;

/**
 * Crediting every believable drive, on invented streets (simulated drives, not recordings): a main road
 * with a crescent that leaves it and rejoins it 60 m farther on. That a track with no fixes on the crescent
 * cannot tell whether the vehicle went round it, when the time between the fixes allows it, while fixes at
 * a steady pace along the main road rule it out, is common practice in reading GPS logs.
 */
class DoubtOddsTest {


    private static final List<RoadFeature> STREETS = List.of(
            street("main", 0, 0, 200, 0, 260, 0, 600, 0),
            street("crescent", 200, 0, 200, 40, 260, 40, 260, 0));

    /**
     * Where a fix by the crescent's mouth can be read as on it, a drive round the crescent is believable;
     * the most probable drive takes the shorter way along the main road about as often. Only the routes
     * through the states of the fixes are weighed (the shortest route between two states), so a crescent
     * with no fix near either leg stays uncredited, hence a share of the seeds rather than every one.
     */
    @org.junit.jupiter.api.Test
    void aCrescentDrivenInADropoutIsCreditedMoreOftenThanByTheMostProbableDriveAlone() {
        StreetNetwork network = new NetworkBuilder(0.5).build(STREETS);
        int[] main = edges(network, "main");
        int[] crescent = edges(network, "crescent");
        int believable = 0, mostProbable = 0;
        for (long seed = 1; seed <= SEEDS; seed++) {
            // west part of the main road, the crescent, the east part: the fixes on the crescent are lost
            List<TrackSegment> drive = dropNorthOf(10, SimulatedDrive.drive(network,
                    List.of(tour(main[0], crescent[0], main[2])), SETTINGS, seed, SimulatedDrive.START));
            believable += covered(network, drive, MatchSettings.defaults()) ? 1 : 0;
            mostProbable += covered(network, drive, MatchSettings.defaults().withDoubtOdds(1)) ? 1 : 0;
        }
        assertTrue(believable > mostProbable && believable >= SEEDS / 2, believable + " vs " + mostProbable);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void aCrescentPassedByIsNotCredited(long seed) {
        StreetNetwork network = new NetworkBuilder(0.5).build(STREETS);
        int[] main = edges(network, "main");
        List<TrackSegment> drive = SimulatedDrive.drive(network, List.of(tour(main[0], main[1], main[2])), SETTINGS,
                seed, SimulatedDrive.START);
        assertEquals(CoverageStatus.MISSED, status(network, drive, MatchSettings.defaults(), "crescent"));
        assertEquals(CoverageStatus.COVERED, status(network, drive, MatchSettings.defaults(), "main"));
    }

    /**
     * A steady 30 km/h, so the time between the fixes either side of the crescent fits the way round it; a
     * fix every 1-5 s, 10 m noise, no random dropouts.
     */
    private static final SimulatedDrive.Settings SETTINGS = new SimulatedDrive.Settings(30, 30, 1, 5, 10, 0, 0, 0);

    private static final int SEEDS = 20;

    private static boolean covered(StreetNetwork network, List<TrackSegment> drive, MatchSettings settings) {
        return status(network, drive, settings, "crescent") == CoverageStatus.COVERED;
    }

    private static CoverageStatus status(StreetNetwork network, List<TrackSegment> drive, MatchSettings settings,
                                         String id) {
        TrackCoverage coverage = new TrackCoverage(network, settings);
        drive.forEach(coverage::accept);
        return coverage.report(0.9, false).streets().stream().filter(s -> s.feature().id().equals(id)).findFirst()
                .orElseThrow().status();
    }

    /** The segments without their fixes more than {@code metres} north of the main road (a dropout). */
    private static List<TrackSegment> dropNorthOf(double metres, List<TrackSegment> segments) {
        List<TrackSegment> kept = new ArrayList<>();
        for (TrackSegment s : segments) {
            List<Integer> keep = new ArrayList<>();
            for (int i = 0; i < s.size(); i++) {
                if ((s.lat()[i] - LAT) / M_LAT <= metres) {
                    keep.add(i);
                }
            }
            kept.add(new TrackSegment(s.file(), s.place(), keep.stream().mapToDouble(i -> s.lon()[i]).toArray(),
                    keep.stream().mapToDouble(i -> s.lat()[i]).toArray(),
                    keep.stream().mapToDouble(i -> s.time()[i]).toArray()));
        }
        return kept;
    }

    /** The edges of a street in digitised order (the network keeps a line's pieces in order). */
    private static int[] edges(StreetNetwork network, String id) {
        List<Integer> edges = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            if (network.feature(e).id().equals(id)) {
                edges.add(e);
            }
        }
        return edges.stream().mapToInt(Integer::intValue).toArray();
    }

    private static Tour tour(int... edges) {
        boolean[] forward = new boolean[edges.length];
        java.util.Arrays.fill(forward, true);
        return new Tour(0, edges, forward, new boolean[edges.length]);
    }

}
