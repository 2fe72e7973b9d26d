package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Broken or hostile OpenStreetMap files are refused with one line naming the file, exit code 3 and no
 * output. XML with a DOCTYPE is refused so no external entity is ever resolved (OWASP XML External
 * Entity Prevention Cheat Sheet: disable DTDs).
 */
class OsmBadInputTest {

    @TempDir
    Path dir;

    @Test
    void doctypeWithAnExternalEntityIsRefusedUnread() throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "do-not-read");
        Path osm = dir.resolve("hostile.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<!DOCTYPE osm [<!ENTITY leak SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<osm version=\"0.6\"><way id=\"1\"><nd ref=\"1\"/><nd ref=\"2\"/><tag k=\"highway\" v=\"residential\"/>"
                + "<tag k=\"name\" v=\"&leak;\"/></way></osm>\n");
        Refusals.assertRefused(dir, osm, "hostile.osm: line 2: a DOCTYPE declaration is not allowed");
    }

    @Test
    void internalEntityExpansionIsRefused() throws IOException {
        Path osm = dir.resolve("expansion.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<!DOCTYPE osm [<!ENTITY a \"aaaaaaaaaa\"><!ENTITY b \"&a;&a;&a;&a;\">]>\n"
                + "<osm version=\"0.6\"><node id=\"1\" lat=\"0\" lon=\"0\"><tag k=\"x\" v=\"&b;\"/></node></osm>\n");
        Refusals.assertRefused(dir, osm, "expansion.osm: line 2: a DOCTYPE declaration is not allowed");
    }

    @Test
    void truncatedPbf() throws IOException {
        byte[] bytes = Files.readAllBytes(Path.of("fixtures/osm/aguascalientes.osm.pbf"));
        Path pbf = dir.resolve("cut.osm.pbf");
        Files.write(pbf, Arrays.copyOf(bytes, bytes.length / 2));
        Refusals.assertRefused(dir, pbf, "cut.osm.pbf: after block");
    }

    @Test
    void notAnOsmFile() throws IOException {
        Path osm = dir.resolve("wrong.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<gpx version=\"1.1\"></gpx>\n");
        Refusals.assertRefused(dir, osm, "wrong.osm: line 2: root element <gpx> is not <osm>");
        assertFalse(Files.exists(dir.resolve("tour.geojson")));
    }

    @Test
    void truncatedXml() throws IOException {
        Path osm = dir.resolve("cut.osm");
        String text = Files.readString(Path.of("fixtures/osm/bavaria-rural.osm"));
        Files.writeString(osm, text.substring(0, text.length() / 2));
        Refusals.assertRefused(dir, osm, "cut.osm: line ");
    }
}
