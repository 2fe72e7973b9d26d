package org.streetcomb.read;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.regex.Pattern;
import org.apache.sis.geometry.GeneralEnvelope;
import org.apache.sis.metadata.iso.extent.DefaultGeographicBoundingBox;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.crs.AbstractCRS;
import org.apache.sis.referencing.cs.AxesConvention;
import org.locationtech.jts.geom.Coordinate;
import org.opengis.referencing.crs.CoordinateReferenceSystem;
import org.opengis.referencing.crs.GeodeticCRS;
import org.opengis.referencing.cs.CartesianCS;
import org.opengis.referencing.operation.CoordinateOperation;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.TransformException;
import org.opengis.util.FactoryException;
import org.streetcomb.InputError;

/**
 * Transforms a layer's coordinates to WGS 84 longitude/latitude with Apache SIS and the EPSG dataset.
 *
 * <p>The operation is chosen by SIS for the layer's extent. When the EPSG data know no datum shift for
 * the source CRS, SIS falls back on a "ballpark" transformation that can be off by hundreds of metres; so
 * an operation whose linear accuracy is unknown or worse than {@link #WORST_ACCURACY_METRES} is refused
 * with a message, never used. ESRI .prj files often name their datum in a way the EPSG data do not
 * recognise (for instance D_North_American_1927): {@link EsriDatumNames} gives the common ones their EPSG
 * code; for others the user states the CRS by its EPSG code.
 *
 * <p>A definition that only restates WGS 84 longitude/latitude (the usual .prj of a GPS-era layer, and
 * srs_id 4326 in GeoPackages) is recognised from its text and needs no transformation: SIS would spend
 * seconds starting its EPSG database to reach the same answer. Coordinates are then taken as longitude,
 * latitude whatever axis order the definition states, as the shapefile and GeoPackage formats store them.
 * Any other definition is resolved once and remembered by {@link CrsOperationCache}, so later runs skip
 * the EPSG database search (seconds) and parse the stored chain of formulas (milliseconds).
 */
final class Wgs84Transform {

    /** Coarser datum shifts are refused: street centrelines would no longer meet GPS tracks or depots. */
    static final double WORST_ACCURACY_METRES = 25;

    /** Deepest bracket nesting taken in WKT; real definitions stay under 10 (see {@link #checkShape}). */
    static final int MAX_WKT_DEPTH = 32;

    /** Longest WKT taken: the longest EPSG definitions with their remarks are a few kilobytes. */
    static final int MAX_WKT_CHARS = 1 << 16;

    /** SIS logs a notice about its optional data directory on first use; users need not see it. */
    private static final Logger SIS_LOG = Logger.getLogger("org.apache.sis");

    static {
        SIS_LOG.setLevel(Level.SEVERE);
    }

    private final MathTransform transform;
    private final String description;

    private Wgs84Transform(MathTransform transform, String description) {
        this.transform = transform;
        this.description = description;
    }

    /** WKT 1 of WGS 84 longitude/latitude, in the OGC and ESRI dialects, with or without authority codes. */
    private static final Pattern PLAIN_WGS84 = Pattern.compile("GEOGCS\\[\"[^\"]*\","
            + "DATUM\\[\"(D_)?WGS[ _]?(19)?84\",SPHEROID\\[\"[^\"]*\",6378137(\\.0*)?,298\\.257223563\\d*"
            + "(,AUTHORITY\\[\"EPSG\",\"7030\"\\])?\\](,AUTHORITY\\[\"EPSG\",\"6326\"\\])?\\],"
            + "PRIMEM\\[\"GREENWICH\",0(\\.0*)?(,AUTHORITY\\[\"EPSG\",\"8901\"\\])?\\],"
            + "UNIT\\[\"DEGREE\",0\\.01745329251994\\d*(,AUTHORITY\\[\"EPSG\",\"9122\"\\])?\\]"
            + "(,AXIS\\[\"[A-Z]+\",[A-Z]+\\])*(,AUTHORITY\\[\"EPSG\",\"4326\"\\])?\\]");

    /**
     * The transformation for a layer whose CRS is given as WKT (a .prj file or a GeoPackage definition),
     * for data within the given extent in source coordinates.
     */
    static Wgs84Transform forWkt(String wkt, Object file, double minX, double minY, double maxX, double maxY) {
        checkShape(wkt, file);
        String compact = wkt.strip().replaceAll("\\s+(?=(?:[^\"]*\"[^\"]*\")*[^\"]*$)", "").toUpperCase(Locale.ROOT);
        if (PLAIN_WGS84.matcher(compact).matches()) {
            return plainLonLat();
        }
        return cached("wkt " + wkt, minX, minY, maxX, maxY, () -> to(fromWkt(wkt, file), minX, minY, maxX, maxY, file));
    }

