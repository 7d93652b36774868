package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** insulation-temperatures.csv: IEC 60364-5-52:2009 Table 52.1, checked against reproductions. */
class InsulationTemperaturesTableTest {
    private static final ReferenceTable T = TableCells.table("insulation-temperatures.csv");
    private static final String COPIES = "BS 7671:2008 Table 4B1 column heads (vi.scribd.com/document/344602377/BS7671-Tables); "
            + "Hong Kong Code of Practice for the Electricity (Wiring) Regulations 2009, Table 15(2) (yumpu.com 11677315 p. 112)";

    @Test
    void thermoplasticSeventyThermosettingNinety() {
        rows(T, "pvc", "xlpe");
        confirmed(T, "pvc", "theta_max", 70, COPIES);
        confirmed(T, "xlpe", "theta_max", 90, COPIES);
    }
}
