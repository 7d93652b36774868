package org.feedernote.sheet;

import java.util.List;

/**
 * A sheet to write, the same for a workbook and a CSV file. keyed: the header row holds the keys
 * and a units row follows it (the input's sheets, read back by the input reader); otherwise the
 * header holds a title with its unit (the result schedule).
 */
public record Table(String name, List<Column> columns, List<Row> rows, boolean keyed, int validatedRows) {

    /**
     * A column: its heading, unit, comment, the closed set a cell may take (a validation list, empty
     * for none) and the number format its figures are shown in (null: as typed).
     */
    public record Column(String heading, String unit, String comment, List<String> choices, String format) {}

    /**
     * A row. mark: a word and a fill for the whole row (FAIL) or null; markedColumn: the cell that
     * gets the governing check's fill, or -1; choices: a validation list for the row's second cell
     * (a key/value sheet), or empty.
     */
    public record Row(List<Object> cells, boolean failing, int markedColumn, List<String> choices) {
        public static Row of(List<Object> cells) {
            return new Row(cells, false, -1, List.of());
        }
    }

    /** The header as one line of text: a title and its unit in brackets, or the key alone. */
    public String heading(int i) {
        Column c = columns.get(i);
        if (keyed || c.unit() == null || c.unit().isEmpty()) return c.heading();
        return c.heading() + " (" + c.unit() + ")";
    }
}
