package org.streetcomb.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;

/**
 * The planted fixture (fixtures/check/planted.geojson, invented, listed in make_fixtures.py) has one
 * defect of each kind at a known place. Each must be found there, and its measurement must match the
 * same quantity computed from the fixture's coordinates with GeographicLib's geodesic inverse (Karney
 * 2013), the reference library for ellipsoidal distances.
 */
class PlantedDefectsTest {

    private static RoadLayer layer;
    private static List<Finding> findings;

    @BeforeAll
    static void check() {
        layer = Layers.read("check/planted.geojson");
        findings = Layers.check(layer, layer.features(), -1);
    }

    @Test
    void cleanGridHasNoFindings() {
        RoadLayer clean = Layers.read("check/clean.geojson");
        assertEquals(List.of(), Layers.check(clean, clean.features(), 0));
    }

    @Test
    void separatePartIsTheIslandWithItsLength() {
        Finding part = only(FindingKind.SEPARATE_PART);
        assertEquals(List.of("island-1", "island-2"), part.featureIds());
        assertEquals(geodesicLength("island-1") + geodesicLength("island-2"), part.value(), 1e-6);
        assertEquals(Severity.WARNING, part.severity());
    }

    @Test
    void undershootGapRunsFromTheDeadEndToTheLineItMisses() {
        Finding gap = only(FindingKind.UNDERSHOOT);
        Coordinate end = last(feature("undershoot"));
        // the missed line v32 runs due north, so the nearest point is on it at the dead end's latitude
        Coordinate onLine = feature("v32").getCoordinateN(0);
        assertEquals(List.of("v32", "undershoot"), gap.featureIds());
        assertEquals(distance(end.x, end.y, onLine.x, end.y), gap.value(), 0.01);
        assertEquals(1.5, gap.value(), 0.02, "planted as 1.5 m");
        Coordinate[] at = gap.location().getCoordinates();
        assertEquals(end, at[0]);
        assertEquals(onLine.x, at[1].x, 1e-7);
    }

    @Test
    void overshootIsTheStubPastTheCorner() {
        Finding stub = only(FindingKind.OVERSHOOT);
        assertEquals(List.of("overshoot"), stub.featureIds());
        LineString line = feature("overshoot");
        Coordinate corner = last(feature("v32"));
        assertEquals(distance(corner.x, corner.y, last(line).x, last(line).y), stub.value(), 1e-6);
        assertEquals(2.0, stub.value(), 0.02, "planted as 2 m");
    }

    @Test
    void duplicateNamesBothCopies() {
        Finding twin = only(FindingKind.DUPLICATE);
        assertEquals(List.of("h01", "duplicate"), twin.featureIds());
        assertEquals(geodesicLength("duplicate"), twin.value(), 1e-6);
    }

    @Test
    void bridgeCrossingIsAWarningAtTheCrossingPoint() {
        Finding crossing = only(FindingKind.CROSSING);
        assertEquals(List.of("h12", "bridge"), crossing.featureIds());
        assertEquals(Severity.WARNING, crossing.severity(), "tagged bridge=yes");
        Coordinate at = crossing.location().getCoordinate();
        assertEquals(feature("bridge").getCoordinateN(0).x, at.x, 1e-7);
        assertEquals(feature("h12").getCoordinateN(0).y, at.y, 1e-7);
        assertEquals(90, crossing.value(), 0.5);
    }

    @Test
    void zeroLengthAndCollapsingLinesAreDegenerate() {
        List<Finding> degenerate = Layers.ofKind(findings, FindingKind.DEGENERATE);
        assertEquals(2, degenerate.size());
        assertEquals(List.of("zero"), degenerate.get(0).featureIds());
        assertEquals(0, degenerate.get(0).value());
        assertEquals(feature("zero").getCoordinateN(0), degenerate.get(0).location().getCoordinate());
        assertEquals(List.of("tiny"), degenerate.get(1).featureIds());
        assertEquals(geodesicLength("tiny"), degenerate.get(1).value(), 0.005);
    }

    @Test
    void droppedFeaturesAreCountedByReason() {
        List<Finding> dropped = Layers.ofKind(findings, FindingKind.DROPPED);
        assertEquals(2, dropped.size());
        assertTrue(dropped.get(0).problem().endsWith("Point"));
        assertTrue(dropped.get(1).problem().endsWith("Polygon"));
        assertEquals(1, dropped.get(0).value());
        assertNull(dropped.get(0).location());
    }

    @Test
    void nothingElseIsReported() {
        assertEquals(9, findings.size());
        assertTrue(findings.stream().noneMatch(f -> f.severity() == Severity.BLOCKING));
    }

    private static Finding only(FindingKind kind) {
        List<Finding> ofKind = Layers.ofKind(findings, kind);
        assertEquals(1, ofKind.size(), kind + ": " + ofKind);
        return ofKind.get(0);
    }

    private static LineString feature(String id) {
        return layer.features().stream().filter(f -> f.id().equals(id)).map(RoadFeature::line).findFirst().orElseThrow();
    }

    private static Coordinate last(LineString line) {
        return line.getCoordinateN(line.getNumPoints() - 1);
    }

    private static double geodesicLength(String id) {
        LineString line = feature(id);
        double sum = 0;
        for (int i = 0; i + 1 < line.getNumPoints(); i++) {
            Coordinate a = line.getCoordinateN(i);
            Coordinate b = line.getCoordinateN(i + 1);
            sum += distance(a.x, a.y, b.x, b.y);
        }
        return sum;
    }

    private static double distance(double lon1, double lat1, double lon2, double lat2) {
        return Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2).s12;
    }
}
