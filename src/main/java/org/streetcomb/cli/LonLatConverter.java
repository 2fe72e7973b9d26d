package org.streetcomb.cli;

import org.streetcomb.network.LonLat;
import picocli.CommandLine;

/** Parses "LON,LAT" in decimal degrees and checks the ranges. */
final class LonLatConverter implements CommandLine.ITypeConverter<LonLat> {

    @Override
    public LonLat convert(String value) {
        String[] parts = value.split(",");
        if (parts.length != 2) {
            throw new CommandLine.TypeConversionException("expected LON,LAT in degrees, e.g. -30.71,45.12; got '" + value + "'");
        }
        double lon;
        double lat;
        try {
            lon = Double.parseDouble(parts[0].trim());
            lat = Double.parseDouble(parts[1].trim());
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("expected two numbers LON,LAT; got '" + value + "'");
        }
        if (!(lon >= -180 && lon <= 180)) {
            throw new CommandLine.TypeConversionException("longitude " + parts[0].trim() + " outside [-180, 180]");
        }
        if (!(lat >= -90 && lat <= 90)) {
            throw new CommandLine.TypeConversionException("latitude " + parts[1].trim() + " outside [-90, 90]");
        }
        return new LonLat(lon, lat);
    }
}
