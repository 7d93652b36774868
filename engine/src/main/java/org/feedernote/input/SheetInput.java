package org.feedernote.input;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.model.Installation;

/**
 * Reads a design input from an .xlsx workbook or from CSV files: a sheet {@code project} of
 * key/value rows (project, basis, supply, keys in dotted form), a sheet {@code boards} and a sheet
 * {@code circuits} with a header row of dotted keys and a row per item. The rows become the same
 * located tree the YAML reader makes, checked and bound by {@link InputReader} with the same rules
 * and messages; a message names the sheet and cell ({@code circuits!F12}).
 * <p>
 * Blank rows and cells are skipped (a blank cell is a key not given), columns may come in any
 * order, a row whose first cell starts with '(' (the template's units row) is a remark, and a
 * number typed as text is read as the number where the key takes one.
 */
public final class SheetInput {
    private SheetInput() {}

    /** The sheets in the order their positions are numbered. */
    static final List<String> SHEETS = List.of(SheetColumns.PROJECT, SheetColumns.BOARDS, SheetColumns.CIRCUITS);

    /** A position's line holds the sheet's number above this many bits and the row below (a sheet has at most 2^20 rows). */
    private static final int ROW_BITS = 21;

    /** A cell's content: a String, a Double, a Boolean, or a LocalDate for a number shown as a date. */
    record Cell(int row, int col, Object value) {}

    /** A sheet as its non-blank rows; each row's cells are its non-blank ones, left to right. name: as the user sees it. */
    record Grid(String name, List<List<Cell>> rows) {}

    public static boolean isSheetInput(Path path) {
        String n = path.getFileName() == null ? "" : path.getFileName().toString().toLowerCase(Locale.ROOT);
        return Files.isDirectory(path) || n.endsWith(".xlsx") || n.endsWith(".csv");
    }

    /** Reads a workbook, a folder of CSV files, or one of a set of CSV files named by its sheet. */
    public static Installation read(Path path) throws InputException {
        String name = path.toString();
        Map<String, Grid> grids = new LinkedHashMap<>();
        List<InputError> errors = new ArrayList<>();
        boolean typed;
        try {
            if (Files.isDirectory(path) || name.toLowerCase(Locale.ROOT).endsWith(".csv")) {
                typed = false;
                readCsv(path, grids, errors);
            } else {
                typed = true;
                WorkbookGrid.read(path, SHEETS, grids);
            }
        } catch (IOException | RuntimeException e) {
            throw new InputException(List.of(new InputError(name, 1, 1, "", "cannot read the workbook: " + e.getMessage())));
        }
        for (String sheet : SHEETS) {
            if (!grids.containsKey(sheet)) {
                errors.add(new InputError(name, 0, 0, "", typed
                        ? "the workbook has no sheet '" + sheet + "' (it needs the sheets project, boards and circuits; `feedernote workbook` writes an empty one)"
                        : "no file " + sheet + ".csv (the CSV input is three files: project.csv, boards.csv, circuits.csv)"));
            }
        }
        if (!errors.isEmpty()) throw new InputException(errors);
        return read(name, grids, typed);
    }

    static Installation read(String name, Map<String, Grid> grids, boolean typed) throws InputException {
        Builder b = new Builder(name, grids, typed);
        Node root = b.root();
        if (!b.errors.isEmpty()) throw new InputException(located(b.errors, b));
        // The YAML form is for the note's listing and the canonical form: made only when asked for.
        Listing yaml = new Listing(root);
        return InputReader.parse(name, root, yaml, () -> InputReader.treeOrNull(name, yaml.get()), b);
    }

    /** The tree's YAML form, written when first asked for; the tree is let go once it is written. */
    private static final class Listing implements java.util.function.Supplier<String> {
        private Node root;
        private String yaml;

        Listing(Node root) {
            this.root = root;
        }

        @Override public synchronized String get() {
            if (yaml == null) {
                yaml = InputYaml.write(root);
                root = null;
            }
            return yaml;
        }
    }

