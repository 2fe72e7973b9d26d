package org.streetcomb.report;

import java.util.List;

/**
 * A named layer of the report's map that the user can switch on and off. Commands build their own layers
 * (a plan's passes, a check's findings, a drive's covered and missed streets) and the writers draw them
 * in the order given, the first at the bottom.
 *
 * @param id       short identifier, unique within the report ([a-z0-9-])
 * @param title    legend text
 * @param note     one line saying what the layer shows, or empty
 * @param kind     how its features are drawn
 * @param style    colour and width
 * @param shown    whether it is on when the report opens
 * @param features what it draws
 */
public record MapLayer(String id, String title, String note, Kind kind, MapStyle style, boolean shown,
                       List<MapFeature> features) {

    /** How a layer's features are drawn. */
    public enum Kind {
        /** polylines */
        LINES,
        /** filled circles of the style's width */
        POINTS,
        /** the feature's label as text at its point */
        LABELS,
        /**
         * filled arrowheads, each part a closed triangle in map units; drawn only where the map shows them at a
         * readable size ({@link #ARROW_METRES_PER_PIXEL})
         */
        ARROWS
    }

    /** Arrowheads are drawn while a pixel covers at most this many metres: a 12 m head is then 6 pixels or more. */
    public static final double ARROW_METRES_PER_PIXEL = 2;

    public MapLayer {
        if (!id.matches("[a-z0-9-]+")) {
            throw new IllegalArgumentException("layer id must be [a-z0-9-]+: " + id);
        }
        features = List.copyOf(features);
    }
}
