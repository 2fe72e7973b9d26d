package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.crs.AbstractCRS;
import org.apache.sis.referencing.cs.AxesConvention;
import org.junit.jupiter.api.Test;
import org.opengis.referencing.crs.ProjectedCRS;
import org.streetcomb.InputError;

/** Coordinate transformation to WGS 84 against published worked examples. */
class Wgs84TransformTest {

    @Test
    void transverseMercatorMatchesEpsgGuidanceNote7_2() throws Exception {
        // EPSG Guidance Note 7-2, Transverse Mercator worked example (OSGB 1936 / British National Grid,
        // EPSG:27700): latitude 50°30'N, longitude 0°30'E gives E = 577274.99 m, N = 69740.50 m
        // (from memory; GDAL's gdaltransform gives 577274.984, 69740.492 for the same point).
        ProjectedCRS grid = (ProjectedCRS) AbstractCRS.castOrCopy(Wgs84Transform.fromOption("EPSG:27700"))
                .forConvention(AxesConvention.RIGHT_HANDED);
        var base = AbstractCRS.castOrCopy(grid.getBaseCRS()).forConvention(AxesConvention.RIGHT_HANDED);
        double[] p = {0.5, 50.5};
        CRS.findOperation(base, grid, null).getMathTransform().transform(p, 0, p, 0, 1);
        assertEquals(577274.99, p[0], 0.01);
        assertEquals(69740.50, p[1], 0.01);
    }

    @Test
    void utmPointMatchesReference() {
        // WGS 84 / UTM zone 33N (EPSG:32633): E 389917.56, N 5819697.36 is 13.3776975 E, 52.5162590 N
        // (a point at the Brandenburg Gate, Berlin; from memory, and GDAL's gdaltransform gives
        // 13.3776974932, 52.5162589746). The datum is WGS 84 itself, so no datum shift is involved.
        Wgs84Transform t = Wgs84Transform.to(Wgs84Transform.fromOption("EPSG:32633"), 389000, 5819000, 390000, 5820000, "test");
        double[] p = {389917.56, 5819697.36};
        t.transform(p, 1);
        assertEquals(13.3776975, p[0], 1e-7);
        assertEquals(52.5162590, p[1], 1e-7);
    }

    @Test
    void refusesADatumShiftItCannotDoAccurately() {
        // An ESRI .prj whose datum name the EPSG data do not know: SIS offers only a ballpark shift.
        String prj = "PROJCS[\"NAD_1927_UTM_Zone_13N\",GEOGCS[\"GCS_North_American_1927\",DATUM[\"D_North_American_1927\","
                + "SPHEROID[\"Clarke_1866\",6378206.4,294.9786982]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]],"
                + "PROJECTION[\"Transverse_Mercator\"],PARAMETER[\"False_Easting\",500000.0],PARAMETER[\"False_Northing\",0.0],"
                + "PARAMETER[\"Central_Meridian\",-105.0],PARAMETER[\"Scale_Factor\",0.9996],PARAMETER[\"Latitude_Of_Origin\",0.0],"
                + "UNIT[\"Meter\",1.0]]";
        InputError e = assertThrows(InputError.class, () ->
                Wgs84Transform.to(Wgs84Transform.fromWkt(prj, "roads.prj"), 589435, 4914006, 609527, 4928063, "roads.prj"));
        assertTrue(e.getMessage().startsWith("roads.prj: no accurate datum shift"), e.getMessage());
        assertTrue(e.getMessage().contains("--crs=EPSG:code"), e.getMessage());
    }
}
