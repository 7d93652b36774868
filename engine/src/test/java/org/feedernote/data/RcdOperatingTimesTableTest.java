package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** rcd-operating-times.csv: IEC 61008-1:2010 and IEC 61009-1:2010, Table 1, every cell. */
class RcdOperatingTimesTableTest {
    private static final ReferenceTable T = TableCells.table("rcd-operating-times.csv");
    private static final String TABLE = "IEC 61008-1 / 61009-1 Table 1, copy at barfuse.com ?p=4963";
    private static final String PDFCOOKIE = "html.pdfcookie.com rvr7mmqer72o (BS EN 61008-1 / 61009-1 tripping times)";
    private static final String MANUALS = "Kewtech KT64 manual p. 35 and Kyoritsu 5406A manual p. 14";

    @Test
    void generalTypeMaximumBreakTimes() {
        rows(T, "general/max", "s/max", "s/min_non_actuating");
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
        confirmed(T, "general/max", "t_1", 0.3, TABLE + "; " + PDFCOOKIE + "; " + MANUALS);
        confirmed(T, "general/max", "t_2", 0.15, TABLE + "; " + PDFCOOKIE);
        confirmed(T, "general/max", "t_5", 0.04, TABLE + "; " + PDFCOOKIE + "; " + MANUALS);
        confirmed(T, "general/max", "t_high", 0.04, TABLE + ", 5 A to 500 A");
    }

    @Test
    void typeSMaximumBreakAndMinimumNonActuatingTimes() {
        confirmed(T, "s/max", "t_1", 0.5, TABLE + "; " + PDFCOOKIE + "; " + MANUALS);
        confirmed(T, "s/max", "t_2", 0.2, TABLE + "; " + PDFCOOKIE);
        confirmed(T, "s/max", "t_5", 0.15, TABLE + "; " + PDFCOOKIE + "; " + MANUALS);
        confirmed(T, "s/max", "t_high", 0.15, TABLE + ", 5 A to 500 A");
        confirmed(T, "s/min_non_actuating", "t_1", 0.13, TABLE + "; " + MANUALS);
        // The Martindale VR2250 manual p. 27 gives 0.05 s here; the copy of the standard's table is followed.
        confirmed(T, "s/min_non_actuating", "t_2", 0.06, TABLE);
        confirmed(T, "s/min_non_actuating", "t_5", 0.05, TABLE + "; " + MANUALS);
        confirmed(T, "s/min_non_actuating", "t_high", 0.04, TABLE + ", 5 A to 500 A");
    }
}
