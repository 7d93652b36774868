package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** harmonics.csv: IEC 60364-5-52:2009 Annex E, Table E.52.1, every cell. */
class HarmonicsTableTest {
    private static final ReferenceTable T = TableCells.table("harmonics.csv");
    private static final String UK_4AA = "BS 7671:2008+A1:2011 Table 4Aa (reproduces E.52.1), copy at pangonilo.com "
            + "\"Cable Rating Reduction Factor due to Harmonic Currents\" and filipinoengineer.com";

    @Test
    void everyBandIsTheUkTables() {
        rows(T, "15", "33", "45", "100");
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
        confirmed(T, "15", "factor", 1.00, UK_4AA + ", 0-15 %");
        confirmed(T, "33", "factor", 0.86, UK_4AA + ", >15-33 %");
        confirmed(T, "45", "factor", 0.86, UK_4AA + ", >33-45 %");
        confirmed(T, "100", "factor", 1.00, UK_4AA + ", >45 %");
        assertEquals("line", T.text("15", "basis"), UK_4AA);
        assertEquals("line", T.text("33", "basis"), UK_4AA);
        assertEquals("neutral", T.text("45", "basis"), UK_4AA);
        assertEquals("neutral", T.text("100", "basis"), UK_4AA);
    }
}
