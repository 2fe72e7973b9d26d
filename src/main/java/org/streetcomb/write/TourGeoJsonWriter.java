package org.streetcomb.write;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/**
 * Writes tours as a GeoJSON FeatureCollection (RFC 7946): one Feature per tour whose geometry is the whole
 * tour as one ordered LineString, and optionally one Feature per step. Coordinates are longitude,
 * latitude with at most 7 decimals (about 1 cm), consecutive repeated points removed; there is no
 * {@code crs} member, as RFC 7946 requires. Lengths are in metres with 3 decimals.
 */
public final class TourGeoJsonWriter {

    private final boolean steps;

    /** @param steps also write one feature per step */
    public TourGeoJsonWriter(boolean steps) {
        this.steps = steps;
    }

    public void write(Path target, StreetNetwork network, List<Tour> tours) {
        write(target, network, tours, null, null);
    }

    /** As {@link #write(Path, StreetNetwork, List)}, with a foreign member {@code name} (none when null). */
    public void write(Path target, StreetNetwork network, List<Tour> tours, String name, JsonNode value) {
        FeatureCollectionFile.write(target, name, value, json -> {
            for (int t = 0; t < tours.size(); t++) {
                writeTour(json, network, tours.get(t), t + 1);
            }
            if (steps) {
                for (int t = 0; t < tours.size(); t++) {
                    writeSteps(json, network, tours.get(t), t + 1);
                }
            }
        });
    }

    private static void writeTour(JsonGenerator json, StreetNetwork network, Tour tour, int number) throws IOException {
        json.writeStartObject();
        json.writeStringField("type", "Feature");
        json.writeObjectFieldStart("properties");
        json.writeNumberField("tour", number);
        json.writeNumberField("steps", tour.steps());
        double length = tour.length(network);
        double deadhead = tour.deadhead(network);
        json.writeNumberField("length_m", metres(length));
        json.writeNumberField("service_m", metres(length - deadhead));
        json.writeNumberField("deadhead_m", metres(deadhead));
        json.writeEndObject();
        json.writeObjectFieldStart("geometry");
        json.writeStringField("type", "LineString");
        json.writeArrayFieldStart("coordinates");
        GeoJsonPositions points = new GeoJsonPositions(json);
        for (int i = 0; i < tour.steps(); i++) {
            edge(points, network, tour.edges()[i], tour.forward()[i]);
        }
        json.writeEndArray();
        json.writeEndObject();
        json.writeEndObject();
    }

    private static void writeSteps(JsonGenerator json, StreetNetwork network, Tour tour, int number) throws IOException {
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            json.writeStartObject();
            json.writeStringField("type", "Feature");
            json.writeObjectFieldStart("properties");
            json.writeNumberField("tour", number);
            json.writeNumberField("step", i + 1);
            json.writeStringField("feature_id", network.feature(e).id());
            json.writeStringField("street", network.feature(e).name());
            json.writeStringField("pass", tour.service()[i] ? "service" : "deadhead");
            json.writeNumberField("length_m", metres(network.length(e)));
            json.writeEndObject();
            json.writeObjectFieldStart("geometry");
            json.writeStringField("type", "LineString");
            json.writeArrayFieldStart("coordinates");
            edge(new GeoJsonPositions(json), network, e, tour.forward()[i]);
            json.writeEndArray();
            json.writeEndObject();
            json.writeEndObject();
        }
    }

    static BigDecimal metres(double value) {
        return BigDecimal.valueOf(value).setScale(3, RoundingMode.HALF_EVEN);
    }

    /** Writes an edge's polyline in the direction driven. */
    private static void edge(GeoJsonPositions points, StreetNetwork network, int e, boolean forward) throws IOException {
        int count = network.pointCount(e);
        for (int k = 0; k < count; k++) {
            int i = forward ? k : count - 1 - k;
            points.add(network.pointLon(e, i), network.pointLat(e, i));
        }
    }
}
