package org.streetcomb.write;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.streetcomb.SafeText;
import org.streetcomb.tour.Direction;

/**
 * Writes direction sheets, one section per tour: as CSV (RFC 4180: comma separated, CRLF line ends,
 * fields quoted when they hold a comma, quote or line break; a first line carries the caution, then
 * the column names)
 * or as a printable HTML page (one table per tour, the caution at the top, print-friendly styling and
 * no scripts). The format follows the file name's extension: .csv, or .html/.htm.
 */
public final class DirectionSheetWriter {

    private static final String[] COLUMNS = {"tour", "step", "instruction", "street", "distance_m", "cumulative_m", "pass"};

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

    /** @param sheets each tour's directions, in tour order */
    public static void write(Path target, List<List<Direction>> sheets, String label) {
        write(target, sheets, label, List.of());
    }

    /** As {@link #write(Path, List, String)}, listing the streets left out after the tours. */
    public static void write(Path target, List<List<Direction>> sheets, String label, List<LeftOut> leftOut) {
        boolean html = Boolean.TRUE.equals(isHtml(target));
        AtomicFile.write(target, out -> {
            if (html) {
                html(out, sheets, label, target.getFileName().toString(), leftOut);
            } else {
                csv(out, sheets, leftOut);
            }
        });
    }

    private static void csv(OutputStream stream, List<List<Direction>> sheets, List<LeftOut> leftOut)
            throws IOException {
        Writer out = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
        out.write(csvField("Caution: " + FieldCaution.TEXT) + "\r\n");
        out.write(String.join(",", COLUMNS) + "\r\n");
        for (int t = 0; t < sheets.size(); t++) {
            for (Direction d : sheets.get(t)) {
                out.write((t + 1) + "," + d.number() + "," + csvField(d.instruction()) + "," + csvField(d.street()) + ","
                        + metres(d.metres()) + "," + metres(d.cumulative()) + "," + pass(d) + "\r\n");
            }
        }
        for (LeftOut street : leftOut) {
            out.write("left out,," + csvField("Not planned: " + street.why() + " (feature " + street.feature() + ")")
                    + "," + csvField(street.street()) + "," + metres(street.metres()) + ",,left out\r\n");
        }
        out.flush();
    }

    private static void html(OutputStream stream, List<List<Direction>> sheets, String label, String title,
                             List<LeftOut> leftOut) throws IOException {
        Writer out = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
        out.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>"
                + escape("Directions: " + title) + "</title>\n<style>\n"
                + "body{font-family:sans-serif;margin:1.5em;color:#000}\n"
                + ".caution{border:2px solid #000;padding:.6em;font-weight:bold}\n"
                + "table{border-collapse:collapse;width:100%;margin-bottom:1.5em}\n"
                + "th,td{border:1px solid #666;padding:.25em .4em;text-align:left}\n"
                + "td.n{text-align:right;font-variant-numeric:tabular-nums}\n"
                + "tr.deadhead td{color:#555;font-style:italic}\n"
                + "@media print{h2{break-before:page}h2:first-of-type{break-before:auto}tr{break-inside:avoid}}\n"
                + "</style>\n</head>\n<body>\n<h1>" + escape("Directions: " + title) + "</h1>\n<p class=\"caution\">"
                + escape(FieldCaution.TEXT) + "</p>\n");
        for (int t = 0; t < sheets.size(); t++) {
            List<Direction> sheet = sheets.get(t);
            double total = sheet.isEmpty() ? 0 : sheet.get(sheet.size() - 1).cumulative();
            out.write(String.format(Locale.ROOT, "<h2>%s %d: %.2f km</h2>%n", escape(label), t + 1, total / 1000));
            out.write("<table>\n<thead><tr><th>Step</th><th>Instruction</th><th>Street</th><th>Distance (m)</th>"
                    + "<th>Cumulative (km)</th><th>Pass</th></tr></thead>\n<tbody>\n");
            for (Direction d : sheet) {
                out.write("<tr class=\"" + pass(d) + "\"><td class=\"n\">" + d.number() + "</td><td>"
                        + escape(d.instruction()) + "</td><td>" + escape(d.street()) + "</td><td class=\"n\">"
                        + String.format(Locale.ROOT, "%.0f", d.metres()) + "</td><td class=\"n\">"
                        + String.format(Locale.ROOT, "%.2f", d.cumulative() / 1000) + "</td><td>"
                        + (d.steps() == 0 ? "" : pass(d)) + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n");
        }
        if (!leftOut.isEmpty()) {
            double total = leftOut.stream().mapToDouble(LeftOut::metres).sum();
            out.write(String.format(Locale.ROOT, "<h2>Left out: %d street%s, %.2f km</h2>%n", leftOut.size(),
                    leftOut.size() == 1 ? "" : "s", total / 1000));
            out.write("<p>Asked for but not in this plan; service them another way or report them.</p>\n"
                    + "<table>\n<thead><tr><th>Street</th><th>Feature</th><th>Length (m)</th><th>Why</th></tr></thead>\n"
                    + "<tbody>\n");
            for (LeftOut street : leftOut) {
                out.write("<tr><td>" + escape(street.street()) + "</td><td>" + escape(street.feature())
                        + "</td><td class=\"n\">" + String.format(Locale.ROOT, "%.0f", street.metres()) + "</td><td>"
                        + escape(street.why()) + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n");
        }
        out.write("<p class=\"caution\">" + escape(FieldCaution.TEXT) + "</p>\n</body>\n</html>\n");
        out.flush();
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
