package org.feedernote.input;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;
import org.feedernote.model.InputWarning;

/**
 * A value that is legal but unusual is read, and the designer is warned where it is written: the
 * input is not refused, and the warnings stay with the installation for the note.
 */
class InputWarningsTest {

    private static final String INPUT = """
            format: 1
            project: {title: T, reference: R, revision: A, date: 2026-01-01}
            supply:
              line_voltage_v: 400
              phase_voltage_v: 230
              source: {utility: {fault_level_ka: 10}}
            boards:
              - id: B0
            circuits:
              - id: C1
                from: B0
                load: {kind: lighting, power_kw: 1.0, power_factor: 0.9, phases: 1}
                length_m: 20
                cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}
                installation: {method: C}
                device: {kind: mcb, curve: B, rating_a: 10}
            """;

    private static List<InputWarning> warnings(String yaml) {
        return Fixtures.parse(yaml).warnings();
    }

    @Test
    void aWellFormedCircuitHasNoWarning() {
        assertEquals(List.of(), warnings(INPUT));
    }

    @Test
    void aNonStandardDeviceRatingIsAWarningNotAnError() {
        // IEC 60898-1 preferred ratings (as devices.csv holds them): 10 and 13 A, no 11 A.
        InputWarning w = warnings(INPUT.replace("rating_a: 10", "rating_a: 11")).get(0);
        assertEquals("circuits[0].device.rating_a", w.where().path());
        assertEquals(16, w.where().line());
        assertEquals(45, w.where().column());
        assertTrue(w.message().startsWith("11 A is not a standard mcb rating (IEC 60898-1: 6, 10, 13"), w.message());
        assertEquals("test.yaml:16:45: warning: circuits[0].device.rating_a: " + w.message(), w.text());
    }

    @Test
    void kilowattsTypedAsWattsOnALightingCircuitAreOneWarningWithBothReasons() {
        // 1 000 kW at 230 V and cos φ 0.9: I = 1 000 000 / (230 × 0.9) = 4 831 A (hand calculation).
        List<InputWarning> all = warnings(INPUT.replace("power_kw: 1.0", "power_kw: 1000"));
        assertEquals(1, all.size(), all.toString());
        InputWarning w = all.get(0);
        assertEquals("circuits[0].load.power_kw", w.where().path());
        assertEquals(12, w.where().line());
        assertTrue(w.message().contains("about 4831 A, is more than 10 times the device rating of 10 A"), w.message());
        assertTrue(w.message().contains("1000 kW of lighting on one circuit is unusual"), w.message());
        assertTrue(w.message().endsWith("(power_kw is in kW, not W)"), w.message());
    }

    @Test
    void aLoadFarAboveItsDeviceIsWarnedOfWhateverItsKind() {
        InputWarning w = warnings(INPUT.replace("kind: lighting, power_kw: 1.0, power_factor: 0.9", "kind: heating, current_a: 500")).get(0);
        assertEquals("circuits[0].load.current_a", w.where().path());
        assertTrue(w.message().startsWith("its current, about 500 A, is more than 10 times the device rating of 10 A"), w.message());
    }

    @Test
    void warningsComeInFileOrder() {
        List<InputWarning> all = warnings(INPUT.replace("power_kw: 1.0", "power_kw: 1000").replace("rating_a: 10", "rating_a: 11"));
        assertEquals(2, all.size(), all.toString());
        assertTrue(all.get(0).where().line() < all.get(1).where().line(), all.toString());
    }

    static java.util.stream.Stream<Path> examples() throws java.io.IOException {
        return Fixtures.examples();
    }

    /** The examples are designs as a designer writes them: nothing in them is unusual. */
    @ParameterizedTest
    @MethodSource("examples")
    void theExamplesHaveNoWarnings(Path example) throws Exception {
        assertEquals(List.of(), InputReader.parse(example.toString(), Files.readString(example), false).warnings());
    }
}
