package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.streetcomb.cli.Main;

/**
 * Opens the audit command's HTML report in headless Chromium. The drive is the bundled simulated drive of
 * the demo town (invented data: the town's tour with Harrow Close, bf-044, and Sallow Lane, bf-005, left
 * out; see AuditCommandTest), so the streets the map must show as missed are known from how the drive was
 * made, not from the program.
 */
class AuditReportBrowserTest extends BrowserTestBase {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final String DEMO = "fixtures/demo/brackenford.geojson";
    private static final Path DRIVE = Path.of("fixtures/demo/brackenford-drive.gpx");
    private static final Set<String> SKIPPED = Set.of("bf-044", "bf-005");


    @Test
    void auditReportShowsTheSkippedStreetsAsMissedTheMopUpTourAndTheJsonNumbers() throws Exception {
        Path html = folder.resolve("audit.html");
        JsonNode printed = audit(DRIVE, html, "--depot=-31.2,44.6", "--mop-up", folder.resolve("mop-up.geojson").toString());
        chromium.open(html);

        assertEquals(List.of("covered", "partly", "missed", "not-driven", "tracks", "service", "deadhead", "arrows", "steps",
                "depot"), MAPPER.convertValue(
                chromium.eval("Array.from(document.querySelectorAll('input[data-layer]')).map(b => b.dataset.layer)"), List.class));
        JsonNode map = chromium.eval("(() => { const d = JSON.parse(document.getElementById('report-data').textContent);"
                + " const ids = l => d.layers.find(x => x.id === l).features.map(f => f.d.find(r => r[0] === 'Feature id')[1]);"
                + " const r = window.streetcombReport;"
                + " return {features: d.layers.reduce((n, l) => n + l.features.length, 0),"
                + " drawn: Number(document.body.dataset.drawn),"
                + " covered: d.layers.find(x => x.id === 'covered').features.reduce((n, f) =>"
                + " n + Number((f.d.find(r => r[0] === 'Street lines') || [0, 1])[1]), 0),"
                + " missed: ids('missed'), parts: ids('not-driven').length,"
                + " tracksAtStart: r.buckets.filter(b => b.layer === 'tracks' && r.map.hasLayer(b.content)).length,"
                + " serviceOnMap: r.buckets.filter(b => b.layer === 'service' && r.map.hasLayer(b.content)).length,"
                + " run: document.getElementById('run').textContent,"
                + " cautions: document.getElementById('cautions').textContent}; })()");
        assertEquals(map.get("features").asInt(), map.get("drawn").asInt(), "every feature becomes a map shape");
        List<String> missed = new ArrayList<>();
        map.get("missed").forEach(id -> missed.add(id.asText()));
        assertEquals(SKIPPED, Set.copyOf(missed), "the streets the drive left out are drawn as missed");
        assertEquals(printed.at("/coverage/streets/covered").asInt(), map.get("covered").asInt(),
                "the covered layer holds every covered street line");
        assertEquals(printed.at("/coverage/missed_parts").asInt(), map.get("parts").asInt());
        assertEquals(0, map.get("tracksAtStart").asInt(), "the tracks start switched off");
        assertTrue(map.get("serviceOnMap").asInt() > 0, "the mop-up tour is drawn: " + map);
        for (String option : List.of("--gps-sigma", "--search-radius", "--route-scale", "--covered-at", DRIVE.toString())) {
            assertTrue(map.get("run").asText().contains(option), "the page says how it was made: " + option);
        }
        assertTrue(map.get("cautions").asText().contains("GPS tracks"), map.get("cautions").asText());
        assertTrue(map.get("cautions").asText().contains("traffic law"), map.get("cautions").asText());

        JsonNode cells = SummaryCells.assertTableShows(chromium, printed);
        for (String key : List.of("coverage.share", "coverage.required_m", "coverage.streets.covered",
                "coverage.streets.partly", "coverage.streets.missed", "coverage.missed_m", "coverage.covered_at",
                "matching.gps_sigma_m", "matching.search_radius_m", "matching.route_scale_m", "tracks.points",
                "matching.matched_points", "matching.off_network_points", "cleaning.thinned", "cleaning.speed_spikes",
                "mop_up.length_m")) {
            assertTrue(cells.toString().contains("[\"" + key + "\""), "the table shows " + key);
        }

        JsonNode switched = chromium.eval("(() => { document.querySelector('input[data-layer=tracks]').click();"
                + " document.querySelector('input[data-layer=covered]').click(); const r = window.streetcombReport;"
                + " return [r.buckets.filter(b => b.layer === 'tracks' && r.map.hasLayer(b.content)).length,"
                + " r.buckets.filter(b => b.layer === 'covered' && r.map.hasLayer(b.content)).length]; })()");
        assertEquals("[1,0]", switched.toString(), "the tracks switch on and the covered streets off");
        assertEquals(List.of(), chromium.problems(), "console errors, exceptions or log errors");
        assertEquals(List.of(), chromium.networkRequests(), "the report must work offline");
    }

