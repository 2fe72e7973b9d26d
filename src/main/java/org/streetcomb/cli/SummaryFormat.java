package org.streetcomb.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * The number formats and layout that every command's summary shares, so plan, health and audit print
 * lengths, shares and labelled lines the same way in text and in JSON.
 */
final class SummaryFormat {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SummaryFormat() {
    }

    static ObjectNode newObject() {
        return MAPPER.createObjectNode();
    }

    /** Metres with 3 decimals (millimetres), as JSON numbers. */
    static BigDecimal metres(double value) {
        return BigDecimal.valueOf(value).setScale(3, RoundingMode.HALF_EVEN);
    }

    /** A share in [0, 1] with 6 decimals; 0 when the whole is 0. */
    static BigDecimal share(double part, double whole) {
        return BigDecimal.valueOf(whole == 0 ? 0 : part / whole).setScale(6, RoundingMode.HALF_EVEN);
    }

    /** Appends one text line: a label in a 9-wide column, then the formatted value. */
    static void line(StringBuilder text, String label, String format, Object... args) {
        text.append(String.format(Locale.ROOT, "%-9s %s%n", label, String.format(Locale.ROOT, format, args)));
    }

    /** The summary as indented JSON with a final newline. */
    static String json(ObjectNode json) {
        try {
            return MAPPER.writeValueAsString(json) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
