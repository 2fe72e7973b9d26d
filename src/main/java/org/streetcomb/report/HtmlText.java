package org.streetcomb.report;

import org.streetcomb.SafeText;

/**
 * Escapes text for HTML. Every string that comes from input data or the command line (street names, ids,
 * file names, option values) passes through here or through the JSON escapes of {@link HtmlReportWriter}
 * before it reaches the page, so a street named {@code <script>} is shown as text and never runs.
 */
final class HtmlText {

    private HtmlText() {
    }

    /** Text safe in element content and in double- or single-quoted attribute values. */
    static String escape(String text) {
        text = SafeText.xml(text);
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