    private static List<InputError> located(List<InputError> errors, InputReader.Locator locator) {
        List<InputError> out = new ArrayList<>();
        for (InputError e : errors) {
            InputReader.Locator.Located at = locator.locate(e.line(), e.column(), e.path());
            out.add(new InputError(e.file(), e.line(), e.column(), at.path(), e.message(), at.place()));
        }
        return out;
    }

    // ---- CSV ----

    private static void readCsv(Path path, Map<String, Grid> grids, List<InputError> errors) throws IOException {
        Path folder;
        String prefix = "";
        if (Files.isDirectory(path)) {
            folder = path;
        } else {
            folder = path.toAbsolutePath().getParent();
            String stem = path.getFileName().toString();
            stem = stem.substring(0, stem.length() - 4);
            for (String sheet : SHEETS) {
                if (stem.toLowerCase(Locale.ROOT).endsWith(sheet)) prefix = stem.substring(0, stem.length() - sheet.length());
            }
        }
        for (String sheet : SHEETS) {
            Path file = folder.resolve(prefix + sheet + ".csv");
            if (!Files.isRegularFile(file)) continue;
            String text;
            try {
                text = new String(Files.readAllBytes(file), StandardCharsets.UTF_8);
            } catch (IOException e) {
                errors.add(new InputError(file.toString(), 0, 0, "", "cannot read the file: " + e.getMessage()));
                continue;
            }
            if (text.startsWith("\uFEFF")) text = text.substring(1);
            grids.put(sheet, new Grid(prefix + sheet + ".csv", Csv.parse(text)));
        }
    }

    // ---- the tree ----

    static String cellName(int row, int col) {
        StringBuilder letters = new StringBuilder();
        int c = col;
        while (c > 0) {
            int r = (c - 1) % 26;
            letters.insert(0, (char) ('A' + r));
            c = (c - 1) / 26;
        }
        return letters.toString() + row;
    }

    /** Builds the tree and says where its positions are. Rows and columns count from 1. */
    private static final class Builder implements InputReader.Locator {
        final String file;
        final Map<String, Grid> grids;
        final boolean typed;
        final List<InputError> errors = new ArrayList<>();
        /** Per sheet number: the dotted key of each column (boards, circuits) and the row where each key is (project). */
        final Map<Integer, Map<String, Integer>> columnOf = new LinkedHashMap<>();
        final Map<String, Integer> projectRowOf = new LinkedHashMap<>();
        final Map<Integer, Integer> headerRow = new LinkedHashMap<>();

        Builder(String file, Map<String, Grid> grids, boolean typed) {
            this.file = file;
            this.grids = grids;
            this.typed = typed;
        }

        static long at(int sheet, int row, int col) {
            return Node.Pos.pack((sheet << ROW_BITS) | row, col);
        }

        Node root() {
            Draft root = new Draft(at(1, 1, 1));
            settings(grids.get(SheetColumns.PROJECT), root);
            root.put(SheetColumns.BOARDS, at(2, 1, 1), rows(2, grids.get(SheetColumns.BOARDS), SheetColumns.BOARDS));
            root.put(SheetColumns.CIRCUITS, at(3, 1, 1), rows(3, grids.get(SheetColumns.CIRCUITS), SheetColumns.CIRCUITS));
            return root.node();
        }

        void error(long at, String path, String message) {
            Node.Pos p = Node.Pos.unpack(at);
            errors.add(new InputError(file, p.line(), p.column(), path, message));
        }

