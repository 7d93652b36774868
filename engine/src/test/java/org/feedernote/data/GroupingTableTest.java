package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** grouping.csv: IEC 60364-5-52:2009 Table B.52.17, items 1, 2, 4 and 5, every cell. */
class GroupingTableTest {
    private static final ReferenceTable T = TableCells.table("grouping.csv");
    private static final String UK_4C1 = "BS 7671:2008 Appendix 4 Table 4C1 (reproduces B.52.17), "
            + "copy at fliphtml5.com/glisk/snup/17th_edition_iee_wiring_regulations/60/";

    private static final String[] CIRCUITS = {"1", "2", "3", "4", "5", "6", "7", "8", "9", "12", "16", "20"};

    @Test
    void theRowsAreThoseOfTheTable() {
        rows(T, CIRCUITS);
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
    }

    @Test
    void everyCellIsTheUkTables() {
        double[] bunched = {1.00, 0.80, 0.70, 0.65, 0.60, 0.57, 0.54, 0.52, 0.50, 0.45, 0.41, 0.38};
        double[] wall = {1.00, 0.85, 0.79, 0.75, 0.73, 0.72, 0.72, 0.71, 0.70, 0.70, 0.70, 0.70};
        double[] tray = {1.00, 0.88, 0.82, 0.77, 0.75, 0.73, 0.73, 0.72, 0.72, 0.72, 0.72, 0.72};
        double[] ladder = {1.00, 0.87, 0.82, 0.80, 0.80, 0.79, 0.79, 0.78, 0.78, 0.78, 0.78, 0.78};
        for (int i = 0; i < CIRCUITS.length; i++) {
            confirmed(T, CIRCUITS[i], "bunched", bunched[i], UK_4C1 + ", bunched in air, on a surface, embedded or enclosed");
            confirmed(T, CIRCUITS[i], "wall-single-layer", wall[i], UK_4C1 + ", single layer on wall or floor");
            confirmed(T, CIRCUITS[i], "tray-single-layer", tray[i], UK_4C1 + ", single layer multicore on a perforated tray");
            confirmed(T, CIRCUITS[i], "ladder-single-layer", ladder[i], UK_4C1 + ", single layer multicore on ladder or cleats");
        }
    }
}
