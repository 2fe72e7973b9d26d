package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.InputError;

/**
 * A stored transformation reproduces the one resolved from the EPSG dataset; a refused one is never stored.
 * The reference is the live Apache SIS operation for the same definition and extent.
 */
class CrsOperationCacheTest {

    /** Spearfish's ESRI .prj (NAD27 / UTM 13N): a datum shift, so the stored chain must carry it. */
    private static final Path PRJ = Path.of("fixtures/shapefiles/spearfish-nad27-utm13n/roads.prj");

    @Test
    void aStoredTransformMapsPointsAsTheLiveOne(@TempDir Path dir) throws Exception {
        String wkt = Files.readString(PRJ);
        double minX = 589435, minY = 4914006, maxX = 609527, maxY = 4928063;
        AtomicInteger resolved = new AtomicInteger();
        CrsOperationCache.Entry live = CrsOperationCache.get(dir, wkt, minX, minY, maxX, maxY, () -> {
            resolved.incrementAndGet();
            Wgs84Transform t = Wgs84Transform.to(Wgs84Transform.fromWkt(wkt, PRJ), minX, minY, maxX, maxY, PRJ);
            return new CrsOperationCache.Entry(transformOf(t), t.description());
        });
        CrsOperationCache.clearInProcess();
        CrsOperationCache.Entry stored = CrsOperationCache.get(dir, wkt, minX, minY, maxX, maxY, () -> {
            throw new AssertionError("the stored entry should have been used");
        });
        assertEquals(1, resolved.get());
        assertEquals(live.description(), stored.description());
        for (double x = minX; x <= maxX; x += (maxX - minX) / 7) {
            for (double y = minY; y <= maxY; y += (maxY - minY) / 7) {
                double[] a = {x, y};
                double[] b = {x, y};
                live.transform().transform(a, 0, a, 0, 1);
                stored.transform().transform(b, 0, b, 0, 1);
                assertEquals(a[0], b[0], 1e-9);
                assertEquals(a[1], b[1], 1e-9);
            }
        }
    }

    @Test
    void aRefusedDefinitionIsNotStored(@TempDir Path dir) throws Exception {
        // as in Wgs84TransformTest: an invented datum name SIS knows only a ballpark shift for
        String prj = "PROJCS[\"UTM\",GEOGCS[\"GCS_Local\",DATUM[\"D_Brackenford_Local_1950\","
                + "SPHEROID[\"Clarke_1866\",6378206.4,294.9786982]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]],"
                + "PROJECTION[\"Transverse_Mercator\"],PARAMETER[\"False_Easting\",500000.0],PARAMETER[\"False_Northing\",0.0],"
                + "PARAMETER[\"Central_Meridian\",-105.0],PARAMETER[\"Scale_Factor\",0.9996],PARAMETER[\"Latitude_Of_Origin\",0.0],"
                + "UNIT[\"Meter\",1.0]]";
        for (int run = 0; run < 2; run++) {
            assertThrows(InputError.class, () -> CrsOperationCache.get(dir, prj, 589435, 4914006, 609527, 4928063, () -> {
                Wgs84Transform t = Wgs84Transform.to(Wgs84Transform.fromWkt(prj, "x.prj"), 589435, 4914006, 609527, 4928063, "x.prj");
                return new CrsOperationCache.Entry(transformOf(t), t.description());
            }));
        }
        try (var files = Files.list(dir)) {
            assertTrue(files.findAny().isEmpty());
        }
    }

    private static org.opengis.referencing.operation.MathTransform transformOf(Wgs84Transform t) {
        return t.mathTransform();
    }
}
