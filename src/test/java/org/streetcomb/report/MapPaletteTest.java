package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.streetcomb.check.FindingKind;

/**
 * Every class a report's legend can list stays apart from every other class of that legend, for normal
 * vision and each kind of dichromacy, by at least {@link ColourDifference#AT_A_GLANCE} (CIE 1976 Delta E*ab;
 * see {@link ColourDifference}). Checked on the full palettes, so legends the demo data never produce (five
 * vehicles, all nine health-check kinds) are covered too; LegendColoursTest reads real reports in a browser.
 */
class MapPaletteTest {

    @Test
    void aPlanLegendWithFiveVehiclesStaysApart() {
        Map<String, String> legend = new LinkedHashMap<>(Map.of("streets", MapPalette.STREETS, "deadhead",
                MapPalette.DEADHEAD, "arrows", MapPalette.ARROWS, "depot", MapPalette.DEPOT, "starts", MapPalette.STARTS,
                "area", MapPalette.AREA, "left out", MapPalette.LEFT_OUT));
        legend.put("reload points", MapPalette.RELOADS);
        for (int v = 0; v < MapPalette.TOURS.size(); v++) {
            legend.put("vehicle " + (v + 1), MapPalette.tour(v));
        }
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    @Test
    void anAuditLegendWithItsMopUpStaysApart() {
        Map<String, String> legend = new LinkedHashMap<>(Map.of("not required", CoverageLayers.NOT_REQUIRED,
                "left out", MapPalette.LEFT_OUT, "covered", CoverageLayers.COVERED, "partly", CoverageLayers.PARTLY,
                "missed", CoverageLayers.MISSED, "still to drive", MapPalette.STILL_TO_DRIVE, "wrong way",
                CoverageLayers.WRONG_WAY, "tracks", TrackLines.COLOUR, "mop-up service", MapPalette.tour(0),
                "deadhead", MapPalette.DEADHEAD));
        legend.put("arrows", MapPalette.ARROWS);
        legend.put("depot", MapPalette.DEPOT);
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    @Test
    void everyHealthCheckKindHasAColourOfItsOwn() {
        Map<String, String> legend = new LinkedHashMap<>(Map.of("streets", MapPalette.STREETS));
        for (FindingKind kind : FindingKind.values()) {
            legend.put(kind.code(), FindingLayers.colour(kind));
        }
        assertEquals(FindingKind.values().length + 1, legend.values().stream().distinct().count());
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    /** The measure can fail: deuteranopia merges a pure red and a green of similar lightness. */
    @Test
    void redAndGreenMergeForADeuteranope() {
        assertTrue(ColourDifference.smallest("#d62728", "#2ca02c") < ColourDifference.AT_A_GLANCE);
        assertTrue(ColourDifference.deltaE(ColourDifference.lab(ColourDifference.VISIONS.get("normal"), "#d62728"),
                ColourDifference.lab(ColourDifference.VISIONS.get("normal"), "#2ca02c")) > 50, "to normal vision they are far apart");
    }
}
