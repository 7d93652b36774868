package org.feedernote.archive;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Comparing a note's recorded trace with the trace recomputed from its input, section by section:
 * what verify reports. The traces here are written by hand in the trace format (format 1).
 */
class TraceComparisonTest {

    private static String trace(String... sections) {
        return "{\"format\":\"feedernote-trace\",\"version\":1,\"engine_version\":\"t\",\"sections\":[" + String.join(",", sections)
                + "],\"fingerprint\":\"\"}";
    }

    private static String section(String id, String steps, String... subsections) {
        return "{\"id\":\"" + id + "\",\"title\":\"" + id + "\",\"steps\":[" + steps + "]"
                + (subsections.length == 0 ? "" : ",\"sections\":[" + String.join(",", subsections) + "]") + "}";
    }

    private static String input(String id, String symbol, double value, String unit) {
        return "{\"kind\":\"input\",\"id\":\"" + id + "\",\"title\":\"T " + id + "\",\"symbol\":\"" + symbol + "\",\"value\":" + value
                + ",\"unit\":\"" + unit + "\"}";
    }

    private static String check(String id, double value, String outcome) {
        return "{\"kind\":\"check\",\"id\":\"" + id + "\",\"title\":\"Check " + id + "\",\"value\":{\"from\":\"x\",\"symbol\":\"I\",\"value\":"
                + value + ",\"unit\":\"A\"},\"outcome\":\"" + outcome + "\"}";
    }

    private final String supply = section("supply", input("supply/U", "U", 400, "V"));
    private final String c1 = section("C1", input("C1/Ib", "I_b", 10, "A"), section("C1/vd", input("C1/vd/L", "L", 25, "m") + ","
            + check("C1/vd/check", 2.5, "PASS")));
    private final String c2 = section("C2", input("C2/Ib", "I_b", 16, "A"));

    @Test
    void identicalTracesHaveNoDifference() {
        assertEquals(List.of(), TraceComparison.compare(trace(supply, c1, c2), trace(supply, c1, c2)));
    }

    @Test
    void aChangedValueAndAChangedOutcomeAreNamedByCircuitStepAndQuantity() {
        String recorded = trace(supply, c1.replace("\"value\":25.0", "\"value\":26.0").replace("PASS", "FAIL"), c2);
        List<String> found = TraceComparison.compare(recorded, trace(supply, c1, c2)).stream().map(TraceComparison.Difference::text).toList();
        assertEquals(List.of("C1: T C1/vd/L L (C1/vd/L): recorded 26.0 m, recomputed 25.0 m",
                "C1: Check C1/vd/check (C1/vd/check): recorded FAIL, recomputed PASS"), found);
    }

    @Test
    void differencesBelowTheToleranceDoNotCount() {
        String recorded = trace(supply.replace("400.0", "400.0000000001"));
        assertEquals(List.of(), TraceComparison.compare(recorded, trace(supply)));
    }

    @Test
    void stepsMissingOnEitherSideAreListedRecordedOrderFirstThenTheRecomputedOnes() {
        String extra = section("C3", input("C3/Ib", "I_b", 6, "A"));
        List<String> found = TraceComparison.compare(trace(supply, c1, c2), trace(supply, c2, extra)).stream()
                .map(d -> d.step() + ": " + d.recorded() + " → " + d.recomputed()).toList();
        assertEquals(List.of("C1/Ib: 10.0 A → (no such step)", "C1/vd/L: 25.0 m → (no such step)",
                "C1/vd/check: 2.5 A → (no such step)", "C3/Ib: (no such step) → 6.0 A"), found);
    }

    @Test
    void stepsAreMatchedByIdWhereverTheirSectionStands() {
        assertEquals(List.of(), TraceComparison.compare(trace(supply, c1, c2), trace(c2, supply, c1)));
    }

    @Test
    void aTraceThatIsNotValidJsonIsRefusedInWords() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TraceComparison.compare(trace(supply, c1).substring(0, 120), trace(supply, c1)));
        assertTrue(e.getMessage().startsWith("a trace is not valid JSON"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TraceComparison.compare("[1, 2]", trace(supply)));
    }
}
