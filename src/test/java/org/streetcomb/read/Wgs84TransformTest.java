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
        // An ESRI .prj whose datum name neither the EPSG data nor the ESRI names table know (an invented
        // local datum on the Clarke 1866 ellipsoid): SIS offers only a ballpark shift.
        String prj = "PROJCS[\"NAD_1927_UTM_Zone_13N\",GEOGCS[\"GCS_Local_1950\",DATUM[\"D_Brackenford_Local_1950\","
                + "SPHEROID[\"Clarke_1866\",6378206.4,294.9786982]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]],"
                + "PROJECTION[\"Transverse_Mercator\"],PARAMETER[\"False_Easting\",500000.0],PARAMETER[\"False_Northing\",0.0],"
                + "PARAMETER[\"Central_Meridian\",-105.0],PARAMETER[\"Scale_Factor\",0.9996],PARAMETER[\"Latitude_Of_Origin\",0.0],"
                + "UNIT[\"Meter\",1.0]]";
        InputError e = assertThrows(InputError.class, () ->
                Wgs84Transform.to(Wgs84Transform.fromWkt(prj, "roads.prj"), 589435, 4914006, 609527, 4928063, "roads.prj"));
        assertTrue(e.getMessage().startsWith("roads.prj: no accurate datum shift"), e.getMessage());
        assertTrue(e.getMessage().contains("--crs=EPSG:code"), e.getMessage());
    }

    /** EPSG:4326 as GDAL's ogr2ogr writes it into gpkg_spatial_ref_sys (copied from fixtures/geopackage/mesa.gpkg). */
    private static final String GDAL_4326 = "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,298.257223563,"
            + "AUTHORITY[\"EPSG\",\"7030\"]],AUTHORITY[\"EPSG\",\"6326\"]],PRIMEM[\"Greenwich\",0,AUTHORITY[\"EPSG\",\"8901\"]],"
            + "UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],AXIS[\"Latitude\",NORTH],"
            + "AXIS[\"Longitude\",EAST],AUTHORITY[\"EPSG\",\"4326\"]]";
    /** The ESRI dialect's WGS 84 .prj (from memory). */
    private static final String ESRI_4326 = "GEOGCS[\"GCS_WGS_1984\",DATUM[\"D_WGS_1984\",SPHEROID[\"WGS_1984\",6378137.0,"
            + "298.257223563]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]]";

    @Test
    void wgs84DefinitionsNeedNoTransformationAndAgreeWithSis() {
        double[] sample = {-111.85, 33.42, 13.7167, 45.2767, 126.978, 37.528};
        for (String wkt : new String[] {GDAL_4326, GDAL_4326.replace(",", ", ")}) {
            Wgs84Transform fast = Wgs84Transform.forWkt(wkt, "layer.prj", -180, -90, 180, 90);
            assertEquals("WGS 84, to WGS 84 within 0 m", fast.description(), wkt);
            double[] p = sample.clone();
            fast.transform(p, 3);
            // Apache SIS's own answer for the same definition: the reference the shortcut must equal
            double[] q = sample.clone();
            Wgs84Transform.to(Wgs84Transform.fromWkt(wkt, "layer.prj"), -180, -90, 180, 90, "layer.prj").transform(q, 3);
            for (int i = 0; i < p.length; i++) {
                assertEquals(q[i], p[i], 1e-12, wkt);
            }
        }
        assertEquals("WGS 84, to WGS 84 within 0 m",
                Wgs84Transform.forOption("EPSG:4326", -180, -90, 180, 90).description());
        // ESRI names the same datum D_WGS_1984; SIS does not match the name to EPSG:6326 and offers only a
        // 3 km ballpark shift, so this common .prj was refused before the text was recognised
        assertEquals("WGS 84, to WGS 84 within 0 m", Wgs84Transform.forWkt(ESRI_4326, "layer.prj", -180, -90, 180, 90)
                .description());
        assertThrows(InputError.class, () ->
                Wgs84Transform.to(Wgs84Transform.fromWkt(ESRI_4326, "layer.prj"), -180, -90, 180, 90, "layer.prj"));
    }

    @Test
    void otherGeographicDefinitionsGoThroughSis() {
        // NAD83 uses the GRS 1980 ellipsoid (inverse flattening 298.257222101, EPSG:7019), not WGS 84's
        String nad83 = "GEOGCS[\"NAD83\",DATUM[\"North_American_Datum_1983\",SPHEROID[\"GRS 1980\",6378137,298.257222101]],"
                + "PRIMEM[\"Greenwich\",0],UNIT[\"degree\",0.0174532925199433]]";
        String description = Wgs84Transform.forWkt(nad83, "layer.prj", -112, 33, -111, 34).description();
        assertTrue(description.startsWith("NAD83, to WGS 84 within"), description);
        // the same datum in grads (EPSG:9105) is not plain longitude/latitude: it is left to SIS (which here
        // finds no accurate operation and refuses), never passed on unconverted
        String grads = GDAL_4326.replace("UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]]",
                "UNIT[\"grad\",0.015707963267949,AUTHORITY[\"EPSG\",\"9105\"]]");
        assertThrows(InputError.class, () -> Wgs84Transform.forWkt(grads, "layer.prj", 99, 49, 101, 51));
    }
}
