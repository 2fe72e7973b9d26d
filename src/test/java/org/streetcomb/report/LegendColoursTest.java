package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.streetcomb.ExitCode;
import org.streetcomb.cli.Main;

/**
 * The legends of real reports as a reader's browser shows them (headless Chromium, colours read from the
 * computed style of each swatch): every class has a colour of its own, apart from every other by at least
 * {@link ColourDifference#AT_A_GLANCE} for normal vision and each kind of dichromacy (CIE 1976 Delta E*ab on
 * simulations of Machado, Oliveira and Fernandes 2009; see {@link ColourDifference}). Trips of one vehicle share
 * its colour, so groups count once per vehicle. At a window 1280 pixels wide nothing scrolls sideways, and the
 * figures at a glance come before the caution and the layers.
 */
class LegendColoursTest extends BrowserTestBase {

    private static final Pattern RGB = Pattern.compile("rgba?\\((\\d+), (\\d+), (\\d+)");
    private static final String DEMO = "fixtures/demo/brackenford.geojson";

    @BeforeAll
    static void windowOf1280() throws Exception {
        chromium.viewport(1280, 800);
    }

    @Test
    void aFleetPlan() throws Exception {
        Path html = folder.resolve("plan.html");
        run("plan", DEMO, "--depot=-31.2,44.6", "--max-trip-km", "8", "--vehicles", "3", "--trip-restarts", "0",
                "--report", html.toString());
        Map<String, String> legend = legend(html);
        assertTrue(legend.keySet().containsAll(List.of("Vehicle 1", "Vehicle 2", "Vehicle 3", "Deadhead passes", "Depot")),
                legend.toString());
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    @Test
    void anAuditWithItsMopUp() throws Exception {
        Path html = folder.resolve("audit.html");
        run("audit", DEMO, "fixtures/demo/brackenford-drive.gpx", "--depot=-31.2,44.6", "--mop-up",
                folder.resolve("mop-up.geojson").toString(), "--report", html.toString());
        Map<String, String> legend = legend(html);
        assertTrue(legend.size() >= 8, legend.toString());
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    @Test
    void aHealthCheckOfMonaco() throws Exception {
        Path html = folder.resolve("health.html");
        // Monaco (OpenStreetMap, fixtures/benchmarks/mixed-osm, NOTICE): one-way traps, unreachable streets,
        // separate parts and crossings, each kind a group of its own
        StringWriter out = new StringWriter();
        int code = Main.run(new String[] {"health", "fixtures/benchmarks/mixed-osm/monaco.osm.pbf", "--report",
            html.toString()}, new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertTrue(code == ExitCode.OK || code == ExitCode.NO_TOUR, "blocking findings end the check with " + code);
        Map<String, String> legend = legend(html);
        assertTrue(legend.keySet().stream().filter(k -> k.startsWith("one way trap") || k.startsWith("depot unreachable")
                || k.startsWith("crossing")).count() >= 2, legend.toString());
        assertEquals(List.of(), ColourDifference.tooClose(legend));
    }

    private static void run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        assertEquals(ExitCode.OK, code, out + "\n" + err);
    }

    /** The legend's classes and their colours; checks the page's layout on the way. */
    private static Map<String, String> legend(Path html) throws Exception {
        chromium.open(html);
        JsonNode layout = chromium.eval("(() => { const p = document.getElementById('panel');"
                + " return {panel: p.scrollWidth - p.clientWidth,"
                + " page: document.documentElement.scrollWidth - window.innerWidth,"
                + " order: Array.from(p.children).map(c => c.id || c.className)}; })()");
        assertTrue(layout.get("panel").asInt() <= 0, "the side panel scrolls sideways by " + layout.get("panel"));
        assertTrue(layout.get("page").asInt() <= 0, "the page scrolls sideways by " + layout.get("page"));
        List<String> order = new ArrayList<>();
        layout.get("order").forEach(n -> order.add(n.asText()));
        assertTrue(order.indexOf("glance") >= 0 && order.indexOf("glance") < order.indexOf("caution")
                && order.indexOf("caution") < order.indexOf("layers"), "figures first, then the caution: " + order);

        JsonNode swatches = chromium.eval("Array.from(document.querySelectorAll('#layers .swatch')).map(s => {"
                + " const c = getComputedStyle(s); return {label: s.parentElement.textContent.trim(),"
                + " shape: s.classList[1], multi: s.dataset.multi || '', line: c.borderTopColor, fill: c.backgroundColor}; })");
        Map<String, String> legend = new LinkedHashMap<>();
        for (JsonNode swatch : swatches) {
            String shape = swatch.get("shape").asText();
            if (!swatch.get("multi").asText().isEmpty() || shape.equals("text")) {
                continue; // striped: its colours are the groups' below; text labels carry no colour of their own
            }
            String colour = hex(swatch.get(shape.equals("line") ? "line" : "fill").asText());
            String label = swatch.get("label").asText().replaceAll(" \\(.*", "");
            Matcher vehicle = Pattern.compile("^(Vehicle \\d+), trip \\d+").matcher(label);
            String key = vehicle.find() ? vehicle.group(1) : label;
            String before = legend.putIfAbsent(key, colour);
            assertTrue(before == null || before.equals(colour), key + " is drawn in two colours");
        }
        return legend;
    }

    private static String hex(String css) {
        Matcher m = RGB.matcher(css);
        assertTrue(m.find(), css);
        return String.format(Locale.ROOT, "#%02x%02x%02x", Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                Integer.parseInt(m.group(3)));
    }
}
