package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

import org.feedernote.Fixtures;
import org.feedernote.data.CapacityData;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Basis;
import org.feedernote.model.*;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/** Current-carrying capacity, correction factors, coordination and sizing against published tables. */
class CapacityTest {
    private static final CapacityData DATA = new CapacityData(ReferenceData.standard());

    /** IEC 60364-5-52:2009 Tables B.52.2 to B.52.5 and B.52.10/B.52.12, copper; each cell confirmed or recalled as its data file's memory column says (CapacityTablesTest holds them with their sources). */
    @ParameterizedTest(name = "{0} {1} loaded, method {2}, {3} mm²: I_t = {4} A")
    @CsvSource({
            "PVC, 2, C, 2.5, 27", "PVC, 2, B2, 1.5, 16.5", "PVC, 2, A1, 16, 61", "PVC, 3, C, 25, 96", "PVC, 3, B1, 95, 207",
            "PVC, 3, D1, 50, 116", "XLPE, 2, C, 2.5, 33", "XLPE, 3, C, 35, 147", "XLPE, 3, B1, 4, 37", "XLPE, 3, E, 95, 298",
            "PVC, 3, E, 16, 80", "XLPE, 2, E, 6, 63"})
    void tabulatedCapacityOfMulticoreCables(Insulation insulation, int loaded, Method method, double size, double amps) {
        Step.Lookup s = DATA.tabulated("t", insulation, Conductor.COPPER, method, loaded, CableType.MULTICORE, null, size);
        assertEquals(amps, s.value(), 1e-9);
        assertEquals("IEC 60364-5-52", s.table().source());
    }

    /** IEC 60364-5-52:2009 Table B.52.12 (XLPE, methods F and G), from memory. */
    @ParameterizedTest(name = "XLPE single-core {0}, {1} mm²: I_t = {2} A")
    @CsvSource({"TREFOIL, 95, 328", "FLAT_TOUCHING, 240, 634", "FLAT_SPACED, 120, 500"})
    void tabulatedCapacityOfSingleCoreCablesInAir(Formation formation, double size, double amps) {
        Method method = formation == Formation.FLAT_SPACED ? Method.G : Method.F;
        assertEquals(amps, DATA.tabulated("t", Insulation.XLPE, Conductor.COPPER, method, 3, CableType.SINGLE_CORE, formation, size).value(), 1e-9);
    }

    /**
     * The ambient factors of IEC 60364-5-52:2009 Tables B.52.14 and B.52.15 follow from the physics
     * of heat flow: C_a = √((θ_max − θ_a) / (θ_max − θ_ref)). Checked against that formula, an
     * independent derivation, to the table's two decimals.
     */
    @ParameterizedTest(name = "ambient {0} °C")
    @ValueSource(doubles = {10, 15, 20, 25, 35, 40, 45, 50, 55})
    void ambientFactorsFollowTheSquareRootLaw(double theta) {
        assertEquals(Math.sqrt((70 - theta) / 40), DATA.ambientAir("a", Insulation.PVC, theta).value(), 0.011);
        assertEquals(Math.sqrt((90 - theta) / 60), DATA.ambientAir("a", Insulation.XLPE, theta).value(), 0.011);
        if (theta <= 50) assertEquals(Math.sqrt((90 - theta) / 70), DATA.ambientGround("g", Insulation.XLPE, theta).value(), 0.011);
    }

    @Test
    void ambientBetweenRowsUsesTheNextHigherRow() {
        Step.Lookup s = DATA.ambientAir("a", Insulation.PVC, 33);
        assertEquals(0.94, s.value(), 1e-12, "33 °C is read at 35 °C");
        assertTrue(s.method().startsWith("next higher"));
    }

    /** IEC 60364-5-52:2009 Table B.52.17, checked against BS 7671:2008 Table 4C1 (copy named in grouping.csv). */
    @ParameterizedTest(name = "{0} × {1}: C_g = {2}")
    @CsvSource({"BUNCHED, 2, 0.80", "BUNCHED, 3, 0.70", "BUNCHED, 6, 0.57", "BUNCHED, 10, 0.45", "WALL_SINGLE_LAYER, 4, 0.75",
            "TRAY_SINGLE_LAYER, 3, 0.82", "LADDER_SINGLE_LAYER, 5, 0.80", "TRAY_SINGLE_LAYER, 14, 0.72"})
    void groupingFactors(Arrangement arrangement, int circuits, double factor) {
        assertEquals(factor, DATA.grouping("g", Method.C, arrangement, circuits).value(), 1e-12);
    }

