package org.streetcomb.read;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.streetcomb.InputError;

/**
 * Reads CARPLIB {@code .dat} files: {@code KEY : value} header lines (Spanish keywords), then edge lines
 * {@code ( u, v) coste c [demanda d]} under {@code LISTA_ARISTAS_REQ} and {@code LISTA_ARISTAS_NOREQ}, and
 * {@code DEPOSITO : n}. Whitespace varies between copies ({@code ( 1 , 2)}, CRLF), so parsing is by
 * pattern, not by column. The header's total cost is not trusted (it is wrong in some files).
 */
public final class CarplibReader {

    private static final Pattern EDGE = Pattern.compile(
            "\\(\\s*(\\d+)\\s*,\\s*(\\d+)\\s*\\)\\s*coste\\s+(\\d+)(?:\\s+demanda\\s+(\\d+))?");
    private static final Pattern HEADER = Pattern.compile("^\\s*([A-Z_]+)\\s*:\\s*(.*?)\\s*$");

    private CarplibReader() {
    }

    public static CarplibInstance read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.ISO_8859_1);
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read: " + e.getMessage());
        }
        String name = null;
        int vertices = -1, depot = -1, vehicles = 0, capacity = 0;
        boolean required = true;
        List<CarplibInstance.Edge> edges = new ArrayList<>();
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n);
            Matcher edge = EDGE.matcher(line);
            if (edge.find()) {
                int u = Integer.parseInt(edge.group(1));
                int v = Integer.parseInt(edge.group(2));
                if (u < 1 || v < 1 || (vertices > 0 && (u > vertices || v > vertices))) {
                    throw InputError.at(file, "line " + (n + 1), "node out of range 1.." + vertices);
                }
                int demand = edge.group(4) == null ? 0 : Integer.parseInt(edge.group(4));
                edges.add(new CarplibInstance.Edge(u, v, Integer.parseInt(edge.group(3)), demand, required));
                continue;
            }
            Matcher header = HEADER.matcher(line);
            if (!header.find()) {
                continue;
            }
            String value = header.group(2);
            switch (header.group(1)) {
                case "NOMBRE" -> name = value;
                case "VERTICES" -> vertices = number(file, n, value);
                case "VEHICULOS" -> vehicles = number(file, n, value);
                case "CAPACIDAD" -> capacity = number(file, n, value);
                case "DEPOSITO" -> depot = number(file, n, value);
                case "LISTA_ARISTAS_REQ" -> required = true;
                case "LISTA_ARISTAS_NOREQ" -> required = false;
                default -> { }
            }
        }
        if (vertices < 1 || depot < 1 || edges.isEmpty()) {
            throw InputError.at(file, null, "not a CARPLIB instance: VERTICES, DEPOSITO or the edge list is missing");
        }
        return new CarplibInstance(name, vertices, List.copyOf(edges), depot, vehicles, capacity);
    }

    private static int number(Path file, int line, String value) {
        try {
            return Integer.parseInt(value.replaceAll("[^0-9].*$", ""));
        } catch (NumberFormatException e) {
            throw InputError.at(file, "line " + (line + 1), "expected a whole number, found '" + value + "'");
        }
    }
}
