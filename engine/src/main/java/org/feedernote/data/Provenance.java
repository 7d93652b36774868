package org.feedernote.data;

import java.util.Arrays;
import java.util.List;

import org.feedernote.trace.Step;

/**
 * Whether a cell of a table was confirmed by a published copy or is recalled. A table with a
 * {@code memory} column names per row what is recalled ("yes" for the whole row, "no" for none, or
 * the recalled columns); a table without it is recalled or confirmed as a whole (its header's
 * {@code from_memory}).
 */
final class Provenance {
    static final String MEMORY = "memory";

    private Provenance() {}

    static boolean recalled(ReferenceTable t, String row, String column) {
        if (!t.columns().contains(MEMORY)) return t.ref().fromMemory();
        String m = t.text(row, MEMORY);
        if (m == null || m.isEmpty() || m.equals("no")) return false;
        if (m.equals("yes")) return true;
        return Arrays.asList(m.split("\\s+")).contains(column);
    }

    static String method(ReferenceTable t, String row, String column) {
        return recalled(t, row, column) ? "exact; from memory (no published copy seen)"
                : "exact; checked against a published copy (see the table's notes)";
    }

    /** The cell at (row, column) as a step whose method says where it comes from; a missing cell is a {@link DataGapException}. */
    static Step.Lookup lookup(ReferenceTable t, String id, String title, String symbol, String unit, String row, String column,
                              String rowLabel, String columnLabel) {
        Step.Lookup exact = t.lookup(id, title, symbol, unit, row, column, rowLabel, columnLabel);
        return new Step.Lookup(exact.q(), title, exact.table(), rowLabel, columnLabel, method(t, row, column), List.of());
    }
}
