package org.streetcomb.docs;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * A page of README.md or docs/ as a reader sees it: line breaks, indentation and quote marks at line
 * starts read as single spaces, so a sentence is found wherever the text wraps.
 */
final class Page {

    private final String name;
    private final String raw;
    private final String text;

    private Page(String name, String raw) {
        this.name = name;
        this.raw = raw;
        this.text = raw.replaceAll("\\s*\\n\\s*(>\\s*)?", " ").replaceAll("[ \\t]+", " ");
    }

    static Page of(String path) {
        try {
            return new Page(path, Files.readString(Path.of(path), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The same page with one passage of its text changed (wrapping ignored, tables gone): how a test shows
     * that a wrong figure is caught.
     */
    Page with(String passage, String replacement) {
        if (!text.contains(passage)) {
            throw new IllegalArgumentException(name + " has no passage \"" + passage + "\"");
        }
        return new Page(name, text.replace(passage, replacement));
    }

    /**
     * Fails unless the page says {@code expected}, word for word: the figures in it were formatted from a
     * measurement at the precision the page prints, so the tolerance is the page's own rounding.
     */
    void says(String expected) {
        if (text.contains(expected)) {
            return;
        }
        int longest = 0;
        for (int n = expected.length() - 1; n > 0; n--) {
            if (text.contains(expected.substring(0, n))) {
                longest = n;
                break;
            }
        }
        String near = "";
        if (longest > 0) {
            int at = text.indexOf(expected.substring(0, longest));
            near = text.substring(at, Math.min(text.length(), at + expected.length() + 20));
        }
        fail(name + " should say \"" + expected + "\"" + (near.isEmpty() ? "" : " but says \"" + near + "\""));
    }

    /**
     * The cells of the first table row whose first cells are {@code lead} (a lead cell ending in "..."
     * matches the cells that start with the rest); fails when there is none.
     */
    List<String> row(String... lead) {
        for (String line : raw.split("\n")) {
            if (!line.startsWith("|")) {
                continue;
            }
            String[] cells = line.substring(1, line.length() - (line.endsWith("|") ? 1 : 0)).split("\\|", -1);
            List<String> trimmed = Arrays.stream(cells).map(String::trim).toList();
            if (leads(trimmed, lead)) {
                return trimmed;
            }
        }
        return fail(name + " has no table row starting " + String.join(" | ", lead));
    }

    private static boolean leads(List<String> cells, String[] lead) {
        if (cells.size() < lead.length) {
            return false;
        }
        for (int i = 0; i < lead.length; i++) {
            boolean prefix = lead[i].endsWith("...");
            String want = prefix ? lead[i].substring(0, lead[i].length() - 3) : lead[i];
            if (prefix ? !cells.get(i).startsWith(want) : !cells.get(i).equals(want)) {
                return false;
            }
        }
        return true;
    }

    /** A cell such as "0.29 %", "**0.29 %**" or "0.976" as a number. */
    static double number(String cell) {
        return Double.parseDouble(cell.replace("*", "").replace("%", "").trim());
    }
}
