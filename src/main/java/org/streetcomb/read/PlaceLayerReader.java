package org.streetcomb.read;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.streetcomb.InputError;

/**
 * Reads the features of an area layer (polygons: wards, districts, gritting zones) or a depot layer
 * (points) from GeoJSON, an ESRI shapefile (or a .zip holding one) or a GeoPackage, into WGS84
 * longitude/latitude with the same CRS handling as the road readers ({@link Wgs84Transform}: the file's
 * own definition, or the {@code crs} given, which takes precedence). Every feature is returned whatever its
 * geometry type, so a caller can name the one that is not what it expected.
 *
 * <p>Shapefile polygons are assembled from their rings as the ESRI Shapefile Technical Description (1998)
 * says: a clockwise ring is an outer ring, an anticlockwise one a hole of the outer ring that holds it.
 * Such layers are small (tens to thousands of features), so each is read whole; O(points).
 */
public final class PlaceLayerReader {

    private static final GeometryFactory GEOMETRY = new GeometryFactory(new PrecisionModel(), 4326);
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private PlaceLayerReader() {
    }

    /**
     * The points of a point layer (reload places, depots) as longitude/latitude pairs, in the layer's order;
     * a feature that is not a single point is refused with its id, so a user finds it in their GIS.
     *
     * @param option the option that named the layer, for messages
     */
    public static List<double[]> points(Path file, String option) {
        List<double[]> points = new ArrayList<>();
        for (Place place : read(file, null, null)) {
            if (!(place.geometry() instanceof org.locationtech.jts.geom.Point point) || point.isEmpty()) {
                throw InputError.at(file, "feature " + place.id(), (place.geometry() == null ? "no geometry"
                        : "a " + place.geometry().getGeometryType()) + ": " + option + " takes a layer of points");
            }
            points.add(new double[] {point.getX(), point.getY()});
        }
        return points;
    }

