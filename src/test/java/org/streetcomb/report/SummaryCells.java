package org.streetcomb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;

/** Checks a report page's summary tables against the JSON summary the command printed. */
final class SummaryCells {

    private SummaryCells() {
    }

    /** Every number and text of the summary table is the one the command printed with --json; returns the cells. */
    static JsonNode assertTableShows(HeadlessChromium chromium, JsonNode printed) throws Exception {
        JsonNode cells = chromium.eval("Array.from(document.querySelectorAll('#summary [data-key]'))"
                + ".map(c => [c.dataset.key, c.textContent])");
        assertTrue(cells.size() > 20, "the summary table has the summary's fields: " + cells.size());
        for (JsonNode cell : cells) {
            JsonNode expected = at(printed, cell.get(0).asText());
            String shown = cell.get(1).asText();
            if (expected.isNumber()) {
                assertEquals(0, expected.decimalValue().compareTo(new BigDecimal(shown)), cell.toString());
            } else {
                assertEquals(expected.isValueNode() ? expected.asText() : expected.toString(), shown, cell.toString());
            }
        }
        return cells;
    }

    private static JsonNode at(JsonNode root, String path) {
        JsonNode node = root;
        for (String part : path.split("\\.")) {
            node = node.isArray() ? node.get(Integer.parseInt(part)) : node.get(part);
        }
        return node;
    }
}
