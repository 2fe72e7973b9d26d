package org.streetcomb.coverage;

import org.streetcomb.match.MatchSettings;
import org.streetcomb.coverage.StreetCoverage;
import org.streetcomb.coverage.TrackCoverage;

import static org.junit.jupiter.api.Assertions.assertTrue;
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
 * A crew that turns back in the middle of a street (at roadworks, say) has driven only the stretch up to
 * the turn (common practice: coverage counts the road driven, not the street entered). On invented
 * streets with a simulated drive (invented data): a 600 m street between two cross streets, driven 500 m
 * from its west end and back, with a fix every 5 s, so the way round by the far junction (200 m more) is
 * within what the vehicle could have driven between two fixes.
 */
class MidStreetTurnTest {


    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6})
    void onlyTheStretchUpToTheTurnIsCredited(long seed) {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                street("long", 0, 0, 600, 0), street("west", 0, -150, 0, 150), street("east", 600, -150, 600, 150)));
        // 30 km/h, a fix every 5 s, 5 m noise: along the west street's south half, 500 m east and back, north
        Random random = new Random(seed);
        int n = 0;
        double[] x = new double[200], y = new double[200], t = new double[200];
        double speed = 30 / 3.6;
        double[][] legs = {{0, -150, 0, 0}, {0, 0, 500, 0}, {500, 0, 0, 0}, {0, 0, 0, 150}};
        double clock = 0;
        for (double[] leg : legs) {
            double length = Math.hypot(leg[2] - leg[0], leg[3] - leg[1]);
            for (double s = 0; s < length; s += 5 * speed) {
                x[n] = leg[0] + (leg[2] - leg[0]) * s / length + 5 * random.nextGaussian();
                y[n] = leg[1] + (leg[3] - leg[1]) * s / length + 5 * random.nextGaussian();
                t[n++] = clock + s / speed;
            }
            clock += length / speed;
        }
        double[] lon = new double[n], lat = new double[n], time = new double[n];
        for (int i = 0; i < n; i++) {
            lon[i] = MetreStreets.LON + x[i] * M_LON;
            lat[i] = LAT + y[i] * M_LAT;
            time[i] = SimulatedDrive.START + t[i];
        }
        TrackCoverage coverage = new TrackCoverage(network, MatchSettings.defaults());
        coverage.accept(new TrackSegment(Path.of("simulated.gpx"), "turn", lon, lat, time));
        StreetCoverage street = coverage.report(0.9, false).streets().stream()
                .filter(s -> s.feature().id().equals("long")).findFirst().orElseThrow();
        // the last fix before the turn lies up to one interval (42 m) short of it, give or take the noise
        assertTrue(street.driven() > 500 - 42 - 15 && street.driven() < 500 + 15, "credited " + street.driven() + " m");
    }

}
