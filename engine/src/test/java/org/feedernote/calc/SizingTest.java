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
}
