package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.ExternalTool;
import org.streetcomb.check.CheckInput;
import org.streetcomb.check.CheckOptions;
import org.streetcomb.check.Finding;
import org.streetcomb.check.NetworkCheck;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.RoadLayer;

/**
 * The findings GeoJSON of the planted fixture (invented data) read back by GDAL's GeoJSON driver, an
 * independent reader: the same number of features, the same values, the same geometry types, and null
 * geometry where a finding has no place.
 */
class FindingGeoJsonGdalTest {

    @TempDir
    Path folder;

    @Test
    void gdalReadsEveryFinding() throws Exception {
        RoadLayer layer = LayerReaders.read(Path.of("fixtures/check/planted.geojson"));
        List<Finding> findings = NetworkCheck.run(new CheckInput(layer, new NetworkBuilder(0.5).build(layer),
                CheckOptions.DEFAULTS, -1));
        Path out = folder.resolve("findings.geojson");
        new FindingGeoJsonWriter().write(out, findings);

        String gdal = ExternalTool.run("ogrinfo", "-ro", "-q", "-dialect", "SQLite", "-sql",
                "SELECT COUNT(*) AS n, SUM(value) AS total, SUM(geometry IS NULL) AS unplaced, "
                + "SUM(GeometryType(geometry) = 'LINESTRING') AS lines FROM findings", out.toString());

        assertEquals(findings.size(), number(gdal, "n"), 0);
        double total = findings.stream()
                .mapToDouble(f -> BigDecimal.valueOf(f.value()).setScale(3, RoundingMode.HALF_EVEN).doubleValue()).sum();
        assertEquals(total, number(gdal, "total"), 1e-6);
        assertEquals(findings.stream().filter(f -> f.location() == null).count(), number(gdal, "unplaced"), 0);
        assertEquals(findings.stream().filter(f -> f.location() instanceof LineString).count(), number(gdal, "lines"), 0);
    }

    private static double number(String output, String field) {
        Matcher m = Pattern.compile("\\b" + field + " \\([A-Za-z]+\\) = ([-0-9.eE+]+)").matcher(output);
        assertEquals(true, m.find(), "no " + field + " in: " + output);
        return Double.parseDouble(m.group(1));
    }
}
