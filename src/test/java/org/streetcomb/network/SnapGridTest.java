package org.streetcomb.network;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.noding.NodedSegmentString;
import org.locationtech.jts.noding.SegmentString;
import org.locationtech.jts.noding.snap.SnappingNoder;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadFeature;

/**
 * The hash-grid snap index against the reference it replaces: JTS's own {@link SnappingNoder} (KdTree
 * index) nodes the same real layers, in the same metric frame and at the same tolerance, into the same
 * pieces (each piece's feature and its vertices to the micrometre). Layers: Seoul's road lines (OSM
 * contributors, ODbL, fixtures/real) and the Aurich shapefile (fixtures/shapefiles), at the default 0.5 m
 * snap and at a coarse 3 m that joins many more vertices.
 */
class SnapGridTest {

    @ParameterizedTest
    @CsvSource({"fixtures/real/roads-seoul.geojson, 0.5", "fixtures/real/roads-seoul.geojson, 3",
            "fixtures/shapefiles/aurich-dhdn-gk2/roads.shp, 0.5", "fixtures/shapefiles/aurich-dhdn-gk2/roads.shp, 3"})
    void nodesRealLayersAsJtsSnappingNoderDoes(String layer, double tolerance) throws Exception {
        List<RoadFeature> features = LayerReaders.read(Path.of(layer)).features();
        SnappingNoder reference = new SnappingNoder(tolerance);
        reference.computeNodes(lines(features));
        @SuppressWarnings("unchecked")
        List<String> expected = pieces(reference.getNodedSubstrings());
        List<String> ours = pieces(SnapGrid.node(lines(features), tolerance, Long.MAX_VALUE - 1).pieces());
        assertEquals(expected.size(), ours.size(), "pieces");
        assertEquals(expected, ours);
    }

    private static List<SegmentString> lines(List<RoadFeature> features) {
        LocalFrame frame = LocalFrame.covering(features);
        List<SegmentString> lines = new ArrayList<>();
        for (int f = 0; f < features.size(); f++) {
            Coordinate[] c = features.get(f).line().getCoordinates();
            Coordinate[] xy = new Coordinate[c.length];
            for (int i = 0; i < c.length; i++) {
                xy[i] = new Coordinate(frame.x(c[i].x), frame.y(c[i].y));
            }
            lines.add(new NodedSegmentString(xy, f));
        }
        return lines;
    }

    private static List<String> pieces(Collection<SegmentString> pieces) {
        List<String> out = new ArrayList<>();
        for (SegmentString piece : pieces) {
            StringBuilder s = new StringBuilder(piece.getData() + ":");
            for (Coordinate c : piece.getCoordinates()) {
                s.append(String.format(Locale.ROOT, " %.6f,%.6f", c.x, c.y));
            }
            out.add(s.toString());
        }
        return out;
    }
}
