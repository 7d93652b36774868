package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * Aluminium XLPE feeders, three loaded conductors: the usual aluminium sub-main, once refused for
 * want of the aluminium columns of IEC 60364-5-52:2009 Table B.52.5 (methods A1 to D2) and Table
 * B.52.13 (method E). Those columns are recalled (capacity-xlpe-3.csv, capacity-xlpe-efg.csv): the
 * check values below are from memory, and the steps must say so, so that the note lists them.
 */
class AluminiumFeederTest {
    private static String feeder(String method) {
        return Fixtures.oneBoard("", """
                - id: F1
                  from: B0
                  load: {kind: other, current_a: 140, power_factor: 0.9, phases: 3}
                  length_m: 30
                  cable: {conductor: aluminium, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}
                  installation: {method: %s}
                  device: {kind: mccb, rating_a: 160, instantaneous_a: 1600, breaking_capacity_ka: 25, let_through_a2s: 2000000}
                """.formatted(method));
    }

    private static Step.Lookup capacityLookup(Result r) {
        return TraceWalk.steps(r.trace()).stream().filter(s -> s instanceof Step.Lookup l && l.symbol().equals("I_t"))
                .map(s -> (Step.Lookup) s).findFirst().orElseThrow();
    }

    @Test
    void clippedDirectTakesTheAluminiumColumnOfTableB525() {
        // Table B.52.5, aluminium, method C: 50 mm² 136 A < 160 A, 70 mm² 174 A ≥ 160 A (from memory).
        Result r = Fixtures.run(feeder("C"));
        CircuitResult c = r.circuits().get(0);
        assertEquals(70, c.circuit().cable().size().mm2());
        Step.Lookup it = capacityLookup(r);
        assertEquals(174, it.value(), 1e-9);
        assertTrue(it.table().citation().contains("B.52.5"), it.table().citation());
        assertTrue(it.table().fromMemory(), "a recalled cell is flagged, so the note lists it");
    }

    @Test
    void inFreeAirTakesTheAluminiumColumnOfTableB5213() {
        // Table B.52.13, aluminium, method E, three loaded: 35 mm² 120 A < 160 A, 50 mm² 146 A < 160 A,
        // 70 mm² 187 A ≥ 160 A (from memory).
        Result r = Fixtures.run(feeder("E"));
        assertEquals(70, r.circuits().get(0).circuit().cable().size().mm2());
        assertEquals(187, capacityLookup(r).value(), 1e-9);
        assertTrue(capacityLookup(r).table().citation().contains("B.52.13"), capacityLookup(r).table().citation());
        assertTrue(capacityLookup(r).table().fromMemory());
    }
}
