package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.data.CableBuildData;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Cable;
import org.feedernote.model.Conductor;
import org.feedernote.model.CpcKind;
import org.feedernote.model.Method;
import org.feedernote.synthetic.SyntheticInstallation;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * The protective conductor follows the cable's construction: a core equal to the line conductors,
 * the reduced cpc of a flat twin-and-earth cable (BS 6004), or a separate conductor sized by Table
 * 54.2 or by calculation and never below the minimum for a conductor not part of a cable.
 */
class ProtectiveConductorConstructionTest {
    private static final CableBuildData BUILDS = new CableBuildData(ReferenceData.standard());

    @Test
    void separateConductorMinimums() {
        // IEC 60364-5-54:2011, 543.1.3 (from memory): a protective conductor not part of a cable, 2.5 mm² Cu where
        // protected against mechanical damage, 4 mm² Cu where not; 16 mm² Al either way. Protected: in conduit or
        // trunking (same clause), i.e. reference methods A1, A2, B1, B2 (IEC 60364-5-52:2009, Table B.52.1).
        for (Method m : List.of(Method.A1, Method.A2, Method.B1, Method.B2)) assertEquals(2.5, CpcKind.separateMinimumMm2(Conductor.COPPER, m));
        for (Method m : List.of(Method.C, Method.D1, Method.D2, Method.E, Method.F, Method.G)) assertEquals(4, CpcKind.separateMinimumMm2(Conductor.COPPER, m));
        assertEquals(16, CpcKind.separateMinimumMm2(Conductor.ALUMINIUM, Method.B2));
        assertEquals(16, CpcKind.separateMinimumMm2(Conductor.ALUMINIUM, Method.E));
    }

    @ParameterizedTest
    @CsvSource({
            // IEC 60364-5-54:2011, Table 54.2: S ≤ 16: S; 16 < S ≤ 35: 16; S > 35: S/2 (from memory). Where S/2 is no
            // standard size the next larger is taken (common practice, no source).
            "1.5, 1.5", "10, 10", "16, 16", "25, 16", "35, 16", "50, 25", "70, 35", "95, 50", "120, 70", "185, 95", "240, 120", "300, 150"})
    void table54_2(double line, double cpc) {
        assertEquals(cpc, Sizing.table54_2(line));
    }

    private static String oneCircuit(String load, String cable, String method) {
        return Fixtures.oneBoard("", """
                - id: C1
                  from: B0
                  load: %s
                  length_m: 20
                  cable: %s
                  installation: {method: %s}
                  device: {kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}
                """.formatted(load, cable, method));
    }

    private static CircuitResult only(Result r) {
        return r.circuits().get(0);
    }

    private static final String SOCKET = "{kind: socket, current_a: 12, power_factor: 0.9, phases: 1}";

    @Test
    void aCoreOfTheCableEqualsTheLineConductors() {
        // A 3-core cable on a single-phase circuit: L, N and a core as cpc (IEC 60364-5-54:2011, 543.2.1).
        Result r = Fixtures.run(oneCircuit(SOCKET, "{conductor: copper, insulation: pvc, type: multicore, cores: 3, size_mm2: auto, cpc_mm2: auto}", "C"));
        Cable cable = only(r).circuit().cable();
        assertEquals(CpcKind.CORE, cable.cpcKind());
        assertEquals(cable.size().mm2(), cable.cpc().mm2());
    }

    @Test
    void twinAndEarthTakesThePublishedCpc() {
        // BS 6004 flat twin and earth: 2.5 mm² with a 1.5 mm² cpc (engx.theiet.org thread 31720, see twin-earth-cpc.csv).
        // A 20 A device: 1.5 mm² clipped direct carries 19.5 A (IEC 60364-5-52:2009 Table B.52.2, from memory), so 2.5 mm².
        Result r = Fixtures.run(oneCircuit("{kind: socket, current_a: 18, power_factor: 0.9, phases: 1}",
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto, cpc_kind: twin-and-earth}", "C")
                .replace("rating_a: 16", "rating_a: 20"));
        Cable cable = only(r).circuit().cable();
        assertEquals(2.5, cable.size().mm2());
        assertEquals(1.5, cable.cpc().mm2());
        // The note says which, citing the standard.
        assertTrue(TraceWalk.steps(r.trace()).stream().anyMatch(s -> s.id().equals("C1/size/cpc") && s instanceof Step.Decision d
                && d.reference().contains("BS 6004")));
    }

