package org.streetcomb.write;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.SafeText;
import org.streetcomb.tour.Direction;

/**
 * Writes direction sheets, one section per tour or trip: as CSV (RFC 4180: comma separated, CRLF line ends,
 * fields quoted when they hold a comma, quote or line break; first lines carry the caution and the heading,
 * then the column names) or as a printable HTML page (A4, a heading with layer, depot, date and vehicle, each
 * trip on a page of its own with its distance and duration, the column names repeated on every printed page,
 * the caution at top and bottom, no scripts). The format follows the file name's extension: .csv, or
 * .html/.htm.
 */
public final class DirectionSheetWriter {

    private static final String[] COLUMNS = {"tour", "step", "instruction", "street", "distance_m", "cumulative_m", "pass",
        "elapsed_min", "feature_id"};

    private DirectionSheetWriter() {
    }

    /** Whether the file name asks for HTML (otherwise CSV); null when the extension is neither. */
    public static Boolean isHtml(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".csv")) {
            return false;
        }
        return name.endsWith(".html") || name.endsWith(".htm") ? true : null;
    }

    /**
     * A street the plan was asked for but left out, listed at the end of the sheet so a crew knows it is not
     * forgotten: its name, feature id, length in metres and why.
     */
    public record LeftOut(String street, String feature, double metres, String why) {
    }

    /**
     * @param sheets  each section's directions, in order
     * @param heading what the plan is: layer, depot, date, vehicle, speeds
     * @param leftOut the streets asked for but left out, listed after the sections
     */
    public static void write(Path target, List<List<Direction>> sheets, SheetHeading heading, List<LeftOut> leftOut) {
        boolean html = Boolean.TRUE.equals(isHtml(target));
        AtomicFile.write(target, out -> {
            Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            if (html) {
                html(writer, sheets, heading, leftOut);
            } else {
                csv(writer, sheets, heading, leftOut);
            }
            writer.flush();
        });
    }

    /** One section's totals: metres serviced and driven without servicing, and hours at the heading's speeds. */
    private record Totals(double service, double deadhead, double hours) {
        static Totals of(List<Direction> sheet, SheetHeading heading) {
            double service = 0;
            double deadhead = 0;
            for (Direction d : sheet) {
                if (d.service()) {
                    service += d.metres();
                } else {
                    deadhead += d.metres();
                }
            }
            return new Totals(service, deadhead, heading.hours(service, deadhead));
        }

        double metres() {
            return service + deadhead;
        }
    }

    private static void csv(Writer out, List<List<Direction>> sheets, SheetHeading heading, List<LeftOut> leftOut)
            throws IOException {
        out.write(csvField("Caution: " + FieldCaution.TEXT) + "\r\n");
        out.write(csvField(headingLine(heading)) + "\r\n");
        StringBuilder sections = new StringBuilder();
        for (int t = 0; t < sheets.size(); t++) {
            Totals totals = Totals.of(sheets.get(t), heading);
            sections.append(t == 0 ? "" : "; ").append(String.format(Locale.ROOT, "%s %d: %.2f km, about %s",
                    heading.label().toLowerCase(Locale.ROOT), t + 1, totals.metres() / 1000,
                    SheetHeading.duration(totals.hours())));
        }
        out.write(csvField(sections + speeds(heading)) + "\r\n");
        out.write(String.join(",", COLUMNS) + "\r\n");
        for (int t = 0; t < sheets.size(); t++) {
            double hours = 0;
            for (Direction d : sheets.get(t)) {
                hours += elapsed(d, heading);
                out.write((t + 1) + "," + d.number() + "," + csvField(d.instruction()) + "," + csvField(d.street()) + ","
                        + metres(d.metres()) + "," + metres(d.cumulative()) + "," + pass(d) + ","
                        + String.format(Locale.ROOT, "%.0f", hours * 60) + "," + csvField(d.feature()) + "\r\n");
            }
        }
        for (LeftOut street : leftOut) {
            out.write("left out,," + csvField("Not planned: " + street.why()) + "," + csvField(street.street()) + ","
                    + metres(street.metres()) + ",,left out,," + csvField(street.feature()) + "\r\n");
        }
    }

    private static double elapsed(Direction d, SheetHeading heading) {
        return d.service() ? heading.hours(d.metres(), 0) : heading.hours(0, d.metres());
    }

    private static String headingLine(SheetHeading heading) {
        return "Layer: " + heading.layer() + "; depot (latitude, longitude): " + heading.depot()
                + (heading.planned() == null ? "" : "; planned on " + heading.planned())
                + (heading.vehicle() == 0 ? "" : "; vehicle " + heading.vehicle());
    }

    private static String speeds(SheetHeading heading) {
        return String.format(Locale.ROOT, " (durations at %s km/h servicing, %s km/h otherwise)",
                number(heading.serviceKmh()), number(heading.travelKmh()));
    }

    private static void html(Writer out, List<List<Direction>> sheets, SheetHeading heading, List<LeftOut> leftOut)
            throws IOException {
        String title = "Directions: " + heading.layer() + (heading.vehicle() == 0 ? "" : ", vehicle " + heading.vehicle());
        out.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>"
                + escape(title) + "</title>\n<style>\n"
                + "@page{size:A4;margin:12mm}\n"
                + "body{font-family:sans-serif;margin:1.5em;color:#000;max-width:60em}\n"
                + ".caution{border:2px solid #000;padding:.6em;font-weight:bold}\n"
                + "table{border-collapse:collapse;width:100%;margin-bottom:1.5em}\n"
                + "th,td{border:1px solid #666;padding:.25em .4em;text-align:left;vertical-align:top}\n"
                + "thead{display:table-header-group}\n"
                + "td.n,th.n{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}\n"
                + "table.facts{width:auto}table.facts th{font-weight:normal;color:#333}table.facts td{font-weight:bold}\n"
                + "tr.deadhead td{color:#444;font-style:italic}\n"
                + ".fill{margin:1em 0}.fill span{display:inline-block;min-width:14em;border-bottom:1px solid #000}\n"
                + "@media print{body{margin:0;font-size:10pt;max-width:none}"
                + "section+section{break-before:page}tr{break-inside:avoid}h2{break-after:avoid}.s{display:none}}\n"
                + "</style>\n</head>\n<body>\n<h1>" + escape(title) + "</h1>\n<p class=\"caution\">"
                + escape(FieldCaution.TEXT) + "</p>\n<table class=\"facts\">\n");
        fact(out, "Road layer", heading.layer());
        fact(out, "Depot (latitude, longitude)", heading.depot());
        if (heading.planned() != null) {
            fact(out, "Planned on", heading.planned().toString());
        }
        if (heading.vehicle() != 0) {
            fact(out, "Vehicle", String.valueOf(heading.vehicle()));
        }
        double metres = 0;
        double hours = 0;
        for (List<Direction> sheet : sheets) {
            Totals totals = Totals.of(sheet, heading);
            metres += totals.metres();
            hours += totals.hours();
        }
        String plural = heading.label().toLowerCase(Locale.ROOT) + (sheets.size() == 1 ? "" : "s");
        fact(out, "In all", String.format(Locale.ROOT, "%d %s, %.2f km, about %s", sheets.size(), plural, metres / 1000,
                SheetHeading.duration(hours)) + speeds(heading));
        out.write("</table>\n<p class=\"fill\">Crew: <span></span> Date driven: <span></span></p>\n");
        for (int t = 0; t < sheets.size(); t++) {
            List<Direction> sheet = sheets.get(t);
            Totals totals = Totals.of(sheet, heading);
            out.write("<section>\n");
            out.write(String.format(Locale.ROOT, "<h2>%s %d of %d%s</h2>%n", escape(heading.label()), t + 1,
                    sheets.size(), heading.vehicle() == 0 ? "" : ", vehicle " + heading.vehicle()));
            out.write(String.format(Locale.ROOT, "<p>%.2f km: service %.2f km, deadhead %.2f km; about %s.</p>%n",
                    totals.metres() / 1000, totals.service() / 1000, totals.deadhead() / 1000,
                    SheetHeading.duration(totals.hours())));
            out.write("<table>\n<thead><tr><th class=\"n\">Step</th><th>Instruction</th><th class=\"s\">Street</th>"
                    + "<th class=\"n\">Distance (m)</th><th class=\"n\">Cumulative (km)</th><th class=\"n\">Elapsed</th>"
                    + "<th>Pass</th></tr></thead>\n<tbody>\n");
            double elapsed = 0;
            for (Direction d : sheet) {
                elapsed += elapsed(d, heading);
                out.write("<tr class=\"" + pass(d) + "\"><td class=\"n\">" + d.number() + "</td><td>"
                        + escape(d.instruction()) + "</td><td class=\"s\">" + escape(d.street()) + "</td><td class=\"n\">"
                        + String.format(Locale.ROOT, "%.0f", d.metres()) + "</td><td class=\"n\">"
                        + String.format(Locale.ROOT, "%.2f", d.cumulative() / 1000) + "</td><td class=\"n\">"
                        + clock(elapsed) + "</td><td>" + (d.steps() == 0 ? "" : pass(d)) + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n</section>\n");
        }
        if (!leftOut.isEmpty()) {
            double total = leftOut.stream().mapToDouble(LeftOut::metres).sum();
            out.write(String.format(Locale.ROOT, "<section>\n<h2>Left out: %d street%s, %.2f km</h2>%n", leftOut.size(),
                    leftOut.size() == 1 ? "" : "s", total / 1000));
            out.write("<p>Asked for but not in this plan; service them another way or report them.</p>\n"
                    + "<table>\n<thead><tr><th>Street</th><th>Feature</th><th class=\"n\">Length (m)</th><th>Why</th>"
                    + "</tr></thead>\n<tbody>\n");
            for (LeftOut street : leftOut) {
                out.write("<tr><td>" + escape(street.street()) + "</td><td>" + escape(street.feature())
                        + "</td><td class=\"n\">" + String.format(Locale.ROOT, "%.0f", street.metres()) + "</td><td>"
                        + escape(street.why()) + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n</section>\n");
        }
        out.write("<p class=\"caution\">" + escape(FieldCaution.TEXT) + "</p>\n</body>\n</html>\n");
    }

    private static void fact(Writer out, String name, String value) throws IOException {
        out.write("<tr><th>" + escape(name) + "</th><td>" + escape(value) + "</td></tr>\n");
    }

    /** Hours as h:mm, rounded to the minute. */
    private static String clock(double hours) {
        long minutes = Math.round(hours * 60);
        return String.format(Locale.ROOT, "%d:%02d", minutes / 60, minutes % 60);
    }

    private static String number(double value) {
        return value == Math.rint(value) ? String.valueOf((long) value) : String.valueOf(value);
    }

    private static String pass(Direction d) {
        return d.steps() == 0 ? "arrive" : d.service() ? "service" : "deadhead";
    }

    private static String metres(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }

    private static String csvField(String value) {
        return SafeText.csvField(value);
    }

    static String escape(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (char c : SafeText.xml(text).toCharArray()) {
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
