package org.streetcomb.docs;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A part of a page in docs/ that a study command writes between two HTML comments, so the figures in it
 * always come from that command and {@link DocFiguresTest} can read them back. Text outside the markers
 * is kept as it is.
 *
 * @param name    the section's name in its markers, e.g. "mop-up study"
 * @param writer  the class that writes it, named in the opening marker
 */
public record GeneratedSection(String name, String writer) {

    public String begin() {
        return "<!-- " + name + ": written by " + writer + ", do not edit by hand -->\n";
    }

    public String end() {
        return "<!-- end of " + name + " -->\n";
    }

    /** The page with {@code body} between this section's markers, appended at the end when it has none. */
    public String splice(String page, String body) {
        String section = begin() + body + end();
        int from = page.indexOf(begin());
        int to = page.indexOf(end());
        if (from < 0 || to < from) {
            return page + "\n" + section;
        }
        return page.substring(0, from) + section + page.substring(to + end().length());
    }

    /** Writes {@code body} into the page's section. */
    public void write(Path page, String body) {
        try {
            Files.writeString(page, splice(Files.readString(page, StandardCharsets.UTF_8), body), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The text between this section's markers in the page; fails when the page has no such section. */
    public String read(Path page) {
        try {
            String text = Files.readString(page, StandardCharsets.UTF_8);
            int from = text.indexOf(begin());
            int to = text.indexOf(end());
            if (from < 0 || to < from) {
                throw new IllegalStateException(page + " has no section \"" + name + "\" written by " + writer);
            }
            return text.substring(from + begin().length(), to);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
