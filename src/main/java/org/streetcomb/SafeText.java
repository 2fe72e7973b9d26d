package org.streetcomb;

/**
 * Text from input data (street names, ids, file names) made safe for the programs it travels to: XML
 * readers, spreadsheets and terminals. One home for each rule so every writer applies the same one.
 * Each method is linear in the text's length.
 */
public final class SafeText {

    private SafeText() {
    }

    /**
     * Drops every character the XML 1.0 Char production (W3C XML 1.0, fifth edition, section 2.2) forbids:
     * control characters other than tab, line feed and carriage return, unpaired surrogates, U+FFFE and
     * U+FFFF. A reader must refuse a document holding one, so a street name with U+0001 would spoil a GPX.
     */
    public static String xml(String text) {
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean pair = Character.isHighSurrogate(c) && i + 1 < text.length()
                    && Character.isLowSurrogate(text.charAt(i + 1));
            boolean allowed = c == '\t' || c == '\n' || c == '\r' || c >= 0x20 && c <= 0xD7FF
                    || c >= 0xE000 && c <= 0xFFFD || pair;
            if (!allowed && out == null) {
                out = new StringBuilder(text.length()).append(text, 0, i);
            }
            if (allowed && out != null) {
                out.append(c);
            }
            if (pair) {
                i++;
                if (out != null) {
                    out.append(text.charAt(i));
                }
            }
        }
        return out == null ? text : out.toString();
    }

    /**
     * One CSV field (RFC 4180 quoting) that a spreadsheet will not run as a formula: a value starting with
     * {@code = + - @}, tab or carriage return is prefixed with a single quote, the OWASP CSV injection
     * guidance's rule (https://owasp.org/www-community/attacks/CSV_Injection).
     */
    public static String csvField(String value) {
        String safe = !value.isEmpty() && "=+-@\t\r".indexOf(value.charAt(0)) >= 0 ? "'" + value : value;
        return safe.contains(",") || safe.contains("\"") || safe.contains("\n") || safe.contains("\r")
                ? "\"" + safe.replace("\"", "\"\"") + "\"" : safe;
    }

    /**
     * Text for a terminal: control characters (C0 other than line feed and tab, DEL, C1) are shown as
     * {@code \xNN}, so an escape sequence in a feature id cannot set the terminal's title or
     * colours or move the cursor.
     */
    public static String terminal(String text) {
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean control = c < 0x20 && c != '\n' && c != '\t' || c >= 0x7F && c <= 0x9F;
            if (control && out == null) {
                out = new StringBuilder(text.length() + 8).append(text, 0, i);
            }
            if (out != null) {
                out.append(control ? String.format("\\x%02X", (int) c) : String.valueOf(c));
            }
        }
        return out == null ? text : out.toString();
    }
}
