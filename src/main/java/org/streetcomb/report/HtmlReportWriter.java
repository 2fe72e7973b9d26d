package org.streetcomb.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.io.CharacterEscapes;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.streetcomb.write.AtomicFile;

/**
 * Writes a {@link MapReport} as one self-contained HTML file: Leaflet, the report's own script and style,
 * and the map data are all inlined, so the file opens from disk with no network (unless a basemap is
 * asked for). A side panel holds the layer switches, the summary tables, how the result was made, and the
 * cautions.
 *
 * <p>Safety: input text reaches the page only as escaped HTML or as JSON inside a data block whose
 * {@code <}, {@code >} and {@code &} are written as unicode escapes, and the script reads it with
 * {@code JSON.parse} and shows it with {@code textContent}. A Content-Security-Policy admits only the two
 * scripts written here (by their SHA-256), no connections, and images only from data URIs and the
 * basemap's host, so even a mistake in escaping could not run injected script or load anything.
 */
public final class HtmlReportWriter {

    /** Up to this many groups are listed open; more are folded away so the summary stays in view. */
    private static final int OPEN_GROUPS = 12;
    private static final Pattern TILE_ORIGIN = Pattern.compile("^(https?)://([^/?#]+)/");
    /**
     * Positions are written as integers in millionths of a degree (about 0.1 m), each the difference from the
     * position before it within the feature.
     */
    private static final double SCALE = 1e6;

    public void write(Path target, MapReport report) {
        LeafletAssets leaflet = LeafletAssets.load();
        String app = resource("report.js");
        String css = resource("report.css");
        AtomicFile.write(target, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            w.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
            w.write("<meta http-equiv=\"Content-Security-Policy\" content=\"" + HtmlText.escape(policy(report, leaflet, app))
                    + "\">\n");
            w.write("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
            w.write("<meta name=\"generator\" content=\"streetcomb\">\n");
            w.write("<!-- This page includes Leaflet " + leaflet.version() + " (https://leafletjs.com), under this licence:\n"
                    + leaflet.licence().replace("--", "- -") + "-->\n");
            w.write("<title>" + HtmlText.escape(report.title()) + "</title>\n");
            w.write("<style>\n" + leaflet.css() + "\n</style>\n<style>\n" + css + "\n</style>\n</head>\n<body>\n");
            panel(w, report, leaflet);
            w.write("<div id=\"map\" role=\"application\" aria-label=\"Map\"></div>\n");
            w.write("<script type=\"application/json\" id=\"report-data\">");
            w.flush();
            data(w, report);
            w.write("</script>\n<script>" + leaflet.script() + "</script>\n<script>" + app + "</script>\n</body>\n</html>\n");
            w.flush();
        });
    }

    private static void panel(Writer w, MapReport report, LeafletAssets leaflet) throws IOException {
        w.write("<aside id=\"panel\">\n<h1>" + HtmlText.escape(report.title()) + "</h1>\n");
        if (!report.glance().isEmpty()) {
            w.write("<section id=\"glance\"><table class=\"glance\">\n");
            for (MapReport.Entry entry : report.glance()) {
                w.write("<tr><th>" + HtmlText.escape(entry.label()) + "</th><td>" + HtmlText.escape(entry.value())
                        + "</td></tr>\n");
            }
            w.write("</table></section>\n");
        }
        w.write("<p class=\"caution\"><strong>Caution.</strong> " + HtmlText.escape(String.join(" ", report.cautions()))
                + "</p>\n");
        w.write("<section id=\"layers\"><h2>Layers</h2>\n<ul class=\"switches\">\n");
        for (MapLayer layer : report.layers()) {
            w.write("<li><label><input type=\"checkbox\" data-layer=\"" + layer.id() + "\"" + (layer.shown() ? " checked" : "")
                    + "> " + swatch(layer, report.groups().size() > 1) + HtmlText.escape(layer.title()) + "</label>");
            if (!layer.note().isEmpty()) {
                w.write("<div class=\"note\">" + HtmlText.escape(layer.note()) + "</div>");
            }
            w.write("</li>\n");
        }
        w.write("</ul>\n");
        // a single group would only repeat the layers above it
        if (report.groups().size() > 1) {
            w.write("<details class=\"groups\"" + (report.groups().size() <= OPEN_GROUPS ? " open" : "") + "><summary>Show "
                    + report.groups().size() + (report.groups().size() == 1 ? " group" : " groups") + "</summary>\n"
                    + "<ul class=\"switches\">\n");
            for (MapGroup group : report.groups()) {
                w.write("<li><label><input type=\"checkbox\" data-group=\"" + HtmlText.escape(group.id()) + "\" checked> "
                        + swatch(MapLayer.Kind.LINES, MapStyle.solid(group.colour(), 4, 1)) + HtmlText.escape(group.title())
                        + "</label></li>\n");
            }
            w.write("</ul>\n</details>\n");
        }
        w.write("<p class=\"hint\">Point at a line or a dot to see what it is; click it for details.</p></section>\n");
        w.write("<details class=\"fold\"><summary>All figures, as <code>--json</code> prints them</summary>\n"
                + "<section id=\"summary\">" + SummaryTables.html(report.summary()) + "\n</section>\n</details>\n");
        w.write("<details class=\"fold\"><summary>How it was made</summary>\n<section id=\"run\">"
                + "<table class=\"facts\">\n");
        for (MapReport.Entry entry : report.run()) {
            w.write("<tr><th>" + HtmlText.escape(entry.label()) + "</th><td>" + HtmlText.escape(entry.value()) + "</td></tr>\n");
        }
        w.write("<tr><th>Map display</th><td>" + HtmlText.escape(displayNote(report, leaflet)) + "</td></tr>\n");
        w.write("</table>\n</section>\n</details>\n");
        w.write("<section id=\"cautions\"><h2>Before you drive</h2>\n<ul>\n");
        for (String caution : report.cautions()) {
            w.write("<li>" + HtmlText.escape(caution) + "</li>\n");
        }
        w.write("</ul>\n</section>\n</aside>\n");
    }

