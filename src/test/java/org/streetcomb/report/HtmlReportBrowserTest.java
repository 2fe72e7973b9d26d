package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.streetcomb.cli.Main;

/**
 * Opens HTML reports in headless Chromium, the reference for what a user's browser does with the page:
 * it must load from disk with no console error and no network request, draw its layers, show the numbers
 * the command printed with --json, and never run script that came from the input.
 */
class HtmlReportBrowserTest extends BrowserTestBase {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Path DEMO = Path.of("fixtures/demo/brackenford.geojson");


    @Test
    void demoReportLoadsDrawsItsLayersAndShowsTheJsonNumbers() throws Exception {
        Path html = folder.resolve("demo.html");
        JsonNode printed = plan(DEMO, html);
        chromium.open(html);

        JsonNode layerIds = chromium.eval("Array.from(document.querySelectorAll('input[data-layer]')).map(b => b.dataset.layer)");
        assertEquals(List.of("streets", "service", "deadhead", "arrows", "steps", "depot"),
                MAPPER.convertValue(layerIds, List.class));
        JsonNode counts = chromium.eval("(() => { const d = JSON.parse(document.getElementById('report-data').textContent);"
                + " return {features: d.layers.reduce((n, l) => n + l.features.length, 0),"
                + " drawn: Number(document.body.dataset.drawn),"
                + " onMap: window.streetcombReport.buckets.filter(b => window.streetcombReport.map.hasLayer(b.content)).length,"
                + " canvases: document.querySelectorAll('.leaflet-pane canvas').length}; })()");
        assertTrue(counts.get("features").asInt() > 0);
        assertEquals(counts.get("features").asInt(), counts.get("drawn").asInt(), "every feature becomes a map shape");
        assertTrue(counts.get("onMap").asInt() >= 4, "the layers shown at start are on the map: " + counts);
        assertTrue(counts.get("canvases").asInt() >= 4, "each line layer draws on its own canvas: " + counts);
        // arrowheads wait until the map is zoomed in far enough to show them as arrows (2 m a pixel or less)
        String arrowsOnMap = "window.streetcombReport.buckets.filter(b => b.layer === 'arrows'"
                + " && window.streetcombReport.map.hasLayer(b.content)).length";
        assertEquals(0, chromium.eval(arrowsOnMap).asInt(), "the whole town at once: no arrows");
        chromium.eval("window.streetcombReport.map.setZoom(18, {animate: false}) && true");
        assertTrue(chromium.eval(arrowsOnMap).asInt() > 0, "zoomed in: the arrows are on the map");
        chromium.eval("window.streetcombReport.map.fitBounds(window.streetcombReport.map.getBounds().pad(2)) && true");

        JsonNode cells = SummaryCells.assertTableShows(chromium, printed);
        for (String key : List.of("totals.tour_m", "totals.deadhead_m", "totals.deadhead_share", "network.length_m",
                "network.odd_nodes", "tours.0.length_m", "method")) {
            assertTrue(cells.toString().contains("[\"" + key + "\""), "the table shows " + key);
        }

        // switching a layer off takes its shapes off the map
        JsonNode afterSwitch = chromium.eval("(() => { document.querySelector('input[data-layer=deadhead]').click();"
                + " return window.streetcombReport.buckets.filter(b => b.layer === 'deadhead'"
                + " && window.streetcombReport.map.hasLayer(b.content)).length; })()");
        assertEquals(0, afterSwitch.asInt());

        assertEquals(List.of(), chromium.problems(), "console errors, exceptions or log errors");
        assertEquals(List.of(), chromium.networkRequests(), "the report must work offline");
    }

