package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.empty;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** ambient-air.csv: IEC 60364-5-52:2009 Table B.52.14, cell by cell. */
class AmbientAirTableTest {
    private static final ReferenceTable T = TableCells.table("ambient-air.csv");
    private static final String UK_4B1 = "BS 7671:2008 Appendix 4 Table 4B1 (reproduces B.52.14 from 30 °C), "
            + "copy at vi.scribd.com/document/344602377/BS7671-Tables";

    @Test
    void theRowsAreTenToEightyDegrees() {
        rows(T, "10", "15", "20", "25", "30", "35", "40", "45", "50", "55", "60", "65", "70", "75", "80");
    }

    @Test
    void fromThirtyDegreesUpEveryCellIsTheUkTables() {
        double[][] pvcXlpe = {{30, 1.00, 1.00}, {35, 0.94, 0.96}, {40, 0.87, 0.91}, {45, 0.79, 0.87}, {50, 0.71, 0.82},
                {55, 0.61, 0.76}, {60, 0.50, 0.71}};
        for (double[] r : pvcXlpe) {
            String row = ReferenceData.sizeKey(r[0]);
            confirmed(T, row, "pvc", r[1], UK_4B1 + ", 70 °C thermoplastic");
            confirmed(T, row, "xlpe", r[2], UK_4B1 + ", 90 °C thermosetting");
        }
        double[][] xlpeOnly = {{65, 0.65}, {70, 0.58}, {75, 0.50}, {80, 0.41}};
        for (double[] r : xlpeOnly) {
            String row = ReferenceData.sizeKey(r[0]);
            confirmed(T, row, "xlpe", r[1], UK_4B1 + ", 90 °C thermosetting");
            empty(T, row, "pvc", "70 °C thermoplastic stops at 60 °C (" + UK_4B1 + ")");
        }
    }

    @Test
    void belowThirtyDegreesTheIecValuesAreRecalled() {
        // From memory: IEC 60364-5-52:2009 Table B.52.14. The UK table has no rows below 25 °C and gives
        // 1.03 / 1.02 at 25 °C, its own values; these are the IEC table's, as recalled.
        double[][] pvcXlpe = {{10, 1.22, 1.15}, {15, 1.17, 1.12}, {20, 1.12, 1.08}, {25, 1.06, 1.04}};
        for (double[] r : pvcXlpe) {
            String row = ReferenceData.sizeKey(r[0]);
            recalled(T, row, "pvc", r[1]);
            recalled(T, row, "xlpe", r[2]);
        }
    }
}
