package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;

/**
 * Design currents by the a.c. power relations (common practice, no source: I = P / (√3 · U · cos φ)
 * for three-phase, I = P / (U₀ · cos φ) for single-phase), within 0.5 % as the issue asks.
 */
class DesignCurrentTest {
    private static final String CABLE4 = "{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 16, cpc_mm2: 16}";
    private static final String CABLE2 = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}";

    private static double ib(String load, String cable) {
        return Fixtures.run(Fixtures.oneBoard("", Fixtures.circuit("C1", load, 10, cable))).circuits().get(0).designCurrent().value();
    }

    @Test
    void threePhaseUsesRootThreeTimesLineVoltage() {
        // 18.5 kW at 400 V, cos φ 0.86: 18 500 / (1.732 05 × 400 × 0.86) = 31.05 A (hand calculation)
        assertEquals(31.05, ib("{kind: heating, power_kw: 18.5, power_factor: 0.86, phases: 3}", CABLE4), 31.05 * 0.005);
    }

    @Test
    void singlePhaseUsesPhaseVoltage() {
        // 2.3 kW at 230 V, cos φ 1: 10.0 A
        assertEquals(10.0, ib("{kind: heating, power_kw: 2.3, power_factor: 1.0, phases: 1}", CABLE2), 1e-9);
    }

    @Test
    void motorCurrentComesFromOutputEfficiencyAndPowerFactor() {
        // 11 kW output, η 0.91, cos φ 0.85, 400 V: 11 000 / 0.91 / (√3 × 400 × 0.85) = 20.53 A
        assertEquals(20.53, ib("{kind: motor, power_kw: 11, efficiency: 0.91, power_factor: 0.85, phases: 3}", CABLE4), 20.53 * 0.005);
    }

    @Test
    void apparentPowerNeedsNoPowerFactor() {
        // 10 kVA three-phase at 400 V: 10 000 / (√3 × 400) = 14.43 A
        assertEquals(14.43, ib("{kind: other, apparent_kva: 10, phases: 3}", CABLE4), 14.43 * 0.005);
    }

    @Test
    void givenCurrentIsTheDesignCurrent() {
        assertEquals(13.0, ib("{kind: socket, current_a: 13, phases: 1}", CABLE2), 1e-12);
    }

    @Test
    void overrideReplacesTheDerivedValueAndIsShown() {
        String circuit = Fixtures.circuit("C1", "{kind: heating, power_kw: 2.3, power_factor: 1.0, phases: 1}", 10, CABLE2)
                + "  design_current_a: 12.5\n";
        Result r = Fixtures.run(Fixtures.oneBoard("", circuit));
        assertEquals(12.5, r.circuits().get(0).designCurrent().value(), 1e-12);
        assertTrue(org.feedernote.trace.TraceWalk.steps(r.trace()).stream().anyMatch(s -> s.id().equals("C1/ib/override")));
    }

    private static final String TWO_BOARDS = Fixtures.head("", "utility: {fault_level_ka: 10}") + """
            boards:
              - id: B0
              - id: B1
                diversity: %s
            circuits:
              - id: F1
                from: B0
                to: B1
                length_m: 20
                cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 25, cpc_mm2: 16}
                installation: {method: C}
                device: {kind: mcb, curve: C, rating_a: 63}
            %s
            """;

    private static String fromB1(String id, String load, String extra) {
        return Fixtures.circuit(id, load, 10, CABLE2).replace("from: B0", "from: B1").indent(2) + extra;
    }

    @Test
    void feederCarriesTheComplexSumOfItsBoardTimesDiversity() {
        // Two three-phase loads: 10 kW at 0.8 and 10 kW at 1.0. P = 20 kW, Q = 7.5 kvar,
        // S = 21.36 kVA; with d = 0.9: 19.22 kVA → 19 224 / (√3 × 400) = 27.75 A (hand calculation).
        String loads = Fixtures.circuit("A", "{kind: motor, power_kw: 10, efficiency: 1, power_factor: 0.8, phases: 3}", 10, CABLE4)
                .replace("from: B0", "from: B1").indent(2)
                + Fixtures.circuit("B", "{kind: heating, power_kw: 10, power_factor: 1.0, phases: 3}", 10, CABLE4)
                .replace("from: B0", "from: B1").indent(2);
        Result r = Fixtures.run(TWO_BOARDS.formatted("0.9", loads));
        double expected = 0.9 * Math.hypot(20, 7.5) * 1000 / (Math.sqrt(3) * 400);
        assertEquals(expected, r.circuits().get(0).designCurrent().value(), expected * 1e-9);
        assertEquals(27.75, r.circuits().get(0).designCurrent().value(), 27.75 * 0.005);
    }

    @Test
    void feederDesignCurrentIsItsMostLoadedPhaseAndNeutralIsThePhasorSum() {
        // Single-phase loads: 4.6 kW on L1 (20 A), 2.3 kW on L2 (10 A), nothing on L3, all at unity
        // power factor. I_b = 20 A; I_N = |20∠0° + 10∠−120°| = 17.32 A.
        String loads = fromB1("A", "{kind: heating, power_kw: 4.6, power_factor: 1.0, phases: 1}", "    phase: L1\n")
                + fromB1("B", "{kind: heating, power_kw: 2.3, power_factor: 1.0, phases: 1}", "    phase: L2\n");
        Result r = Fixtures.run(TWO_BOARDS.formatted("1", loads));
        CircuitResult feeder = r.circuits().get(0);
        assertEquals(20.0, feeder.designCurrent().value(), 1e-9);
        Complex in = Complex.valueOf(20).add(new Complex(10 * Math.cos(-2 * Math.PI / 3), 10 * Math.sin(-2 * Math.PI / 3)));
        assertEquals(in.abs(), feeder.neutralCurrent().value(), 1e-9);
    }

    @Test
    void neutralCurrentMatchesAComplexPhasorSumForLaggingLoads() {
        String loads = fromB1("A", "{kind: motor, power_kw: 3, efficiency: 1, power_factor: 0.8, phases: 1}", "    phase: L1\n")
                + fromB1("B", "{kind: heating, power_kw: 2, power_factor: 0.95, phases: 1}", "    phase: L2\n")
                + fromB1("C", "{kind: other, power_kw: 1, power_factor: 0.7, phases: 1}", "    phase: L3\n");
        Result r = Fixtures.run(TWO_BOARDS.formatted("1", loads.replace("kind: motor", "kind: other").replace("efficiency: 1, ", "")));
        double[][] pq = {{3, 0.8}, {2, 0.95}, {1, 0.7}};
        Complex sum = Complex.ZERO;
        for (int k = 0; k < 3; k++) {
            double i = pq[k][0] * 1000 / (230 * pq[k][1]);
            double angle = -2 * Math.PI / 3 * k - Math.acos(pq[k][1]);
            sum = sum.add(new Complex(i * Math.cos(angle), i * Math.sin(angle)));
        }
        assertEquals(sum.abs(), r.circuits().get(0).neutralCurrent().value(), 1e-9);
    }

    @Test
    void autoPhaseAllocationBalancesLargestFirst() {
        String loads = fromB1("A", "{kind: heating, power_kw: 3, power_factor: 1.0, phases: 1}", "")
                + fromB1("B", "{kind: heating, power_kw: 2, power_factor: 1.0, phases: 1}", "")
                + fromB1("C", "{kind: heating, power_kw: 1, power_factor: 1.0, phases: 1}", "")
                + fromB1("D", "{kind: heating, power_kw: 1, power_factor: 1.0, phases: 1}", "");
        Result r = Fixtures.run(TWO_BOARDS.formatted("1", loads));
        assertEquals("L1", r.circuits().get(1).connection());
        assertEquals("L2", r.circuits().get(2).connection());
        assertEquals("L3", r.circuits().get(3).connection());
        assertEquals("L3", r.circuits().get(4).connection(), "D goes to L3, the least loaded (1 kW against 2 and 3)");
    }
}
