package org.feedernote.data;

import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** soil-resistivity.csv: IEC 60364-5-52:2009 Table B.52.16; no copy with its numbers seen. */
class SoilResistivityTableTest {
    private static final ReferenceTable T = TableCells.table("soil-resistivity.csv");

    @Test
    void everyCellIsRecalled() {
        String[] rho = {"0.5", "0.7", "1", "1.5", "2", "2.5", "3"};
        rows(T, rho);
        // From memory: buried ducts (D1) and direct in the ground (D2).
        double[] d1 = {1.28, 1.20, 1.18, 1.10, 1.05, 1.00, 0.96};
        double[] d2 = {1.88, 1.62, 1.50, 1.28, 1.12, 1.00, 0.90};
        for (int i = 0; i < rho.length; i++) {
            recalled(T, rho[i], "D1", d1[i]);
            recalled(T, rho[i], "D2", d2[i]);
        }
    }
}