    private static String circuit(String cable, String installation, String device, String load) {
        return """
                - id: C1
                  from: B0
                  load: %s
                  length_m: 10
                  cable: %s
                  installation: %s
                  device: %s
                """.formatted(load, cable, installation, device);
    }

    private static CircuitResult one(String cable, String installation, String device, String load) {
        return Fixtures.run(Fixtures.oneBoard("", circuit(cable, installation, device, load))).circuits().get(0);
    }

    @Test
    void workedSizingOfAThreePhaseLoad() {
        // Hand calculation (IEC 60364-5-52:2009 Table B.52.5, XLPE three loaded conductors, method C,
        // from memory): I_b = 32 A, I_n = 32 A; 2.5 mm² gives 30 A < 32 A, 4 mm² gives 40 A ≥ 32 A → 4 mm².
        CircuitResult r = one("{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}",
                "{method: C}", "{kind: mcb, curve: C, rating_a: 32, breaking_capacity_ka: 10}", "{kind: other, current_a: 32, power_factor: 0.9, phases: 3}");
        assertEquals(4, r.circuit().cable().size().mm2());
        // IEC 60364-5-54:2011: Table 54.2 gives cpc = S = 4 mm² for S ≤ 16 mm²; 543.1.2 allows a smaller
        // one by calculation, which must then pass the adiabatic check and disconnection.
        assertTrue(r.circuit().cable().cpc().mm2() <= 4);
        assertTrue(r.check("protective-conductor").pass() && r.check("disconnection").pass());
        assertEquals(40, r.tabulatedCapacity().value(), 1e-9);
        assertEquals("capacity", r.governingCheck());
        Result whole = Fixtures.run(Fixtures.oneBoard("", circuit(
                "{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}", "{method: C}",
                "{kind: mcb, curve: C, rating_a: 32, breaking_capacity_ka: 10}", "{kind: other, current_a: 32, power_factor: 0.9, phases: 3}")));
        assertTrue(TraceWalk.steps(whole.trace()).stream()
                .anyMatch(s -> s instanceof Step.Decision d && d.because().equals("I_z 30 A < I_n 32 A") && d.outcome().equals("2.5 mm² rejected")),
                "the note shows why 2.5 mm² was rejected");
    }

