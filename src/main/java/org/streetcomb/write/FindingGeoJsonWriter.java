package org.streetcomb.write;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.Point;
import org.streetcomb.check.Finding;

/**
 * Writes health-check findings as a GeoJSON FeatureCollection (RFC 7946) for a map viewer: one Feature per
 * finding, a Point, LineString or MultiLineString where the defect is (null geometry for findings without
 * a place), with the properties {@code kind}, {@code severity}, {@code value}, {@code unit},
 * {@code feature_ids} (comma-separated, so every viewer's attribute table shows it), {@code problem} and
 * {@code fix}. Coordinates have at most 7 decimals (about 1 cm).
 */
public final class FindingGeoJsonWriter {

    public void write(Path target, List<Finding> findings) {
        FeatureCollectionFile.write(target, json -> {
            for (Finding finding : findings) {
                writeFinding(json, finding);
            }
        });
    }

    private static void writeFinding(JsonGenerator json, Finding finding) throws IOException {
        json.writeStartObject();
        json.writeStringField("type", "Feature");
        json.writeObjectFieldStart("properties");
        json.writeStringField("kind", finding.kind().code());
        json.writeStringField("severity", finding.severity().code());
        json.writeNumberField("value", BigDecimal.valueOf(finding.value()).setScale(3, RoundingMode.HALF_EVEN));
        json.writeStringField("unit", finding.unit());
        json.writeStringField("feature_ids", String.join(",", finding.featureIds()));
        json.writeStringField("problem", finding.problem());
        json.writeStringField("fix", finding.fix());
        json.writeEndObject();
        json.writeFieldName("geometry");
        writeGeometry(json, finding.location());
        json.writeEndObject();
    }

    private static void writeGeometry(JsonGenerator json, Geometry geometry) throws IOException {
        if (geometry == null) {
            json.writeNull();
            return;
        }
        json.writeStartObject();
        if (geometry instanceof Point point) {
            json.writeStringField("type", "Point");
            json.writeFieldName("coordinates");
            position(json, point.getX(), point.getY());
        } else if (geometry instanceof LineString line) {
            json.writeStringField("type", "LineString");
            json.writeFieldName("coordinates");
            positions(json, line);
        } else if (geometry instanceof MultiLineString lines) {
            json.writeStringField("type", "MultiLineString");
            json.writeArrayFieldStart("coordinates");
            for (int i = 0; i < lines.getNumGeometries(); i++) {
                positions(json, (LineString) lines.getGeometryN(i));
            }
            json.writeEndArray();
        } else {
            throw new IllegalStateException("unexpected finding geometry " + geometry.getGeometryType());
        }
        json.writeEndObject();
    }

    private static void positions(JsonGenerator json, LineString line) throws IOException {
        json.writeStartArray();
        for (int i = 0; i < line.getNumPoints(); i++) {
            position(json, line.getCoordinateN(i).x, line.getCoordinateN(i).y);
        }
        json.writeEndArray();
    }

    private static void position(JsonGenerator json, double lon, double lat) throws IOException {
        json.writeStartArray();
        json.writeNumber(BigDecimal.valueOf(lon).setScale(7, RoundingMode.HALF_EVEN).stripTrailingZeros());
        json.writeNumber(BigDecimal.valueOf(lat).setScale(7, RoundingMode.HALF_EVEN).stripTrailingZeros());
        json.writeEndArray();
    }
}