        private void settings(Grid grid, Draft root) {
            Map<String, Long> seen = new LinkedHashMap<>();
            for (List<Cell> row : grid.rows()) {
                Cell keyCell = row.get(0);
                if (keyCell.col() != 1) continue;
                String key = text(keyCell.value()).trim();
                if (key.isEmpty() || key.startsWith("(") || (key.equals("key") && keyCell.row() == grid.rows().get(0).get(0).row())) continue;
                Cell valueCell = null;
                for (Cell c : row) if (c.col() == 2) valueCell = c;
                if (valueCell == null) continue;
                long keyAt = at(1, keyCell.row(), 1);
                if (seen.containsKey(key)) {
                    error(keyAt, key, "the key '" + key + "' is given twice (first in row " + (Node.Pos.unpack(seen.get(key)).line() & ((1 << ROW_BITS) - 1)) + ")");
                    continue;
                }
                seen.put(key, keyAt);
                projectRowOf.put(key, keyCell.row());
                Spec spec = SheetColumns.specAt(InputSchema.ROOT, key);
                put(root, key, keyAt, scalar(valueCell.value(), spec, at(1, valueCell.row(), 2)), key);
            }
        }

        private Node rows(int sheet, Grid grid, String list) {
            Draft.Items items = new Draft.Items(at(sheet, 1, 1));
            List<List<Cell>> rows = grid.rows();
            if (rows.isEmpty()) return items.node();
            List<Cell> header = rows.get(0);
            int headerAt = header.get(0).row();
            headerRow.put(sheet, headerAt);
            Map<Integer, String> keys = new LinkedHashMap<>();
            Map<String, Integer> columns = new LinkedHashMap<>();
            for (Cell h : header) {
                String key = text(h.value()).trim();
                if (key.isEmpty()) continue;
                if (columns.containsKey(key)) {
                    error(at(sheet, headerAt, h.col()), key, "the column '" + key + "' is given twice (first in column "
                            + cellName(headerAt, columns.get(key)).replaceAll("\\d", "") + ")");
                    continue;
                }
                columns.put(key, h.col());
                keys.put(h.col(), key);
            }
            columnOf.put(sheet, columns);
            Spec.Obj itemSpec = SheetColumns.rowSpec(list);
            // Each column's spec, found once rather than per cell.
            Map<Integer, Spec> specOf = new java.util.HashMap<>();
            for (Map.Entry<Integer, String> k : keys.entrySet()) specOf.put(k.getKey(), SheetColumns.specAt(itemSpec, k.getValue()));
            for (int r = 1; r < rows.size(); r++) {
                List<Cell> row = rows.get(r);
                Cell first = null;
                for (Cell c : row) if (keys.containsKey(c.col())) { first = c; break; }
                if (first == null) continue;
                if (first.col() == header.get(0).col() && text(first.value()).trim().startsWith("(")) continue;
                Draft item = new Draft(at(sheet, row.get(0).row(), first.col()));
                for (Cell c : row) {
                    String key = keys.get(c.col());
                    if (key == null) continue;
                    Node value = scalar(c.value(), specOf.get(c.col()), at(sheet, c.row(), c.col()));
                    if (value == null) continue;
                    put(item, key, at(sheet, headerAt, c.col()), value, key);
                }
                items.add(item);
            }
            return items.node();
        }

