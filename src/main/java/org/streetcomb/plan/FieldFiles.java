package org.streetcomb.plan;

import java.nio.file.Path;
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
 */
public record FieldFiles(Path tours, boolean steps, Path gpx, GpxLimits gpxLimits, Path kml, Path directions,
                         boolean recordScope) {

    /** The files without the scope record (a mop-up, say). */
    public FieldFiles(Path tours, boolean steps, Path gpx, GpxLimits gpxLimits, Path kml, Path directions) {
        this(tours, steps, gpx, gpxLimits, kml, directions, false);
    }
}
