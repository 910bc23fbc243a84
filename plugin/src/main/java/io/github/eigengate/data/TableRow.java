package io.github.eigengate.data;

import java.util.Map;

/**
 * A row of a claims table ({@code congruences.csv}, {@code reducible.csv}, {@code modp-weights.csv}) kept as text
 * with its location; the check that owns the table parses it and reports malformed cells itself.
 */
public record TableRow(String file, int line, Map<String, String> cells, Map<String, Integer> columns) {

    public TableRow {
        cells = Map.copyOf(cells);
        columns = Map.copyOf(columns);
    }

    /** The stripped cell, "" when absent. */
    public String get(String column) {
        return cells.getOrDefault(column, "");
    }

    public SourceLocation at() {
        return SourceLocation.row(file, line);
    }

    public SourceLocation at(String column) {
        Integer c = columns.get(column);
        return new SourceLocation(file, line, c == null ? 0 : c);
    }
}