    @Test
    void workedSizingWithGroupingAndAmbient() {
        // Hand calculation (IEC 60364-5-52:2009, from memory): PVC, two loaded conductors, method B2,
        // 35 °C (C_a 0.94, Table B.52.14), three circuits bunched (C_g 0.70, Table B.52.17); I_n = 20 A
        // needs I_t ≥ 20 / (0.94 × 0.70) = 30.4 A; 4 mm² gives 30 A (Table B.52.2) → 6 mm² (38 A).
        CircuitResult r = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto}",
                "{method: B2, ambient_c: 35, grouped_circuits: 3, group_arrangement: bunched}", "{kind: mcb, curve: B, rating_a: 20, breaking_capacity_ka: 10}",
                "{kind: socket, current_a: 16, power_factor: 0.9, phases: 1}");
        assertEquals(6, r.circuit().cable().size().mm2());
        assertEquals(0.94 * 0.70, r.correctionFactor().value(), 1e-12);
        assertEquals(38 * 0.94 * 0.70, r.capacity().value(), 1e-9);
    }

    @Test
    void autoRatingIsTheSmallestStandardRatingNotBelowTheDesignCurrent() {
        // IEC 60898-1 preferred ratings (from memory): 6, 10, 13, 16, 20, 25, 32 … ; I_b = 14.4 A → 16 A.
        CircuitResult r = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}",
                "{method: C}", "{kind: mcb, curve: B, rating_a: auto, breaking_capacity_ka: 10}", "{kind: heating, power_kw: 3.312, power_factor: 1.0, phases: 1}");
        assertEquals(16, r.rating().value(), 1e-12);
    }

    @Test
    void aFuseAtTheCableRatingFailsTheOverloadCheck() {
        // gG fuse I_2 = 1.6 I_n (IEC 60269-1, from memory): with I_n = I_z, I_2 = 1.6 I_z > 1.45 I_z.
        CircuitResult r = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 4, cpc_mm2: 1.5}",
                "{method: C}", "{kind: fuse, rating_a: 32, breaking_capacity_ka: 10, let_through_a2s: 30000, disconnection_current_a: 200}", "{kind: socket, current_a: 20, power_factor: 0.9, phases: 1}");
        // Table B.52.2 method C, 4 mm²: 36 A; I_2 = 1.6 × 32 = 51.2 A ≤ 1.45 × 36 = 52.2 A: passes.
        assertTrue(r.check("overload").pass());
        CircuitResult f = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}",
                "{method: C}", "{kind: fuse, rating_a: 25, breaking_capacity_ka: 10, let_through_a2s: 30000, disconnection_current_a: 200}", "{kind: socket, current_a: 20, power_factor: 0.9, phases: 1}");
        // 25 A ≤ 27 A passes capacity, but I_2 = 40 A > 1.45 × 27 = 39.15 A fails overload.
        assertTrue(f.check("capacity").pass());
        assertFalse(f.check("overload").pass());
        assertEquals(40, f.check("overload").value(), 1e-9);
    }

    @Test
    void aHigherAmbientOrMoreGroupingNeverRaisesTheCapacity() {
        double previous = Double.POSITIVE_INFINITY;
        for (int ambient = 10; ambient <= 60; ambient += 5) {
            for (int n : List.of(1, 2, 3, 4, 6, 9, 12, 20)) {
                CircuitResult r = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 10, cpc_mm2: 4}",
                        "{method: C, ambient_c: " + ambient + ", grouped_circuits: " + n + ", group_arrangement: bunched}",
                        "{kind: mcb, curve: B, rating_a: 6, breaking_capacity_ka: 10}", "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}");
                if (n == 1) previous = Double.POSITIVE_INFINITY;
                assertTrue(r.capacity().value() <= previous + 1e-12, ambient + " °C, " + n + " circuits");
                previous = r.capacity().value();
            }
        }
        double last = Double.POSITIVE_INFINITY;
        for (int ambient = 10; ambient <= 60; ambient += 5) {
            CircuitResult r = one("{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 10, cpc_mm2: 4}",
                    "{method: C, ambient_c: " + ambient + "}", "{kind: mcb, curve: B, rating_a: 6, breaking_capacity_ka: 10}",
                    "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}");
            assertTrue(r.capacity().value() <= last + 1e-12);
            last = r.capacity().value();
        }
    }

    @ParameterizedTest(name = "I_b {0} A, method {1}")
    @CsvSource({"9, C", "14, B2", "23, C", "31, B1", "45, E", "61, C", "88, C", "100, E"})
    void anAutoSizedCablePassesAndTheNextSmallerFailsTheGoverningCheck(double current, String method) {
        String load = "{kind: other, current_a: " + current + ", power_factor: 0.9, phases: 3}";
        String device = "{kind: mcb, curve: B, rating_a: auto, breaking_capacity_ka: 10}";
        CircuitResult r = one("{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}",
                "{method: " + method + "}", device, load);
        assertTrue(r.pass(), r.failing().toString());
        List<Double> sizes = ReferenceData.standardSizes();
        int i = sizes.indexOf(r.circuit().cable().size().mm2());
        // Nothing below the design basis's smallest line conductor is a candidate (default 1.5 mm²: IEC 60364-5-52:2009, Table 52.2).
        if (i == 0 || sizes.get(i - 1) < Basis.DEFAULT_MINIMUM_SIZE_MM2 - 1e-9) return;
        String smaller = ReferenceData.sizeKey(sizes.get(i - 1));
        CircuitResult s = one("{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: " + smaller + ", cpc_mm2: " + smaller + "}",
                "{method: " + method + "}", device, load);
        assertFalse(s.check(r.governingCheck()).pass(), "the next smaller size fails " + r.governingCheck());
    }
}