    /**
     * @param crs   "EPSG:code" or a WKT file for a layer that states none (or states it wrongly), or null
     * @param table the table of a GeoPackage holding several feature tables, or null
     */
    public static List<Place> read(Path file, String crs, String table) {
        if (!Files.isRegularFile(file)) {
            throw InputError.at(file, null, "no such file");
        }
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        List<Place> places;
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            places = geoJson(file);
        } else if (name.endsWith(".shp") || name.endsWith(".zip")) {
            places = shapefile(file, crs);
        } else if (name.endsWith(".gpkg")) {
            places = geoPackage(file, crs, table);
        } else {
            throw InputError.at(file, null, "unknown file type for an area or depot layer: expected .geojson, .json, "
                    + ".shp, a .zip holding a shapefile, or .gpkg");
        }
        if (places.isEmpty()) {
            throw InputError.at(file, null, "no features");
        }
        return List.copyOf(places);
    }

    // ---- GeoJSON (RFC 7946: always WGS84)

    private static List<Place> geoJson(Path file) {
        JsonNode root;
        try {
            root = MAPPER.readTree(file.toFile());
        } catch (JsonProcessingException e) {
            var loc = e.getLocation();
            throw InputError.at(file, loc == null ? null : "line " + loc.getLineNr(), "malformed JSON: "
                    + e.getOriginalMessage().lines().findFirst().orElse(""));
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read: " + e.getMessage());
        }
        List<JsonNode> features = new ArrayList<>();
        if (root != null && "Feature".equals(root.path("type").asText())) {
            features.add(root);
        } else if (root != null && root.path("features").isArray()) {
            root.path("features").forEach(features::add);
        } else {
            throw InputError.at(file, null, "expected a GeoJSON FeatureCollection or Feature");
        }
        List<Place> places = new ArrayList<>();
        for (int i = 0; i < features.size(); i++) {
            JsonNode feature = features.get(i);
            String place = "feature " + (i + 1);
            Map<String, String> properties = new LinkedHashMap<>();
            JsonNode props = feature.path("properties");
            for (Iterator<Map.Entry<String, JsonNode>> it = props.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> entry = it.next();
                if (!entry.getValue().isNull()) {
                    properties.put(entry.getKey(), entry.getValue().isValueNode() ? entry.getValue().asText()
                            : entry.getValue().toString());
                }
            }
            JsonNode id = feature.get("id");
            String featureId = id != null && (id.isTextual() || id.isNumber()) ? id.asText()
                    : properties.getOrDefault("id", String.valueOf(i + 1));
            JsonNode geometry = feature.get("geometry");
            places.add(new Place(featureId, properties, geometry == null || geometry.isNull() ? null
                    : geoJsonGeometry(geometry, file, place)));
        }
        return places;
    }

    private static Geometry geoJsonGeometry(JsonNode geometry, Path file, String place) {
        JsonNode c = geometry.path("coordinates");
        String type = geometry.path("type").asText("");
        return switch (type) {
            case "Point" -> GEOMETRY.createPoint(position(c, file, place));
            case "LineString" -> GEOMETRY.createLineString(positions(c, file, place));
            case "MultiLineString" -> {
                List<Geometry> parts = new ArrayList<>();
                c.forEach(part -> parts.add(GEOMETRY.createLineString(positions(part, file, place))));
                yield GEOMETRY.buildGeometry(parts);
            }
            case "Polygon" -> polygon(c, file, place);
            case "MultiPolygon" -> {
                List<Polygon> parts = new ArrayList<>();
                c.forEach(part -> parts.add(polygon(part, file, place)));
                yield GEOMETRY.createMultiPolygon(parts.toArray(new Polygon[0]));
            }
            default -> GEOMETRY.createGeometryCollection();
        };
    }

    private static Polygon polygon(JsonNode rings, Path file, String place) {
        if (!rings.isArray() || rings.isEmpty()) {
            throw InputError.at(file, place, "a polygon needs an array of rings");
        }
        LinearRing shell = ring(positions(rings.get(0), file, place), file, place);
        LinearRing[] holes = new LinearRing[rings.size() - 1];
        for (int r = 1; r < rings.size(); r++) {
            holes[r - 1] = ring(positions(rings.get(r), file, place), file, place);
        }
        return GEOMETRY.createPolygon(shell, holes);
    }

    private static LinearRing ring(Coordinate[] coords, Object file, String place) {
        if (coords.length < 4 || !coords[0].equals2D(coords[coords.length - 1])) {
            throw InputError.at(file, place, "a polygon ring needs at least 4 positions, the last equal to the first");
        }
        return GEOMETRY.createLinearRing(coords);
    }

    private static Coordinate[] positions(JsonNode array, Path file, String place) {
        if (!array.isArray()) {
            throw InputError.at(file, place, "expected an array of positions");
        }
        Coordinate[] coords = new Coordinate[array.size()];
        for (int i = 0; i < coords.length; i++) {
            coords[i] = position(array.get(i), file, place);
        }
        return coords;
    }

    private static Coordinate position(JsonNode p, Path file, String place) {
        if (!p.isArray() || p.size() < 2 || !p.get(0).isNumber() || !p.get(1).isNumber()) {
            throw InputError.at(file, place, "a position must be an array [longitude, latitude]");
        }
        double lon = p.get(0).asDouble();
        double lat = p.get(1).asDouble();
        if (!(lon >= -180 && lon <= 180 && lat >= -90 && lat <= 90)) {
            throw InputError.at(file, place, "position " + lon + "," + lat + " is not a longitude,latitude in degrees");
        }
        return new Coordinate(lon, lat);
    }

    // ---- shapefile

    private static List<Place> shapefile(Path file, String crs) {
        if (!ShapefileZip.extension(file.getFileName().toString()).equals(".zip")) {
            return shapefile(file, file.toString(), crs);
        }
        Path folder = null;
        try {
            folder = Files.createTempDirectory("streetcomb-shp").toRealPath();
            Path shp = ShapefileZip.unpack(file, folder);
            return shapefile(shp, file + "!" + folder.relativize(shp), crs);
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot unpack into a temporary folder: " + e.getMessage());
        } finally {
            ShapefileReader.deleteQuietly(folder);
        }
    }

    private static List<Place> shapefile(Path shp, String label, String crs) {
        Path dbf = ShapefileReader.sidecar(shp, ".dbf", label);
        Path prj = ShapefileReader.find(shp, ".prj");
        Path cpg = ShapefileReader.find(shp, ".cpg");
        ReadTally tally = new ReadTally();
        List<Place> places = new ArrayList<>();
        try (ShpLineReader shapes = ShpLineReader.anyShape(shp, label);
             DbfAttributes attributes = new DbfAttributes(dbf, cpg == null ? null : ShapefileReader.charset(cpg, label),
                     ShapefileReader.sibling(label, ".dbf"))) {
            Wgs84Transform toWgs84 = transform(crs, prj == null ? null : Files.readString(prj, StandardCharsets.ISO_8859_1),
                    label, new Envelope(shapes.minX(), shapes.maxX(), shapes.minY(), shapes.maxY()));
            for (ShpLineReader.Shape shape; (shape = shapes.next()) != null; ) {
                if (shape.number() > attributes.recordCount()) {
                    break;
                }
                Map<String, String> properties = attributes.next(tally);
                String place = "record " + shape.number();
                Geometry geometry = shape.parts().length == 0 ? null
                        : toWgs84(shpGeometry(shapes.shapeType(), shape.parts()), toWgs84, label, place);
                places.add(new Place(String.valueOf(shape.number()), properties, geometry));
            }
        } catch (IOException e) {
            throw InputError.at(label, null, "cannot read: " + e.getMessage());
        }
        return places;
    }

    /** Rings to polygons by their orientation (clockwise: outer), points, or lines. */
    private static Geometry shpGeometry(int type, double[][] parts) {
        if (ShpLineReader.isPoint(type)) {
            return GEOMETRY.createPoint(new Coordinate(parts[0][0], parts[0][1]));
        }
        List<Geometry> lines = new ArrayList<>();
        List<LinearRing> shells = new ArrayList<>();
        List<List<LinearRing>> holes = new ArrayList<>();
        List<LinearRing> orphans = new ArrayList<>();
        for (double[] xy : parts) {
            Coordinate[] coords = new Coordinate[xy.length / 2];
            for (int i = 0; i < coords.length; i++) {
                coords[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
            }
            if (!ShpLineReader.isPolygon(type)) {
                if (coords.length >= 2) {
                    lines.add(GEOMETRY.createLineString(coords));
                }
                continue;
            }
            if (coords.length < 4 || !coords[0].equals2D(coords[coords.length - 1])) {
                continue;
            }
            LinearRing ring = GEOMETRY.createLinearRing(coords);
            if (Orientation.isCCW(coords)) {
                orphans.add(ring);
            } else {
                shells.add(ring);
                holes.add(new ArrayList<>());
            }
        }
        if (!ShpLineReader.isPolygon(type)) {
            return GEOMETRY.buildGeometry(lines);
        }
        for (LinearRing hole : orphans) {
            boolean placed = false;
            for (int s = 0; s < shells.size() && !placed; s++) {
                if (GEOMETRY.createPolygon(shells.get(s)).covers(hole.getPointN(0))) {
                    holes.get(s).add(hole);
                    placed = true;
                }
            }
            if (!placed) {
                // an anticlockwise ring outside every outer ring: a layer digitised the other way round
                shells.add(GEOMETRY.createLinearRing(hole.reverse().getCoordinates()));
                holes.add(new ArrayList<>());
            }
        }
        Polygon[] polygons = new Polygon[shells.size()];
        for (int s = 0; s < polygons.length; s++) {
            polygons[s] = GEOMETRY.createPolygon(shells.get(s), holes.get(s).toArray(new LinearRing[0]));
        }
        return polygons.length == 1 ? polygons[0] : GEOMETRY.createMultiPolygon(polygons);
    }

    // ---- GeoPackage

    private static List<Place> geoPackage(Path file, String crs, String wanted) {
        try (Connection db = GeoPackageConnection.open(file);
             Statement sql = db.createStatement()) {
            List<String[]> tables = new ArrayList<>();
            try (ResultSet rs = sql.executeQuery("SELECT g.table_name, g.column_name, g.srs_id FROM gpkg_contents c "
                    + "JOIN gpkg_geometry_columns g ON c.table_name = g.table_name WHERE c.data_type = 'features' "
                    + "ORDER BY g.table_name")) {
                while (rs.next()) {
                    tables.add(new String[] {rs.getString(1), rs.getString(2), rs.getString(3)});
                }
            }
            String names = String.join(", ", tables.stream().map(t -> t[0]).toList());
            String[] table = tables.size() == 1 && wanted == null ? tables.get(0)
                    : tables.stream().filter(t -> t[0].equals(wanted)).findFirst().orElseThrow(() -> InputError.at(file,
                    null, tables.isEmpty() ? "the GeoPackage holds no feature table" : wanted == null
                            ? "the GeoPackage holds several feature tables (" + names + "): name the one to read"
                            : "no feature table named " + wanted + "; its feature tables: " + names));
            String wkt = null;
            try (ResultSet rs = sql.executeQuery("SELECT definition FROM gpkg_spatial_ref_sys WHERE srs_id = "
                    + Long.parseLong(table[2]))) {
                if (rs.next()) {
                    wkt = rs.getString(1);
                }
            }
            List<Place> places = new ArrayList<>();
            Envelope extent = new Envelope();
            int number = 0;
            try (ResultSet rs = sql.executeQuery("SELECT * FROM " + GeoPackageReader.quote(table[0]))) {
                ResultSetMetaData meta = rs.getMetaData();
                while (rs.next()) {
                    number++;
                    Map<String, String> properties = new LinkedHashMap<>();
                    for (int c = 1; c <= meta.getColumnCount(); c++) {
                        String value = rs.getString(c);
                        if (!meta.getColumnName(c).equalsIgnoreCase(table[1]) && value != null) {
                            properties.put(meta.getColumnName(c), value);
                        }
                    }
                    byte[] blob = rs.getBytes(table[1]);
                    Geometry geometry = blob == null ? null
                            : GeoPackageReader.geometry(blob, file, "feature " + number);
                    if (geometry != null) {
                        extent.expandToInclude(geometry.getEnvelopeInternal());
                    }
                    places.add(new Place(String.valueOf(number), properties, geometry));
                }
            }
            if (places.isEmpty()) {
                return places;
            }
            if (wkt != null && (wkt.isBlank() || wkt.strip().equalsIgnoreCase("undefined"))) {
                wkt = null;
            }
            Wgs84Transform toWgs84 = transform(crs, wkt, file + ": table " + table[0], extent);
            List<Place> lonLat = new ArrayList<>();
            for (Place p : places) {
                lonLat.add(new Place(p.id(), p.properties(), p.geometry() == null ? null
                        : toWgs84(p.geometry(), toWgs84, file, "feature " + p.id())));
            }
            return lonLat;
        } catch (SQLException e) {
            String message = e.getMessage() == null ? "" : e.getMessage().lines().findFirst().orElse("");
            throw InputError.at(file, null, "not a readable GeoPackage: " + message);
        }
    }

    // ---- coordinates

    private static Wgs84Transform transform(String crs, String wkt, Object label, Envelope extent) {
        if (crs != null) {
            return Wgs84Transform.forOption(crs, extent.getMinX(), extent.getMinY(), extent.getMaxX(), extent.getMaxY());
        }
        if (wkt == null) {
            throw InputError.at(label, null, "no coordinate reference system is stated: give it as EPSG:code");
        }
        return Wgs84Transform.forWkt(wkt, label, extent.getMinX(), extent.getMinY(), extent.getMaxX(), extent.getMaxY());
    }

    /** A copy of the geometry with every coordinate transformed to longitude/latitude. */
    private static Geometry toWgs84(Geometry geometry, Wgs84Transform toWgs84, Object file, String place) {
        Geometry copy = GEOMETRY.createGeometry(geometry);
        copy.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                double[] xy = {seq.getX(i), seq.getY(i)};
                Coordinate c = toWgs84.lonLat(xy, 1, file, place)[0];
                seq.setOrdinate(i, 0, c.x);
                seq.setOrdinate(i, 1, c.y);
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        return copy;
    }
}
