package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.data.DataGapException;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * basis.impedance: tabulated: a circuit's r and x are the published mV/A/m figures of BS 7671:2018
 * Appendix 4, and its drop is the checker's hand calculation ΔU = (r·cos φ + x·sin φ)·I_b·L / 1000
 * (Appendix 4, 6.2, from memory; the same form as IEC 60364-5-52:2009, Annex G) with the printed
 * figures. The circuits are invented; the figures are the tables', the source beside each.
 */
class TabulatedImpedanceTest {
    private static final double U = 400;
    private static final double U0 = 230;

    private static String load(int phases, double amps) {
        return "{kind: other, current_a: " + amps + ", power_factor: 0.8, phases: " + phases + "}";
    }

    private static String one(String basis, String load, double length, String cable, String method) {
        return Fixtures.oneBoard(basis, Fixtures.circuit("C1", load, length, cable).replace("{method: C}", "{method: " + method + "}"));
    }

    private static CircuitResult only(Result r) {
        return r.circuits().get(0);
    }

    /** The hand calculation in per cent of U_n: (r·cos φ + x·sin φ)·I·L / 1000 / U_n · 100, cos φ = 0.8. */
    private static double hand(double r, double x, double amps, double length, double un) {
        return (r * 0.8 + x * 0.6) * amps * length / 1000 / un * 100;
    }

    @Test
    void xlpeSingleCoreFlatTouchingThreePhaseIsTable4E1BColumn8() {
        // BS 7671:2018 Table 4E1B col. 8, 25 mm²: r = 1.60, x = 0.190 mV/A/m (CSE Distributors copy, "Table 4E1B").
        Result r = Fixtures.run(one("impedance: tabulated", load(3, 30), 100,
                "{conductor: copper, insulation: xlpe, type: single-core, formation: flat-touching, size_mm2: 25, cpc_mm2: 16}", "C"));
        CircuitResult c = only(r);
        assertEquals(30, c.designCurrent().value(), 1e-9);
        assertEquals(1.60, c.impedance().r().value(), 1e-12);
        assertEquals(0.190, c.impedance().x().value(), 1e-12);
        // (1.60 × 0.8 + 0.190 × 0.6) × 30 A × 100 m / 1000 = 4.182 V = 1.0455 % of 400 V.
        assertEquals(4.182, c.dropV().value(), 1e-9);
        assertEquals(hand(1.60, 0.190, 30, 100, U), c.dropPercent().value(), 1e-9);
        // The table is at 90 °C, the maximum operating temperature of XLPE (BS 7671 Table 4E1B heading).
        assertEquals(90, c.impedance().theta().value(), 1e-12);
    }

    @Test
    void singleCoreInConduitSinglePhaseIsTable4E1BColumn3() {
        // BS 7671:2018 Table 4E1B col. 3 (enclosed, methods A and B), 35 mm²: r = 1.35, x = 0.29 mV/A/m (CSE copy).
        Result r = Fixtures.run(one("impedance: tabulated", load(1, 30), 40,
                "{conductor: copper, insulation: xlpe, type: single-core, formation: flat-touching, size_mm2: 35, cpc_mm2: 16}", "B1"));
        CircuitResult c = only(r);
        assertEquals(1.35, c.impedance().r().value(), 1e-12);
        assertEquals(0.29, c.impedance().x().value(), 1e-12);
        assertEquals(hand(1.35, 0.29, 30, 40, U0), c.dropPercent().value(), 1e-9);
    }

    @Test
    void upTo16mm2TheOneFigureIsRAndXIsNil() {
        // BS 7671:2018 Table 4E4B col. 3, 16 mm² two-core, single-phase: 2.9 mV/A/m, the only figure (CSE copy, "Table 4E4B").
        // With a known power factor the drop is 2.9 × cos φ × I × L (Appendix 4, 6.2, from memory).
        Result r = Fixtures.run(one("impedance: tabulated", load(1, 30), 25,
                "{conductor: copper, insulation: xlpe, type: multicore, cores: 3, size_mm2: 16, cpc_mm2: 16}", "C"));
        CircuitResult c = only(r);
        assertEquals(2.9, c.impedance().r().value(), 1e-12);
        assertEquals(0, c.impedance().x().value(), 1e-12);
        assertEquals(hand(2.9, 0, 30, 25, U0), c.dropPercent().value(), 1e-9);
        Step.Input x = (Step.Input) TraceWalk.steps(r.trace()).stream().filter(s -> s.id().equals("C1/z/x_tab")).findFirst().orElseThrow();
        assertTrue(x.reference().contains("Table 4E4B") && x.reference().contains("one figure"), x.reference());
    }

