package org.streetcomb.check;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.index.strtree.STRtree;
import org.streetcomb.network.LocalFrame;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.ReadReport;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;

/**
 * What the detectors look at: the road lines as read, the network built from them, and a metric plane
 * for distances. The edges' metric lines and their spatial index (a JTS {@link STRtree}) are built once,
 * on first use, and shared by the detectors that need them.
 */
public final class CheckInput {

    private static final GeometryFactory METRIC = new GeometryFactory();

    private final RoadLayer layer;
    private final StreetNetwork network;
    private final CheckOptions options;
    private final int depot;
    private final LocalFrame frame;
    private LineString[] edgeLines;
    private STRtree edgeIndex;

    /**
     * @param layer   the road layer the network was built from
     * @param network the network built from {@code layer}
     * @param options thresholds
     * @param depot   the depot node, or -1 when there is none
     */
    public CheckInput(RoadLayer layer, StreetNetwork network, CheckOptions options, int depot) {
        this.layer = layer;
        this.network = network;
        this.options = options;
        this.depot = depot;
        this.frame = LocalFrame.covering(layer.features());
    }

    public List<RoadFeature> features() {
        return layer.features();
    }

    public ReadReport read() {
        return layer.report();
    }

    /**
     * Whether the network joins lines wherever they cross (a geometric layer noded without grade
     * separation), rather than only at shared nodes or vertices.
     */
    public boolean joinsCrossings() {
        return !layer.hasTopology() && layer.gradeSeparation() == null;
    }

    public StreetNetwork network() {
        return network;
    }

    public CheckOptions options() {
        return options;
    }

    /** The depot node, or -1. */
    public int depot() {
        return depot;
    }

    public LocalFrame frame() {
        return frame;
    }

    /** A WGS84 position in the metric plane. */
    public Coordinate metric(double lon, double lat) {
        return new Coordinate(frame.x(lon), frame.y(lat));
    }

    /** Edge {@code e}'s polyline in the metric plane. */
    public synchronized LineString edgeLine(int e) {
        if (edgeLines == null) {
            edgeLines = new LineString[network.edgeCount()];
            for (int i = 0; i < edgeLines.length; i++) {
                Coordinate[] coords = new Coordinate[network.pointCount(i)];
                for (int k = 0; k < coords.length; k++) {
                    coords[k] = metric(network.pointLon(i, k), network.pointLat(i, k));
                }
                edgeLines[i] = METRIC.createLineString(coords);
            }
        }
        return edgeLines[e];
    }

    /** The edges' metric envelopes in a spatial index whose items are edge ids (Integer). */
    public synchronized STRtree edgeIndex() {
        if (edgeIndex == null) {
            edgeIndex = new STRtree();
            for (int e = 0; e < network.edgeCount(); e++) {
                edgeIndex.insert(edgeLine(e).getEnvelopeInternal(), e);
            }
            edgeIndex.build();
        }
        return edgeIndex;
    }

    /** A line in the metric plane from the feature's WGS84 line. */
    public LineString metricLine(RoadFeature feature) {
        LineString line = feature.line();
        Coordinate[] coords = new Coordinate[line.getNumPoints()];
        for (int k = 0; k < coords.length; k++) {
            Coordinate c = line.getCoordinateN(k);
            coords[k] = metric(c.x, c.y);
        }
        return METRIC.createLineString(coords);
    }
}
