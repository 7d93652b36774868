package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Installation;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * Fault levels, earth-fault loop, disconnection and withstand: how the path adds up. The published
 * values (IEC 60909 fault levels, k factors, Table 41.3 Z_s, the Z_e + R1 + R2 hand calculation)
 * are published cases (IK-, K-, ZS-, {@code PublishedCasesTest}).
 */
class FaultPathTest {

    private static String install(String source, String basis, String circuits) {
        return Fixtures.head(basis, source) + """
                boards:
                  - id: B0
                  - id: B1
                circuits:
                  - id: F1
                    from: B0
                    to: B1
                    length_m: 50
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 95, cpc_mm2: 50}
                    installation: {method: E}
                    device: {kind: mccb, rating_a: 200, instantaneous_a: 2000, breaking_capacity_ka: 36, let_through_a2s: 2000000}
                %s
                """.formatted(circuits.indent(2));
    }

    private static String finalCircuit(String device, String cable, double length) {
        return """
                - id: C1
                  from: B1
                  load: {kind: other, current_a: 10, power_factor: 0.9, phases: 1}
                  length_m: %s
                  cable: %s
                  installation: {method: C}
                  device: %s
                """.formatted(length, cable, device);
    }

    private static final String CABLE = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}";

    @Test
    void givenUtilityFaultLevelIsTheFaultLevelAtTheOrigin() {
        Result r = Fixtures.run(install("utility: {fault_level_ka: 16, loop_impedance_ohm: 0.35, x_r_ratio: 2}", "",
                finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}", CABLE, 10)));
        assertEquals(16, r.boards().get(0).faultKa().value(), 1e-9);
        assertEquals(0.35, r.boards().get(0).loopImpedance().value(), 1e-9);
    }

    @Test
    void faultLevelDownstreamIsTheComplexSumOfTheSourceAndTheFeeder() {
        Result r = Fixtures.run(install("transformer: {rating_kva: 1000, impedance_percent: 6, x_r_ratio: 6}", "",
                finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}", CABLE, 10)));
        CircuitResult feeder = r.circuits().get(0);
        double zt = 0.06 * 400 * 400 / 1e6;
        double rt = zt / Math.sqrt(37);
        double kt = 0.95 * 1.1 / (1 + 0.6 * 0.06 * 6 / Math.sqrt(37));
        Complex source = new Complex(kt * rt, kt * 6 * rt);
        // IEC 60228 Table 2, 95 mm² copper: 0.193 Ω/km at 20 °C (from memory); the reactance is the engine's derived value.
        Complex cable = new Complex(0.193 * 50 / 1000, feeder.impedance().reactance().value() * 50 / 1000);
        double expected = 1.1 * 400 / (Math.sqrt(3) * source.add(cable).abs()) / 1000;
        assertEquals(expected, r.boards().get(1).faultKa().value(), 1e-9);
    }

    @Test
    void aLongerCableNeverRaisesTheFaultCurrentAndALargerCpcNeverRaisesZs() {
        double lastFault = Double.POSITIVE_INFINITY;
        for (int length = 10; length <= 200; length += 30) {
            String src = "utility: {fault_level_ka: 10, loop_impedance_ohm: 0.2}";
            String yaml = install(src, "", finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}", CABLE, 10))
                    .replace("length_m: 50", "length_m: " + length);
            double fault = Fixtures.run(yaml).boards().get(1).faultKa().value();
            assertTrue(fault <= lastFault);
            lastFault = fault;
        }
        double lastZs = Double.POSITIVE_INFINITY;
        for (String cpc : new String[] {"1", "1.5", "2.5", "4", "6", "10"}) {
            if (cpc.equals("1")) continue;
            String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 10, cpc_mm2: %s}".formatted(cpc);
            double zs = Fixtures.run(install("utility: {fault_level_ka: 6, loop_impedance_ohm: 0.3}", "",
                    finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}", cable, 40))).circuits().get(1).loopImpedance().value();
            assertTrue(zs <= lastZs, "cpc " + cpc);
            lastZs = zs;
        }
    }

    @Test
    void ttSystemsUseTheRcdTouchVoltageCheck() {
        // IEC 60364-4-41:2005, 411.5.3: R_A × I_Δn ≤ 50 V. 100 Ω × 0.03 A = 3 V passes; 2000 Ω × 0.03 A = 60 V fails.
        String device = "{kind: rcbo, curve: B, rating_a: 16, breaking_capacity_ka: 10, residual_current_a: 0.03}";
        Result ok = Fixtures.run(install("utility: {fault_level_ka: 6, loop_impedance_ohm: 21}", "earthing: TT, earth_electrode_resistance_ohm: 100",
                finalCircuit(device, CABLE, 10)));
        assertTrue(ok.circuits().get(1).check("disconnection").pass());
        assertEquals(3, ok.circuits().get(1).check("disconnection").value(), 1e-9);
        Result bad = Fixtures.run(install("utility: {fault_level_ka: 6, loop_impedance_ohm: 21}", "earthing: TT, earth_electrode_resistance_ohm: 2000",
                finalCircuit(device, CABLE, 10)));
        assertFalse(bad.circuits().get(1).check("disconnection").pass());
    }

    @Test
    void missingDeviceDataFailsTheCheckAndSaysWhy() {
        Result r = Fixtures.run(install("utility: {fault_level_ka: 6, loop_impedance_ohm: 0.3}", "",
                finalCircuit("{kind: mccb, rating_a: 16}", CABLE, 10)));
        CircuitResult c = r.circuits().get(1);
        assertFalse(c.check("disconnection").pass());
        assertFalse(c.check("disconnection").determined());
        assertFalse(c.check("breaking-capacity").pass());
        assertTrue(TraceWalk.steps(r.trace()).stream().anyMatch(s -> s instanceof Step.Decision d && d.because().contains("instantaneous_a")));
    }

    @Test
    void breakingCapacityBelowTheFaultLevelFails() {
        Result r = Fixtures.run(install("utility: {fault_level_ka: 16}", "",
                finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 3, let_through_a2s: 20000}", CABLE, 10)));
        CheckResult bc = r.circuits().get(1).check("breaking-capacity");
        assertFalse(bc.pass(), "3 kA device where the fault level is " + bc.limit() + " kA");
    }

    @Test
    void aBoardWhoseWithstandIsBelowItsFaultLevelFailsWhetherOrNotTheTraceIsRecorded() {
        // IEC 61439-1:2011, 9.3: a board's rated short-circuit withstand must be at least the prospective
        // fault current where it is installed; 1 kA at a board fed over 50 m of 95 mm² from a 16 kA origin.
        String yaml = install("utility: {fault_level_ka: 16, loop_impedance_ohm: 0.1}", "",
                finalCircuit("{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}", CABLE, 10))
                .replace("  - id: B1\n", "  - id: B1\n    fault_rating_ka: 1\n");
        Installation inst = Fixtures.parse(yaml);
        for (boolean record : new boolean[] {true, false}) {
            Result r = new Engine(ReferenceData.standard()).run(inst, record);
            CheckResult withstand = r.boards().get(1).checks().get(0);
            assertEquals("breaking-capacity", withstand.name());
            assertFalse(withstand.pass(), "recorded: " + record);
            assertFalse(r.pass(), "recorded: " + record);
        }
    }
}
