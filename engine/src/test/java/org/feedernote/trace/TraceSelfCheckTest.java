package org.feedernote.trace;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.expr.Evaluator;
import org.feedernote.input.InputReader;

/**
 * The trace checks itself: each formula step re-evaluated from its own bindings gives its value,
 * every step it uses exists, and every binding carries its declared unit.
 */
class TraceSelfCheckTest {

    @ParameterizedTest
    @MethodSource("org.feedernote.Fixtures#examples")
    void everyFormulaStepRecomputesFromItsBindings(Path input) throws Exception {
        selfCheck(new Engine(ReferenceData.standard()).run(InputReader.read(input)));
    }

    /** A generated installation: its circuits are calculated side by side, and the trace must not show it. */
    @org.junit.jupiter.api.Test
    void aGeneratedInstallationsTraceChecksItselfToo() throws Exception {
        String json = org.feedernote.synthetic.SyntheticInstallation.toJson(org.feedernote.synthetic.SyntheticInstallation.generate(250, 9));
        selfCheck(new Engine(ReferenceData.standard()).run(InputReader.parse("synthetic.json", json, true)));
    }

    private static void selfCheck(Result result) {
        List<Step> steps = TraceWalk.steps(result.trace());
        Set<String> ids = new HashSet<>();
        for (Step step : steps) assertTrue(ids.add(step.id()), () -> "step id used twice: " + step.id());
        for (Step step : steps) {
            for (String used : step.uses()) {
                assertTrue(ids.contains(used), () -> step.id() + " uses " + used + ", which is not in the trace");
            }
            if (step instanceof Step.Formula f) {
                Map<String, Double> values = new HashMap<>();
                for (Step.Binding b : f.bindings()) {
                    assertEquals(b.var().unit(), b.q().unit(), () -> f.id() + ": unit of " + b.var().symbol());
                    values.put(b.var().key(), b.q().value());
                }
                assertEquals(f.value(), Evaluator.evaluate(f.expr(), values, f.id()), Math.abs(f.value()) * 1e-12 + 1e-15, f.id());
            }
        }
        assertFalse(steps.isEmpty());
    }
}
