package org.streetcomb.check;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.Travel;

/** Reads test layers from fixtures/ and runs the health check on them. */
final class Layers {

    private static final Map<String, RoadLayer> READ = new HashMap<>();

    private Layers() {
    }

    static RoadLayer read(String fixture) {
        return read(fixture, null);
    }

    /**
     * Each layer is read once per test run: projected shapefiles are slow to read.
     *
     * @param crs the layer's CRS as EPSG:code, or null for the file's own
     */
    static synchronized RoadLayer read(String fixture, String crs) {
        return READ.computeIfAbsent(fixture + " " + crs, key -> LayerReaders.read(Path.of("fixtures", fixture),
                crs == null ? ReadOptions.DEFAULTS : ReadOptions.DEFAULTS.withCrs(crs)));
    }

    /** The layer's lines with {@code oneway=yes} read as one-way along the line, the others two-way. */
    static List<RoadFeature> withOneWay(RoadLayer layer, Travel oneWay) {
        return layer.features().stream()
                .map(f -> new RoadFeature(f.id(), f.name(), f.line(),
                        "yes".equals(f.properties().get("oneway")) ? oneWay : Travel.BOTH, f.required(), f.properties()))
                .collect(Collectors.toList());
    }

    static List<Finding> check(RoadLayer layer, List<RoadFeature> features, int depot) {
        RoadLayer lines = new RoadLayer(layer.source(), features, layer.report(), layer.endNodes(), layer.gradeSeparation(),
                layer.crossingLimit());
        StreetNetwork network = new NetworkBuilder(CheckOptions.DEFAULTS.snap()).build(lines);
        return NetworkCheck.run(new CheckInput(lines, network, CheckOptions.DEFAULTS, depot));
    }

    static List<Finding> ofKind(List<Finding> findings, FindingKind kind) {
        return findings.stream().filter(f -> f.kind() == kind).toList();
    }
}
