package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.empty;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/**
 * conductor-resistance.csv: IEC 60228:2004 Table 2, class 2, every cell. The 1 mm² copper row (18.1 Ω/km) is on
 * mycableengineering.com, uecables.com ("Plain conductors", cl.2) and kabelmetal-indonesia.com Table A.2 ("1.0 … 18.1").
 */
class ConductorResistanceTableTest {
    private static final ReferenceTable T = TableCells.table("conductor-resistance.csv");
    private static final String COPY = "IEC 60228:2004 Table 2, copies at mycableengineering.com \"IEC 60228 DC resistance\", "
            + "kabelmetal-indonesia.com Table A.2 and uecables.com (plain copper)";

    private static final String[] SIZES = {"1", "1.5", "2.5", "4", "6", "10", "16", "25", "35", "50", "70", "95", "120", "150", "185",
            "240", "300", "400", "500", "630"};

    @Test
    void theRowsAreTheSizesTheProgramAccepts() {
        rows(T, SIZES);
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
    }

    @Test
    void everyCellIsThePublishedMaximum() {
        double[] copper = {18.1, 12.1, 7.41, 4.61, 3.08, 1.83, 1.15, 0.727, 0.524, 0.387, 0.268, 0.193, 0.153, 0.124, 0.0991, 0.0754,
                0.0601, 0.0470, 0.0366, 0.0283};
        double[] aluminium = {0, 0, 0, 0, 0, 3.08, 1.91, 1.20, 0.868, 0.641, 0.443, 0.320, 0.253, 0.206, 0.164, 0.125, 0.100, 0.0778,
                0.0605, 0.0469};
        for (int i = 0; i < SIZES.length; i++) {
            confirmed(T, SIZES[i], "copper", copper[i], COPY + ", plain annealed copper, Ω/km");
            if (aluminium[i] == 0) empty(T, SIZES[i], "aluminium", "class 2 aluminium starts at 10 mm² (" + COPY + ")");
            else confirmed(T, SIZES[i], "aluminium", aluminium[i], COPY + ", aluminium, Ω/km");
        }
    }
}
