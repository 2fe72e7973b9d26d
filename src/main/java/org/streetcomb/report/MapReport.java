package org.streetcomb.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/**
 * Everything one report shows: the map's layers and groups, the command's summary, how it was run, and
 * the cautions. The HTML report and the PNG quick look are both drawn from it.
 *
 * @param title            heading of the report
 * @param layers           map layers, bottom first
 * @param groups           feature groups the user can switch together (for example tours), possibly none
 * @param summary          the command's summary, the same tree it prints with {@code --json}; the report's
 *                         tables are drawn from it so their numbers are the printed ones
 * @param run              how the result was made: command line, input files, options, as label and text
 * @param cautions         safety cautions, one sentence each
 * @param basemap          tiles to draw under the layers, or null for none (the report then needs no network)
 * @param displayTolerance lines are simplified for display to within this many metres (0: not simplified)
 * @param glance           the few figures a reader needs first (the lines of the command's text summary that
 *                         matter most), shown above everything else
 */
public record MapReport(String title, List<MapLayer> layers, List<MapGroup> groups, JsonNode summary,
                        List<Entry> run, List<String> cautions, Basemap basemap, double displayTolerance,
                        List<Entry> glance) {

    /** A labelled line of text. */
    public record Entry(String label, String value) {
    }

    /**
     * Web map tiles drawn under the layers when the viewer is online.
     *
     * @param urlTemplate an http(s) URL with {z}, {x} and {y} (and optionally {s}) placeholders
     * @param credit      the attribution the tile provider requires, as plain text
     */
    public record Basemap(String urlTemplate, String credit) {
    }

    /** A report without figures at a glance. */
    public MapReport(String title, List<MapLayer> layers, List<MapGroup> groups, JsonNode summary, List<Entry> run,
                     List<String> cautions, Basemap basemap, double displayTolerance) {
        this(title, layers, groups, summary, run, cautions, basemap, displayTolerance, List.of());
    }

    public MapReport {
        glance = List.copyOf(glance);
        layers = List.copyOf(layers);
        groups = List.copyOf(groups);
        run = List.copyOf(run);
        cautions = List.copyOf(cautions);
    }
}
