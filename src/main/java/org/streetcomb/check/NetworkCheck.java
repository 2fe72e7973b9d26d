package org.streetcomb.check;

import java.util.ArrayList;
import java.util.List;

/**
 * Runs every detector over a layer and its network and returns the findings grouped by kind, in the
 * order of {@link FindingKind}, each group in its detector's order.
 */
public final class NetworkCheck {

    static final List<Detector> DETECTORS = List.of(
            new SeparatePartCheck(), new OneWayTrapCheck(), new DepotReachCheck(), new UndershootCheck(),
            new OvershootCheck(), new DuplicateCheck(), new CrossingCheck(), new DegenerateCheck(), new DroppedCheck());

    private NetworkCheck() {
    }

    public static List<Finding> run(CheckInput input) {
        List<Finding> findings = new ArrayList<>();
        for (Detector detector : DETECTORS) {
            findings.addAll(detector.find(input));
        }
        findings.sort((a, b) -> a.kind().compareTo(b.kind()));
        return List.copyOf(findings);
    }
}
