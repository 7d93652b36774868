package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * The starting dip of a motor includes the source: the transformer (or network) impedance at the
 * starting current and power factor, as its own step, beside each upstream feeder's and the
 * motor cable's.
 */
class MotorStartingSourceTest {

    /** A 1 000 kVA, 6 % transformer; a 100 A three-phase motor on the origin board, starting direct on line at 6 × I_b. */
    private static String workshop(String source, String motorFrom, String feeders) {
        return Fixtures.head("", source) + """
                boards:
                  - id: MDB
                  - id: DB-W
                circuits:
                  - id: F-W
                    from: MDB
                    to: DB-W
                    length_m: 40
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 150, cpc_mm2: 70}
                    installation: {method: E}
                    device: {kind: mccb, rating_a: 250, instantaneous_a: 2500, breaking_capacity_ka: 50, let_through_a2s: 4000000}
                  - id: M-CMP
                    from: %s
                    load: {kind: motor, current_a: 100, power_factor: 0.86, phases: 3, starting_current_multiple: 6, starting_power_factor: 0.3}
                    length_m: 30
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 50, cpc_mm2: 25}
                    installation: {method: E}
                    device: {kind: mccb, rating_a: 125, instantaneous_a: 1250, breaking_capacity_ka: 50, let_through_a2s: 1000000}
                %s""".formatted(motorFrom, feeders);
    }

    private static Step.Formula step(Result r, String id) {
        return TraceWalk.steps(r.trace()).stream().filter(s -> s instanceof Step.Formula f && f.id().equals(id))
                .map(s -> (Step.Formula) s).findFirst().orElseThrow(() -> new AssertionError("no step " + id));
    }

    private static CircuitResult circuit(Result r, String id) {
        return r.circuits().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    /*
     * Hand calculation, transformer 1 000 kVA, u_k = 6 %, X/R = 5, U = 400 V, U_0 = 230 V (the input):
     *   Z_T = u_k/100 · U²/S_rT = 0.06 · 400² / 1 000 000 = 0.009 600 Ω      IEC 60909-0:2016, 6.3.1, equation (7) (from memory)
     *   R_T = Z_T / √(1 + (X/R)²) = 0.009 6 / √26 = 0.001 882 7 Ω            from Z_T and X/R (circuit theory)
     *   X_T = 5 · R_T = 0.009 413 6 Ω
     *   (K_T is a correction for the maximum short-circuit currents, IEC 60909-0:2016, 6.3.3; it does not belong to a drop: not applied)
     *   I_st = 6 · 100 A = 600 A     the multiple 6 is the input; 6 to 8 × I_n for direct-on-line cage motors is common practice, no source
     *   cos φ_st = 0.3, sin φ_st = √(1 − 0.09) = 0.953 94    0.3 while starting: common practice, no source (the program's default, given here)
     *   ΔU_st(source) = 100 · I_st · (R_T cos φ_st + X_T sin φ_st) / U_0      IEC 60364-5-52:2009, Annex G, b = 1, Δu = 100 u/U_0
     *                 = 100 · 600 · (0.000 564 8 + 0.008 980 0) / 230 = 100 · 5.726 9 / 230 = 2.490 %
     * The whole starting current is taken through the source: before the motor starts the origin is at U_n (the safe side).
     */
    @Test
    void theTransformerAddsItsDipAtTheStartingCurrentAndPowerFactor() {
        Result r = Fixtures.run(workshop("transformer: {rating_kva: 1000, impedance_percent: 6, x_r_ratio: 5}", "MDB", ""));
        Step.Formula source = step(r, "M-CMP/st/dU_source");
        assertEquals(2.490, source.result().value(), 0.002, "hand calculation above");
        Step.Formula own = step(r, "M-CMP/st/dU_pct");
        CircuitResult m = circuit(r, "M-CMP");
        assertEquals(source.result().value() + own.result().value(), m.startingDipPercent().value(), 1e-9,
                "a motor on the origin board: its dip is the source's and its own cable's");
        assertEquals(m.startingDipPercent().value(), m.check("motor-starting").value(), 1e-12);
    }

    /*
     * The same motor on the sub-board: the dip adds the source (2.490 %, as above), the feeder's
     * running drop and its added drop at (I_st − I_b), and the motor cable's drop at I_st, each its own step.
     */
    @Test
    void onASubBoardTheSourceTheFeederAndTheMotorCableEachHaveTheirStep() {
        Result r = Fixtures.run(workshop("transformer: {rating_kva: 1000, impedance_percent: 6, x_r_ratio: 5}", "DB-W", ""));
        double source = step(r, "M-CMP/st/dU_source").result().value();
        assertEquals(2.490, source, 0.002, "hand calculation above");
        double inc = step(r, "M-CMP/st/F-W/inc").result().value();
        double own = step(r, "M-CMP/st/dU_pct").result().value();
        double feederRunning = circuit(r, "F-W").dropPercent().value();
        Step.Formula total = step(r, "M-CMP/st/dU_total");
        assertEquals(source + feederRunning + inc + own, total.result().value(), 1e-9);
        assertEquals(List.of("ΔU_st(source)", "ΔU(F-W)", "ΔU_st(F-W)", "ΔU_st(M-CMP)"),
                total.bindings().stream().map(b -> b.q().symbol()).toList());
    }

    /*
     * A distribution network given by its fault level: I_k = 16 kA at 400 V, X/R = 2.
     *   Z_Q = c_max · U / (√3 · I_k) = 1.1 · 400 / (√3 · 16 000) = 0.015 877 Ω    IEC 60909-0:2016, 6.2, equation (1), c_max = 1.1 (Table 1, LV +10 %)
     *   R_Q = Z_Q/√5 = 0.007 100 6 Ω, X_Q = 2 R_Q = 0.014 201 Ω
     *   ΔU_st(source) = 100 · 600 · (0.007 100 6 · 0.3 + 0.014 201 · 0.953 94) / 230 = 100 · 9.406 / 230 = 4.090 %
     */
    @Test
    void aNetworkGivenByItsFaultLevelIsTheSource() {
        Result r = Fixtures.run(workshop("utility: {fault_level_ka: 16, loop_impedance_ohm: 0.2, x_r_ratio: 2}", "MDB", ""));
        assertEquals(4.090, step(r, "M-CMP/st/dU_source").result().value(), 0.002, "hand calculation above");
    }

    @Test
    void aStifferSourceNeverDeepensTheDip() {
        double weak = circuit(Fixtures.run(workshop("transformer: {rating_kva: 630, impedance_percent: 6, x_r_ratio: 5}", "MDB", "")), "M-CMP")
                .startingDipPercent().value();
        double stiff = circuit(Fixtures.run(workshop("transformer: {rating_kva: 1600, impedance_percent: 6, x_r_ratio: 5}", "MDB", "")), "M-CMP")
                .startingDipPercent().value();
        assertTrue(stiff < weak, stiff + " < " + weak + ": a larger transformer of the same u_k has the smaller impedance (common practice, no source)");
    }
}
