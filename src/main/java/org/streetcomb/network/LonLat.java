package org.streetcomb.network;

/** A WGS84 position in decimal degrees. */
public record LonLat(double lon, double lat) {
}
