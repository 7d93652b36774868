package org.feedernote.data;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.TableRef;
import org.feedernote.trace.Trace;

/**
 * A reference table read from a CSV resource whose '#' header names the source, edition, table,
 * the meaning and unit of each column, and whether the values were recalled from memory.
 * Cells may be empty where the source gives no value.
 */
public final class ReferenceTable {
    private final TableRef ref;
    private final Map<String, String> header;
    private final List<String> columns;
    private final Map<String, Map<String, String>> rows;
    /** The numbers of each row, by the column's place in columns (null where a cell is empty or text). */
    private final Map<String, Double[]> numbers = new java.util.HashMap<>();
    /** The column names, for finding a column's place. */
    private final String[] columnNames;

    private ReferenceTable(TableRef ref, Map<String, String> header, List<String> columns,
                           Map<String, Map<String, String>> rows) {
        this.ref = ref;
        this.header = header;
        this.columns = columns;
        this.rows = rows;
        // Interned, as the names callers pass are (literals, and the capacity columns CapacityData
        // interns): a column is then found by identity.
        this.columnNames = columns.stream().map(String::intern).toArray(String[]::new);
        for (var r : rows.entrySet()) {
            Double[] parsed = new Double[columnNames.length];
            for (int i = 0; i < columnNames.length; i++) {
                String cell = r.getValue().get(columnNames[i]);
                try {
                    if (cell != null && !cell.isEmpty()) parsed[i] = Double.parseDouble(cell);
                } catch (NumberFormatException text) {
                    // a text column (a standard's name, a list of ratings)
                }
            }
            numbers.put(r.getKey(), parsed);
        }
    }

    public static ReferenceTable resource(String name) {
        String path = "/org/feedernote/data/" + name;
        try (InputStream in = ReferenceTable.class.getResourceAsStream(path)) {
            if (in == null) throw new IllegalStateException("reference table missing from the build: " + path);
            return parse(name, new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException("cannot read reference table " + path, e);
        }
    }

    static ReferenceTable parse(String name, String text) {
        Map<String, String> header = new LinkedHashMap<>();
        List<String> columns = null;
        Map<String, Map<String, String>> rows = new LinkedHashMap<>();
        try (BufferedReader r = new BufferedReader(new java.io.StringReader(text))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank()) continue;
                if (line.startsWith("#")) {
                    int colon = line.indexOf(':');
                    if (colon > 0) header.put(line.substring(1, colon).trim(), line.substring(colon + 1).trim());
                    continue;
                }
                String[] cells = line.split(",", -1);
                if (columns == null) {
                    columns = Arrays.stream(cells).map(String::trim).toList();
                    continue;
                }
                if (cells.length != columns.size()) {
                    throw new IllegalStateException(name + ": row '" + line + "' has " + cells.length + " cells, header has " + columns.size());
                }
                Map<String, String> row = new LinkedHashMap<>();
                for (int i = 0; i < cells.length; i++) row.put(columns.get(i), cells[i].trim());
                rows.put(cells[0].trim(), row);
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        for (String key : List.of("title", "source", "edition", "table", "from_memory")) {
            if (!header.containsKey(key)) throw new IllegalStateException(name + ": header lacks '" + key + "'");
        }
        TableRef ref = new TableRef(name.replaceFirst("\\.csv$", ""), header.get("title"), header.get("source"),
                header.get("edition"), header.get("table"), Boolean.parseBoolean(header.get("from_memory")),
                header.getOrDefault("notes", ""));
        return new ReferenceTable(ref, header, columns == null ? List.of() : columns, rows);
    }

    public TableRef ref() { return ref; }
    public Map<String, String> header() { return header; }
    public List<String> columns() { return columns; }
    public List<String> rowKeys() { return new ArrayList<>(rows.keySet()); }

    /** The value at (row, column), or null where the table has none. */
    public Double value(String row, String column) {
        Double[] r = numbers.get(row);
        if (r == null) return null;
        int c = place(column);
        return c < 0 ? null : r[c];
    }

    /**
     * The place of a column, or -1. A table has a few columns (at most 15) and callers name them
     * by interned strings: compared by identity first, a lookup hashes nothing.
     */
    private int place(String column) {
        String[] names = columnNames;
        for (int i = 0; i < names.length; i++) if (names[i] == column) return i;
        for (int i = 0; i < names.length; i++) if (names[i].equals(column)) return i;
        return -1;
    }

    public String text(String row, String column) {
        Map<String, String> r = rows.get(row);
        return r == null ? null : r.get(column);
    }

    /**
     * The value at (row, column) as the quantity owner + step. With the no-op trace (a sizing
     * candidate) it is read straight from the table, with no step, labels or joined id made; with a
     * recording trace, and wherever the cell is missing (so that the gap is reported in the same
     * words), recorded is made, added to the trace and its quantity returned.
     */
    public Q quantity(Trace t, String owner, String step, String symbol, String unit, String row, String column,
                      Supplier<Step.Lookup> recorded) {
        if (!t.recording()) {
            Double v = value(row, column);
            if (v != null) return new Q(owner, step, symbol, v, unit);
        }
        Step.Lookup s = recorded.get();
        t.add(s);
        return s.q();
    }

    /** Exact lookup recorded as a trace step; a missing cell is a loud error, never a zero. */
    public Step.Lookup lookup(String stepId, String title, String symbol, String unit, String row, String column,
                              String rowLabel, String columnLabel) {
        Double v = value(row, column);
        if (v == null) {
            throw new DataGapException(stepId + ": " + ref.citation() + " gives no value for " + rowLabel + ", " + columnLabel);
        }
        return new Step.Lookup(stepId, title, symbol, v, unit, cellRef(row, column), rowLabel, columnLabel, "exact", List.of());
    }

    /**
     * The table's reference as it holds for one cell: a table with a per-row {@code memory} column
     * is recalled only in the cells that column names, so the note can list exactly the recalled
     * values it used.
     */
    public TableRef cellRef(String row, String column) {
        if (!ref.fromMemory() || !columns.contains(Provenance.MEMORY)) return ref;
        boolean recalled = Provenance.recalled(this, row, column);
        return recalled ? ref : verifiedRef();
    }

    private TableRef verified;

    private TableRef verifiedRef() {
        TableRef v = verified;
        if (v == null) {
            v = new TableRef(ref.id(), ref.title(), ref.source(), ref.edition(), ref.table(), false, ref.notes());
            verified = v;
        }
        return v;
    }
}
