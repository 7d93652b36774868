package org.feedernote.verification;

import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/**
 * Small invented design inputs written in place, on which the published cases run the engine:
 * the inputs are ours, the values they are compared with are the standards'.
 */
final class InventedInputs {
    private InventedInputs() {}

    /** The first lines of an input: format, an invented project, the basis and a 400/230 V supply from the source. */
    static String head(String basis, String source) {
        return """
                format: 1
                project: {title: Published case, reference: PC-1, revision: A, date: 2026-01-01}
                basis: {%s}
                supply:
                  line_voltage_v: 400
                  phase_voltage_v: 230
                  source: {%s}
                """.formatted(basis, source);
    }

    /** One board B0 at the origin with the circuits given (YAML list items). */
    static String oneBoard(String basis, String source, String circuits) {
        return head(basis, source) + """
                boards:
                  - id: B0
                circuits:
                %s
                """.formatted(circuits.indent(2));
    }

    /**
     * The origin board B0 and a board B1 fed over 50 m of 95/50 mm² four-core XLPE (method E) by a
     * 200 A MCCB; the circuits given are fed from B1.
     */
    static String subBoard(String basis, String source, String circuits) {
        return head(basis, source) + """
                boards:
                  - id: B0
                  - id: B1
                circuits:
                  - id: F1
                    from: B0
                    to: B1
                    length_m: 50
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 95, cpc_mm2: 50}
                    installation: {method: E}
                    device: {kind: mccb, rating_a: 200, instantaneous_a: 2000, breaking_capacity_ka: 36, let_through_a2s: 2000000}
                %s
                """.formatted(circuits.indent(2));
    }

    /** A final circuit C1 from the board given. */
    static String circuit(String board, String load, double lengthM, String cable, String method, String device) {
        return """
                - id: C1
                  from: %s
                  load: %s
                  length_m: %s
                  cable: %s
                  installation: {method: %s}
                  device: %s
                """.formatted(board, load, lengthM, cable, method, device);
    }

    static Result run(ReferenceData data, String yaml) {
        try {
            return new Engine(data).run(InputReader.parse("published-case.yaml", yaml, false));
        } catch (InputException e) {
            throw new IllegalStateException("the invented input of a published case is invalid: " + e.errors(), e);
        }
    }

    static CircuitResult circuit(Result r, String id) {
        return r.circuits().stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalStateException("no circuit " + id));
    }

    /** The value of the step with the id given (a formula's value or an input's). */
    static double step(Result r, String id) {
        for (Step s : TraceWalk.steps(r.trace())) {
            if (!s.id().equals(id)) continue;
            if (s instanceof Step.Formula f) return f.value();
            if (s instanceof Step.Input i) return i.result().value();
        }
        throw new IllegalStateException("no step " + id + " in the trace");
    }
}
