package org.streetcomb.report;

/**
 * How a layer is drawn, the same in the HTML map and the PNG quick look.
 *
 * @param colour  CSS hex colour {@code #rrggbb}; a feature may override it
 * @param width   line width, or point diameter, in screen pixels
 * @param opacity 0..1
 * @param dash    dash pattern in pixels ("6 4"), or empty for a solid line
 */
public record MapStyle(String colour, double width, double opacity, String dash) {

    public MapStyle {
        if (!colour.matches("#[0-9a-f]{6}")) {
            throw new IllegalArgumentException("colour must be #rrggbb in lower case: " + colour);
        }
        if (!dash.matches("[0-9 ]*")) {
            throw new IllegalArgumentException("dash must be numbers separated by spaces: " + dash);
        }
    }

    public static MapStyle solid(String colour, double width, double opacity) {
        return new MapStyle(colour, width, opacity, "");
    }
}
