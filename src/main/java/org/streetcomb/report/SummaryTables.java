package org.streetcomb.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Draws a command's JSON summary as HTML tables, whatever fields it has, so the report shows exactly the
 * numbers the command prints with {@code --json}: scalars at the top level form the first table, each
 * object its own table (nested objects flattened), an array of objects a table with one row per element
 * (inside an object too, drawn after the object's table),
 * and an array of text a list. Every value cell carries its JSON path in {@code data-key} (for example
 * {@code totals.tour_m} or {@code tours.0.length_m}) and the value exactly as JSON writes it.
 */
final class SummaryTables {

    private final StringBuilder html = new StringBuilder();

    private SummaryTables() {
    }

    static String html(JsonNode summary) {
        SummaryTables tables = new SummaryTables();
        // a summary may hold plain Java values (lists of warnings): make it a tree of JSON nodes first
        tables.top(new ObjectMapper().valueToTree(summary));
        return tables.html.toString();
    }

    private void top(JsonNode summary) {
        List<Map.Entry<String, JsonNode>> scalars = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = summary.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> field = it.next();
            if (field.getValue().isValueNode()) {
                scalars.add(field);
            }
        }
        if (!scalars.isEmpty()) {
            html.append("<table class=\"facts\">");
            for (Map.Entry<String, JsonNode> field : scalars) {
                row(label(field.getKey()), field.getKey(), field.getValue());
            }
            html.append("</table>");
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = summary.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> field = it.next();
            JsonNode value = field.getValue();
            if (value.isValueNode()) {
                continue;
            }
            html.append("<h3>").append(HtmlText.escape(label(field.getKey()))).append("</h3>");
            if (value.isObject()) {
                List<Nested> nested = new ArrayList<>();
                html.append("<table class=\"facts\">");
                objectRows("", field.getKey(), value, nested);
                html.append("</table>");
                for (Nested table : nested) {
                    html.append("<h3>").append(HtmlText.escape(table.label)).append("</h3>");
                    arrayTable(table.path, table.array);
                }
            } else if (isTable(value)) {
                arrayTable(field.getKey(), value);
            } else {
                list(field.getKey(), value);
            }
        }
    }

    /** Adds the rows of an object; its arrays of objects go to {@code nested}, to be drawn as tables after it. */
    private void objectRows(String labelPrefix, String path, JsonNode object, List<Nested> nested) {
        if (object.isEmpty()) {
            row(labelPrefix.isEmpty() ? "(none)" : labelPrefix, path, object);
            return;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> field = it.next();
            String label = labelPrefix.isEmpty() ? label(field.getKey()) : labelPrefix + " / " + label(field.getKey());
            String key = path + "." + field.getKey();
            if (field.getValue().isObject()) {
                objectRows(label, key, field.getValue(), nested);
            } else if (field.getValue().isArray() && isTable(field.getValue())) {
                nested.add(new Nested(label(path.split("\\.")[0]) + " / " + label, key, field.getValue()));
            } else {
                row(label, key, field.getValue());
            }
        }
    }

    private static boolean isTable(JsonNode array) {
        if (array.isEmpty()) {
            return false;
        }
        for (JsonNode element : array) {
            if (!element.isObject()) {
                return false;
            }
        }
        return true;
    }

    private void arrayTable(String path, JsonNode array) {
        Set<String> columns = new LinkedHashSet<>();
        for (JsonNode element : array) {
            element.fieldNames().forEachRemaining(columns::add);
        }
        html.append("<table class=\"rows\"><thead><tr>");
        for (String column : columns) {
            html.append("<th>").append(HtmlText.escape(label(column))).append("</th>");
        }
        html.append("</tr></thead><tbody>");
        for (int i = 0; i < array.size(); i++) {
            html.append("<tr>");
            for (String column : columns) {
                JsonNode value = array.get(i).get(column);
                cell(path + "." + i + "." + column, value);
            }
            html.append("</tr>");
        }
        html.append("</tbody></table>");
    }

    private void list(String path, JsonNode array) {
        if (array.isEmpty()) {
            html.append("<p class=\"none\">none</p>");
            return;
        }
        html.append("<ul class=\"notes\">");
        for (int i = 0; i < array.size(); i++) {
            html.append("<li data-key=\"").append(HtmlText.escape(path + "." + i)).append("\">")
                    .append(HtmlText.escape(text(array.get(i)))).append("</li>");
        }
        html.append("</ul>");
    }

    private void row(String label, String path, JsonNode value) {
        html.append("<tr><th>").append(HtmlText.escape(label)).append("</th>");
        cell(path, value);
        html.append("</tr>");
    }

    private void cell(String path, JsonNode value) {
        if (value == null) {
            // this element of the array has no such field
            html.append("<td></td>");
            return;
        }
        html.append("<td data-key=\"").append(HtmlText.escape(path)).append('"');
        if (value != null && value.isNumber()) {
            html.append(" class=\"number\"");
        }
        html.append('>').append(HtmlText.escape(text(value))).append("</td>");
    }

    /**
     * The value as JSON writes it; text without quotes; a nested value as compact JSON. Decimals are written
     * out in full: the tree may hold them normalised (200.0 as 2E+2).
     */
    private static String text(JsonNode value) {
        if (value.isBigDecimal()) {
            return value.decimalValue().toPlainString();
        }
        return value.isValueNode() ? value.asText() : value.toString();
    }

    /** An array of objects inside an object, drawn as its own table. */
    private record Nested(String label, String path, JsonNode array) {
    }

    /** "deadhead_share" becomes "deadhead share", "tour_m" becomes "tour (m)". */
    static String label(String key) {
        String words = key.endsWith("_m") ? key.substring(0, key.length() - 2) + " (m)" : key;
        return words.replace('_', ' ');
    }
}
