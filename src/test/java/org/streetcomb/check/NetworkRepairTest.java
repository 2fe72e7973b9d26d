package org.streetcomb.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadLayer;

/**
 * Repairs on the planted fixture (invented data): after closing gaps and dropping duplicates the check
 * finds neither any more, and the network's length changes by exactly the gap closed and the copy dropped,
 * as measured by the check before the repair (lengths are geodesic, GeographicLib).
 */
class NetworkRepairTest {

    @Test
    void closingGapsAndDroppingDuplicatesRemovesThoseFindings() {
        RoadLayer layer = Layers.read("check/planted.geojson");
        StreetNetwork before = new NetworkBuilder(0.5).build(layer);
        List<Finding> found = Layers.check(layer, layer.features(), -1);
        double gap = Layers.ofKind(found, FindingKind.UNDERSHOOT).get(0).value();
        double copy = Layers.ofKind(found, FindingKind.DUPLICATE).get(0).value();

        NetworkRepair.Result repaired = NetworkRepair.apply(layer, before, 0.5,
                new RepairOptions(2, true));

        assertEquals(2, repaired.done().size());
        assertTrue(repaired.done().get(0).startsWith("closed 1 gap of up to 1.51 m by extending feature undershoot"),
                repaired.done().get(0));
        assertTrue(repaired.done().get(1).startsWith("dropped 1 duplicate edge (100 m) of feature duplicate"),
                repaired.done().get(1));
        List<Finding> after = NetworkCheck.run(new CheckInput(repaired.layer(), repaired.network(),
                CheckOptions.DEFAULTS, -1));
        assertEquals(List.of(), Layers.ofKind(after, FindingKind.UNDERSHOOT));
        assertEquals(List.of(), Layers.ofKind(after, FindingKind.DUPLICATE));
        assertEquals(before.totalLength() + gap - copy, repaired.network().totalLength(), 1e-3);
    }

    /** Joined only at shared vertices, the gap closes because the missed line gains the new end as a vertex. */
    @Test
    void closedGapJoinsAGradeSeparatedLayerToo() {
        RoadLayer layer = Layers.read("check/planted.geojson").gradeSeparated(null);
        StreetNetwork before = new NetworkBuilder(0.5).build(layer);
        NetworkRepair.Result repaired = NetworkRepair.apply(layer, before, 0.5, new RepairOptions(2, false));
        List<Finding> after = NetworkCheck.run(new CheckInput(repaired.layer(), repaired.network(), CheckOptions.DEFAULTS, -1));
        assertEquals(List.of(), Layers.ofKind(after, FindingKind.UNDERSHOOT));
        Finding bridge = Layers.ofKind(after, FindingKind.CROSSING).get(0);
        assertTrue(bridge.fix().startsWith("the planner keeps them apart"), bridge.fix());
    }

    @Test
    void gapsWiderThanTheToleranceStayOpen() {
        RoadLayer layer = Layers.read("check/planted.geojson");
        StreetNetwork before = new NetworkBuilder(0.5).build(layer);
        NetworkRepair.Result repaired = NetworkRepair.apply(layer, before, 0.5,
                new RepairOptions(1, false));
        assertEquals(List.of(), repaired.done());
        assertEquals(before.edgeCount(), repaired.network().edgeCount());
    }
}