    /** Resolves a definition once per text and extent ({@link CrsOperationCache}); the accuracy check runs first. */
    private static Wgs84Transform cached(String definition, double minX, double minY, double maxX, double maxY,
                                         java.util.function.Supplier<Wgs84Transform> resolve) {
        CrsOperationCache.Entry entry = CrsOperationCache.get(definition, minX, minY, maxX, maxY, () -> {
            Wgs84Transform t = resolve.get();
            return new CrsOperationCache.Entry(t.transform, t.description);
        });
        return new Wgs84Transform(entry.transform(), entry.description());
    }

    /** The transformation for the CRS the user gave with --crs ("EPSG:code" or a file holding WKT). */
    static Wgs84Transform forOption(String crs, double minX, double minY, double maxX, double maxY) {
        String origin = "--crs " + crs;
        if (crs.strip().equalsIgnoreCase("EPSG:4326")) {
            return plainLonLat();
        }
        if (!crs.toUpperCase(Locale.ROOT).startsWith("EPSG:")) {
            // WKT in a file or on the command line is taken exactly as a .prj holding the same text would be
            return forWkt(optionWkt(crs), origin, minX, minY, maxX, maxY);
        }
        return cached("option " + crs.strip().toUpperCase(Locale.ROOT), minX, minY, maxX, maxY,
                () -> to(fromOption(crs), minX, minY, maxX, maxY, origin));
    }

    private static Wgs84Transform plainLonLat() {
        return new Wgs84Transform(null, "WGS 84, to WGS 84 within 0 m");
    }

    /** The CRS of a .prj file's WKT (OGC or ESRI dialect). */
    static CoordinateReferenceSystem fromWkt(String wkt, Object file) {
        checkShape(wkt, file);
        try {
            return CRS.fromWKT(EsriDatumNames.withEpsgCode(wkt.strip()));
        } catch (FactoryException | RuntimeException e) {
            throw InputError.at(file, null, "the coordinate reference system does not parse: " + firstLine(e));
        }
    }

    /** The CRS the user gave: "EPSG:code" or a file holding WKT. */
    static CoordinateReferenceSystem fromOption(String crs) {
        if (crs.toUpperCase(Locale.ROOT).startsWith("EPSG:")) {
            try {
                return CRS.forCode(crs.toUpperCase(Locale.ROOT));
            } catch (FactoryException | RuntimeException e) {
                throw new InputError("--crs " + crs + ": not a known EPSG code (" + firstLine(e) + ")");
            }
        }
        return fromWkt(optionWkt(crs), "--crs " + crs);
    }

