package org.feedernote.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

import org.junit.jupiter.api.Test;

import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.Formation;
import org.feedernote.model.Insulation;
import org.feedernote.model.Method;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;
import org.feedernote.trace.TraceRecorder;

/**
 * A table value read for a sizing candidate (the no-op trace, no step made) is the very quantity
 * the recorded lookup gives: the same value, symbol, unit and id. Only the recorded one leaves a
 * step, which cites the table.
 */
class TableQuantityTest {
    private static final ReferenceData DATA = ReferenceData.standard();
    private static final FaultData FAULTS = new FaultData(DATA);
    private static final CapacityData CAPACITY = new CapacityData(DATA);

    /** The quantity with the no-op trace and with a recording one, and the steps the recording kept. */
    private record Both(Q figures, Q recorded, List<Step> steps) {}

    private static Both both(Function<Trace, Q> lookup) {
        Q figures = lookup.apply(Trace.noop());
        TraceRecorder root = new TraceRecorder();
        Q recorded = lookup.apply(root.section("C-1", "Circuit C-1", ""));
        List<Step> steps = new ArrayList<>(root.toSection().sections().get(0).steps());
        return new Both(figures, recorded, steps);
    }

    private static void assertSameQuantity(Both b) {
        assertEquals(b.recorded().value(), b.figures().value());
        assertEquals(b.recorded().symbol(), b.figures().symbol());
        assertEquals(b.recorded().unit(), b.figures().unit());
        assertEquals(b.recorded().id(), b.figures().id());
        assertEquals(1, b.steps().size());
        assertTrue(b.steps().get(0) instanceof Step.Lookup l && !l.table().citation().isEmpty());
        assertEquals(b.recorded().id(), b.steps().get(0).id());
    }

    @Test
    void everyLookupACandidateMakesGivesTheRecordedQuantity() {
        for (Conductor conductor : Conductor.values()) {
            for (double size : List.of(10.0, 16.0, 95.0, 240.0)) {
                assertSameQuantity(both(t -> DATA.resistance20(t, "C-1", "/z/R20", conductor, size)));
            }
            assertSameQuantity(both(t -> DATA.alpha20(t, "C-1", "/z/alpha20", conductor)));
        }
        for (Insulation insulation : Insulation.values()) {
            assertSameQuantity(both(t -> DATA.maxTemperature(t, "C-1", "/z/theta_max", insulation)));
            assertSameQuantity(both(t -> FAULTS.finalTemperature(t, "C-1", "/fault/theta_f", insulation)));
            for (double size : List.of(1.5, 25.0, 185.0)) {
                assertSameQuantity(both(t -> DATA.insulationThickness(t, "C-1", "/z/t_i", insulation, size)));
                assertSameQuantity(both(t -> CAPACITY.tabulated(t, "C-1", "/cap/I_t", insulation, Conductor.COPPER, Method.C, 3,
                        CableType.MULTICORE, null, false, size)));
            }
        }
        assertSameQuantity(both(t -> CAPACITY.tabulated(t, "C-1", "/cap/I_t", Insulation.XLPE, Conductor.COPPER, Method.F, 3,
                CableType.SINGLE_CORE, Formation.TREFOIL, false, 240)));
    }

    /** IEC 60228:2004, Table 2: plain copper, class 2, 2.5 mm², 7.41 Ω/km at 20 °C (copies named in conductor-resistance.csv). */
    @Test
    void theValueIsTheTablesCell() {
        Q r20 = DATA.resistance20(Trace.noop(), "C-1", "/z/R20", Conductor.COPPER, 2.5);
        assertEquals(7.41, r20.value(), 0);
        assertEquals("C-1/z/R20", r20.id());
    }

    /** Aluminium class 2 conductors start at 10 mm² (IEC 60228:2004, Table 2; copies named in conductor-resistance.csv): the gap is reported in the lookup's words. */
    @Test
    void aMissingCellIsTheSameDataGapWithOrWithoutTheTrace() {
        DataGapException figures = assertThrows(DataGapException.class,
                () -> DATA.resistance20(Trace.noop(), "C-1", "/z/R20", Conductor.ALUMINIUM, 2.5));
        DataGapException recorded = assertThrows(DataGapException.class,
                () -> DATA.resistance20(new TraceRecorder().section("C-1", "Circuit C-1", ""), "C-1", "/z/R20", Conductor.ALUMINIUM, 2.5));
        assertEquals(recorded.getMessage(), figures.getMessage());
        assertTrue(figures.getMessage().startsWith("C-1/z/R20: "), figures.getMessage());
    }
}
