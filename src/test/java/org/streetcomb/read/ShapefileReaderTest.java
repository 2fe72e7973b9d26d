package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.streetcomb.network.GeodesicLength;

/**
 * Shapefiles in three projections against GDAL's ogrinfo (the independent reader): feature count,
 * total geodesic length after transforming to WGS 84 (SpatiaLite's ST_Length on the ellipsoid, through
 * GDAL's SQLite dialect) and the count of one-way lines. The fixtures are the real extracts listed in
 * NOTICE: Spearfish (NAD27 / UTM 13N), Mesa (NAD83 / Arizona Central, US survey feet) and Aurich (DHDN /
 * Gauss-Kruger zone 2, oneway 0/1 field).
 */
class ShapefileReaderTest {

    @ParameterizedTest
    @CsvSource({
        "fixtures/shapefiles/spearfish-nad27-utm13n/roads.shp, EPSG:26713, ''",
        "fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp, EPSG:2223, ''",
        "fixtures/shapefiles/aurich-dhdn-gk2/roads.shp, , oneway=1",
    })
    void matchesGdal(String path, String crs, String oneWayWhere) {
        Path file = Path.of(path);
        RoadLayer layer = LayerReaders.read(file, ReadOptions.DEFAULTS.withCrs(crs));

        String table = file.getFileName().toString().replace(".shp", "");
        String gdal = Gdal.ogrinfo("-dialect", "SQLite", "-sql", "SELECT COUNT(*) AS n, "
                + "SUM(ST_Length(ST_Transform(geometry, 4326), 1)) AS metres"
                + (oneWayWhere.isEmpty() ? ", 0 AS oneway" : ", SUM(" + oneWayWhere + ") AS oneway")
                + " FROM \"" + table + "\"", file.toString());

        assertEquals((int) Gdal.number(gdal, "n"), layer.report().featuresRead());
        assertEquals((int) Gdal.number(gdal, "oneway"), layer.report().oneWayLines());
        double metres = layer.features().stream().mapToDouble(f -> length(f)).sum();
        // datum shifts differ slightly between PROJ and SIS; lengths agree far closer than 1 in 10,000
        assertEquals(Gdal.number(gdal, "metres"), metres, 1e-4 * metres);
        assertTrue(layer.report().sourceCrs().contains("to WGS 84 within"));
    }

    private static double length(RoadFeature f) {
        var c = f.line().getCoordinates();
        double sum = 0;
        for (int i = 1; i < c.length; i++) {
            sum += GeodesicLength.between(c[i - 1].x, c[i - 1].y, c[i].x, c[i].y);
        }
        return sum;
    }

    @Test
    void readsUtf8NamesWhateverTheHeaderClaims() {
        // SOURCES.md: the Aurich .dbf's language driver says cp1252 but its text is UTF-8 ("Straße").
        // ogrinfo -oo ENCODING=UTF-8 lists "Oldersumer Straße" and "Große Mühlenwallstraße" among the names
        RoadLayer layer = LayerReaders.read(Path.of("fixtures/shapefiles/aurich-dhdn-gk2/roads.shp"));
        Set<String> names = new TreeSet<>(layer.features().stream().map(RoadFeature::name).toList());
        assertTrue(names.containsAll(Set.of("Oldersumer Straße", "Große Mühlenwallstraße")), names::toString);
        assertTrue(names.stream().noneMatch(n -> n.contains("Ã")), "mis-decoded UTF-8");
    }
}
