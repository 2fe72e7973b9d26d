package org.streetcomb.read;

import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Gives the datum of an ESRI-dialect WKT its EPSG code, so Apache SIS finds the datum shift the EPSG
 * dataset holds for it. ESRI names datums "D_" plus a name of its own ("D_North_American_1927" for the
 * EPSG's "North American Datum 1927"); SIS matches some of these to EPSG names and aliases but not the
 * common North American, European and Pacific ones, and then knows only a shift kilometres off, which
 * the reader refuses. The code is added only when the WKT's ellipsoid is the one the EPSG dataset gives
 * that datum, so a misnamed datum is never given another's shift. Written by hand: the mapping is a table
 * no library on Maven Central serves.
 */
final class EsriDatumNames {

    /** An EPSG geodetic datum: its code and its ellipsoid's semi-major axis and inverse flattening. */
    record EpsgDatum(int code, double semiMajor, double inverseFlattening) {
    }

    private static final double GRS80 = 298.257222101;

    /** ESRI datum names and the EPSG datums they stand for (codes and ellipsoids from the EPSG dataset). */
    static final Map<String, EpsgDatum> DATUMS = Map.ofEntries(
            Map.entry("D_NORTH_AMERICAN_1927", new EpsgDatum(6267, 6378206.4, 294.9786982138982)),
            Map.entry("D_NORTH_AMERICAN_1983", new EpsgDatum(6269, 6378137, GRS80)),
            Map.entry("D_NORTH_AMERICAN_1983_HARN", new EpsgDatum(6152, 6378137, GRS80)),
            Map.entry("D_NAD_1983_2011", new EpsgDatum(1116, 6378137, GRS80)),
            Map.entry("D_NORTH_AMERICAN_1983_CSRS", new EpsgDatum(6140, 6378137, GRS80)),
            Map.entry("D_OSGB_1936", new EpsgDatum(6277, 6377563.396, 299.3249646)),
            Map.entry("D_ETRS_1989", new EpsgDatum(6258, 6378137, GRS80)),
            Map.entry("D_EUROPEAN_1950", new EpsgDatum(6230, 6378388, 297)),
            Map.entry("D_GDA_1994", new EpsgDatum(6283, 6378137, GRS80)),
            Map.entry("D_GDA2020", new EpsgDatum(1168, 6378137, GRS80)),
            Map.entry("D_NZGD_2000", new EpsgDatum(6167, 6378137, GRS80)),
            Map.entry("D_WGS_1972", new EpsgDatum(6322, 6378135, 298.26)),
            Map.entry("D_TOKYO", new EpsgDatum(6301, 6377397.155, 299.1528128)),
            Map.entry("D_JGD_2000", new EpsgDatum(6612, 6378137, GRS80)),
            Map.entry("D_RGF_1993", new EpsgDatum(6171, 6378137, GRS80)),
            Map.entry("D_BELGE_1972", new EpsgDatum(6313, 6378388, 297)),
            Map.entry("D_AMERSFOORT", new EpsgDatum(6289, 6377397.155, 299.1528128)),
            Map.entry("D_SIRGAS_2000", new EpsgDatum(6674, 6378137, GRS80)),
            Map.entry("D_KOREA_2000", new EpsgDatum(6737, 6378137, GRS80)),
            Map.entry("D_HONG_KONG_1980", new EpsgDatum(6611, 6378388, 297)),
            Map.entry("D_DEUTSCHES_HAUPTDREIECKSNETZ", new EpsgDatum(6314, 6377397.155, 299.1528128)));

    private static final Pattern DATUM = Pattern.compile(
            "DATUM\\[\\s*\"([^\"]+)\"\\s*,\\s*SPHEROID\\[\\s*\"[^\"]*\"\\s*,\\s*([-+0-9.Ee]+)\\s*,\\s*([-+0-9.Ee]+)",
            Pattern.CASE_INSENSITIVE);

    private EsriDatumNames() {
    }

    /**
     * The WKT with {@code AUTHORITY["EPSG","code"]} added to its DATUM element when the datum is a known
     * ESRI name without an authority and its ellipsoid matches; otherwise the WKT unchanged.
     */
    static String withEpsgCode(String wkt) {
        Matcher m = DATUM.matcher(wkt);
        if (!m.find()) {
            return wkt;
        }
        EpsgDatum datum = DATUMS.get(m.group(1).toUpperCase(Locale.ROOT));
        if (datum == null || !sameEllipsoid(datum, m.group(2), m.group(3))) {
            return wkt;
        }
        int open = wkt.indexOf('[', m.start());
        int close = closing(wkt, open);
        int spheroidClose = closing(wkt, wkt.indexOf('[', wkt.toUpperCase(Locale.ROOT).indexOf("SPHEROID", open)));
        if (close < 0 || spheroidClose < 0 || wkt.substring(spheroidClose, close).toUpperCase(Locale.ROOT).contains("AUTHORITY")) {
            return wkt;
        }
        return wkt.substring(0, close) + ",AUTHORITY[\"EPSG\",\"" + datum.code() + "\"]" + wkt.substring(close);
    }

    private static boolean sameEllipsoid(EpsgDatum datum, String semiMajor, String inverseFlattening) {
        try {
            return Math.abs(Double.parseDouble(semiMajor) - datum.semiMajor()) < 1e-3
                    && Math.abs(Double.parseDouble(inverseFlattening) - datum.inverseFlattening()) < 1e-6;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    /** The index of the bracket closing the one at {@code open}, skipping quoted text; -1 if none. */
    private static int closing(String wkt, int open) {
        if (open < 0) {
            return -1;
        }
        int depth = 0;
        boolean quoted = false;
        for (int i = open; i < wkt.length(); i++) {
            char c = wkt.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted && (c == '[' || c == '(')) {
                depth++;
            } else if (!quoted && (c == ']' || c == ')') && --depth == 0) {
                return i;
            }
        }
        return -1;
    }
}
