package org.feedernote.trace;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

/**
 * A step id names one step: within a top-level section and its sub-sections it is never used twice
 * (checked while assertions are on, as in every test run). A section once made takes no more steps.
 */
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

    @Test
    void aCompletedSectionIsTheOneTheTraceHoldsAndTakesNoMoreSteps() {
        TraceRecorder root = new TraceRecorder();
        Trace circuit = root.section("C-1", "Circuit C-1", "");
        Trace sub = circuit.section("C-1/vd", "Voltage drop", "");
        sub.add(note("C-1/vd/dU"));
        circuit.complete();
        assertThrows(IllegalStateException.class, () -> sub.add(note("C-1/vd/x")));
        assertThrows(IllegalStateException.class, () -> circuit.section("C-1/z", "Impedance", ""));
        Trace other = root.section("C-2", "Circuit C-2", "");
        other.add(note("C-2/a"));
        Section all = root.toSection();
        assertEquals(2, all.sections().size());
        assertEquals("C-1/vd/dU", all.sections().get(0).sections().get(0).steps().get(0).id());
        assertEquals("C-2/a", all.sections().get(1).steps().get(0).id());
    }

    @Test
    void theNoOpTraceIgnoresCompletion() {
        Trace.noop().complete();
        assertFalse(Trace.noop().recording());
    }
}
