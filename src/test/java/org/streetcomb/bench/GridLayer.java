package org.streetcomb.bench;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Random;

/**
 * Writes a generated street grid as GeoJSON for benchmarks (invented data): east-west streets are long
 * lines through every junction, so the noder has to split them; north-south blocks are separate lines,
 * a tenth of them left out at random so the grid has many odd nodes, as real networks do. Junctions are
 * jittered by up to 20 m.
 */
public final class GridLayer {

    private GridLayer() {
    }

    /** A grid of about {@code edges} edges; returns the number of block sides written. */
    public static long write(Path file, int edges, long seed) throws IOException {
        int side = (int) Math.ceil(Math.sqrt(edges / 1.9));
        double step = 0.001;
        Random random = new Random(seed);
        double[][] lon = new double[side + 1][side + 1];
        double[][] lat = new double[side + 1][side + 1];
        for (int i = 0; i <= side; i++) {
            for (int j = 0; j <= side; j++) {
                lon[i][j] = 5 + i * step + (random.nextDouble() - 0.5) * step * 0.3;
                lat[i][j] = 40 + j * step * 0.75 + (random.nextDouble() - 0.5) * step * 0.2;
            }
        }
        long sides = 0;
        try (JsonGenerator json = new JsonFactory().createGenerator(file.toFile(), JsonEncoding.UTF8)) {
            json.writeStartObject();
            json.writeStringField("type", "FeatureCollection");
            json.writeArrayFieldStart("features");
            for (int j = 0; j <= side; j++) {
                start(json, "row " + j);
                for (int i = 0; i <= side; i++) {
                    point(json, lon[i][j], lat[i][j]);
                }
                end(json);
                sides += side;
            }
            for (int i = 0; i <= side; i++) {
                for (int j = 0; j < side; j++) {
                    if (random.nextDouble() < 0.9) {
                        start(json, "column " + i + " block " + j);
                        point(json, lon[i][j], lat[i][j]);
                        point(json, lon[i][j + 1], lat[i][j + 1]);
                        end(json);
                        sides++;
                    }
                }
            }
            json.writeEndArray();
            json.writeEndObject();
        }
        return sides;
    }

    private static void start(JsonGenerator json, String name) throws IOException {
        json.writeStartObject();
        json.writeStringField("type", "Feature");
        json.writeObjectFieldStart("properties");
        json.writeStringField("name", name);
        json.writeEndObject();
        json.writeObjectFieldStart("geometry");
        json.writeStringField("type", "LineString");
        json.writeArrayFieldStart("coordinates");
    }

    private static void point(JsonGenerator json, double lon, double lat) throws IOException {
        json.writeStartArray();
        json.writeNumber(Math.round(lon * 1e7) / 1e7);
        json.writeNumber(Math.round(lat * 1e7) / 1e7);
        json.writeEndArray();
    }

    private static void end(JsonGenerator json) throws IOException {
        json.writeEndArray();
        json.writeEndObject();
        json.writeEndObject();
    }
}