    /** The WKT of a --crs value: the text itself when it looks like WKT, else the file it names. */
    private static String optionWkt(String crs) {
        if (crs.strip().matches("(?s)[A-Za-z_]+\\s*[\\[(].*")) {
            return crs;
        }
        try {
            Path file = Path.of(crs);
            if (Files.isRegularFile(file) && Files.size(file) > MAX_WKT_CHARS) {
                throw new InputError("--crs " + crs + ": " + Files.size(file) + " bytes is too long for a coordinate "
                        + "reference system definition (at most " + MAX_WKT_CHARS + ")");
            }
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputError error) {
                throw error;
            }
            throw new InputError("--crs " + crs + ": expected EPSG:code, WKT text or a readable file holding WKT");
        }
    }

    /**
     * Refuses WKT that no real definition resembles before the parser sees it: the parser recurses once per
     * bracket level, so text nested thousands deep would overflow the stack. Real definitions (a projected
     * CRS over a geographic one over a datum over an ellipsoid) nest under 10 deep.
     */
    static void checkShape(String wkt, Object file) {
        if (wkt.length() > MAX_WKT_CHARS) {
            throw InputError.at(file, null, wkt.length() + " characters is too long for a coordinate reference system "
                    + "definition (at most " + MAX_WKT_CHARS + ")");
        }
        int depth = 0;
        boolean quoted = false;
        for (int i = 0; i < wkt.length(); i++) {
            char c = wkt.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted && (c == '[' || c == '(')) {
                if (++depth > MAX_WKT_DEPTH) {
                    throw InputError.at(file, "character " + (i + 1), "the coordinate reference system definition is "
                            + "nested more than " + MAX_WKT_DEPTH + " brackets deep: not a real definition");
                }
            } else if (!quoted && (c == ']' || c == ')')) {
                depth--;
            }
        }
    }

    /**
     * The transformation from {@code source} to WGS 84 longitude/latitude for data within the given
     * extent (in source coordinates), refused when its accuracy is unknown or coarse.
     */
    static Wgs84Transform to(CoordinateReferenceSystem source, double minX, double minY, double maxX, double maxY,
                             Object file) {
        source = horizontal(source, file);
        CoordinateReferenceSystem eastNorth = AbstractCRS.castOrCopy(source).forConvention(AxesConvention.RIGHT_HANDED);
        String name = source.getName().getCode();
        try {
            DefaultGeographicBoundingBox area = null;
            // a layer's extent narrows the choice of datum shift; a damaged one (a header's box beyond any
            // place on the earth) is not used, since the projection library would be handed nonsense
            boolean sane = Math.max(Math.max(Math.abs(minX), Math.abs(maxX)), Math.max(Math.abs(minY), Math.abs(maxY)))
                    <= MAX_PROJECTED;
            if (sane && minX <= maxX && minY <= maxY) {
                GeneralEnvelope extent = new GeneralEnvelope(eastNorth);
                extent.setRange(0, minX, maxX);
                extent.setRange(1, minY, maxY);
                area = new DefaultGeographicBoundingBox();
                area.setBounds(extent);
            }
            CoordinateOperation op = CRS.findOperation(eastNorth, CommonCRS.WGS84.normalizedGeographic(), area);
            double accuracy = CRS.getLinearAccuracy(op);
            if (!(accuracy <= WORST_ACCURACY_METRES)) {
                throw InputError.at(file, null, String.format(Locale.ROOT, "no accurate datum shift from %s to WGS 84 is "
                        + "known (best accuracy %s): state the layer's CRS by its EPSG code with --crs=EPSG:code",
                        name, Double.isNaN(accuracy) ? "unknown" : String.format(Locale.ROOT, "%.0f m", accuracy)));
            }
            return new Wgs84Transform(op.getMathTransform(), String.format(Locale.ROOT, "%s, to WGS 84 within %.0f m",
                    name, accuracy));
        } catch (FactoryException | TransformException e) {
            throw InputError.at(file, null, "no transformation from " + name + " to WGS 84: " + firstLine(e));
        }
    }

    /**
     * The two-dimensional part of {@code source} that road coordinates are in; a geocentric (earth-centred
     * X, Y, Z) system has none and is refused in words rather than fed two numbers where it takes three.
     */
    private static CoordinateReferenceSystem horizontal(CoordinateReferenceSystem source, Object file) {
        String name = source.getName().getCode();
        if (source instanceof GeodeticCRS && source.getCoordinateSystem() instanceof CartesianCS) {
            throw InputError.at(file, null, name + " is a geocentric coordinate reference system (X, Y, Z from the "
                    + "earth's centre): road layers need a geographic (longitude/latitude) or projected one");
        }
        CoordinateReferenceSystem flat = CRS.getHorizontalComponent(source);
        if (flat == null || flat.getCoordinateSystem().getDimension() != 2) {
            throw InputError.at(file, null, name + " has no horizontal (longitude/latitude or easting/northing) part: "
                    + "road layers need a geographic or projected coordinate reference system");
        }
        return flat;
    }

    /** Largest absolute coordinate value read in any coordinate reference system. */
    static final double MAX_PROJECTED = 1e9;

    /** Transforms {@code count} x,y pairs in place to longitude,latitude. */
    void transform(double[] xy, int count) {
        if (transform == null) {
            return;
        }
        try {
            transform.transform(xy, 0, xy, 0, count);
        } catch (TransformException e) {
            throw new InputError("a coordinate lies outside the domain of the layer's projection: " + firstLine(e));
        }
    }

    /**
     * Transforms {@code count} x,y pairs in place and returns them as longitude/latitude coordinates,
     * refusing a point that lands off the globe (the usual sign of a wrong CRS).
     */
    Coordinate[] lonLat(double[] xy, int count, Object file, String place) {
        for (int i = 0; i < 2 * count; i++) {
            // no projection of the earth reaches a billion units (its circumference is 1.3e8 feet), so larger
            // values are damage, refused before a projection library is handed them
            if (!(Math.abs(xy[i]) <= MAX_PROJECTED)) {
                throw InputError.at(file, place + ", point " + (i / 2 + 1), "coordinate " + xy[i]
                        + " is no place on the earth in any coordinate reference system: the geometry is damaged");
            }
        }
        try {
            transform(xy, count);
        } catch (InputError e) {
            throw InputError.at(file, place, e.getMessage());
        }
        Coordinate[] coords = new Coordinate[count];
        for (int i = 0; i < count; i++) {
            double lon = xy[2 * i];
            double lat = xy[2 * i + 1];
            if (!(lon >= -180 && lon <= 180 && lat >= -90 && lat <= 90)) {
                throw InputError.at(file, place + ", point " + (i + 1),
                        "does not transform to a valid longitude/latitude: is the layer's coordinate reference system right?");
            }
            coords[i] = new Coordinate(lon, lat);
        }
        return coords;
    }

    /** The transformation itself (null for plain longitude/latitude). */
    MathTransform mathTransform() {
        return transform;
    }

    /** The source CRS and the accuracy of the datum shift, for the read report. */
    String description() {
        return description;
    }

    private static String firstLine(Exception e) {
        String message = e.getMessage();
        return InputError.inWords(e);
    }
}
