package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.coverage.TrackCoverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.streetcomb.coverage.MetreStreets.LAT;
import static org.streetcomb.coverage.MetreStreets.M_LAT;
import static org.streetcomb.coverage.MetreStreets.M_LON;
import static org.streetcomb.coverage.MetreStreets.street;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.TrackSegment;

/**
 * A receiver whose error persists (drift) on invented streets with a simulated drive (invented data): a
 * main road west to east with a service road 15 m north of its middle 600 m, joined at both ends, and the
 * drive along the main road recorded 9 m too far north throughout, plus 3 m of noise. Read fix by fix, the
 * middle of the drive fits the service road better; the drift, seen where the main road runs alone, is
 * taken out before the final match (a lasting GPS offset is common practice to expect; Newson &amp; Krumm's
 * model treats every fix's error as independent).
 */
class DriftTest {


    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4})
    void theDriftIsTakenOutBeforeTheFinalMatch(long seed) {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                street("main", -600, 0, 1200, 0), street("service", 0, 15, 600, 15),
                street("west link", 0, 0, 0, 15), street("east link", 600, 0, 600, 15)));
        Random random = new Random(seed);
        int n = 0;
        double[] lon = new double[400], lat = new double[400], time = new double[400];
        double speed = 30 / 3.6;
        for (double x = -600; x <= 1200; x += 2 * speed) {
            lon[n] = MetreStreets.LON + (x + 3 * random.nextGaussian()) * M_LON;
            lat[n] = LAT + (9 + 3 * random.nextGaussian()) * M_LAT;
            time[n] = SimulatedDrive.START + (x + 600) / speed;
            n++;
        }
        TrackSegment drive = new TrackSegment(Path.of("simulated.gpx"), "drift", java.util.Arrays.copyOf(lon, n),
                java.util.Arrays.copyOf(lat, n), java.util.Arrays.copyOf(time, n));
        MatchSettings drift = MatchSettings.defaults().withDriftWindow(60);
        assertEquals(CoverageStatus.MISSED, status(network, drive, drift, "service"));
        assertEquals(CoverageStatus.COVERED, status(network, drive, drift, "main"));
        // the plain match, without taking the drift out, reads the middle of the drive as the service road
        assertEquals(CoverageStatus.COVERED, status(network, drive, MatchSettings.defaults(), "service"));
    }

    private static CoverageStatus status(StreetNetwork network, TrackSegment drive, MatchSettings settings, String id) {
        TrackCoverage coverage = new TrackCoverage(network, settings);
        coverage.accept(drive);
        return coverage.report(0.9, false).streets().stream().filter(s -> s.feature().id().equals(id)).findFirst()
                .orElseThrow().status();
    }

}