        /** Puts a value at a dotted key, making the mappings and lists on the way. */
        private void put(Draft root, String dotted, long keyAt, Node value, String shown) {
            if (value == null) return;
            Draft at = root;
            String[] parts = dotted.split("\\.", -1);
            for (int i = 0; i < parts.length; i++) {
                String part = parts[i];
                boolean last = i == parts.length - 1;
                int bracket = part.indexOf('[');
                int index = -1;
                if (bracket >= 0 && part.endsWith("]")) {
                    try {
                        index = Integer.parseInt(part.substring(bracket + 1, part.length() - 1));
                    } catch (NumberFormatException e) {
                        index = -2;
                    }
                    part = part.substring(0, bracket);
                }
                if (part.isEmpty() || index == -2 || index > 999) {
                    error(keyAt, shown, "'" + dotted + "' is not a key in dotted form (keys are written like supply.source.transformer.rating_kva, list items like project.revisions[0].date)");
                    return;
                }
                Object existing = at.get(part);
                if (index >= 0) {
                    Draft.Items items;
                    if (existing == null) {
                        items = new Draft.Items(keyAt);
                        at.put(part, keyAt, items);
                    } else if (existing instanceof Draft.Items it) {
                        items = it;
                    } else {
                        conflict(keyAt, dotted, shown);
                        return;
                    }
                    while (items.size() <= index) items.add(new Draft(keyAt));
                    Object item = items.get(index);
                    if (last) {
                        items.set(index, value);
                        return;
                    }
                    if (!(item instanceof Draft d)) {
                        conflict(keyAt, dotted, shown);
                        return;
                    }
                    at = d;
                } else if (last) {
                    if (existing != null) {
                        conflict(keyAt, dotted, shown);
                        return;
                    }
                    at.put(part, keyAt, value);
                } else {
                    if (existing == null) {
                        Draft d = new Draft(value.pos() == null ? keyAt : packed(value));
                        at.put(part, keyAt, d);
                        at = d;
                    } else if (existing instanceof Draft d) {
                        at = d;
                    } else {
                        conflict(keyAt, dotted, shown);
                        return;
                    }
                }
            }
        }

        private static long packed(Node n) {
            Node.Pos p = n.pos();
            return Node.Pos.pack(p.line(), p.column());
        }

        private void conflict(long keyAt, String dotted, String shown) {
            error(keyAt, shown, "'" + dotted + "' is given both as a value and as a mapping or list of keys below it; give one of them");
        }

        /** A cell as the scalar the key takes: a number typed as text is a number where the key takes one. */
        private Node scalar(Object value, Spec spec, long at) {
            if (value == null) return null;
            if (value instanceof String s) {
                String t = s.strip();
                if (t.isEmpty()) return s.isEmpty() && spec instanceof Spec.Str ? new Node.Scalar(at, "") : null;
                boolean numeric = spec instanceof Spec.Num || (!typed && spec instanceof Spec.Str str && str.numbersAsText());
                if (numeric) {
                    Object n = number(t);
                    if (n != null) return new Node.Scalar(at, n);
                }
                if (!typed && (t.equals("true") || t.equals("false")) && !(spec instanceof Spec.Str)) return new Node.Scalar(at, Boolean.valueOf(t));
                return new Node.Scalar(at, t);
            }
            if (value instanceof Double d) {
                if (spec instanceof Spec.Date) {
                    // A date typed as a number: the spreadsheet's day count, shown for what it is.
                    return new Node.Scalar(at, d);
                }
                return new Node.Scalar(at, d == Math.rint(d) && Math.abs(d) < 1e15 ? (Object) d.longValue() : d);
            }
            if (value instanceof java.time.LocalDate date) {
                if (spec instanceof Spec.Date || spec instanceof Spec.Str) return new Node.Scalar(at, date.toString());
                return new Node.Scalar(at, date.toString());
            }
            return new Node.Scalar(at, value);
        }

        static Object number(String t) {
            if (!t.matches("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?")) return null;
            if (t.matches("[-+]?\\d{1,15}")) return Long.parseLong(t.startsWith("+") ? t.substring(1) : t);
            return Double.parseDouble(t);
        }

        static String text(Object v) {
            if (v == null) return "";
            if (v instanceof Double d) return StructureValidator.num(d);
            return v.toString();
        }

        // ---- places ----

        @Override public Located locate(int line, int column, String path) {
            int sheet = line >>> ROW_BITS;
            int row = line & ((1 << ROW_BITS) - 1);
            if (sheet < 1 || sheet > SHEETS.size()) {
                sheet = 1;
                row = 1;
                column = 1;
            }
            String sheetKey = SHEETS.get(sheet - 1);
            Grid grid = grids.get(sheetKey);
            String sheetName = grid == null ? sheetKey : grid.name();
            String shown = path;
            if (sheet == 1) {
                Integer keyRow = projectRowOf.get(path);
                if (keyRow != null) {
                    row = keyRow;
                    column = 2;
                }
            } else {
                String prefix = sheetKey + "[";
                if (path.startsWith(prefix)) {
                    int close = path.indexOf(']');
                    shown = close + 1 < path.length() ? path.substring(close + 2) : "";
                }
                Integer col = columnOf.getOrDefault(sheet, Map.of()).get(shown);
                Integer header = headerRow.get(sheet);
                if (col != null && (header == null || row != header)) column = col;
            }
            return new Located(sheetName + "!" + cellName(row, column), shown);
        }
    }