    @Test
    void aSeparateConductorIsNotBelowTheMinimumAndStartsAt30C() {
        // 2-core cable clipped direct (method C): no core to spare, so a separate conductor, at least 4 mm²
        // (IEC 60364-5-54:2011, 543.1.3), its k from an initial 30 °C (Table A.54.2).
        Result r = Fixtures.run(oneCircuit(SOCKET, "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto}", "C"));
        Cable cable = only(r).circuit().cable();
        assertEquals(CpcKind.SEPARATE, cable.cpcKind());
        assertEquals(4, cable.cpc().mm2());
        Step.Lookup thetaI = TraceWalk.steps(r.trace()).stream().filter(s -> s.id().equals("C1/fault/pe/theta_i") || s.id().endsWith("/theta_i"))
                .map(s -> (Step.Lookup) s).findFirst().orElseThrow();
        assertEquals(30, thetaI.result().value(), 1e-9);
        // In conduit (method B2) the minimum is 2.5 mm².
        Result b2 = Fixtures.run(oneCircuit(SOCKET, "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto}", "B2"));
        assertTrue(only(b2).circuit().cable().cpc().mm2() >= 2.5);
    }

    @Test
    void givenSizesWithoutAKindKeepTheirFormerK() {
        // A 2-core 1.5 mm² cable with a given 1.5 mm² cpc: no construction assumed, θ_i = θ_max (IEC 60364-5-54:2011,
        // Table A.54.3, the lower k): the numbers of inputs written before cpc_kind do not move.
        Result r = Fixtures.run(oneCircuit(SOCKET, "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 2.5}", "C"));
        assertNull(only(r).circuit().cable().cpcKind());
        assertTrue(TraceWalk.steps(r.trace()).stream().noneMatch(s -> s.id().endsWith("/theta_i")));
    }

    /** Property: every cpc chosen by auto is one its construction allows. */
    @ParameterizedTest
    @ValueSource(longs = {1, 7, 42})
    void everyAutoCpcIsOneTheConstructionAllows(long seed) {
        String yaml = SyntheticInstallation.generate(120, seed);
        // The generated 2-core PVC circuits once as generated (separate by default) and once as twin and earth.
        String twinAndEarth = yaml.replace("cores: 2, size_mm2: auto, cpc_mm2: auto}", "cores: 2, size_mm2: auto, cpc_mm2: auto, cpc_kind: twin-and-earth}");
        assertNotEquals(yaml, twinAndEarth);
        for (String input : List.of(yaml, twinAndEarth)) {
            var inst = Fixtures.parse(input);
            Result r = new Engine(ReferenceData.standard()).run(inst, false);
            List<String> wrong = new ArrayList<>();
            for (CircuitResult c : r.circuits()) {
                Cable original = inst.circuits().stream().filter(x -> x.id().equals(c.id())).findFirst().orElseThrow().cable();
                if (!original.cpc().auto()) continue;
                Cable cable = c.circuit().cable();
                double s = cable.size().mm2();
                double cpc = cable.cpc().mm2();
                boolean allowed = switch (cable.cpcKind()) {
                    case CORE -> cpc == s;
                    case TWIN_AND_EARTH -> BUILDS.twinAndEarthCpcMm2(s) != null && cpc == BUILDS.twinAndEarthCpcMm2(s);
                    case SEPARATE -> cpc >= CpcKind.separateMinimumMm2(cable.conductor(), c.circuit().conditions().method())
                            && cpc <= Math.max(Sizing.table54_2(s), CpcKind.separateMinimumMm2(cable.conductor(), c.circuit().conditions().method()));
                    default -> false;
                };
                if (!allowed) wrong.add(c.id() + ": " + cable.cpcKind() + " " + s + "/" + cpc);
            }
            assertEquals(List.of(), wrong);
        }
    }
}