    @Test
    void textFromTheInputIsShownAsTextAndNeverRuns() throws Exception {
        String hostileStreet = "<script>document.body.dataset.pwned='street'</script>";
        String hostileId = "</script><img src=x onerror=\"document.body.dataset.pwned='id'\">";
        Path layer = folder.resolve("<img src=x onerror=document.body.dataset.pwned=1>.geojson");
        Files.writeString(layer, """
                {"type":"FeatureCollection","features":[
                 {"type":"Feature","id":%s,"properties":{"name":%s},
                  "geometry":{"type":"LineString","coordinates":[[-31.2,44.6],[-31.199,44.6],[-31.199,44.601]]}},
                 {"type":"Feature","properties":{"name":"Plain Lane"},
                  "geometry":{"type":"LineString","coordinates":[[-31.199,44.601],[-31.2,44.6]]}}]}
                """.formatted(MAPPER.writeValueAsString(hostileId), MAPPER.writeValueAsString(hostileStreet)),
                StandardCharsets.UTF_8);
        Path html = folder.resolve("hostile.html");
        plan(layer, html);
        chromium.open(html);

        // open the popup and the hover text of the hostile street, the places its name is shown
        JsonNode shown = chromium.eval("(() => { const r = window.streetcombReport;"
                + " const b = r.buckets.find(b => b.layer === 'streets');"
                + " const shape = b.content.getLayers().find(s => s.reportFeature.t.includes('script'));"
                + " shape.fire('mouseover', {latlng: shape.getCenter()}, true);"
                + " const tip = document.querySelector('.leaflet-tooltip').textContent;"
                + " shape.fire('click', {latlng: shape.getCenter()}, true);"
                + " const popup = document.querySelector('.leaflet-popup-content');"
                + " document.querySelector('input[data-layer=steps]').click();"
                + " return {tip: tip, popup: popup.textContent, elements: popup.querySelectorAll('script, img').length,"
                + " labels: document.querySelectorAll('.map-label').length,"
                + " file: document.querySelector('#summary [data-key=\"input.file\"]').textContent,"
                + " pwned: document.body.dataset.pwned || null,"
                + " scripts: document.scripts.length, images: document.images.length}; })()");
        assertEquals(hostileStreet, shown.get("tip").asText());
        assertTrue(shown.get("popup").asText().contains(hostileStreet), shown.toString());
        assertTrue(shown.get("popup").asText().contains(hostileId), shown.toString());
        assertEquals(0, shown.get("elements").asInt(), "no element was made from the input's text");
        assertTrue(shown.get("labels").asInt() > 0, "the step numbers appear when switched on");
        assertEquals(layer.toString(), shown.get("file").asText());
        assertTrue(shown.get("pwned").isNull(), "a script from the input ran: " + shown);
        assertEquals(3, shown.get("scripts").asInt(), "only the data block, Leaflet and the report's script");
        assertEquals(0, shown.get("images").asInt());
        assertEquals(List.of(), chromium.problems(), "console errors, exceptions or log errors (a blocked script shows here)");
        String page = Files.readString(html, StandardCharsets.UTF_8);
        assertFalse(page.contains(hostileStreet), "the raw hostile text must not appear in the file");
        assertFalse(page.contains("<img src=x"), "the raw hostile file name must not appear in the file");
    }

    @Test
    void basemapTilesComeOnlyFromTheGivenHostAndItsCreditIsText() throws Exception {
        // a loopback port that was free a moment ago refuses connections: the page asks for tiles, nothing leaves
        int port;
        try (ServerSocket probe = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            port = probe.getLocalPort();
        }
        Path html = folder.resolve("basemap.html");
        plan(DEMO, html, "--basemap", "http://127.0.0.1:" + port + "/{z}/{x}/{y}.png", "--basemap-credit", "<b>Tiles</b> by Example");
        chromium.open(html);
        JsonNode credit = chromium.eval("(() => { const a = document.querySelector('.leaflet-control-attribution');"
                + " return {text: a.textContent, bold: a.querySelectorAll('b').length}; })()");
        assertTrue(credit.get("text").asText().contains("<b>Tiles</b> by Example"), credit.toString());
        assertEquals(0, credit.get("bold").asInt(), "the credit is text, not markup");
        // wait for the tile requests to fail, then check what was asked for and what the policy said
        Thread.sleep(500);
        List<String> requests = chromium.networkRequests();
        assertFalse(requests.isEmpty(), "tiles were requested");
        for (String url : requests) {
            assertTrue(url.matches("http://127\\.0\\.0\\.1:" + port + "/\\d+/\\d+/\\d+\\.png"), url);
        }
        for (String problem : chromium.problems()) {
            assertTrue(problem.contains("net::ERR_CONNECTION_REFUSED"), "only the refused tiles may be logged: " + problem);
        }
    }

    @Test
    void healthCheckReportDrawsEachFindingThatHasAPlace() throws Exception {
        // fixtures/check/planted.geojson has one planted defect of each kind (see its generator)
        Path html = folder.resolve("health.html");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"health", "fixtures/check/planted.geojson", "--report", html.toString(), "--json",
            "--quiet"}, new PrintWriter(out), new PrintWriter(err));
        assertTrue(code == 0 || code == 4, err.toString());
        JsonNode printed = MAPPER.readTree(out.toString());
        chromium.open(html);
        assertEquals(List.of("streets", "finding-lines", "finding-points"), MAPPER.convertValue(
                chromium.eval("Array.from(document.querySelectorAll('input[data-layer]')).map(b => b.dataset.layer)"), List.class));
        int placed = 0;
        for (JsonNode finding : printed.get("findings")) {
            placed += finding.path("kind").asText().equals("dropped") ? 0 : 1;
        }
        JsonNode drawn = chromium.eval("window.streetcombReport.buckets.filter(b => b.layer.startsWith('finding-'))"
                + ".reduce((n, b) => n + b.content.getLayers().length, 0)");
        assertEquals(placed, drawn.asInt(), "every finding with a place is on the map");
        SummaryCells.assertTableShows(chromium, printed);
        assertEquals(List.of(), chromium.problems());
    }

    private static JsonNode plan(Path layer, Path html, String... more) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> args = new java.util.ArrayList<>(List.of("plan", layer.toString(), "--depot=-31.2,44.6", "--report",
                html.toString(), "--json", "--quiet"));
        args.addAll(List.of(more));
        int code = Main.run(args.toArray(new String[0]), new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        return MAPPER.readTree(out.toString());
    }
}
