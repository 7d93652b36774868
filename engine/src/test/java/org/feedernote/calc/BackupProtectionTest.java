package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * Back-up protection, IEC 60364-4-43:2008, 434.5.1 (from memory: "a lower breaking capacity is
 * permitted if another protective device having the necessary breaking capacity is installed on
 * the supply side; the characteristics of the devices shall then be co-ordinated so that the
 * energy let through by the two does not exceed what the device on the load side and the
 * conductors it protects can withstand"). The manufacturer's combined (series) breaking capacity
 * stands for that co-ordination: given, it is what the breaking-capacity check compares, and the
 * check says so; not given, a device below the prospective current fails as before.
 */
class BackupProtectionTest {

    /** A 16 kA supply, a short 95 mm² sub-main (a fault level at B1 well above 6 kA), and a 6 kA MCB on B1. */
    private static String design(String backup) {
        return Fixtures.head("", "utility: {fault_level_ka: 16, loop_impedance_ohm: 0.1, x_r_ratio: 2}") + """
                boards:
                  - id: B0
                  - id: B1
                circuits:
                  - id: F1
                    from: B0
                    to: B1
                    length_m: 5
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 95, cpc_mm2: 50}
                    installation: {method: E}
                    device: {kind: mccb, rating_a: 200, instantaneous_a: 2000, breaking_capacity_ka: 36, let_through_a2s: 2000000}
                  - id: C1
                    from: B1
                    load: {kind: other, current_a: 10, power_factor: 0.9, phases: 3}
                    length_m: 20
                    cable: {conductor: copper, insulation: pvc, type: multicore, cores: 4, size_mm2: 4, cpc_mm2: 4}
                    installation: {method: C}
                    device: {kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 6%s}
                """.formatted(backup);
    }

    private static CircuitResult c1(Result r) {
        return r.circuits().stream().filter(c -> c.id().equals("C1")).findFirst().orElseThrow();
    }

    @Test
    void withoutBackupADeviceBelowTheFaultLevelFails() {
        CheckResult bc = c1(Fixtures.run(design(""))).check("breaking-capacity");
        assertTrue(bc.limit() > 6, "the scenario puts more than 6 kA at B1: " + bc.limit());
        assertFalse(bc.pass());
        assertEquals(6, bc.value(), 1e-12);
    }

    @Test
    void withTheManufacturersCombinedCapacityItPassesAsAStatedDecision() {
        Result r = Fixtures.run(design(", backup: {upstream_circuit: F1, combined_breaking_capacity_ka: 25}"));
        CheckResult bc = c1(r).check("breaking-capacity");
        assertTrue(bc.pass(), bc.toString());
        assertTrue(bc.determined());
        assertEquals(25, bc.value(), 1e-12, "the combined value is compared");
        assertTrue(bc.title().contains("back-up protection by F1"), bc.title());
        assertTrue(TraceWalk.steps(r.trace()).stream().anyMatch(s -> s instanceof Step.Decision d && d.id().equals("C1/fault/bc/backup")
                && d.reference().contains("434.5.1")), "the decision is stated in the working");
        CheckResult sc = c1(r).check("short-circuit");
        assertFalse(sc.deemed(), "435.1 rests on the device breaking the current itself: with back-up the conductors get the adiabatic check");
    }

    @Test
    void aCombinedCapacityBelowTheFaultLevelStillFails() {
        Result r = Fixtures.run(design(", backup: {upstream_circuit: F1, combined_breaking_capacity_ka: 6.5}"));
        assertFalse(c1(r).check("breaking-capacity").pass());
    }

    @Test
    void aDeviceThatBreaksTheCurrentAloneIsCheckedOnItsOwnRating() {
        Result r = Fixtures.run(design(", backup: {upstream_circuit: F1, combined_breaking_capacity_ka: 25}").replace("breaking_capacity_ka: 6,",
                "breaking_capacity_ka: 50,"));
        CheckResult bc = c1(r).check("breaking-capacity");
        assertEquals(50, bc.value(), 1e-12);
        assertFalse(bc.title().contains("back-up"));
    }
}