    @Test
    void cablesInParallelShareTheTabulatedFigure() {
        // BS 7671:2018 Table 4E4B col. 4, 95 mm² three- or four-core: r = 0.43, x = 0.130 mV/A/m (CSE copy); two in parallel halve both.
        Result r = Fixtures.run(one("impedance: tabulated", load(3, 30), 200,
                "{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 95, cpc_mm2: 95, parallel: 2}", "C"));
        CircuitResult c = only(r);
        assertEquals(0.43 / 2, c.impedance().r().value(), 1e-12);
        assertEquals(0.130 / 2, c.impedance().x().value(), 1e-12);
        assertEquals(hand(0.43 / 2, 0.130 / 2, 30, 200, U), c.dropPercent().value(), 1e-9);
    }

    @Test
    void theLookupCitesTableRowAndColumnAndTheDecisionsAreRecorded() {
        Result r = Fixtures.run(one("impedance: tabulated, conductor_temperature: estimated", load(3, 30), 100,
                "{conductor: copper, insulation: xlpe, type: single-core, formation: trefoil, size_mm2: 50, cpc_mm2: 25}", "F"));
        List<Step> steps = TraceWalk.steps(r.trace());
        Step.Lookup rt = (Step.Lookup) steps.stream().filter(s -> s.id().equals("C1/z/r_tab")).findFirst().orElseThrow();
        // BS 7671:2018 Table 4E1B col. 7 (trefoil), 50 mm²: r = 0.86 (CSE copy).
        assertEquals(0.86, rt.result().value(), 1e-12);
        assertTrue(rt.table().table().contains("4E1B"), rt.table().table());
        assertEquals("50 mm²", rt.row());
        assertTrue(rt.column().startsWith("col. 7"), rt.column());
        assertFalse(rt.table().fromMemory());
        Step.Decision theta = (Step.Decision) steps.stream().filter(s -> s.id().equals("C1/z/theta")).findFirst().orElseThrow();
        assertTrue(theta.because().contains("estimated is not applied"), theta.because());
        // The estimated temperature is not applied: the table's 90 °C stands.
        assertEquals(90, only(r).impedance().theta().value(), 1e-12);
        assertTrue(steps.stream().anyMatch(s -> s.id().equals("C1/z/fault-basis")));
    }

    @Test
    void theFaultPathKeepsIec60228ResistanceAndTakesItsReactanceFromTheTable() {
        Result r = Fixtures.run(one("impedance: tabulated", load(3, 30), 100,
                "{conductor: copper, insulation: xlpe, type: single-core, formation: flat-touching, size_mm2: 25, cpc_mm2: 16}", "C"));
        ImpedanceResult z = only(r).impedance();
        // IEC 60228:2004 Table 2, class 2 plain copper 25 mm²: 0.727 Ω/km at 20 °C.
        assertEquals(0.727, z.r20().value(), 1e-12);
        // X per conductor = x / √3 of Table 4E1B col. 8 (0.190 mV/A/m); R = r / √3.
        assertEquals(0.190 / Math.sqrt(3), z.reactance().value(), 1e-12);
        assertEquals(1.60 / Math.sqrt(3), z.resistance().value(), 1e-12);
    }

    @Test
    void derivedStaysTheDefault() {
        String cable = "{conductor: copper, insulation: xlpe, type: single-core, formation: flat-touching, size_mm2: 25, cpc_mm2: 16}";
        Result byDefault = Fixtures.run(one("", load(3, 30), 100, cable, "C"));
        Result given = Fixtures.run(one("impedance: derived", load(3, 30), 100, cable, "C"));
        assertEquals(byDefault.circuits().get(0).dropPercent().value(), given.circuits().get(0).dropPercent().value(), 0);
        assertNotEquals(1.60, byDefault.circuits().get(0).impedance().r().value());
    }

    @Test
    void aSizeTheTableDoesNotHoldIsADataGapNamingTheTable() {
        // The 4E1B copy stops before 300 mm²: no figure is held, and none is made up.
        DataGapException e = assertThrows(DataGapException.class, () -> Fixtures.run(one("impedance: tabulated", load(3, 30), 100,
                "{conductor: copper, insulation: xlpe, type: single-core, formation: trefoil, size_mm2: 300, cpc_mm2: 150}", "F")));
        assertTrue(e.getMessage().contains("Table 4E1B") && e.getMessage().contains("300 mm²"), e.getMessage());
    }

    @Test
    void aluminiumIsADataGapNamingTheTable() {
        DataGapException e = assertThrows(DataGapException.class, () -> Fixtures.run(one("impedance: tabulated", load(3, 30), 100,
                "{conductor: aluminium, insulation: pvc, type: multicore, cores: 4, size_mm2: 25, cpc_mm2: 25}", "C")));
        assertTrue(e.getMessage().contains("Table 4D4B") && e.getMessage().contains("copper"), e.getMessage());
    }
}
