package org.feedernote.data;

import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** thermal-insulation.csv: BS 7671:2018 Table 52.2; no copy of that edition's table seen. */
class ThermalInsulationTableTest {
    private static final ReferenceTable T = TableCells.table("thermal-insulation.csv");

    @Test
    void everyCellIsRecalled() {
        rows(T, "50", "100", "200", "400", "500");
        // From memory. The copy seen (tlc-direct.co.uk/Book/4.3.6.htm) is of BS 7671:2001, whose table gave
        // 0.89 0.81 0.68 0.55 and 0.50: a different edition, so no confirmation of these.
        recalled(T, "50", "factor", 0.88);
        recalled(T, "100", "factor", 0.78);
        recalled(T, "200", "factor", 0.63);
        recalled(T, "400", "factor", 0.51);
        recalled(T, "500", "factor", 0.50);
    }
}
