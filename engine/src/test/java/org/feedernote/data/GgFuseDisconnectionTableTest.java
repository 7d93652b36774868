package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.empty;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/**
 * gg-fuse-disconnection.csv: BS 7671:2008+A1:2011 Tables 41.2 (0.4 s) and 41.4 (5 s), BS 88-2 and BS 88-3 fuses,
 * every cell; the operating currents are derived from the confirmed Z_s (I_a = 230 V / Z_s, to 0.1 A).
 */
class GgFuseDisconnectionTableTest {
    private static final ReferenceTable T = TableCells.table("gg-fuse-disconnection.csv");
    private static final String CONNECTIONS = "BS 7671:2008+A1:2011 Table 41.2, NICEIC Connections Winter 2011-12 p. 60 "
            + "(issuu.com/redactive/docs/nicjan12/60) Table 2";
    private static final String METREL = "BS 7671:2008+A1:2011 Tables 41.2 and 41.4, Metrel MI 3000 manual p. 57 (easymanua.ls), "
            + "its value / 0.8";

    // key, Z_s at 0.4 s (0 = not tabulated), Z_s at 5 s
    private static final Object[][] CELLS = {
            {"bs88-2/6", 8.21, 12.8}, {"bs88-2/10", 4.89, 7.19}, {"bs88-2/16", 2.56, 4.18}, {"bs88-2/20", 1.77, 2.95},
            {"bs88-2/25", 1.35, 2.30}, {"bs88-2/32", 1.04, 1.84}, {"bs88-2/40", 0.0, 1.35}, {"bs88-2/50", 0.0, 1.04},
            {"bs88-2/63", 0.0, 0.82}, {"bs88-2/80", 0.0, 0.57}, {"bs88-2/100", 0.0, 0.46}, {"bs88-2/125", 0.0, 0.34},
            {"bs88-2/160", 0.0, 0.28}, {"bs88-2/200", 0.0, 0.19},
            {"bs88-3/5", 10.45, 15.33}, {"bs88-3/16", 2.42, 4.11}, {"bs88-3/20", 2.04, 3.38}, {"bs88-3/32", 0.96, 1.64},
            {"bs88-3/45", 0.0, 1.04}, {"bs88-3/63", 0.0, 0.72}, {"bs88-3/80", 0.0, 0.53}, {"bs88-3/100", 0.0, 0.40}};

    @Test
    void everyZsIsThePublishedMaximum() {
        String[] keys = new String[CELLS.length];
        for (int i = 0; i < CELLS.length; i++) keys[i] = (String) CELLS[i][0];
        rows(T, keys);
        assertFalse(T.ref().fromMemory(), "every cell was confirmed or derived from a confirmed cell");
        for (Object[] c : CELLS) {
            String key = (String) c[0];
            double z04 = (Double) c[1];
            double z5 = (Double) c[2];
            String at04 = key.startsWith("bs88-2") ? CONNECTIONS + "; also " + METREL : METREL;
            if (z04 == 0) {
                empty(T, key, "zs_04", "0.4 s not tabulated above 32 A");
                empty(T, key, "ia_04", "0.4 s not tabulated above 32 A");
            } else {
                confirmed(T, key, "zs_04", z04, at04);
                confirmed(T, key, "ia_04", derived(z04), "derived: 230 V / " + z04 + " Ω (" + at04 + ")");
            }
            confirmed(T, key, "zs_5", z5, METREL);
            confirmed(T, key, "ia_5", derived(z5), "derived: 230 V / " + z5 + " Ω (" + METREL + ")");
        }
    }

    @Test
    void systemAndRatingMatchTheKey() {
        for (Object[] c : CELLS) {
            String[] parts = ((String) c[0]).split("/");
            assertEquals(parts[0], T.text((String) c[0], "system"));
            assertEquals(Double.parseDouble(parts[1]), T.value((String) c[0], "rating_a"));
        }
    }

    /** I_a = U_0 / Z_s with U_0 = 230 V (the 2011 tables carry no C_min), rounded to 0.1 A. */
    private static double derived(double zs) {
        return Math.round(230 / zs * 10) / 10.0;
    }
}
