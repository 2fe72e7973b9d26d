package org.streetcomb.write;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;

/**
 * The one place a GeoJSON FeatureCollection file (RFC 7946) is opened and closed: UTF-8, numbers written
 * plain (no exponent), a final newline, through {@link AtomicFile}. Writers supply the features.
 */
public final class FeatureCollectionFile {

    /** Writes the features of a collection into its open {@code features} array. */
    @FunctionalInterface
    public interface Features {
        void write(JsonGenerator json) throws IOException;
    }

    private FeatureCollectionFile() {
    }

    public static void write(Path target, Features features) {
        write(target, null, null, features);
    }

    /**
     * Writes a collection with a foreign member (RFC 7946 section 6.1) before its features: {@code name}
     * holding {@code value}; none when {@code name} is null.
     */
    public static void write(Path target, String name, JsonNode value, Features features) {
        AtomicFile.write(target, out -> {
            try (JsonGenerator json = new JsonFactory().createGenerator(out, JsonEncoding.UTF8)
                    .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN)) {
                json.setCodec(new ObjectMapper());
                json.writeStartObject();
                json.writeStringField("type", "FeatureCollection");
                if (name != null) {
                    json.writeFieldName(name);
                    json.writeTree(value);
                }
                json.writeArrayFieldStart("features");
                features.write(json);
                json.writeEndArray();
                json.writeEndObject();
                json.writeRaw('\n');
            }
        });
    }
}
