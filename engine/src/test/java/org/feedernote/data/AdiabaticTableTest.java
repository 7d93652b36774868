package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** adiabatic.csv: IEC 60364-5-54:2011 Annex A, Tables A.54.1 and A.54.2, every cell. */
class AdiabaticTableTest {
    private static final ReferenceTable T = TableCells.table("adiabatic.csv");
    private static final String K_COPY = "IEC 60364-5-54 Table A.54.1, copy at mycableengineering.com \"Calculation of k Factor\"";
    private static final String NEN = "NEN 1010 (carries IEC 60364-5-54 Table A.54.2), copy at witchesandangels.nl/nen1010/cn543.html";

    @Test
    void constantsAndTemperaturesAreThePublishedOnes() {
        rows(T, "copper", "aluminium", "pvc", "xlpe");
        assertFalse(T.ref().fromMemory(), "every cell was confirmed");
        confirmed(T, "copper", "K", 226, K_COPY);
        confirmed(T, "copper", "beta", 234.5, K_COPY);
        confirmed(T, "aluminium", "K", 148, K_COPY);
        confirmed(T, "aluminium", "beta", 228, K_COPY);
        confirmed(T, "pvc", "theta_final", 160, NEN + "; also mycableengineering.com \"The Adiabatic Equation and k Factor\"");
        confirmed(T, "xlpe", "theta_final", 250, NEN + "; also mycableengineering.com \"The Adiabatic Equation and k Factor\"");
        confirmed(T, "pvc", "theta_initial_separate", 30, NEN);
        confirmed(T, "xlpe", "theta_initial_separate", 30, NEN);
    }

    /** The constants give the k values the NEN 1010 copy tabulates for a protective conductor not in a cable. */
    @Test
    void theConstantsReproduceThePublishedKValues() {
        assertEquals(143, k("copper", "pvc"), 0.5, NEN + ": copper, PVC, 143");
        assertEquals(176, k("copper", "xlpe"), 0.5, NEN + ": copper, EPR or XLPE, 176");
        assertEquals(95, k("aluminium", "pvc"), 0.5, NEN + ": aluminium, PVC, 95");
        assertEquals(116, k("aluminium", "xlpe"), 0.5, NEN + ": aluminium, EPR or XLPE, 116");
    }

    private static double k(String material, String insulation) {
        double kk = T.value(material, "K");
        double beta = T.value(material, "beta");
        double ti = T.value(insulation, "theta_initial_separate");
        double tf = T.value(insulation, "theta_final");
        return kk * Math.sqrt(Math.log(1 + (tf - ti) / (beta + ti)));
    }
}
