package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.sis.referencing.CRS;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.opengis.referencing.datum.DatumAuthorityFactory;
import org.opengis.referencing.datum.GeodeticDatum;
import org.streetcomb.ExternalTool;
import org.streetcomb.network.GeodesicLength;

/** ESRI datum names given their EPSG codes, checked against the EPSG dataset, EPSG-coded readings and GDAL. */
class EsriDatumNamesTest {

    @Test
    void everyCodeIsTheEpsgDatumWithThatEllipsoid() throws Exception {
        // the EPSG dataset as Apache SIS ships it is the reference for each code's datum and ellipsoid
        DatumAuthorityFactory epsg = (DatumAuthorityFactory) CRS.getAuthorityFactory("EPSG");
        for (Map.Entry<String, EsriDatumNames.EpsgDatum> e : EsriDatumNames.DATUMS.entrySet()) {
            GeodeticDatum datum = epsg.createGeodeticDatum(String.valueOf(e.getValue().code()));
            assertEquals(datum.getEllipsoid().getSemiMajorAxis(), e.getValue().semiMajor(), 1e-6, e.getKey());
            assertEquals(datum.getEllipsoid().getInverseFlattening(), e.getValue().inverseFlattening(), 1e-9, e.getKey());
        }
    }

    @Test
    void aDatumWithAnotherEllipsoidIsLeftAlone() {
        // NAD27 is on Clarke 1866; a .prj giving the name with the GRS 1980 ellipsoid is not what it says
        String wrong = "GEOGCS[\"GCS\",DATUM[\"D_North_American_1927\",SPHEROID[\"GRS_1980\",6378137.0,298.257222101]],"
                + "PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]]";
        assertEquals(wrong, EsriDatumNames.withEpsgCode(wrong));
        String right = wrong.replace("SPHEROID[\"GRS_1980\",6378137.0,298.257222101]", "SPHEROID[\"Clarke_1866\",6378206.4,294.9786982]");
        assertTrue(EsriDatumNames.withEpsgCode(right).contains(
                "DATUM[\"D_North_American_1927\",SPHEROID[\"Clarke_1866\",6378206.4,294.9786982],AUTHORITY[\"EPSG\",\"6267\"]]"),
                EsriDatumNames.withEpsgCode(right));
    }

    /**
     * Spearfish's ESRI .prj, read as it comes, puts every point where the EPSG code of the same system puts
     * it (NAD27 / UTM zone 13N, EPSG:26713, the system the data set's description names).
     */
    @Test
    void anEsriNad27PrjReadsAsItsEpsgCode() {
        Path shp = Path.of("fixtures/shapefiles/spearfish-nad27-utm13n/roads.shp");
        assertTrue(farthestApart(LayerReaders.read(shp).features(),
                LayerReaders.read(shp, ReadOptions.DEFAULTS.withCrs("EPSG:26713")).features()) < 0.01);
    }

    /**
     * Mesa's ESRI .prj (NAD83 State Plane Arizona Central in US survey feet, which GDAL identifies as
     * ESRI:102649 and no EPSG code matches exactly) puts every point where GDAL's ogr2ogr puts it; NAD83 to
     * WGS 84 is the null shift in both (EPSG:1188).
     */
    @Test
    void anEsriNad83PrjReadsAsGdalReadsIt(@TempDir Path dir) throws Exception {
        Path shp = Path.of("fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp");
        Path gdal = dir.resolve("mesa.geojson");
        ExternalTool.run("ogr2ogr", "-f", "GeoJSON", "-t_srs", "EPSG:4326", "-lco", "COORDINATE_PRECISION=10",
                gdal.toString(), shp.toString());
        assertTrue(farthestApart(LayerReaders.read(shp).features(), LayerReaders.read(gdal).features()) < 0.01);
    }

    /** The largest distance in metres between corresponding vertices of two readings of the same lines. */
    private static double farthestApart(List<RoadFeature> a, List<RoadFeature> b) {
        assertEquals(a.size(), b.size());
        double worst = 0;
        for (int f = 0; f < a.size(); f++) {
            Coordinate[] p = a.get(f).line().getCoordinates();
            Coordinate[] q = b.get(f).line().getCoordinates();
            assertEquals(p.length, q.length);
            for (int i = 0; i < p.length; i++) {
                worst = Math.max(worst, GeodesicLength.between(p[i].x, p[i].y, q[i].x, q[i].y));
            }
        }
        return worst;
    }
}
