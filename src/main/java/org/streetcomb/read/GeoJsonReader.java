package org.streetcomb.read;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.PrecisionModel;
import org.streetcomb.InputError;

/**
 * Reads road centrelines from a GeoJSON FeatureCollection (RFC 7946) or a single Feature.
 *
 * <p>The collection is streamed: one feature at a time is held as a tree, so the layer's size is bounded
 * by its kept lines, not by the JSON text. LineString and MultiLineString features are kept (one road
 * line per part); every other geometry type, and features without geometry, are counted in the
 * {@link ReadReport}. Positions must be finite and within longitude [-180, 180] and latitude [-90, 90];
 * a third (altitude) value is ignored. Errors name the file, the line and the feature.
 */
public final class GeoJsonReader implements LayerReader {

    private static final GeometryFactory GEOMETRY = new GeometryFactory(new PrecisionModel(), 4326);
    /** Jackson's fast double parser (correctly rounded, like Double.parseDouble): coordinates are most of a layer. */
    private static final ObjectMapper MAPPER = new ObjectMapper(JsonFactory.builder()
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER).build());

    private final AttributeMapping mapping;

    public GeoJsonReader() {
        this(ReadOptions.DEFAULTS);
    }

    public GeoJsonReader(ReadOptions options) {
        this.mapping = new AttributeMapping(options);
    }

    @Override
    public RoadLayer read(Path file) {
        Collector collector = new Collector(file);
        try (InputStream in = Files.newInputStream(file);
             JsonParser parser = MAPPER.getFactory().createParser(in)) {
            readTopLevel(parser, collector);
        } catch (JsonProcessingException e) {
            var loc = e.getLocation();
            String place = loc == null ? null : "line " + loc.getLineNr() + ", column " + loc.getColumnNr();
            throw InputError.at(file, place, "malformed JSON: " + e.getOriginalMessage().lines().findFirst().orElse(""));
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read: " + e.getMessage());
        }
        ReadTally tally = collector.tally;
        if (tally.isEmpty()) {
            throw InputError.at(file, null, tally.features() == 0
                    ? "no features: expected a FeatureCollection of LineString or MultiLineString road lines"
                    : "no road lines kept among " + tally.features() + " features (skipped: " + tally.skippedText() + ")");
        }
        return tally.layer(file, ReadReport.WGS84);
    }

    private void readTopLevel(JsonParser parser, Collector collector) throws IOException {
        if (parser.nextToken() != JsonToken.START_OBJECT) {
            throw InputError.at(collector.file, "line 1", "expected a GeoJSON object");
        }
        String type = null;
        // the other fields are kept in case the object is a single Feature
        ObjectNode single = MAPPER.createObjectNode();
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String field = parser.currentName();
            JsonToken value = parser.nextToken();
            if (field.equals("features") && value == JsonToken.START_ARRAY) {
                while (parser.nextToken() != JsonToken.END_ARRAY) {
                    int line = parser.currentLocation().getLineNr();
                    JsonNode feature = parser.readValueAsTree();
                    collector.feature(feature, line);
                }
            } else if (field.equals("type") && value == JsonToken.VALUE_STRING) {
                type = parser.getText();
            } else {
                single.set(field, parser.readValueAsTree());
            }
        }
        if ("Feature".equals(type)) {
            collector.feature(single, 1);
        } else if (!"FeatureCollection".equals(type)) {
            throw InputError.at(collector.file, null, "top-level type is " + (type == null ? "missing" : '"' + type + '"')
                    + ": expected \"FeatureCollection\" or \"Feature\"");
        }
    }

    private final class Collector {
        final Path file;
        final ReadTally tally = new ReadTally();

        Collector(Path file) {
            this.file = file;
        }

        void feature(JsonNode feature, int line) {
            // features are counted from 0, as GDAL counts a GeoJSON layer's FIDs, so a place or an id
            // given here is the feature a user finds in desktop GIS
            int fid = tally.feature() - 1;
            String place = "line " + line + " (feature " + fid + ")";
            if (!feature.isObject()) {
                throw InputError.at(file, place, "a feature must be a JSON object");
            }
            JsonNode geometry = feature.get("geometry");
            if (geometry == null || geometry.isNull()) {
                tally.skip("no geometry");
                return;
            }
            String type = geometry.path("type").asText("");
            JsonNode coordinates = geometry.get("coordinates");
            Map<String, String> properties = properties(feature.get("properties"));
            if (!type.equals("LineString") && !type.equals("MultiLineString")) {
                tally.skip(type.isEmpty() ? "unknown geometry" : type);
                return;
            }
            if (!mapping.keeps(properties, tally)) {
                return;
            }
            String id = featureId(feature, properties, fid);
            List<LineString> lines = new ArrayList<>();
            if (type.equals("LineString")) {
                add(lines, coordinates, place);
            } else if (coordinates == null || !coordinates.isArray()) {
                throw InputError.at(file, place, "MultiLineString without a coordinates array");
            } else {
                for (JsonNode part : coordinates) {
                    add(lines, part, place);
                }
            }
            mapping.keep(id, properties, lines, tally, file + ": " + place);
        }

        /** The feature's id member, else an "id" property (both as GDAL takes them), else its FID. */
        private String featureId(JsonNode feature, Map<String, String> properties, int fid) {
            JsonNode id = feature.get("id");
            if (id != null && (id.isTextual() || id.isNumber())) {
                return id.asText();
            }
            return properties.getOrDefault("id", String.valueOf(fid));
        }

        private void add(List<LineString> lines, JsonNode positions, String place) {
            if (positions == null || !positions.isArray()) {
                throw InputError.at(file, place, "LineString without a coordinates array");
            }
            if (positions.size() < 2) {
                tally.skip("LineString with fewer than 2 positions");
                return;
            }
            Coordinate[] coords = new Coordinate[positions.size()];
            int i = 0;
            for (JsonNode position : positions) {
                coords[i] = position(position, place + ", position " + (i + 1));
                i++;
            }
            lines.add(GEOMETRY.createLineString(coords));
        }

        private Coordinate position(JsonNode position, String place) {
            if (!position.isArray() || position.size() < 2 || !position.get(0).isNumber() || !position.get(1).isNumber()) {
                throw InputError.at(file, place, "a position must be an array [longitude, latitude]");
            }
            double lon = position.get(0).asDouble();
            double lat = position.get(1).asDouble();
            if (!Double.isFinite(lon) || lon < -180 || lon > 180) {
                throw InputError.at(file, place, "longitude " + lon + " outside [-180, 180]");
            }
            if (!Double.isFinite(lat) || lat < -90 || lat > 90) {
                throw InputError.at(file, place, "latitude " + lat + " outside [-90, 90]"
                        + (Math.abs(lon) <= 90 && Math.abs(lat) <= 180 ? " (are longitude and latitude swapped?)" : ""));
            }
            return new Coordinate(lon, lat);
        }

        private Map<String, String> properties(JsonNode node) {
            Map<String, String> properties = new LinkedHashMap<>();
            if (node != null && node.isObject()) {
                for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                    Map.Entry<String, JsonNode> entry = it.next();
                    JsonNode value = entry.getValue();
                    if (!value.isNull()) {
                        properties.put(entry.getKey(), value.isValueNode() ? value.asText() : value.toString());
                    }
                }
            }
            return properties;
        }
    }
}
