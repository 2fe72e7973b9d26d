package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.streetcomb.coverage.MetreStreets.street;
import static org.streetcomb.coverage.MetreStreets.track;
import static org.streetcomb.coverage.MetreStreets.tunnel;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;

/**
 * A receiver gets no fix in a tunnel (common practice: satellite signals do not reach underground), so a
 * track through a tunnel longer than the gap limit (300 m by default) has a gap as long as the tunnel. On
 * invented streets (invented data): 200 m in the open, a 600 m tunnel, 200 m in the open, driven at 36 km/h
 * with a fix each second outside the tunnel. The tunnel must count as driven, and the same gap over open
 * streets must not (there the receiver would have seen the drive, so a 600 m gap is a dropout).
 */
class TunnelGapTest {

    @Test
    void aTunnelLongerThanTheGapLimitIsCreditedFromTheFixesAtItsEnds() {
        assertEquals(1.0, drivenShareOfMiddle(tunnel("middle", 200, 0, 800, 0)), 1e-9);
    }

    @Test
    void theSameGapInTheOpenIsADropout() {
        assertEquals(0.0, drivenShareOfMiddle(street("middle", 200, 0, 800, 0)), 1e-9);
    }

    private static double drivenShareOfMiddle(RoadFeature middle) {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(street("west", 0, 0, 200, 0), middle,
                street("east", 800, 0, 1000, 0)));
        List<Double> fixes = new ArrayList<>();
        for (int x = 0; x <= 1000; x += 10) {
            if (x < 200 || x > 800) {
                fixes.addAll(List.of((double) x, 0.0, x / 10.0));
            }
        }
        TrackCoverage coverage = new TrackCoverage(network, MatchSettings.defaults());
        coverage.accept(track(fixes.stream().mapToDouble(Double::doubleValue).toArray()));
        return coverage.report(0.9, false).streets().stream().filter(s -> s.feature().id().equals("middle"))
                .findFirst().orElseThrow().fraction();
    }
}
