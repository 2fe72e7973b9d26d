package org.streetcomb.read;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.zip.ZipEntry;
import java.util.zip.ZipException;
import java.util.zip.ZipInputStream;
import org.streetcomb.InputError;

/**
 * Unpacks the shapefile members of a .zip into a private temporary folder so the shapefile reader can
 * stream them. Only shapefile members are written; an entry whose path is absolute or climbs out of the
 * folder ("../") is refused, as is an archive holding no .shp or more than one.
 */
final class ShapefileZip {

    private static final Set<String> MEMBERS = Set.of(".shp", ".shx", ".dbf", ".prj", ".cpg");

    private ShapefileZip() {
    }

    /** Unpacks {@code zip} into {@code folder} and returns the one .shp inside. */
    static Path unpack(Path zip, Path folder) {
        List<Path> shapefiles = new ArrayList<>();
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(zip))) {
            for (ZipEntry entry; (entry = in.getNextEntry()) != null; ) {
                String name = entry.getName();
                Path target = folder.resolve(name).normalize();
                if (name.startsWith("/") || name.startsWith("\\") || name.contains("..") || !target.startsWith(folder)) {
                    throw InputError.at(zip, "entry " + name, "the path leads outside the archive's folder: refused");
                }
                if (entry.isDirectory() || !MEMBERS.contains(extension(name))) {
                    continue;
                }
                Files.createDirectories(target.getParent());
                Files.copy(in, target);
                if (extension(name).equals(".shp")) {
                    shapefiles.add(target);
                }
            }
        } catch (ZipException e) {
            throw InputError.at(zip, null, "not a readable zip archive: " + e.getMessage());
        } catch (IOException e) {
            throw InputError.at(zip, null, "cannot unpack: " + e.getMessage());
        }
        if (shapefiles.size() != 1) {
            throw InputError.at(zip, null, shapefiles.isEmpty() ? "the archive holds no .shp file"
                    : "the archive holds " + shapefiles.size() + " shapefiles (" + folder.relativize(shapefiles.get(0))
                      + ", " + folder.relativize(shapefiles.get(1)) + ", ...): unpack it and name one");
        }
        return shapefiles.get(0);
    }

    static String extension(String name) {
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot).toLowerCase(Locale.ROOT);
    }
}
