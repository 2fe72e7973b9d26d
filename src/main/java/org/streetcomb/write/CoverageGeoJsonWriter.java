package org.streetcomb.write;

import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.EdgeSlice;
import org.streetcomb.coverage.MissedPart;
import org.streetcomb.coverage.StreetCoverage;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.write.GeoJsonPositions;

/**
 * Writes coverage as GeoJSON FeatureCollections (RFC 7946, no {@code crs} member, longitude/latitude with
 * at most 7 decimals) for a map viewer: one layer of streets with their status and driven share, and one
 * of the missed parts as lines drawn in the direction they must still be driven ({@code way} = either,
 * along or against the street's digitised direction). Lengths are metres with 3 decimals, shares 0..1
 * with 4. Files are written through {@link FeatureCollectionFile}.
 */
public final class CoverageGeoJsonWriter {

    private CoverageGeoJsonWriter() {
    }

    public static void writeStreets(Path target, CoverageReport report) {
        FeatureCollectionFile.write(target, json -> {
            for (StreetCoverage street : report.streets()) {
                RoadFeature f = street.feature();
                json.writeStartObject();
                json.writeStringField("type", "Feature");
                json.writeObjectFieldStart("properties");
                json.writeStringField("feature_id", f.id());
                json.writeStringField("street", f.name());
                json.writeStringField("status", street.status().label());
                json.writeNumberField("fraction", round(street.fraction(), 4));
                json.writeNumberField("length_m", round(street.length(), 3));
                json.writeNumberField("needed_m", round(street.needed(), 3));
                json.writeNumberField("driven_m", round(street.driven(), 3));
                json.writeNumberField("wrong_way_m", round(street.wrongWay(), 3));
                json.writeStringField("travel", f.travel().name().toLowerCase(Locale.ROOT));
                json.writeEndObject();
                Coordinate[] coords = f.line().getCoordinates();
                double[] packed = new double[2 * coords.length];
                for (int i = 0; i < coords.length; i++) {
                    packed[2 * i] = coords[i].x;
                    packed[2 * i + 1] = coords[i].y;
                }
                lineString(json, packed);
                json.writeEndObject();
            }
        });
    }

    public static void writeMissed(Path target, CoverageReport report) {
        StreetNetwork network = report.network();
        FeatureCollectionFile.write(target, json -> {
            for (MissedPart part : report.missed()) {
                RoadFeature f = network.feature(part.edge());
                json.writeStartObject();
                json.writeStringField("type", "Feature");
                json.writeObjectFieldStart("properties");
                json.writeStringField("feature_id", f.id());
                json.writeStringField("street", f.name());
                json.writeNumberField("edge", part.edge());
                json.writeStringField("way", part.way().label());
                json.writeNumberField("length_m", round(part.length(), 3));
                json.writeEndObject();
                lineString(json, EdgeSlice.of(network, part.edge(), part.from(), part.to(),
                        part.way() == MissedPart.Way.AGAINST));
                json.writeEndObject();
            }
        });
    }

    private static void lineString(JsonGenerator json, double[] lonLat) throws IOException {
        json.writeObjectFieldStart("geometry");
        json.writeStringField("type", "LineString");
        json.writeArrayFieldStart("coordinates");
        GeoJsonPositions positions = new GeoJsonPositions(json);
        for (int i = 0; i < lonLat.length; i += 2) {
            // a repeated position is left out, but a line always keeps two positions
            if (i == lonLat.length - 2 && positions.written() == 1) {
                positions.addAlways(lonLat[i], lonLat[i + 1]);
            } else {
                positions.add(lonLat[i], lonLat[i + 1]);
            }
        }
        json.writeEndArray();
        json.writeEndObject();
    }

    private static BigDecimal round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN);
    }
}