    private static String displayNote(MapReport report, LeafletAssets leaflet) {
        String lines = report.displayTolerance() > 0
                ? String.format(Locale.ROOT, "lines simplified for display to within %s m (Douglas-Peucker); "
                        + "lengths and figures use the full geometry", plain(report.displayTolerance()))
                : "lines drawn with every vertex";
        String tiles = report.basemap() == null ? "no basemap (works offline)" : "basemap tiles from " + report.basemap().urlTemplate();
        return lines + "; positions rounded to 0.000001 degree; " + tiles + "; map drawn with Leaflet " + leaflet.version();
    }

    private static String plain(double value) {
        return java.math.BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /**
     * A layer's legend swatch: in the colour its features are drawn in; or, when they are drawn in the colours
     * of the groups listed below it (tours by vehicle, findings by kind), in stripes of up to five of those,
     * marked {@code data-multi}, since the groups name the colours.
     */
    private static String swatch(MapLayer layer, boolean grouped) {
        Set<String> colours = new LinkedHashSet<>();
        boolean ownColours = false;
        for (MapFeature feature : layer.features()) {
            ownColours |= feature.colour() != null;
            String colour = feature.colour() != null ? feature.colour() : layer.style().colour();
            if (colour.matches("#[0-9A-Fa-f]{6}")) {
                colours.add(colour);
            }
        }
        if (colours.size() <= 1 && !(grouped && ownColours)) {
            String colour = colours.isEmpty() ? layer.style().colour() : colours.iterator().next();
            return swatch(layer.kind(), new MapStyle(colour, layer.style().width(), layer.style().opacity(),
                    layer.style().dash()));
        }
        List<String> shown = new ArrayList<>(colours).subList(0, Math.min(5, colours.size()));
        StringBuilder stripes = new StringBuilder("linear-gradient(90deg");
        for (int i = 0; i < shown.size(); i++) {
            stripes.append(String.format(Locale.ROOT, ", %s %.0f%% %.0f%%", shown.get(i), 100.0 * i / shown.size(),
                    100.0 * (i + 1) / shown.size()));
        }
        stripes.append(')');
        String shape = layer.kind() == MapLayer.Kind.POINTS ? "dot" : "line";
        return "<span class=\"swatch " + shape + " multi\" data-multi=\"" + shown.size() + "\" style=\"--g:" + stripes
                + "\"></span>";
    }

    private static String swatch(MapLayer.Kind kind, MapStyle style) {
        // colours and dashes are validated by MapStyle, so they are safe inside the attribute
        String shape = switch (kind) {
            case LINES -> "line";
            case POINTS -> "dot";
            case ARROWS -> "arrow";
            case LABELS -> "text";
        };
        String border = style.dash().isEmpty() ? "solid" : "dotted";
        return "<span class=\"swatch " + shape + "\" style=\"--c:" + style.colour() + ";--b:" + border + "\"></span>";
    }

    /** The page's Content-Security-Policy: only our own scripts, no connections, images only from data URIs. */
    static String policy(MapReport report, LeafletAssets leaflet, String app) {
        String images = "data:";
        if (report.basemap() != null) {
            images += " " + tileOrigin(report.basemap().urlTemplate());
        }
        return "default-src 'none'; script-src '" + sha256(leaflet.script()) + "' '" + sha256(app)
                + "'; style-src 'unsafe-inline'; img-src " + images + "; base-uri 'none'; form-action 'none'";
    }

    /** The scheme and host of a tile URL template, with a {s} subdomain placeholder widened to a wildcard. */
    public static String tileOrigin(String urlTemplate) {
        Matcher m = TILE_ORIGIN.matcher(urlTemplate);
        if (!m.find() || !m.group(2).matches("(\\{s\\}\\.)?[A-Za-z0-9.-]+(:[0-9]+)?")) {
            throw new IllegalArgumentException("expected an http(s) tile URL such as https://tiles.example.org/{z}/{x}/{y}.png");
        }
        return m.group(1) + "://" + m.group(2).replace("{s}", "*");
    }

    private static String sha256(String script) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(script.getBytes(StandardCharsets.UTF_8));
            return "sha256-" + Base64.getEncoder().encodeToString(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void data(Writer w, MapReport report) throws IOException {
        JsonGenerator json = new JsonFactory().createGenerator(w);
        json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        json.setCharacterEscapes(new ScriptSafeEscapes());
        DisplaySimplifier simplifier = new DisplaySimplifier(report.displayTolerance());
        Bounds bounds = new Bounds();
        json.writeStartObject();
        json.writeStringField("title", report.title());
        if (report.basemap() != null) {
            json.writeObjectFieldStart("basemap");
            json.writeStringField("url", report.basemap().urlTemplate());
            json.writeStringField("credit", report.basemap().credit());
            json.writeEndObject();
        }
        json.writeArrayFieldStart("groups");
        for (MapGroup group : report.groups()) {
            json.writeStartObject();
            json.writeStringField("id", group.id());
            json.writeStringField("title", group.title());
            json.writeStringField("colour", group.colour());
            json.writeEndObject();
        }
        json.writeEndArray();
        json.writeArrayFieldStart("layers");
        for (MapLayer layer : report.layers()) {
            json.writeStartObject();
            json.writeStringField("id", layer.id());
            json.writeStringField("title", layer.title());
            json.writeStringField("kind", layer.kind().name().toLowerCase(Locale.ROOT));
            json.writeBooleanField("shown", layer.shown());
            json.writeObjectFieldStart("style");
            json.writeStringField("colour", layer.style().colour());
            json.writeNumberField("width", layer.style().width());
            json.writeNumberField("opacity", layer.style().opacity());
            json.writeStringField("dash", layer.style().dash());
            json.writeEndObject();
            json.writeArrayFieldStart("features");
            for (MapFeature feature : layer.features()) {
                feature(json, feature, layer.kind() == MapLayer.Kind.LINES ? simplifier : null, bounds);
            }
            json.writeEndArray();
            json.writeEndObject();
        }
        json.writeEndArray();
        json.writeFieldName("bounds");
        if (bounds.west <= bounds.east) {
            json.writeArray(new double[] {bounds.south, bounds.west, bounds.north, bounds.east}, 0, 4);
        } else {
            json.writeNull();
        }
        json.writeEndObject();
        json.flush();
    }

    private static void feature(JsonGenerator json, MapFeature feature, DisplaySimplifier simplifier, Bounds bounds)
            throws IOException {
        json.writeStartObject();
        if (feature.group() != null) {
            json.writeStringField("g", feature.group());
        }
        if (feature.colour() != null) {
            json.writeStringField("c", feature.colour());
        }
        if (!feature.label().isEmpty()) {
            json.writeStringField("t", feature.label());
        }
        if (!feature.details().isEmpty()) {
            json.writeArrayFieldStart("d");
            for (Map.Entry<String, String> row : feature.details().entrySet()) {
                json.writeStartArray();
                json.writeString(row.getKey());
                json.writeString(row.getValue());
                json.writeEndArray();
            }
            json.writeEndArray();
        }
        json.writeArrayFieldStart("p");
        // deltas run on from one part to the next, so only the feature's first position is written in full
        long lastX = 0;
        long lastY = 0;
        for (double[] part : feature.parts()) {
            double[] shown = simplifier == null ? part : simplifier.simplify(part);
            json.writeStartArray();
            for (int i = 0; i < shown.length; i += 2) {
                bounds.add(shown[i], shown[i + 1]);
                long x = Math.round(shown[i] * SCALE);
                long y = Math.round(shown[i + 1] * SCALE);
                json.writeNumber(x - lastX);
                json.writeNumber(y - lastY);
                lastX = x;
                lastY = y;
            }
            json.writeEndArray();
        }
        json.writeEndArray();
        json.writeEndObject();
    }

    private static String resource(String name) {
        try (InputStream in = HtmlReportWriter.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The extent of everything drawn, for the initial view. */
    private static final class Bounds {
        double west = Double.POSITIVE_INFINITY;
        double south = Double.POSITIVE_INFINITY;
        double east = Double.NEGATIVE_INFINITY;
        double north = Double.NEGATIVE_INFINITY;

        void add(double lon, double lat) {
            west = Math.min(west, lon);
            east = Math.max(east, lon);
            south = Math.min(south, lat);
            north = Math.max(north, lat);
        }
    }

    /** JSON escapes that also write {@code <}, {@code >} and {@code &} as unicode escapes, so no text can close the data block. */
    private static final class ScriptSafeEscapes extends CharacterEscapes {
        private static final long serialVersionUID = 1L;
        private final int[] ascii = standardAsciiEscapesForJSON();

        ScriptSafeEscapes() {
            ascii['<'] = ESCAPE_STANDARD;
            ascii['>'] = ESCAPE_STANDARD;
            ascii['&'] = ESCAPE_STANDARD;
        }

        @Override
        public int[] getEscapeCodesForAscii() {
            return ascii;
        }

        @Override
        public com.fasterxml.jackson.core.SerializableString getEscapeSequence(int ch) {
            return null;
        }
    }
}
