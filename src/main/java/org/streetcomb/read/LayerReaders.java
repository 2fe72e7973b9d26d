package org.streetcomb.read;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.streetcomb.InputError;

/** Picks the reader for a file from its name. */
public final class LayerReaders {

    private LayerReaders() {
    }

    public static RoadLayer read(Path file) {
        return read(file, ReadOptions.DEFAULTS);
    }

    public static RoadLayer read(Path file, ReadOptions options) {
        if (!Files.isRegularFile(file)) {
            throw InputError.at(file, null, "no such file");
        }
        RoadLayer layer = forFile(file, options).read(file);
        RoadLayer read = options.gradeSeparated() && !layer.hasTopology() ? layer.gradeSeparated(options.levelField()) : layer;
        return read.withCrossingLimit(options.crossingLimit());
    }

    static LayerReader forFile(Path file, ReadOptions options) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (options.layer() != null && !name.endsWith(".gpkg")) {
            throw InputError.at(file, null, "--layer does not apply: it picks a table of a GeoPackage (.gpkg), and this "
                    + "file holds one layer");
        }
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            if (options.crs() != null) {
                throw InputError.at(file, null, "--crs does not apply: GeoJSON is always WGS84 longitude/latitude (RFC 7946)");
            }
            return new GeoJsonReader(options);
        }
        if (name.endsWith(".osm") || name.endsWith(".osm.gz") || name.endsWith(".osm.bz2") || name.endsWith(".osm.pbf")) {
            if (options.crs() != null) {
                throw InputError.at(file, null, "--crs does not apply: OpenStreetMap data is always WGS84 longitude/latitude");
            }
            return new OsmReader(options, name.endsWith(".pbf"));
        }
        if (name.endsWith(".shp") || name.endsWith(".zip")) {
            return new ShapefileReader(options);
        }
        if (name.endsWith(".gpkg")) {
            return new GeoPackageReader(options);
        }
        throw InputError.at(file, null, "unknown file type: expected .geojson, .json, .shp, a .zip holding a shapefile, .gpkg, .osm, .osm.gz, .osm.bz2 or .osm.pbf");
    }
}
