package org.feedernote.data;

import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** grouping-ground.csv: IEC 60364-5-52:2009 Tables B.52.18 and B.52.19, touching columns; no copy seen. */
class GroupingGroundTableTest {
    private static final ReferenceTable T = TableCells.table("grouping-ground.csv");

    @Test
    void everyCellIsRecalled() {
        rows(T, "1", "2", "3", "4", "5", "6");
        // From memory: B.52.18 cables touching (D2) and B.52.19 ducts touching (D1).
        double[] d2 = {1.00, 0.75, 0.65, 0.60, 0.55, 0.50};
        double[] d1 = {1.00, 0.85, 0.75, 0.70, 0.65, 0.60};
        for (int n = 1; n <= 6; n++) {
            recalled(T, Integer.toString(n), "D2", d2[n - 1]);
            recalled(T, Integer.toString(n), "D1", d1[n - 1]);
        }
    }
}
