package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/** Sizing against the cumulative voltage drop (common practice, no source: the physics of the path). */
class SizingTest {
    private static String installation(String feederSize, String finalSize, double finalLength) {
        return Fixtures.head("voltage_drop_limit_percent: 4", "utility: {fault_level_ka: 10}") + """
                boards:
                  - id: B0
                  - id: B1
                circuits:
                  - id: F1
                    from: B0
                    to: B1
                    length_m: 120
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: %s, cpc_mm2: auto}
                    installation: {method: C}
                    device: {kind: mccb, rating_a: 63, instantaneous_a: 630, breaking_capacity_ka: 25, let_through_a2s: 300000}
                  - id: M1
                    from: B1
                    load: {kind: heating, power_kw: 30, power_factor: 1.0, phases: 3}
                    length_m: 10
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 10, cpc_mm2: 10}
                    installation: {method: C}
                    device: {kind: mcb, curve: C, rating_a: 50, breaking_capacity_ka: 10, let_through_a2s: 60000}
                  - id: L1
                    from: B1
                    load: {kind: lighting, power_kw: 2.0, power_factor: 0.95, phases: 1}
                    length_m: %s
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: %s, cpc_mm2: auto}
                    installation: {method: C}
                    device: {kind: mcb, curve: B, rating_a: 10, breaking_capacity_ka: 10}
                """.formatted(feederSize, finalLength, finalSize);
    }

    @Test
    void theCumulativeLimitEnlargesAlongThePathUntilEveryLoadPasses() {
        Result r = Fixtures.run(installation("auto", "auto", 60));
        assertTrue(r.pass(), () -> r.circuits().stream().filter(c -> !c.pass()).map(c -> c.id() + " " + c.failing()).toList().toString());
        CircuitResult feeder = r.circuits().get(0);
        CircuitResult light = r.circuits().get(2);
        assertTrue(light.cumulativePercent().value() <= 4 + 1e-9);
        assertTrue(feeder.circuit().cable().size().mm2() > 16 || light.circuit().cable().size().mm2() > 1.5,
                "something was enlarged beyond the capacity minimum");
        boolean explained = TraceWalk.steps(r.trace()).stream().anyMatch(s -> s instanceof Step.Decision d
                && d.title().equals("Enlarged for the cumulative voltage drop"));
        assertTrue(explained, "the note explains the enlargement");
    }

    @Test
    void givenSizesAreNeverChangedOnlyChecked() {
        Result r = Fixtures.run(installation("16", "1.5", 60));
        assertEquals(16, r.circuits().get(0).circuit().cable().size().mm2());
        assertEquals(1.5, r.circuits().get(2).circuit().cable().size().mm2());
        assertFalse(r.circuits().get(2).check("voltage-drop").pass());
    }

    @Test
    void whenNothingCanBeEnlargedTheLoadFailsAndTheNoteSaysSo() {
        Result r = Fixtures.run(installation("16", "1.5", 60).replace("size_mm2: 16", "size_mm2: 16"));
        assertFalse(r.pass());
        Result auto = Fixtures.run(installation("16", "auto", 2000));
        assertFalse(auto.circuits().get(2).check("voltage-drop").pass());
        assertTrue(TraceWalk.steps(auto.trace()).stream().anyMatch(s -> s instanceof Step.Decision d
                && d.title().equals("Voltage drop cannot be met")));
    }

    /**
     * Three motors at the end of a long sub-main, with a starting-dip limit of 5 %: the sub-main and
     * the motor cables are enlarged until every motor starts within it. While drops are balanced the
     * sizing reads of each motor below a grown feeder only its starting check, made afresh under
     * the feeder's new figures; the final pass calculates everything again. The sizes chosen must
     * give the same figures when the same design is checked with them given (nothing read stale),
     * and every motor must pass (common practice, no source: a dip limit met at the terminals).
     */
    @Test
    void motorsBelowAGrownFeederAreJudgedByTheirStartingDipUnderItsNewSize() {
        String motors = Fixtures.head("voltage_drop_limit_percent: 5, motor_starting_limit_percent: 5",
                "utility: {fault_level_ka: 16, loop_impedance_ohm: 0.2, x_r_ratio: 2}") + """
                boards:
                  - id: MDB
                  - id: DB-P
                circuits:
                  - id: F-P
                    from: MDB
                    to: DB-P
                    length_m: 160
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}
                    installation: {method: C}
                    device: {kind: mccb, rating_a: 125, instantaneous_a: 630, breaking_capacity_ka: 25, disconnection_current_a: 300, let_through_a2s: 400000}
                """
                + motor("M-1", "power_kw: 22, power_factor: 0.85, efficiency: 0.92, phases: 3, starting_current_multiple: 7.5", 12,
                        "kind: mccb, rating_a: 63, instantaneous_a: 380, breaking_capacity_ka: 16, disconnection_current_a: 380, let_through_a2s: 90000")
                + motor("M-2", "power_kw: 7.5, power_factor: 0.84, efficiency: 0.9, phases: 3, starting_current_multiple: 7", 10,
                        "kind: mcb, curve: C, rating_a: auto, breaking_capacity_ka: 10, let_through_a2s: 45000")
                + motor("M-3", "power_kw: 11, power_factor: 0.85, efficiency: 0.91, phases: 3, starting_current_multiple: 7", 15,
                        "kind: mcb, curve: C, rating_a: auto, breaking_capacity_ka: 10, let_through_a2s: 45000");
        Result sized = Fixtures.run(motors);
        assertTrue(sized.pass(), () -> sized.circuits().stream().filter(c -> !c.pass()).map(c -> c.id() + " " + c.failing()).toList().toString());
        long feederSteps = TraceWalk.steps(sized.trace()).stream().filter(s -> s instanceof Step.Decision d
                && d.id().startsWith("F-P/size/") && d.title().equals("Enlarged for the cumulative voltage drop")).count();
        assertTrue(feederSteps > 0, "the sub-main grew for the motors below it");
        for (String motor : java.util.List.of("M-1", "M-2", "M-3")) {
            CircuitResult m = sized.circuits().stream().filter(c -> c.id().equals(motor)).findFirst().orElseThrow();
            assertTrue(m.check("motor-starting").pass(), motor);
        }

        Result given = new Engine(org.feedernote.data.ReferenceData.standard()).run(
                org.feedernote.synthetic.SyntheticInstallation.asSized(sized.input(), sized), true);
        for (CircuitResult a : sized.circuits()) {
            CircuitResult b = given.circuits().stream().filter(c -> c.id().equals(a.id())).findFirst().orElseThrow();
            assertEquals(a.circuit().cable().size().mm2(), b.circuit().cable().size().mm2(), a.id());
            for (CheckResult check : a.checks()) {
                CheckResult again = b.check(check.name());
                assertEquals(check.value(), again.value(), a.id() + " " + check.name());
                assertEquals(check.pass(), again.pass(), a.id() + " " + check.name());
            }
        }
    }

    /** A motor circuit on board DB-P, its sizes auto, as an item of the circuits list. */
    private static String motor(String id, String load, int lengthM, String device) {
        return """
                  - id: %s
                    from: DB-P
                    load: {kind: motor, %s}
                    length_m: %d
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}
                    installation: {method: C}
                    device: {%s}
                """.formatted(id, load, lengthM, device);
    }
}
