package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;

import org.junit.jupiter.api.Test;

/** conductor-wires.csv: IEC 60228:2004 Table 2, minimum number of wires of circular non-compacted class 2 conductors. */
class ConductorWiresTableTest {
    private static final ReferenceTable T = TableCells.table("conductor-wires.csv");
    private static final String COPY = "IEC 60228:2004 Table 2 (class 2, circular), copy at kabelmetal-indonesia.com "
            + "\"Conductor specification in according to IEC 60228\", Table A.2";

    @Test
    void upTo240SquareMillimetresTheCopysCounts() {
        rows(T, "1", "1.5", "2.5", "4", "6", "10", "16", "25", "35", "50", "70", "95", "120", "150", "185", "240", "300", "400", "500",
                "630");
        String[] seven = {"1", "1.5", "2.5", "4", "6", "10", "16", "25", "35"};
        for (String s : seven) confirmed(T, s, "wires", 7, COPY);
        for (String s : new String[] {"50", "70", "95"}) confirmed(T, s, "wires", 19, COPY);
        for (String s : new String[] {"120", "150", "185", "240"}) confirmed(T, s, "wires", 37, COPY);
    }

    @Test
    void from300SquareMillimetresRecalled() {
        // From memory: the copy stops at 240 mm²; no other copy of the larger rows was found.
        recalled(T, "300", "wires", 61);
        recalled(T, "400", "wires", 61);
        recalled(T, "500", "wires", 61);
        recalled(T, "630", "wires", 91);
    }
}
