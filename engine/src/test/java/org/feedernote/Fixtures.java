package org.feedernote;

import java.nio.file.Path;

import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;

/** Shared helpers for tests: the project root, small inputs written in place, running the engine. */
public final class Fixtures {
    private Fixtures() {}

    public static Path root() {
        String r = System.getProperty("feedernote.root");
        return r == null ? Path.of("..").toAbsolutePath().normalize() : Path.of(r).toAbsolutePath().normalize();
    }

    public static Path inputs() {
        return root().resolve("inputs");
    }

    /** The example inputs of inputs/ (YAML), in name order: a source for parameterised tests. */
    public static java.util.stream.Stream<Path> examples() throws java.io.IOException {
        return java.nio.file.Files.list(inputs()).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    public static Installation parse(String yaml) {
        try {
            return InputReader.parse("test.yaml", yaml, false);
        } catch (InputException e) {
            throw new AssertionError("input should be valid but: " + e.errors(), e);
        }
    }

    public static Result run(String yaml) {
        return new Engine(ReferenceData.standard()).run(parse(yaml));
    }

    /** The first lines of a test input: format, a project, the basis and a 400/230 V supply from the given source. */
    public static String head(String basis, String source) {
        return """
                format: 1
                project: {title: Test, reference: T-1, revision: A, date: 2026-01-01}
                basis: {%s}
                supply:
                  line_voltage_v: 400
                  phase_voltage_v: 230
                  source: {%s}
                """.formatted(basis, source);
    }

    /** A one-board installation around the given circuits (YAML list items, indented by two). */
    public static String oneBoard(String basis, String circuits) {
        return head(basis, "utility: {fault_level_ka: 10, loop_impedance_ohm: 0.3}") + """
                boards:
                  - id: B0
                circuits:
                %s
                """.formatted(circuits.indent(2));
    }

    public static String circuit(String id, String load, double lengthM, String cable) {
        return """
                - id: %s
                  from: B0
                  load: %s
                  length_m: %s
                  cable: %s
                  installation: {method: C}
                  device: {kind: mcb, curve: B, rating_a: 32, breaking_capacity_ka: 10}
                """.formatted(id, load, lengthM, cable);
    }
}
