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
        if (!Files.isRegularFile(file)) {
            throw InputError.at(file, null, "no such file");
        }
        return forFile(file).read(file);
    }

    static LayerReader forFile(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".geojson") || name.endsWith(".json")) {
            return new GeoJsonReader();
        }
        throw InputError.at(file, null, "unknown file type: expected .geojson or .json");
    }
}
