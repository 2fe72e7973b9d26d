package org.streetcomb.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Every file the README's examples write in the checkout (the value of an output option, or a shell
 * redirect) is covered by .gitignore, so trying the examples leaves the clone clean. Patterns are read
 * as git reads the simple ones used there: a leading "/" anchors at the top, "*" matches within a name
 * (gitignore(5)).
 */
class ReadmeOutputsIgnoredTest {

    private static final Pattern WRITTEN = Pattern.compile(
            "(?:--(?:out|gpx|kml|directions|report|quicklook|streets-out|missed-out|mop-up|mop-up-ids)\\s+|>\\s*)"
                    + "([A-Za-z0-9._-]+\\.[a-z]+)");

    @Test
    void everyExampleOutputIsIgnored() throws IOException {
        List<PathMatcher> ignored = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of(".gitignore"))) {
            String pattern = line.strip();
            if (!pattern.isEmpty() && !pattern.startsWith("#")) {
                String glob = pattern.startsWith("/") ? pattern.substring(1) : pattern;
                ignored.add(FileSystems.getDefault().getPathMatcher("glob:" + glob.replaceAll("/$", "")));
            }
        }
        List<String> outputs = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("README.md"))) {
            if (!line.startsWith("    ")) {
                continue; // commands are the indented code lines
            }
            Matcher m = WRITTEN.matcher(line);
            while (m.find()) {
                outputs.add(m.group(1));
            }
        }
        assertTrue(outputs.size() >= 10, "outputs found in the README's examples: " + outputs);
        List<String> tracked = outputs.stream().filter(name -> ignored.stream()
                .noneMatch(glob -> glob.matches(Path.of(name)))).distinct().toList();
        assertEquals(List.of(), tracked, "README examples write files .gitignore does not cover");
    }
}