    /** A mapping or list while the rows are read; made into nodes at the end. */
    private static final class Draft {
        final long at;
        final Map<String, Object> values = new LinkedHashMap<>();
        final Map<String, Long> keyAt = new LinkedHashMap<>();

        Draft(long at) {
            this.at = at;
        }

        Object get(String key) {
            return values.get(key);
        }

        void put(String key, long keyPos, Object value) {
            values.put(key, value);
            keyAt.put(key, keyPos);
        }

        Node node() {
            Fields.Builder entries = new Fields.Builder();
            for (Map.Entry<String, Object> e : values.entrySet()) {
                entries.add(new Node.Entry(e.getKey(), keyAt.get(e.getKey()), toNode(e.getValue())));
            }
            return new Node.Obj(at, entries.build());
        }

        static Node toNode(Object o) {
            if (o instanceof Draft d) return d.node();
            if (o instanceof Items i) return i.node();
            return (Node) o;
        }

        static final class Items {
            final long at;
            final List<Object> items = new ArrayList<>();

            Items(long at) {
                this.at = at;
            }

            int size() { return items.size(); }
            Object get(int i) { return items.get(i); }
            void set(int i, Object o) { items.set(i, o); }
            void add(Object o) { items.add(o); }

            Node node() {
                List<Node> out = new ArrayList<>(items.size());
                for (Object o : items) out.add(toNode(o));
                return new Node.Arr(at, out);
            }
        }
    }

    /** CSV as RFC 4180 writes it: fields in double quotes where they hold a comma, a quote or a line break. */
    static final class Csv {
        private Csv() {}

        static List<List<Cell>> parse(String text) {
            List<List<Cell>> rows = new ArrayList<>();
            List<Cell> row = new ArrayList<>();
            StringBuilder field = new StringBuilder();
            int line = 1;
            int rowLine = 1;
            int col = 1;
            boolean quoted = false;
            boolean wasQuoted = false;
            int n = text.length();
            for (int i = 0; i < n; i++) {
                char ch = text.charAt(i);
                if (quoted) {
                    if (ch == '"') {
                        if (i + 1 < n && text.charAt(i + 1) == '"') {
                            field.append('"');
                            i++;
                        } else {
                            quoted = false;
                        }
                    } else {
                        if (ch == '\n') line++;
                        field.append(ch);
                    }
                } else if (ch == '"' && field.length() == 0) {
                    quoted = true;
                    wasQuoted = true;
                } else if (ch == ',') {
                    add(row, rowLine, col++, field, wasQuoted);
                    wasQuoted = false;
                } else if (ch == '\n' || ch == '\r') {
                    if (ch == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') i++;
                    add(row, rowLine, col, field, wasQuoted);
                    wasQuoted = false;
                    if (!row.isEmpty()) rows.add(row);
                    row = new ArrayList<>();
                    line++;
                    rowLine = line;
                    col = 1;
                } else {
                    field.append(ch);
                }
            }
            add(row, rowLine, col, field, wasQuoted);
            if (!row.isEmpty()) rows.add(row);
            return rows;
        }

        private static void add(List<Cell> row, int line, int col, StringBuilder field, boolean quoted) {
            String s = field.toString();
            field.setLength(0);
            // A quoted empty field is an empty text given; an unquoted one is a blank cell.
            if (!s.isBlank() || (quoted && s.isEmpty())) row.add(new Cell(line, col, s));
        }
    }
}
