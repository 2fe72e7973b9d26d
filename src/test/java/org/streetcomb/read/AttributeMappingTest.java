package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Attribute mapping on GeoJSON layers. The one-way encodings are those of OpenStreetMap's Key:oneway
 * (https://wiki.openstreetmap.org/wiki/Key:oneway: yes, -1, no) and the from-to/to-from codes councils
 * use (common practice).
 */
class AttributeMappingTest {

    @TempDir
    Path dir;

    private Path layer(String... features) throws IOException {
        StringBuilder b = new StringBuilder("{\"type\":\"FeatureCollection\",\"features\":[");
        for (int i = 0; i < features.length; i++) {
            b.append(i == 0 ? "" : ",").append("{\"type\":\"Feature\",\"properties\":").append(features[i])
                    .append(",\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[-31.2,44.6],[-31.2,44.61]]}}");
        }
        Path file = dir.resolve("layer.geojson");
        Files.writeString(file, b.append("]}").toString());
        return file;
    }

    @Test
    void readsDefaultOneWayEncodings() throws IOException {
        Path file = layer("{\"oneway\":\"yes\"}", "{\"oneway\":\"-1\"}", "{\"oneway\":\"no\"}", "{\"oneway\":\"FT\"}",
                "{\"oneway\":\"TF\"}", "{\"oneway\":1}", "{}", "{\"oneway\":\"reversible\"}");
        RoadLayer read = LayerReaders.read(file);
        List<Travel> travel = read.features().stream().map(RoadFeature::travel).toList();
        assertEquals(List.of(Travel.FORWARD, Travel.BACKWARD, Travel.BOTH, Travel.FORWARD, Travel.BACKWARD,
                Travel.FORWARD, Travel.BOTH, Travel.BOTH), travel);
        assertEquals(5, read.report().oneWayLines());
        assertEquals(Map.of("one-way value 'reversible' not recognised, read as two-way", 1), read.report().notes());
    }

    @Test
    void honoursFieldsValuesAndFilters() throws IOException {
        Path file = layer("{\"STREET\":\"Mill Lane\",\"DIR\":\"W\",\"CLASS\":\"local\",\"GRIT\":\"Y\"}",
                "{\"STREET\":\"Quarry Road\",\"DIR\":\"A\",\"CLASS\":\"trunk\",\"GRIT\":\"N\"}",
                "{\"STREET\":\"Fen Walk\",\"DIR\":\"\",\"CLASS\":\"private\"}");
        ReadOptions d = ReadOptions.DEFAULTS;
        ReadOptions options = new ReadOptions("STREET", "DIR", Set.of("w"), Set.of("A"), Set.of(""),
                List.of(), List.of(new ReadOptions.FieldFilter("CLASS", Set.of("PRIVATE"))), "GRIT",
                d.mode(), false, false, null, false, null, null, null, null, RoadLayer.AUTOMATIC_CROSSINGS);
        RoadLayer read = LayerReaders.read(file, options);
        assertEquals(List.of("Mill Lane", "Quarry Road"), read.features().stream().map(RoadFeature::name).toList());
        assertEquals(List.of(Travel.FORWARD, Travel.BACKWARD), read.features().stream().map(RoadFeature::travel).toList());
        assertEquals(List.of(true, false), read.features().stream().map(RoadFeature::required).toList());
        assertEquals(Map.of("matching --drop CLASS=private", 1), read.report().skippedByType());
        assertEquals(3, read.report().featuresRead());
    }

    @Test
    void keepFilterMustMatchEveryFilter() throws IOException {
        Path file = layer("{\"a\":\"1\",\"b\":\"x\"}", "{\"a\":\"1\",\"b\":\"y\"}", "{\"a\":\"2\",\"b\":\"x\"}");
        ReadOptions d = ReadOptions.DEFAULTS;
        ReadOptions options = new ReadOptions(d.nameField(), d.onewayField(), d.onewayForward(), d.onewayBackward(),
                d.onewayBoth(), List.of(new ReadOptions.FieldFilter("a", Set.of("1")), new ReadOptions.FieldFilter("b", Set.of("x"))),
                List.of(), null, d.mode(), false, false, null, false, null, null, null, null, RoadLayer.AUTOMATIC_CROSSINGS);
        RoadLayer read = LayerReaders.read(file, options);
        assertEquals(1, read.features().size());
        assertFalse(read.report().skippedByType().isEmpty());
    }
}
