package org.streetcomb.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Leaflet's script and style sheet, read from the Leaflet WebJar on the class path (org.webjars.npm:leaflet,
 * BSD-2-Clause), with the style sheet's images inlined as data URIs and the source-map comment removed, so
 * the report needs nothing beside itself. The licence text travels with it, as BSD-2-Clause asks.
 */
record LeafletAssets(String version, String script, String css, String licence) {

    private static final String ROOT = "META-INF/resources/webjars/leaflet/";
    private static final Pattern IMAGE = Pattern.compile("url\\(images/([a-z0-9-]+\\.png)\\)");

    static LeafletAssets load() {
        Properties pom = new Properties();
        try (InputStream in = resource("META-INF/maven/org.webjars.npm/leaflet/pom.properties")) {
            pom.load(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String version = pom.getProperty("version");
        String dist = ROOT + version + "/dist/";
        String script = text(dist + "leaflet.js").replaceAll("\n//# sourceMappingURL=\\S+\\s*$", "\n");
        Matcher images = IMAGE.matcher(text(dist + "leaflet.css"));
        StringBuilder css = new StringBuilder();
        while (images.find()) {
            String data = Base64.getEncoder().encodeToString(bytes(dist + "images/" + images.group(1)));
            images.appendReplacement(css, Matcher.quoteReplacement("url(data:image/png;base64," + data + ")"));
        }
        images.appendTail(css);
        return new LeafletAssets(version, script, css.toString(), text(ROOT + version + "/LICENSE"));
    }

    private static String text(String name) {
        return new String(bytes(name), StandardCharsets.UTF_8);
    }

    private static byte[] bytes(String name) {
        try (InputStream in = resource(name)) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static InputStream resource(String name) {
        InputStream in = LeafletAssets.class.getClassLoader().getResourceAsStream(name);
        if (in == null) {
            throw new IllegalStateException("missing from the class path: " + name + " (the Leaflet WebJar)");
        }
        return in;
    }
}
