package org.streetcomb.write;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Writes the positions of one GeoJSON LineString: longitude, latitude rounded to 7 decimals (about 1 cm,
 * RFC 7946 recommends no more), and a position equal to the one before it left out, since it would make
 * a degenerate segment. Every GeoJSON line streetcomb writes goes through here, so they round alike.
 */
public final class GeoJsonPositions {

    private final JsonGenerator json;
    private BigDecimal lastLon;
    private BigDecimal lastLat;
    private int written;

    /** @param json a generator positioned inside the coordinates array */
    public GeoJsonPositions(JsonGenerator json) {
        this.json = json;
    }

    /** Writes the position unless, rounded, it repeats the previous one. */
    public void add(double lon, double lat) throws IOException {
        BigDecimal x = degrees(lon);
        BigDecimal y = degrees(lat);
        if (!(x.equals(lastLon) && y.equals(lastLat))) {
            write(x, y);
        }
    }

    /** Writes the position even if it repeats the previous one (a LineString needs two positions). */
    public void addAlways(double lon, double lat) throws IOException {
        write(degrees(lon), degrees(lat));
    }

    public int written() {
        return written;
    }

    private void write(BigDecimal x, BigDecimal y) throws IOException {
        json.writeStartArray();
        json.writeNumber(x);
        json.writeNumber(y);
        json.writeEndArray();
        lastLon = x;
        lastLat = y;
        written++;
    }

    private static BigDecimal degrees(double value) {
        return BigDecimal.valueOf(value).setScale(7, RoundingMode.HALF_EVEN).stripTrailingZeros();
    }
}
