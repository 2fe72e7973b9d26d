package org.streetcomb.read;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.streetcomb.InputError;

/**
 * Reads road centrelines from the line layer of an OGC GeoPackage (.gpkg) through sqlite-jdbc.
 *
 * <p>The layer is the one feature table whose gpkg_geometry_columns type is a line (or generic geometry);
 * a file with several is refused with their names. Each geometry blob is the GeoPackage binary header
 * ("GP", version, flags whose bits 1-3 give the envelope size) followed by standard WKB, read by JTS.
 * LineStrings and the parts of MultiLineStrings become road lines, other geometries are counted as
 * skipped. The CRS is the gpkg_spatial_ref_sys definition of the layer's srs_id, or the --crs option,
 * which takes precedence; every non-geometry column becomes a property.
 */
final class GeoPackageReader implements LayerReader {

    private static final GeometryFactory GEOMETRY = new GeometryFactory(new PrecisionModel(), 4326);
    private static final String LINE_TYPES = "'LINESTRING', 'MULTILINESTRING', 'GEOMETRY'";
    /** Envelope sizes in bytes by the flags' envelope indicator (OGC 12-128r18, clause 2.1.3.1.1). */
    private static final int[] ENVELOPE_BYTES = {0, 32, 48, 48, 64};

    private final ReadOptions options;
    private final AttributeMapping mapping;

    GeoPackageReader(ReadOptions options) {
        this.options = options;
        this.mapping = new AttributeMapping(options);
    }

    private record Row(String id, Map<String, String> properties, List<LineString> lines) {
    }

    @Override
    public RoadLayer read(Path file) {
        try (Connection db = GeoPackageConnection.open(file);
             Statement sql = db.createStatement()) {
            String[] layer = lineLayer(sql, file, options.layer());
            String table = layer[0];
            String column = layer[1];
            ReadTally tally = new ReadTally();
            List<Row> rows = new ArrayList<>();
            Envelope extent = new Envelope();
            String pk = primaryKey(sql, table);
            try (ResultSet rs = sql.executeQuery("SELECT * FROM " + quote(table))) {
                ResultSetMetaData meta = rs.getMetaData();
                while (rs.next()) {
                    int number = tally.feature();
                    Map<String, String> attributes = new LinkedHashMap<>();
                    for (int c = 1; c <= meta.getColumnCount(); c++) {
                        String value = rs.getString(c);
                        if (!meta.getColumnName(c).equalsIgnoreCase(column) && value != null) {
                            attributes.put(meta.getColumnName(c), value);
                        }
                    }
                    String id = pk == null ? String.valueOf(number) : attributes.getOrDefault(pk, String.valueOf(number));
                    List<LineString> lines = lines(rs.getBytes(column), tally, file, "feature " + id);
                    if (!lines.isEmpty() && mapping.keeps(attributes, tally)) {
                        lines.forEach(line -> extent.expandToInclude(line.getEnvelopeInternal()));
                        rows.add(new Row(id, attributes, lines));
                    }
                }
            }
            Wgs84Transform toWgs84 = toWgs84(sql, layer[2], file, extent);
            for (Row row : rows) {
                List<LineString> lonLat = new ArrayList<>();
                for (LineString line : row.lines()) {
                    Coordinate[] coords = line.getCoordinates();
                    double[] xy = new double[2 * coords.length];
                    for (int i = 0; i < coords.length; i++) {
                        xy[2 * i] = coords[i].x;
                        xy[2 * i + 1] = coords[i].y;
                    }
                    lonLat.add(GEOMETRY.createLineString(toWgs84.lonLat(xy, coords.length, file, "feature " + row.id())));
                }
                mapping.keep(row.id(), row.properties(), lonLat, tally, file + ": feature " + row.id());
            }
            if (tally.isEmpty()) {
                throw InputError.at(file, null, "no road lines kept among " + tally.features() + " features of layer "
                        + table + " (skipped: " + tally.skippedText() + ")");
            }
            return tally.layer(file, toWgs84.description());
        } catch (SQLException e) {
            throw InputError.at(file, null, "not a readable GeoPackage: " + firstLine(e));
        }
    }

