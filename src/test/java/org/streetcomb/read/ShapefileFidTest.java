package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A shapefile feature's id is the FID desktop GIS shows for it, so "feature 908" in a message is the
 * feature a user finds as FID 908. The reference is GDAL's ogrinfo (an outside reader: {@code ogrinfo -fid N}
 * prints the feature with FID N); the layer is the Aurich roads shapefile (OpenStreetMap, fixtures/shapefiles,
 * NOTICE).
 */
class ShapefileFidTest {

    private static final Path LAYER = Path.of("fixtures/shapefiles/aurich-dhdn-gk2/roads.shp");

    @ParameterizedTest
    @ValueSource(ints = {0, 5, 908})
    void theIdIsTheFidGdalShows(int fid) throws Exception {
        if (new ProcessBuilder("sh", "-c", "command -v ogrinfo").start().waitFor() != 0) {
            assertTrue(System.getenv("STREETCOMB_CI") == null, "ogrinfo is missing on CI");
            return;
        }
        Process info = new ProcessBuilder("ogrinfo", "-al", "-q", "-fid", String.valueOf(fid), LAYER.toString())
                .redirectErrorStream(true).start();
        String text = new String(info.getInputStream().readAllBytes());
        assertEquals(0, info.waitFor(), text);
        Matcher osmId = Pattern.compile("osm_id \\(Integer64\\) = (\\d+)").matcher(text);
        assertTrue(osmId.find(), text);
        RoadFeature ours = LayerReaders.read(LAYER).features().stream()
                .filter(f -> f.id().equals(String.valueOf(fid))).findFirst().orElseThrow();
        assertEquals(osmId.group(1), String.valueOf(ours.properties().get("osm_id")), "feature " + fid);
    }
}
