package org.feedernote.data;

import static org.feedernote.data.TableCells.confirmed;
import static org.feedernote.data.TableCells.recalled;
import static org.feedernote.data.TableCells.rows;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** devices.csv: conventional currents and ratings per device standard, cell by cell. */
class DevicesTableTest {
    private static final ReferenceTable T = TableCells.table("devices.csv");

    @Test
    void theMcbConventionalTrippingCurrentIsConfirmed() {
        rows(T, "mcb", "rcbo", "mccb", "fuse");
        confirmed(T, "mcb", "k2", 1.45, "IEC 60898-1 Table 7, 1.45 I_n: sparkyhub.co.uk \"MCB Time-Current Curves\"");
    }

    @Test
    void theOtherMultiplesAreRecalled() {
        // From memory: IEC 61009-1:2010 Table 7, IEC 60947-2:2016 Table 6, IEC 60269-1:2006 Table 2 (gG from 16 A).
        recalled(T, "rcbo", "k2", 1.45);
        recalled(T, "mccb", "k2", 1.30);
        recalled(T, "fuse", "k2", 1.60);
    }

    @Test
    void theRatingListsAreRecalled() {
        // From memory: the usual ratings, not a standard's whole series.
        assertEquals("6 10 13 16 20 25 32 40 50 63 80 100 125", T.text("mcb", "ratings"), "from memory");
        assertEquals("6 10 13 16 20 25 32 40 50 63 80 100 125", T.text("rcbo", "ratings"), "from memory");
        assertEquals("16 20 25 32 40 50 63 80 100 125 160 200 250 320 400 500 630 800 1000 1250 1600", T.text("mccb", "ratings"),
                "from memory");
        assertEquals("16 20 25 32 40 50 63 80 100 125 160 200 250 315 400 500 630 800 1000 1250", T.text("fuse", "ratings"),
                "from memory");
        for (String kind : new String[] {"mcb", "rcbo", "mccb", "fuse"}) {
            assertTrue(Provenance.recalled(T, kind, "ratings"), kind + " ratings are recalled and say so");
        }
    }
}
