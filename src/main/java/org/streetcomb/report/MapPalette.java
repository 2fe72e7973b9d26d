package org.streetcomb.report;

import java.util.List;

/**
 * Every colour the maps use, in one place, so each report's legend can be checked as a whole: every class a
 * legend lists has a colour of its own that stays apart from the others for viewers with each kind of
 * dichromacy (MapPaletteTest and LegendColoursTest measure it).
 *
 * <ul>
 * <li>Tours, trips and vehicles: the palette of Okabe and Ito, "Color Universal Design" (2008), designed to
 *     stay distinct for colour-blind viewers, without its black and yellow (used below). Beyond five, colours
 *     repeat.</li>
 * <li>Coverage: the four-class diverging red-blue scheme of ColorBrewer 2.0 (Brewer, Penn State), marked
 *     colour-blind safe by its authors, so "not driven" reads as the strongest colour without telling red from
 *     green.</li>
 * <li>Health-check kinds: Paul Tol's "muted" qualitative scheme (Tol, "Colour Schemes", SRON technical note
 *     EPS/TN/09-002, 2021), nine colours made for colour-blind readers.</li>
 * <li>The rest are greys and Okabe–Ito's black, yellow and vermillion, picked so the combined legends stay
 *     apart.</li>
 * </ul>
 */
public final class MapPalette {

    /** Okabe–Ito blue, orange, bluish green, sky blue, reddish purple. */
    static final List<String> TOURS = List.of("#0072b2", "#e69f00", "#009e73", "#56b4e9", "#cc79a7");
    /** The street network, drawn under everything else. */
    static final String STREETS = "#cccccc";
    /** Deadhead passes, dotted over the service line. */
    static final String DEADHEAD = "#000000";
    static final String ARROWS = "#555555";
    /** Okabe–Ito vermillion. */
    static final String DEPOT = "#d55e00";
    /** Where each separate part's tour starts. */
    static final String STARTS = "#333333";
    /** Tol's olive: reload points, where a fleet's trips end to reload and the next one leaves. */
    static final String RELOADS = "#999933";
    /** Tol's indigo: the outline of a service area. */
    static final String AREA = "#332288";
    /** Okabe–Ito yellow: streets asked for but left out of the plan, in the plan's and the audit's maps alike. */
    static final String LEFT_OUT = "#f0e442";

    static final String COVERED = "#67a9cf";
    static final String PARTLY = "#ef8a62";
    static final String MISSED = "#b2182b";
    /** The stretches still to drive, drawn over the streets' status colours. */
    static final String STILL_TO_DRIVE = "#762a83";
    static final String WRONG_WAY = "#332288";
    static final String TRACKS = "#7f7f7f";

    /** Tol's muted scheme, one colour per health-check kind in the order of {@code FindingKind}. */
    static final List<String> FINDING_KINDS = List.of("#cc6677", "#882255", "#332288", "#999933", "#ddcc77", "#44aa99",
            "#88ccee", "#aa4499", "#117733");

    private MapPalette() {
    }

    /** The colour of tour, trip or vehicle number {@code index} (from 0). */
    static String tour(int index) {
        return TOURS.get(index % TOURS.size());
    }
}
