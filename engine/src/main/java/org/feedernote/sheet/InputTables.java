package org.feedernote.sheet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.input.Node;
import org.feedernote.input.SheetColumns;

/**
 * The design input as the three sheets the input reader reads (project, boards, circuits), from
 * the format's description ({@link SheetColumns}): empty as a template, or holding an input. Every
 * column has its key as the header, its unit below, a comment saying what it takes, and a
 * validation list where the key takes a closed set of words or sizes.
 */
public final class InputTables {
    private InputTables() {}

    /** Rows a template's validation lists reach: room for a large schedule typed by hand. */
    static final int TEMPLATE_ROWS = 2000;

    /** The template: every key, no values but the format's version. */
    public static List<Table> template() {
        return of(null);
    }

    /** An input's tree (already read without errors) as the three sheets; null gives the template. */
    public static List<Table> of(Node root) {
        Map<String, Object> settings = new LinkedHashMap<>();
        List<Map<String, Object>> boards = new ArrayList<>();
        List<Map<String, Object>> circuits = new ArrayList<>();
        int revisions = 1;
        if (root instanceof Node.Obj o) {
            for (Node.Entry e : o.entries().values()) {
                if (e.key().equals(SheetColumns.BOARDS)) boards = items(e.value());
                else if (e.key().equals(SheetColumns.CIRCUITS)) circuits = items(e.value());
                else flatten(e.key(), e.value(), settings);
            }
            Node project = o.get("project");
            Node list = project instanceof Node.Obj p ? p.get("revisions") : null;
            revisions = list instanceof Node.Arr a ? a.items().size() : 0;
        } else {
            settings.put("format", 1L);
        }
        List<Table> out = new ArrayList<>();
        out.add(settingsTable(settings, revisions));
        out.add(rowsTable(SheetColumns.BOARDS, SheetColumns.boards(), boards, root == null));
        out.add(rowsTable(SheetColumns.CIRCUITS, SheetColumns.circuits(), circuits, root == null));
        return out;
    }

    private static List<Map<String, Object>> items(Node list) {
        List<Map<String, Object>> out = new ArrayList<>();
        if (list instanceof Node.Arr a) {
            for (Node item : a.items()) {
                Map<String, Object> row = new LinkedHashMap<>();
                if (item instanceof Node.Obj o) for (Node.Entry e : o.entries().values()) flatten(e.key(), e.value(), row);
                out.add(row);
            }
        }
        return out;
    }

    /** Dotted keys to values: mappings joined with '.', list items numbered [0], [1], … */
    private static void flatten(String key, Node n, Map<String, Object> out) {
        if (n instanceof Node.Obj o) {
            for (Node.Entry e : o.entries().values()) flatten(key + "." + e.key(), e.value(), out);
        } else if (n instanceof Node.Arr a) {
            for (int i = 0; i < a.items().size(); i++) flatten(key + "[" + i + "]", a.items().get(i), out);
        } else {
            out.put(key, ((Node.Scalar) n).value());
        }
    }

    private static Table settingsTable(Map<String, Object> values, int revisions) {
        List<Table.Column> columns = List.of(
                new Table.Column("key", null, "The key in dotted form (project.title, supply.source.transformer.rating_kva). A row left without a value is a key not given.", List.of(), null),
                new Table.Column("value", null, "The key's value: a number, a word from the list, a text or a date YYYY-MM-DD.", List.of(), null),
                new Table.Column("unit", null, "The unit the value is in (from the key's suffix); read by nobody.", List.of(), null),
                new Table.Column("meaning", null, "What the key is, whether it is required, and its default; read by nobody.", List.of(), null));
        List<Table.Row> rows = new ArrayList<>();
        List<String> listed = new ArrayList<>();
        for (SheetColumns.Column c : SheetColumns.settings(Math.max(revisions, 1))) {
            listed.add(c.key());
            rows.add(new Table.Row(cells(c.key(), values.get(c.key()), c.unit(), c.describe()), false, -1, c.choices()));
        }
        // Keys the format does not know (a tree read without errors has none): kept, for the reader to name.
        for (Map.Entry<String, Object> e : values.entrySet()) {
            if (!listed.contains(e.getKey())) rows.add(Table.Row.of(cells(e.getKey(), e.getValue(), null, null)));
        }
        return new Table(SheetColumns.PROJECT, columns, rows, false, 0);
    }

    private static List<Object> cells(Object... values) {
        List<Object> out = new ArrayList<>(values.length);
        for (Object v : values) out.add(v);
        return out;
    }

    private static Table rowsTable(String name, List<SheetColumns.Column> keys, List<Map<String, Object>> items, boolean template) {
        List<Table.Column> columns = new ArrayList<>();
        List<String> order = new ArrayList<>();
        for (SheetColumns.Column c : keys) {
            columns.add(new Table.Column(c.key(), c.unit(), c.describe(), c.choices(), null));
            order.add(c.key());
        }
        for (Map<String, Object> item : items) {
            for (String k : item.keySet()) {
                if (!order.contains(k)) {
                    order.add(k);
                    columns.add(new Table.Column(k, null, null, List.of(), null));
                }
            }
        }
        List<Table.Row> rows = new ArrayList<>();
        for (Map<String, Object> item : items) {
            List<Object> cells = new ArrayList<>(order.size());
            for (String k : order) cells.add(item.get(k));
            rows.add(Table.Row.of(cells));
        }
        return new Table(name, columns, rows, true, template ? TEMPLATE_ROWS : items.size() + TEMPLATE_ROWS);
    }
}
