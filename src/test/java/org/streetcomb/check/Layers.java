package org.streetcomb.check;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.GeoJsonReader;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.read.Travel;

/** Reads test layers from fixtures/ and runs the health check on them. */
final class Layers {

    private Layers() {
    }

    static RoadLayer read(String fixture) {
        return new GeoJsonReader().read(Path.of("fixtures", fixture));
    }

    /** The layer's lines with {@code oneway=yes} read as one-way along the line, the others two-way. */
    static List<RoadFeature> withOneWay(RoadLayer layer, Travel oneWay) {
        return layer.features().stream()
                .map(f -> new RoadFeature(f.id(), f.name(), f.line(),
                        "yes".equals(f.properties().get("oneway")) ? oneWay : Travel.BOTH, f.required(), f.properties()))
                .collect(Collectors.toList());
    }

    static List<Finding> check(RoadLayer layer, List<RoadFeature> features, int depot) {
        StreetNetwork network = new NetworkBuilder(CheckOptions.DEFAULTS.snap()).build(features);
        return NetworkCheck.run(new CheckInput(features, layer.report(), network, CheckOptions.DEFAULTS, depot));
    }

    static List<Finding> ofKind(List<Finding> findings, FindingKind kind) {
        return findings.stream().filter(f -> f.kind() == kind).toList();
    }
}
