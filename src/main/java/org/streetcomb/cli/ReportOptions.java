package org.streetcomb.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.streetcomb.network.LonLat;
import org.streetcomb.timing.StageClock;
import org.streetcomb.report.HtmlReportWriter;
import org.streetcomb.report.MapGroup;
import org.streetcomb.report.MapLayer;
import org.streetcomb.report.MapReport;
import org.streetcomb.report.QuickLookPng;
import org.streetcomb.report.ReportCautions;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;
import picocli.CommandLine.Option;

/**
 * The report options any command can mix in: an HTML report with a map (with an optional basemap and a
 * display tolerance) and a PNG quick look. The command builds its layers and summary; this writes them with the command line it ran
 * with and the cautions.
 */
final class ReportOptions {

    static final List<String> CAUTIONS = ReportCautions.PLAN;

    /** The cautions of a report with no tour in it (a health check, an audit without mop-up): checking streets on the ground is driving too. */
    static final List<String> CHECK_CAUTIONS = ReportCautions.CHECK;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Write one self-contained HTML page with a map of the result and its summary; it opens "
                    + "from disk with no network.")
    @Writes(standardOutput = true)
    Path html;

    @Option(names = "--quicklook", paramLabel = "FILE.png",
            description = "Write a PNG picture of the same map, of --quicklook-size pixels.")
    @Writes
    Path png;

    @Option(names = "--quicklook-size", paramLabel = "WIDTHxHEIGHT", defaultValue = "1200x800",
            description = "Pixel size of the --quicklook picture (default: ${DEFAULT-VALUE}).")
    String pngSize;

    @Option(names = "--basemap", paramLabel = "URL",
            description = "Draw web map tiles under the report's map, from an http(s) URL with {z}, {x} and {y}, "
                    + "e.g. https://tiles.example.org/{z}/{x}/{y}.png. The viewer then needs the network. Default: none.")
    String basemap;

    @Option(names = "--basemap-credit", paramLabel = "TEXT", defaultValue = "",
            description = "The attribution the tile provider requires, shown on the map.")
    String basemapCredit;

    @Option(names = "--display-tolerance", paramLabel = "METRES", defaultValue = "1",
            description = "Simplify lines on the report's map to within this distance; 0 keeps every vertex "
                    + "(default: ${DEFAULT-VALUE} m). Figures always use the full geometry.")
    double displayTolerance;

    @CommandLine.Spec(CommandLine.Spec.Target.MIXEE)
    CommandSpec command;

    /** Checks the options before any work is done, so a typo fails fast. */
    void validate() {
        if (!(displayTolerance >= 0) || displayTolerance > 1000) {
            throw new CommandLine.ParameterException(command.commandLine(), "--display-tolerance must be 0 to 1000 metres");
        }
        pictureSize();
        if (basemap != null) {
            try {
                HtmlReportWriter.tileOrigin(basemap);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(command.commandLine(), "--basemap: " + e.getMessage());
            }
            if (!(basemap.contains("{z}") && basemap.contains("{x}") && basemap.contains("{y}"))) {
                throw new CommandLine.ParameterException(command.commandLine(),
                        "--basemap: the URL needs {z}, {x} and {y} placeholders");
            }
        }
    }

    private int[] pictureSize() {
        String[] parts = pngSize.split("x");
        try {
            int[] size = {Integer.parseInt(parts[0]), Integer.parseInt(parts[1])};
            if (parts.length == 2 && size[0] >= 200 && size[1] >= 150 && size[0] <= 8000 && size[1] <= 8000) {
                return size;
            }
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            // reported below with the allowed range
        }
        throw new CommandLine.ParameterException(command.commandLine(),
                "--quicklook-size must be WIDTHxHEIGHT from 200x150 to 8000x8000 pixels, e.g. 1200x800; got '" + pngSize + "'");
    }

    /** Whether any report file was asked for. */
    boolean requested() {
        return html != null || png != null;
    }

    /** The summary's account of the report files, added before they are written so the page shows it too. */
    PlanSummary.Section section() {
        ObjectNode json = new ObjectMapper().createObjectNode();
        List<String[]> lines = new ArrayList<>();
        if (html != null) {
            json.put("html", html.toString());
            json.put("display_tolerance_m", displayTolerance);
            lines.add(new String[] {"Report", html + (basemap == null ? "" : " (basemap tiles need the network)")});
        }
        if (png != null) {
            json.put("picture", png.toString());
            json.put("picture_size", pngSize);
            lines.add(new String[] {"Picture", png + " (" + pngSize + " pixels)"});
        }
        return new PlanSummary.Section("report", json, lines);
    }

    /** Writes the report files asked for, with the planning cautions; does nothing when none is. */
    void write(String title, List<MapLayer> layers, List<MapGroup> groups, JsonNode summary,
               List<MapReport.Entry> glance, StageClock clock) {
        write(title, layers, groups, summary, glance, CAUTIONS, clock);
    }

    /** Writes the report files asked for, with the given cautions; does nothing when none is. */
    void write(String title, List<MapLayer> layers, List<MapGroup> groups, JsonNode summary,
               List<MapReport.Entry> glance, List<String> cautions, StageClock clock) {
        if (!requested()) {
            return;
        }
        MapReport report = new MapReport(title, layers, groups, withoutTimes(summary), run(), cautions,
                basemap == null ? null : new MapReport.Basemap(basemap, basemapCredit), displayTolerance, glance);
        clock.run("report", () -> {
            if (html != null) {
                new HtmlReportWriter().write(html, report);
            }
            if (png != null) {
                int[] size = pictureSize();
                new QuickLookPng(size[0], size[1]).write(png, report);
            }
        });
    }

    /**
     * The summary without its stage times ("seconds", at any depth), so the same inputs and options give the
     * same report byte for byte; the times stay in the printed summary and in --json.
     */
    static JsonNode withoutTimes(JsonNode summary) {
        JsonNode copy = summary.deepCopy();
        strip(copy);
        return copy;
    }

    private static void strip(JsonNode node) {
        if (node instanceof com.fasterxml.jackson.databind.node.ObjectNode object) {
            object.remove("seconds");
        }
        node.forEach(ReportOptions::strip);
    }

    /** The command line, each input file with its size, and every option's value (given or default). */
    private List<MapReport.Entry> run() {
        List<MapReport.Entry> run = new ArrayList<>();
        String args = command.commandLine().getParseResult().originalArgs().stream()
                .map(ReportOptions::quoted).collect(Collectors.joining(" "));
        // the original arguments start with the command's own name
        run.add(new MapReport.Entry("Command", command.root().qualifiedName() + " " + args));
        for (PositionalParamSpec positional : command.positionalParameters()) {
            Object value = positional.getValue();
            List<?> values = value instanceof List<?> list ? list : value == null ? List.of() : List.of(value);
            for (Object each : values) {
                if (each instanceof Path path) {
                    run.add(new MapReport.Entry("Input " + positional.paramLabel(), path + sizeOf(path)));
                }
            }
        }
        for (OptionSpec option : command.options()) {
            if (!option.usageHelp() && !option.versionHelp()) {
                Object value = option.getValue();
                run.add(new MapReport.Entry(option.longestName(), value == null ? "(not set)"
                        : value instanceof LonLat at ? at.lon() + "," + at.lat() : String.valueOf(value)));
            }
        }
        return run;
    }

    private static String sizeOf(Path path) {
        try {
            return " (" + Files.size(path) + " bytes)";
        } catch (java.io.IOException e) {
            return "";
        }
    }

    private static String quoted(String arg) {
        return arg.matches("[A-Za-z0-9_./,:=+@%-]+") ? arg : "'" + arg.replace("'", "'\\''") + "'";
    }
}
