package org.feedernote.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

/**
 * Holds a table's cells to published values: a confirmed cell must equal the copy's value and
 * carry no "from memory" flag; a recalled cell must keep its value and its flag, so that neither a
 * wrong edit nor a dropped flag goes unnoticed.
 */
final class TableCells {
    private TableCells() {}

    static ReferenceTable table(String file) {
        return ReferenceData.standard().table(file);
    }

    static void rows(ReferenceTable t, String... keys) {
        assertEquals(List.of(keys), t.rowKeys(), t.ref().id() + ": the rows");
    }

    static void confirmed(ReferenceTable t, String row, String column, double expected, String source) {
        Double v = t.value(row, column);
        assertNotNull(v, t.ref().id() + " " + row + "/" + column + " is missing; " + source);
        assertEquals(expected, v, 1e-12, t.ref().id() + " " + row + "/" + column + ", " + source);
        assertFalse(Provenance.recalled(t, row, column), t.ref().id() + " " + row + "/" + column + " is confirmed (" + source
                + ") and carries no from-memory flag");
    }

    static void recalled(ReferenceTable t, String row, String column, double expected) {
        Double v = t.value(row, column);
        assertNotNull(v, t.ref().id() + " " + row + "/" + column + " is missing");
        assertEquals(expected, v, 1e-12, t.ref().id() + " " + row + "/" + column + ", from memory");
        assertTrue(Provenance.recalled(t, row, column), t.ref().id() + " " + row + "/" + column + " is recalled and says so");
        assertTrue(t.ref().fromMemory(), t.ref().id() + " has a recalled cell: the file-level from_memory stays true");
    }

    static void empty(ReferenceTable t, String row, String column, String why) {
        assertNull(t.value(row, column), t.ref().id() + " " + row + "/" + column + ": " + why);
    }
}
