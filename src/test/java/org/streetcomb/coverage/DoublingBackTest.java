package org.streetcomb.coverage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.streetcomb.coverage.MetreStreets.street;
import static org.streetcomb.coverage.MetreStreets.track;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;

/**
 * A route between two fixes that runs up a side street to its next junction and straight back turns back at
 * that junction, and is charged as any other turn back where the street goes on (a crew rarely does it;
 * common practice). Before, only a turn back onto the fix's own position was charged, so after a dropout a
 * single noisy fix beside a side street credited the whole side street. On invented streets (invented data):
 * a main street east through a junction X, a 15 m side street north from X to a junction Y where two streets
 * go on. The crew drives the main street at 36 km/h; its receiver drops out for 6 s before X, and the first
 * fix after the dropout lies 15 m off its true place, 1 m beside the side street. The side street must stay
 * missed; the main street is driven.
 */
class DoublingBackTest {

    @Test
    void aLoneFixBesideASideStreetAfterADropoutDoesNotCreditIt() {
        StreetNetwork network = new NetworkBuilder(0.5).build(List.of(
                street("main-west", 0, 0, 100, 0), street("main-east", 100, 0, 300, 0),
                street("side", 100, 0, 100, 15), street("north", 100, 15, 100, 150), street("cross", 100, 15, 40, 15)));
        List<Double> fixes = new ArrayList<>();
        for (int t = 0; t <= 4; t++) {
            fixes.addAll(List.of(10.0 * t, 0.0, (double) t));
        }
        fixes.addAll(List.of(101.0, 12.0, 11.0));
        for (int t = 12; t <= 30; t++) {
            fixes.addAll(List.of(10.0 * t, 0.0, (double) t));
        }
        TrackCoverage coverage = new TrackCoverage(network, MatchSettings.defaults().withSigma(10, false));
        coverage.accept(track(fixes.stream().mapToDouble(Double::doubleValue).toArray()));
        Map<String, Double> share = coverage.report(0.9, false).streets().stream()
                .collect(Collectors.toMap(s -> s.feature().id(), StreetCoverage::fraction));
        assertEquals(0.0, share.get("side"), 1e-9, "side street");
        assertEquals(1.0, share.get("main-west"), 1e-9, "main street, west");
        assertEquals(1.0, share.get("main-east"), 1e-9, "main street, east");
    }
}
