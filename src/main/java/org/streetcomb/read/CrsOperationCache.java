package org.streetcomb.read;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;
import org.apache.sis.io.wkt.WKTFormat;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.TransformException;

/**
 * Remembers the transformation chosen for a CRS definition, so each definition is resolved once.
 *
 * <p>Why: choosing the operation (Apache SIS's {@code CRS.findOperation}) opens and searches the embedded
 * EPSG database, about 5 to 8 s of CPU, on every run of the command; the chosen operation itself is a short
 * chain of formulas with parameters (a projection, a Helmert shift), which SIS writes and reads back as
 * WKT 2 {@code CONCAT_MT}/{@code PARAM_MT} in a few milliseconds without the database. So the first run
 * stores that WKT, keyed by the SHA-256 of the definition text and the layer's extent (the extent can
 * change the operation chosen), with the description that carries the datum shift's accuracy; the
 * accuracy check runs before anything is stored, so a refused definition is never cached and is refused
 * again on every run.
 *
 * <p>Entries live in the process (one map) and, when a cache folder is known, in one small file each:
 * the system property {@code streetcomb.crs.cache}, else {@code $XDG_CACHE_HOME/streetcomb/crs}, else
 * {@code ~/.cache/streetcomb/crs}. An entry is stored only when the WKT read back maps probe points of the
 * extent to within {@link #ROUND_TRIP_DEGREES} (about a millimetre) of the live transform; an entry that no longer parses is
 * ignored and rebuilt. A folder that cannot be written just means no persisted entries.
 */
final class CrsOperationCache {

    /** A stored transform must reproduce the live one this closely (in degrees, about 1 mm). */
    static final double ROUND_TRIP_DEGREES = 1e-8;

    private static final String VERSION = "streetcomb-crs-cache 1";

    /** A resolved transformation and its description ("NAME, to WGS 84 within N m"). */
    record Entry(MathTransform transform, String description) {
    }

    private static final Map<String, Entry> IN_PROCESS = new ConcurrentHashMap<>();

    private CrsOperationCache() {
    }

    /**
     * The entry for {@code definition} over the given extent: from this process, from the cache folder,
     * or from {@code resolve} (then stored).
     */
    static Entry get(String definition, double minX, double minY, double maxX, double maxY, Supplier<Entry> resolve) {
        return get(folder(), definition, minX, minY, maxX, maxY, resolve);
    }

    /** As {@link #get(String, double, double, double, double, Supplier)} with the given folder (null: none). */
    static Entry get(Path folder, String definition, double minX, double minY, double maxX, double maxY,
                     Supplier<Entry> resolve) {
        String key = key(definition, minX, minY, maxX, maxY);
        Entry known = IN_PROCESS.get(key);
        if (known != null) {
            return known;
        }
        Path file = folder == null ? null : folder.resolve(key + ".wkt");
        Entry entry = file == null ? null : load(file);
        if (entry == null) {
            entry = resolve.get();
            if (file != null && entry.transform() != null) {
                store(file, entry, new double[] {minX, minY, maxX, maxY});
            }
        }
        IN_PROCESS.put(key, entry);
        return entry;
    }

    /** The cache folder, or null when none can be named. */
    static Path folder() {
        String property = System.getProperty("streetcomb.crs.cache");
        if (property != null) {
            return property.isBlank() ? null : Path.of(property);
        }
        String xdg = System.getenv("XDG_CACHE_HOME");
        if (xdg != null && !xdg.isBlank()) {
            return Path.of(xdg, "streetcomb", "crs");
        }
        String home = System.getProperty("user.home");
        return home == null || home.isBlank() ? null : Path.of(home, ".cache", "streetcomb", "crs");
    }

    /** Forgets the entries held in this process (tests use it to exercise the folder). */
    static void clearInProcess() {
        IN_PROCESS.clear();
    }

    static String key(String definition, double minX, double minY, double maxX, double maxY) {
        String text = VERSION + "\n" + definition.strip() + "\n"
                + String.format(java.util.Locale.ROOT, "%.9g %.9g %.9g %.9g", minX, minY, maxX, maxY);
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    private static Entry load(Path file) {
        try {
            if (!Files.isRegularFile(file)) {
                return null;
            }
            String text = Files.readString(file, StandardCharsets.UTF_8);
            int first = text.indexOf('\n');
            int second = first < 0 ? -1 : text.indexOf('\n', first + 1);
            if (second < 0 || !text.substring(0, first).equals(VERSION)) {
                return null;
            }
            Object parsed = new WKTFormat().parseObject(text.substring(second + 1));
            return parsed instanceof MathTransform mt ? new Entry(mt, text.substring(first + 1, second)) : null;
        } catch (IOException | java.text.ParseException | RuntimeException e) {
            return null;
        }
    }

    private static void store(Path file, Entry entry, double[] extent) {
        try {
            String wkt = entry.transform().toWKT();
            MathTransform back = (MathTransform) new WKTFormat().parseObject(wkt);
            if (!sameOnProbes(entry.transform(), back, extent)) {
                return;
            }
            Files.createDirectories(file.getParent());
            Path part = Files.createTempFile(file.getParent(), "entry", ".part");
            Files.writeString(part, VERSION + "\n" + entry.description() + "\n" + wkt, StandardCharsets.UTF_8);
            Files.move(part, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | java.text.ParseException | TransformException | RuntimeException e) {
            // no persisted entry: the next run resolves the definition again
        }
    }

    /** Both transforms agree at the extent's corners and centre (or at the origin when there is no extent). */
    private static boolean sameOnProbes(MathTransform a, MathTransform b, double[] e) throws TransformException {
        double[] probes = e[0] <= e[2] && e[1] <= e[3]
                ? new double[] {e[0], e[1], e[2], e[3], e[0], e[3], e[2], e[1], (e[0] + e[2]) / 2, (e[1] + e[3]) / 2}
                : new double[] {0, 0};
        int n = probes.length / 2;
        double[] pa = new double[probes.length];
        double[] pb = new double[probes.length];
        a.transform(probes, 0, pa, 0, n);
        b.transform(probes, 0, pb, 0, n);
        for (int i = 0; i < probes.length; i++) {
            if (!(Math.abs(pa[i] - pb[i]) <= ROUND_TRIP_DEGREES)) {
                return false;
            }
        }
        return true;
    }
}
