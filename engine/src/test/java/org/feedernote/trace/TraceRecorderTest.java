package org.feedernote.trace;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

/** A step id names one step: within a top-level section and its sub-sections it is never used twice. */
class TraceRecorderTest {
    private static Step note(String id) {
        return new Step.Note(id, "remark", "text", "");
    }

    @Test
    void anIdUsedTwiceInASectionOrItsSubsectionsIsRefused() {
        TraceRecorder root = new TraceRecorder();
        Trace circuit = root.section("C-1", "Circuit C-1", "");
        circuit.add(note("C-1/a"));
        assertThrows(IllegalStateException.class, () -> circuit.add(note("C-1/a")));
        Trace sub = circuit.section("C-1/fault", "Fault", "");
        assertThrows(IllegalStateException.class, () -> sub.add(note("C-1/a")));
    }

    @Test
    void differentTopLevelSectionsKeepTheirOwnIds() {
        TraceRecorder root = new TraceRecorder();
        root.section("C-1", "Circuit C-1", "").add(note("shared/x"));
        root.section("C-2", "Circuit C-2", "").add(note("shared/x"));
        assertEquals(2, root.toSection().sections().size());
    }

    @Test
    void aLargeSectionKeepsEveryStepInOrder() {
        TraceRecorder root = new TraceRecorder();
        Trace big = root.section("B", "Board", "");
        for (int i = 0; i < 5000; i++) big.add(note("B/" + i));
        assertThrows(IllegalStateException.class, () -> big.add(note("B/4321")));
        var steps = root.toSection().sections().get(0).steps();
        assertEquals(5000, steps.size());
        for (int i = 0; i < 5000; i++) assertEquals("B/" + i, steps.get(i).id());
    }

    @Test
    void aFrozenTraceTakesNoMoreSteps() {
        TraceRecorder root = new TraceRecorder();
        Trace circuit = root.section("C-1", "Circuit C-1", "");
        circuit.add(note("C-1/a"));
        Section frozen = root.toSection();
        assertThrows(IllegalStateException.class, () -> circuit.add(note("C-1/b")));
        assertThrows(IllegalStateException.class, () -> root.section("C-2", "Circuit C-2", ""));
        assertThrows(UnsupportedOperationException.class, () -> frozen.sections().get(0).steps().add(note("C-1/c")));
        assertEquals(1, frozen.sections().get(0).steps().size());
    }
}
