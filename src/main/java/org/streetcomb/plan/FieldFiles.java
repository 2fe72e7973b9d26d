package org.streetcomb.plan;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import org.streetcomb.write.GpxLimits;

/**
 * Which files to write for a plan; any may be null.
 *
 * @param tours      the tours (or trips) as a GeoJSON FeatureCollection
 * @param steps      also one GeoJSON feature per step of each tour
 * @param gpx        GPX 1.1 for handheld units (one file per vehicle when a fleet of several was planned)
 * @param gpxLimits  simplification and point limits for GPX and KML
 * @param kml        KML 2.2 for globe viewers
 * @param directions a direction sheet, .csv or .html (one per vehicle, as GPX)
 * @param recordScope keep the plan's scope in the tours' GeoJSON ({@link ScopeRecord}), for the audit
 * @param planned    the day printed on the direction sheets as the day of planning, or null for none
 */
public record FieldFiles(Path tours, boolean steps, Path gpx, GpxLimits gpxLimits, Path kml, Path directions,
                         boolean recordScope, LocalDate planned) {

    /** The files, with today's date on the sheets ({@link #today()}). */
    public FieldFiles(Path tours, boolean steps, Path gpx, GpxLimits gpxLimits, Path kml, Path directions,
                      boolean recordScope) {
        this(tours, steps, gpx, gpxLimits, kml, directions, recordScope, today());
    }

    /**
     * Today in the machine's time zone, or the day of {@code SOURCE_DATE_EPOCH} (seconds since 1970, UTC) when
     * that variable is set, so a rerun on another day can reproduce a plan's files byte for byte (the
     * reproducible-builds.org convention).
     */
    public static LocalDate today() {
        String epoch = System.getenv("SOURCE_DATE_EPOCH");
        if (epoch != null && epoch.strip().matches("\\d{1,12}")) {
            return Instant.ofEpochSecond(Long.parseLong(epoch.strip())).atZone(ZoneOffset.UTC).toLocalDate();
        }
        return LocalDate.now();
    }

    /** The files without the scope record (a mop-up, say) and with no date on the sheets. */
    public FieldFiles(Path tours, boolean steps, Path gpx, GpxLimits gpxLimits, Path kml, Path directions) {
        this(tours, steps, gpx, gpxLimits, kml, directions, false, null);
    }

    /** The same files with the given day of planning on the sheets. */
    public FieldFiles planned(LocalDate day) {
        return new FieldFiles(tours, steps, gpx, gpxLimits, kml, directions, recordScope, day);
    }
}