    @Test
    void aTrackNamedLikeAScriptIsShownAsTextAndNeverRuns() throws Exception {
        String hostileName = "<script>document.body.dataset.pwned='track'</script>";
        Path gpx = folder.resolve("<img src=x onerror=document.body.dataset.pwned=1>.gpx");
        String xml = Files.readString(DRIVE, StandardCharsets.UTF_8);
        assertTrue(xml.contains("<name>simulated</name>"));
        Files.writeString(gpx, xml.replace("<name>simulated</name>",
                "<name>" + hostileName.replace("<", "&lt;").replace(">", "&gt;") + "</name>"), StandardCharsets.UTF_8);
        Path html = folder.resolve("hostile-audit.html");
        audit(gpx, html);
        chromium.open(html);

        JsonNode shown = chromium.eval("(() => { const r = window.streetcombReport;"
                + " document.querySelector('input[data-layer=tracks]').click();"
                + " const shape = r.buckets.find(b => b.layer === 'tracks').content.getLayers()[0];"
                + " shape.fire('mouseover', {latlng: shape.getCenter()}, true);"
                + " const tip = document.querySelector('.leaflet-tooltip').textContent;"
                + " shape.fire('click', {latlng: shape.getCenter()}, true);"
                + " const popup = document.querySelector('.leaflet-popup-content');"
                + " return {tip: tip, popup: popup.textContent, elements: popup.querySelectorAll('script, img').length,"
                + " title: document.querySelector('h1').textContent,"
                + " file: document.querySelector('#summary [data-key=\"tracks.files.0.file\"]').textContent,"
                + " pwned: document.body.dataset.pwned || null,"
                + " scripts: document.scripts.length, images: document.images.length}; })()");
        assertTrue(shown.get("tip").asText().contains("track 1 (" + hostileName + "), segment 1"), shown.toString());
        assertTrue(shown.get("popup").asText().contains(hostileName), shown.toString());
        assertEquals(0, shown.get("elements").asInt(), "no element was made from the input's text");
        assertTrue(shown.get("title").asText().contains(gpx.getFileName().toString()), shown.toString());
        assertEquals(gpx.toString(), shown.get("file").asText());
        assertTrue(shown.get("pwned").isNull(), "a script from the input ran: " + shown);
        assertEquals(3, shown.get("scripts").asInt(), "only the data block, Leaflet and the report's script");
        assertEquals(0, shown.get("images").asInt());
        assertEquals(List.of(), chromium.problems(), "console errors, exceptions or log errors (a blocked script shows here)");
        String page = Files.readString(html, StandardCharsets.UTF_8);
        assertFalse(page.contains(hostileName), "the raw hostile track name must not appear in the file");
        assertFalse(page.contains("<img src=x"), "the raw hostile file name must not appear in the file");
    }

    private static JsonNode audit(Path track, Path html, String... more) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> args = new ArrayList<>(List.of("audit", DEMO, track.toString(), "--report", html.toString(), "--json",
                "--quiet"));
        args.addAll(List.of(more));
        int code = Main.run(args.toArray(new String[0]), new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        return MAPPER.readTree(out.toString());
    }
}
