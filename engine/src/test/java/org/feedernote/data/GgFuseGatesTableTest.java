package org.feedernote.data;

import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * gg-fuse-gates.csv: IEC 60269-1:2006+A1:2009 Table 2 (conventional currents and times) and Table 3 (gates), every
 * cell from memory: no published copy of either table was found (searched by title and by the gate currents).
 */
class GgFuseGatesTableTest {
    private static final ReferenceTable T = TableCells.table("gg-fuse-gates.csv");

    // I_n, conventional time (h), I_min(10 s), I_max(5 s), I_min(0.1 s), I_max(0.1 s): from memory
    private static final double[][] GATES = {{16, 1, 33, 65, 85, 150}, {20, 1, 42, 85, 110, 200}, {25, 1, 52, 110, 150, 260},
            {32, 1, 75, 150, 200, 350}, {40, 1, 95, 190, 260, 450}, {50, 1, 125, 250, 350, 610}, {63, 1, 160, 320, 450, 820},
            {80, 2, 215, 425, 610, 1100}, {100, 2, 290, 580, 820, 1450}, {125, 2, 355, 715, 1100, 1910},
            {160, 2, 460, 950, 1450, 2590}, {200, 3, 610, 1250, 1910, 3420}, {250, 3, 750, 1650, 2590, 4500},
            {315, 3, 1050, 2200, 3420, 6000}, {400, 3, 1420, 2840, 4500, 8060}, {500, 4, 1780, 3800, 6000, 10600},
            {630, 4, 2200, 5100, 8060, 14140}};

    @Test
    void everyCellIsRecalledAndSaysSo() {
        String[] keys = new String[GATES.length];
        for (int i = 0; i < GATES.length; i++) keys[i] = ReferenceData.sizeKey(GATES[i][0]);
        rows(T, keys);
        assertTrue(T.ref().fromMemory(), "no cell was confirmed");
        for (double[] g : GATES) {
            String r = keys[indexOf(g)];
            recalled(T, r, "k_nf", 1.25);
            recalled(T, r, "k_f", 1.6);
            recalled(T, r, "t_conv_h", g[1]);
            recalled(T, r, "imin_10s", g[2]);
            recalled(T, r, "imax_5s", g[3]);
            recalled(T, r, "imin_01s", g[4]);
            recalled(T, r, "imax_01s", g[5]);
        }
    }

    /** A consistency check of the recalled cells, not a source: each gate lies above the one before it. */
    @Test
    void gatesRiseWithTheRating() {
        for (int i = 1; i < GATES.length; i++)
            for (int c = 2; c < 6; c++) assertTrue(GATES[i][c] > GATES[i - 1][c], "gate column " + c + " rises at " + GATES[i][0] + " A");
        for (double[] g : GATES) assertTrue(g[2] < g[3] && g[4] < g[5], "each gate's minimum below its maximum at " + g[0] + " A");
    }

    private static int indexOf(double[] row) {
        for (int i = 0; i < GATES.length; i++) if (GATES[i] == row) return i;
        throw new IllegalArgumentException();
    }
}
