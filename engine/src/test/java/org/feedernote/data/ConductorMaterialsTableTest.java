package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** conductor-materials.csv: IEC 60287-1-1 Table 1 (α_20) and Table 2 (k_s, k_p, round stranded), every cell. */
class ConductorMaterialsTableTest {
    private static final ReferenceTable T = TableCells.table("conductor-materials.csv");
    private static final String ALPHA = "IEC 60287-1-1 Table 1, copies at cableizer.com/documentation/alpha_encl/ (Ed. 2.1) and "
            + "mycableengineering.com \"Electrical Resistivities & Temperature Coefficients\" (2006)";
    private static final String KS = "IEC 60287-1-1 Table 2, copy at cableizer.com/documentation/k_s/ (1.0 for round stranded "
            + "conductors; only Milliken and hollow conductors differ)";
    private static final String KP = "IEC 60287-1-1 Table 2, copy at cableizer.com/documentation/k_p/";

    @Test
    void constantsAreThePublishedOnes() {
        rows(T, "copper", "aluminium");
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
        confirmed(T, "copper", "alpha20", 0.00393, ALPHA + ", copper");
        confirmed(T, "aluminium", "alpha20", 0.00403, ALPHA + ", aluminium");
        confirmed(T, "copper", "ks", 1, KS);
        confirmed(T, "aluminium", "ks", 1, KS);
        confirmed(T, "copper", "kp", 1, KP + ": round stranded copper, extruded insulation (0.8 only dried and impregnated)");
        // Corrected from a recalled 1: the copy gives 0.8 for round stranded aluminium whatever the insulation.
        confirmed(T, "aluminium", "kp", 0.8, KP + ": round stranded aluminium, 0.8");
    }
}
