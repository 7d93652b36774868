package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;

/**
 * A single-phase sub-board fed by a 2-core cable, as in shops, flats and small buildings: its
 * demand on one phase, the line-to-neutral drop, the single-phase fault loop, and a single-phase
 * load of the board that feeds it. Invented circuits; the rules are the trade's (common practice,
 * no source) and IEC 60364-5-52, Annex G for the single-phase drop.
 */
class SinglePhaseBoardTest {

    private static String installation(String feederPhase, String extra) {
        return Fixtures.head("", "transformer: {rating_kva: 500, impedance_percent: 5}") + """
                boards:
                  - id: B0
                  - id: FLAT
                    diversity: 0.8
                circuits:
                  - id: F-FLAT
                    from: B0
                    to: FLAT
                    %s
                    length_m: 30
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 10, cpc_mm2: 4}
                    installation: {method: C}
                    device: {kind: mcb, curve: B, rating_a: 50, breaking_capacity_ka: 10}
                  - id: K1
                    from: FLAT
                    load: {kind: heating, power_kw: 4.6, power_factor: 1, phases: 1}
                    length_m: 10
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 4, cpc_mm2: 1.5}
                    installation: {method: C}
                    device: {kind: mcb, curve: B, rating_a: 32, breaking_capacity_ka: 6}
                  - id: S1
                    from: FLAT
                    load: {kind: socket, current_a: 10, power_factor: 1, phases: 1}
                    length_m: 15
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}
                    installation: {method: C}
                    device: {kind: rcbo, curve: B, rating_a: 20, residual_current_a: 0.03, breaking_capacity_ka: 6}
                %s
                """.formatted(feederPhase, extra.indent(2));
    }

    private static CircuitResult circuit(Result r, String id) {
        return r.circuits().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void theFeederCarriesTheBoardsDemandOnOnePhaseAndItsDropIsReferredToThePhaseVoltage() {
        Result r = Fixtures.run(installation("phase: L2", ""));
        CircuitResult f = circuit(r, "F-FLAT");
        // Demand: 0.8 × (4.6 kW / 230 V + 10 A) = 0.8 × (20 A + 10 A) = 24 A on L2 (both loads at unity power factor).
        assertEquals(24, f.designCurrent().value(), 1e-9);
        assertEquals(1, f.phases());
        assertEquals("L2", f.connection());
        assertEquals("L2", circuit(r, "K1").connection());
        // The single-phase drop is ΔU / U_0: the feeder's own drop in volts over 230 V.
        assertEquals(f.dropV().value() / 230 * 100, f.dropPercent().value(), 1e-9);
        // The origin board sees the sub-board as a single-phase load on L2 only.
        BoardResult b0 = r.boards().get(0);
        assertEquals(24, b0.phaseCurrents().get(1).value(), 1e-9);
        assertEquals(0, b0.phaseCurrents().get(0).value(), 1e-9);
    }

    @Test
    void theSingleBoardsFaultLevelIsTheLineToNeutralValue() {
        Result r = Fixtures.run(installation("phase: auto", ""));
        BoardResult flat = r.boards().get(1);
        CircuitResult k1 = circuit(r, "K1");
        assertEquals(flat.faultKa().value(), k1.faultAtOrigin().value(), 1e-12);
        assertTrue(k1.check("breaking-capacity").pass());
    }

    @Test
    void aThreePhaseLoadOnASinglePhaseBoardIsAnInputError() {
        String yaml = installation("", """
                - id: M1
                  from: FLAT
                  load: {kind: motor, power_kw: 2.2, power_factor: 0.8, efficiency: 0.85, phases: 3}
                  length_m: 10
                  cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 2.5, cpc_mm2: 2.5}
                  installation: {method: C}
                  device: {kind: mcb, curve: C, rating_a: 10, breaking_capacity_ka: 6}
                """);
        InputException e = assertThrows(InputException.class, () -> InputReader.parse("t.yaml", yaml, false));
        assertTrue(e.errors().toString().contains("single-phase"), e.errors().toString());
    }
}
