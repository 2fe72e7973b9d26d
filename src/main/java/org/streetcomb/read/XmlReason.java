package org.streetcomb.read;

/**
 * The reason in a StAX parser's message, without the parser's own "ParseError at [row,col]:[r,c] Message:"
 * prefix (the place is given separately, in the user's words), on one line.
 */
final class XmlReason {

    private XmlReason() {
    }

    static String of(String message) {
        if (message == null) {
            return "";
        }
        String trimmed = message.replaceFirst("(?s)^ParseError at \\[row,col\\]:\\[\\d+,\\d+\\]\\s*Message:\\s*", "");
        return trimmed.lines().findFirst().orElse("").trim();
    }
}
