package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** insulation-thickness.csv: IEC 60502-1 (edition 2.1) Tables 5 (PVC/A) and 6 (XLPE), 0.6/1 kV, every cell. */
class InsulationThicknessTableTest {
    private static final ReferenceTable T = TableCells.table("insulation-thickness.csv");
    private static final String TABLES = "IEC 60502-1 \"Nominal thickness of PVC/A insulation\" and \"... of cross-linked "
            + "polyethylene (XLPE) insulation\", 0.6/1 kV, reproduced on a cable maker's \"Technical Reference\" page (stored copy, "
            + "address not kept; see the table's notes)";
    private static final String LS_VINA = "lsvinacns.vn 0.6/1 kV XLPE cables to IEC 60502-1:2009, insulation nominal thickness";
    private static final String ELAND = "Eland Cables BS 5467 data sheet, scribd.com document 74298776, single-core AWA";

    private static final String[] SIZES = {"1.5", "2.5", "4", "6", "10", "16", "25", "35", "50", "70", "95", "120", "150", "185",
            "240", "300", "400", "500", "630"};

    @Test
    void pvcIsTable5() {
        String[] all = new String[SIZES.length + 1];
        all[0] = "1";
        System.arraycopy(SIZES, 0, all, 1, SIZES.length);
        rows(T, all);
        assertTrue(T.ref().fromMemory(), "the PVC column is recalled");
        // From memory: agrees with a copy whose address was not kept (TABLES), which cannot be cited.
        double[] pvc = {0.8, 0.8, 1.0, 1.0, 1.0, 1.0, 1.2, 1.2, 1.4, 1.4, 1.6, 1.6, 1.8, 2.0, 2.2, 2.4, 2.6, 2.8, 2.8};
        for (int i = 0; i < SIZES.length; i++) recalled(T, SIZES[i], "pvc", pvc[i]);
    }

    @Test
    void xlpeIsTable6() {
        double[] xlpe = {0.7, 0.7, 0.7, 0.7, 0.7, 0.7, 0.9, 0.9, 1.0, 1.1, 1.1, 1.2, 1.4, 1.6, 1.7, 1.8, 2.0, 2.2, 2.4};
        for (int i = 0; i < SIZES.length; i++) {
            double s = Double.parseDouble(SIZES[i]);
            String also = s <= 95 ? "; also " + LS_VINA : "";
            if (s >= 50) also += "; also " + ELAND;
            confirmed(T, SIZES[i], "xlpe", xlpe[i], TABLES + ", XLPE (mm)" + also);
        }
        // The sizes between the two copies that carry an address: 1.5 to 95 (LS Vina) and 50 to 630 (Eland) cover every row.
        for (String size : SIZES) {
            double s = Double.parseDouble(size);
            assertTrue(s <= 95 || s >= 50, size);
        }
    }

    @Test
    void theOneSquareMillimetreRowIsAnAssumptionFlaggedAsRecalled() {
        // IEC 60502-1 starts at 1.5 mm²; the row repeats the 1.5 mm² thicknesses (an assumption of this program, no source).
        recalled(T, "1", "pvc", 0.8);
        recalled(T, "1", "xlpe", 0.7);
    }
}
