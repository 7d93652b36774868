package org.feedernote.data;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.model.Curve;

/**
 * A lookup carries its own cell's provenance: in a table whose memory column names the recalled
 * cells, a confirmed cell is not flagged "from memory" and a recalled one is, so that the note lists
 * exactly the recalled values it used.
 */
class CellProvenanceTest {
    private static final DeviceData DEVICES = new DeviceData(ReferenceData.standard());

    @Test
    void aConfirmedCellOfAPartlyRecalledTableIsNotFlagged() {
        // BS EN 60898-1:2003, Annex ZA, class 3, type C up to 16 A at 10 kA: 84 000 A²s (confirmed, see mcb-let-through.csv).
        assertFalse(DEVICES.classThreeLetThrough("x", Curve.C, 16, 10000).table().fromMemory());
    }

    @Test
    void aRecalledCellOfThatTableIsFlagged() {
        // The same table at 3 kA: recalled (from memory), flagged in its memory column.
        assertTrue(DEVICES.classThreeLetThrough("x", Curve.C, 16, 3000).table().fromMemory());
    }
}