    /**
     * The line layer's table name, geometry column and srs_id: the one named, or the only one; refuses
     * none, several without a name, or a name that is not among them.
     */
    private static String[] lineLayer(Statement sql, Path file, String wanted) throws SQLException {
        List<String[]> layers = new ArrayList<>();
        try (ResultSet rs = sql.executeQuery("SELECT g.table_name, g.column_name, g.srs_id"
                + " FROM gpkg_contents c JOIN gpkg_geometry_columns g ON c.table_name = g.table_name"
                + " WHERE c.data_type = 'features' AND upper(g.geometry_type_name) IN (" + LINE_TYPES + ")"
                + " ORDER BY g.table_name")) {
            while (rs.next()) {
                layers.add(new String[] {rs.getString(1), rs.getString(2), rs.getString(3)});
            }
        } catch (SQLException e) {
            throw InputError.at(file, null, "not a GeoPackage (no gpkg_contents and gpkg_geometry_columns tables): "
                    + firstLine(e));
        }
        String names = String.join(", ", layers.stream().map(l -> l[0]).toList());
        if (wanted != null) {
            return layers.stream().filter(l -> l[0].equals(wanted)).findFirst().orElseThrow(() -> InputError.at(file, null,
                    "no line layer named " + wanted + (layers.isEmpty() ? "; the GeoPackage holds none" : "; its line layers: " + names)));
        }
        if (layers.size() != 1) {
            throw InputError.at(file, null, layers.isEmpty() ? "the GeoPackage holds no line layer"
                    : "the GeoPackage holds several line layers (" + names + "): name the road layer with --layer");
        }
        return layers.get(0);
    }

    private static String primaryKey(Statement sql, String table) throws SQLException {
        try (ResultSet rs = sql.executeQuery("PRAGMA table_info(" + quote(table) + ")")) {
            while (rs.next()) {
                if (rs.getInt("pk") == 1) {
                    return rs.getString("name");
                }
            }
        }
        return null;
    }

    private Wgs84Transform toWgs84(Statement sql, String srsId, Path file, Envelope extent) throws SQLException {
        if (options.crs() != null) {
            return Wgs84Transform.forOption(options.crs(), extent.getMinX(), extent.getMinY(), extent.getMaxX(),
                    extent.getMaxY());
        }
        try (ResultSet rs = sql.executeQuery("SELECT definition FROM gpkg_spatial_ref_sys WHERE srs_id = " + Long.parseLong(srsId))) {
            String wkt = rs.next() ? rs.getString(1) : null;
            if (wkt == null || wkt.isBlank() || wkt.strip().equalsIgnoreCase("undefined")) {
                throw InputError.at(file, null, "the line layer's srs_id " + srsId + " has no coordinate reference system "
                        + "definition: state it with --crs=EPSG:code (or --crs=FILE holding its WKT)");
            }
            return Wgs84Transform.forWkt(wkt, file + ": gpkg_spatial_ref_sys srs_id " + srsId, extent.getMinX(),
                    extent.getMinY(), extent.getMaxX(), extent.getMaxY());
        }
    }

    /** The road lines of one geometry blob in the layer's own coordinates; counts what is skipped. */
    private static List<LineString> lines(byte[] blob, ReadTally tally, Path file, String place) {
        List<LineString> lines = new ArrayList<>();
        if (blob == null) {
            tally.skip("null geometry");
            return lines;
        }
        Geometry geometry = geometry(blob, file, place);
        if (!(geometry instanceof LineString || geometry instanceof MultiLineString)) {
            tally.skip(geometry.getGeometryType() + " geometry");
            return lines;
        }
        for (int i = 0; i < geometry.getNumGeometries(); i++) {
            LineString line = (LineString) geometry.getGeometryN(i);
            if (line.getNumPoints() < 2) {
                tally.skip("line part with fewer than 2 points");
            } else {
                lines.add(line);
            }
        }
        return lines;
    }

    /** The geometry of a GeoPackage geometry blob (header, then WKB), in the layer's own coordinates. */
    static Geometry geometry(byte[] blob, Path file, String place) {
        if (blob.length < 8 || blob[0] != 'G' || blob[1] != 'P') {
            throw InputError.at(file, place, "geometry is not a GeoPackage geometry blob (no \"GP\" header)");
        }
        int envelope = (blob[3] >> 1) & 7;
        if (envelope >= ENVELOPE_BYTES.length) {
            throw InputError.at(file, place, "geometry header names an unknown envelope type " + envelope);
        }
        int header = 8 + ENVELOPE_BYTES[envelope];
        Geometry geometry;
        try {
            geometry = new WKBReader().read(Arrays.copyOfRange(blob, header, blob.length));
        } catch (ParseException | RuntimeException e) {
            throw InputError.at(file, place, "geometry does not parse as WKB: " + e.getMessage());
        }
        return geometry;
    }

    static String quote(String identifier) {
        return "\"" + identifier.replace("\"", "\"\"") + "\"";
    }

    private static String firstLine(Exception e) {
        String message = e.getMessage();
        return message == null ? e.getClass().getSimpleName() : message.lines().findFirst().orElse("");
    }
}
