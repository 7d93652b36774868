package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;

/**
 * What the summaries say of figures the program supplied: a device rating chosen for
 * rating_a: auto is shown, marked as chosen; a verdict resting on an assumption rather than data
 * says so, with the key that would replace it.
 */
class ChosenAndAssumedTest {

    private static String design(String device, String load) {
        return Fixtures.oneBoard("", """
                - id: M1
                  from: B0
                  load: %s
                  length_m: 25
                  cable: {conductor: copper, insulation: pvc, type: multicore, cores: 4, size_mm2: 4, cpc_mm2: 4}
                  installation: {method: C}
                  device: %s
                """.formatted(load, device));
    }

    private static final String MOTOR = "{kind: motor, current_a: 14, power_factor: 0.85, phases: 3, starting_current_multiple: 6}";

    @Test
    void aRatingChosenForAutoIsShownAndMarked() {
        Result r = Fixtures.run(design("{kind: mcb, curve: C, rating_a: auto, breaking_capacity_ka: 10}", MOTOR));
        CircuitResult m = r.circuits().get(0);
        // I_b = 14 A: the next standard MCB rating at or above it is 16 A (IEC 60898-1:2015, 5.3.2 preferred values, from memory).
        assertEquals(16, m.rating().value(), 1e-9);
        assertEquals("16 (chosen)", NoteBuilder.summaryRow(m, "3").deviceRating());
        assertTrue(TerminalSummary.render(r, "x.yaml").contains("16 (chosen)"));
    }

    @Test
    void theJsonResultNamesEachAssumptionWithItsKey() {
        Result r = Fixtures.run(design("{kind: mcb, curve: C, rating_a: 20, breaking_capacity_ka: 10}", MOTOR));
        com.fasterxml.jackson.databind.JsonNode json = ResultJson.tree(r);
        com.fasterxml.jackson.databind.JsonNode dip = null;
        for (com.fasterxml.jackson.databind.JsonNode k : json.get("circuits").get(0).get("checks")) {
            if (k.get("name").asText().equals("motor-starting")) dip = k;
        }
        assertNotNull(dip);
        // cos φ_st = 0.3: the program's default while starting (common practice, no source).
        assertEquals("circuits[0].load.starting_power_factor", dip.get("assumptions").get(0).get("key").asText());
        // The network's X/R is not given: the supply's figures rest on the program's 1.
        assertTrue(json.get("source_assumptions").toString().contains("supply.source.utility.x_r_ratio"), json.get("source_assumptions").toString());
    }

    @Test
    void aGivenRatingIsShownAsGiven() {
        Result r = Fixtures.run(design("{kind: mcb, curve: C, rating_a: 20, breaking_capacity_ka: 10}", MOTOR));
        assertEquals("20", NoteBuilder.summaryRow(r.circuits().get(0), "3").deviceRating());
    }

    @Test
    void aDefaultStandingForAMissingDatumIsNamedWithItsKey() {
        Result r = Fixtures.run(design("{kind: mcb, curve: C, rating_a: 20, breaking_capacity_ka: 10}", MOTOR));
        String terminal = TerminalSummary.render(r, "x.yaml");
        // cos φ_st = 0.3 is the program's default while starting (common practice, no source): the dip's verdict rests on it.
        assertTrue(terminal.contains("M1 motor-starting: cos φ_st taken as 0.3, the program's default (circuits[0].load.starting_power_factor would replace it)"),
                terminal);
        assertTrue(NoteBuilder.summaryRow(r.circuits().get(0), "3").governing().endsWith(" (assumed, 1.4)"));
        // The network's X/R is not given: 1 stands for it (the program's assumption; common practice, no source).
        assertTrue(terminal.contains("supply: X/R of the network taken as 1 (fault levels, the starting dip) (supply.source.utility.x_r_ratio would replace it)"),
                terminal);
    }

    @Test
    void theDatumGivenTheAssumptionIsGone() {
        Result r = Fixtures.run(design("{kind: mcb, curve: C, rating_a: 20, breaking_capacity_ka: 10, let_through_a2s: 30000}",
                MOTOR.replace("starting_current_multiple: 6", "starting_current_multiple: 6, starting_power_factor: 0.35"))
                .replace("loop_impedance_ohm: 0.3}", "loop_impedance_ohm: 0.3, x_r_ratio: 1}"));
        assertTrue(r.assumptionLines().isEmpty(), r.assumptionLines().toString());
        assertFalse(TerminalSummary.render(r, "x.yaml").contains("Resting on assumptions"));
    }
}
