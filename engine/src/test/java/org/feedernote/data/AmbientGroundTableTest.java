package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.empty;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** ambient-ground.csv: IEC 60364-5-52:2009 Table B.52.15, cell by cell. */
class AmbientGroundTableTest {
    private static final ReferenceTable T = TableCells.table("ambient-ground.csv");
    private static final String UK_4B2 = "BS 7671:2008 Appendix 4 Table 4B2 (reproduces B.52.15), "
            + "copy at vi.scribd.com/document/344602377/BS7671-Tables";

    @Test
    void theRowsAreTenToEightyDegrees() {
        rows(T, "10", "15", "20", "25", "30", "35", "40", "45", "50", "55", "60", "65", "70", "75", "80");
    }

    @Test
    void everyCellIsTheUkTables() {
        double[][] pvcXlpe = {{10, 1.10, 1.07}, {15, 1.05, 1.04}, {20, 1.00, 1.00}, {25, 0.95, 0.96}, {30, 0.89, 0.93},
                {40, 0.77, 0.85}, {45, 0.71, 0.80}, {50, 0.63, 0.76}, {55, 0.55, 0.71}, {60, 0.45, 0.65}};
        for (double[] r : pvcXlpe) {
            String row = ReferenceData.sizeKey(r[0]);
            confirmed(T, row, "pvc", r[1], UK_4B2 + ", 70 °C thermoplastic");
            confirmed(T, row, "xlpe", r[2], UK_4B2 + ", 90 °C thermosetting");
        }
        confirmed(T, "35", "pvc", 0.84, UK_4B2 + ", 70 °C thermoplastic");
        double[][] xlpeOnly = {{65, 0.60}, {70, 0.53}, {75, 0.46}, {80, 0.38}};
        for (double[] r : xlpeOnly) {
            String row = ReferenceData.sizeKey(r[0]);
            confirmed(T, row, "xlpe", r[1], UK_4B2 + ", 90 °C thermosetting");
            empty(T, row, "pvc", "70 °C thermoplastic stops at 60 °C (" + UK_4B2 + ")");
        }
    }

    @Test
    void thermosettingAtThirtyFiveDegreesIsRecalled() {
        // From memory: the copy's text is illegible in this cell; 0.89 is also √((90 − 35)/70).
        recalled(T, "35", "xlpe", 0.89);
    }
}
