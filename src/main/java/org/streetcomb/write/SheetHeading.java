package org.streetcomb.write;

import java.time.LocalDate;
import java.util.Locale;

/**
 * What heads a direction sheet, so a crew knows which plan it holds: the road layer it was planned on, the
 * depot, the day it was planned, the vehicle (0 when one vehicle or none was planned), what each section is
 * called ("Tour" or "Trip") and the speeds that turn distance into the duration printed for each section.
 *
 * @param layer      the road layer's file name
 * @param depotLat   the depot's latitude, degrees (WGS84)
 * @param depotLon   the depot's longitude, degrees (WGS84)
 * @param planned    the day the plan was made, or null to leave it out
 * @param vehicle    the vehicle's number, from 1; 0 when the plan has no fleet of several
 * @param label      "Tour" or "Trip"
 * @param serviceKmh average speed while servicing
 * @param travelKmh  average speed on deadhead
 */
public record SheetHeading(String layer, double depotLat, double depotLon, LocalDate planned, int vehicle, String label,
                           double serviceKmh, double travelKmh) {

    /** The depot as latitude, longitude: the order phones and handheld units take when a crew types it in. */
    String depot() {
        return String.format(Locale.ROOT, "%.6f, %.6f", depotLat, depotLon);
    }

    /** Hours to drive the given service and deadhead metres at the heading's speeds. */
    double hours(double serviceMetres, double deadheadMetres) {
        return serviceMetres / (1000 * serviceKmh) + deadheadMetres / (1000 * travelKmh);
    }

    /** "1 h 05 min", "40 min": rounded to the minute. */
    public static String duration(double hours) {
        long minutes = Math.round(hours * 60);
        return minutes < 60 ? minutes + " min" : String.format(Locale.ROOT, "%d h %02d min", minutes / 60, minutes % 60);
    }
}
