package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.empty;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/**
 * armour-steel-wire.csv: BS 5467:2016, gross armour cross-section of two-core copper XLPE/SWA cables, every
 * cell; the three- and four-core areas and the armour resistances are not entered (no copy seen).
 */
class ArmourSteelWireTableTest {
    private static final ReferenceTable T = TableCells.table("armour-steel-wire.csv");
    private static final String COPY = "BS 5467 two-core SWA, the 6942X data sheet at scribd.com document 451392436, column "
            + "\"Actual Armour Cross Section Area\" (mm²)";

    private static final String[] SIZES = {"1.5", "2.5", "4", "6", "10", "16", "25", "35", "50", "70", "95", "120", "150", "185",
            "240", "300", "400"};

    @Test
    void twoCoreAreasAreTheDataSheets() {
        rows(T, SIZES);
        assertFalse(T.ref().fromMemory(), "every entered cell was confirmed");
        double[] area = {15, 17, 19, 22, 26, 42, 42, 60, 68, 80, 113, 125, 138, 191, 215, 235, 265};
        for (int i = 0; i < SIZES.length; i++) confirmed(T, SIZES[i], "area_2c", area[i], COPY);
        // The first value also in the gross-area table at dnaop.com/html/61674_12.html (two-core, 1.5 mm²).
        confirmed(T, "1.5", "area_2c", 15, "dnaop.com/html/61674_12.html, two-core 1.5 mm²");
    }

    @Test
    void whatNoCopyGaveIsLeftEmptyNeverGuessed() {
        for (String s : SIZES)
            for (String c : new String[] {"area_3c", "area_4c", "r20_2c", "r20_3c", "r20_4c"})
                empty(T, s, c, "no published copy seen: a lookup reports the gap");
    }
}
