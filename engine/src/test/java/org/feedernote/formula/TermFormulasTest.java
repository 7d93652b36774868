package org.feedernote.formula;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import org.feedernote.expr.Evaluator;
import org.feedernote.expr.Expr;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceRecorder;
import org.feedernote.trace.Trace;
import org.feedernote.trace.TraceWalk;

/** A sum over terms is valued by the kept formula over anonymous variables, and shows the terms' own symbols. */
class TermFormulasTest {
    private static final List<Q> DROPS = List.of(new Q("F-1/vd/dU_pct", "ΔU(F-1)", 0.1 + 0.2, Units.PERCENT),
            new Q("F-2/vd/dU_pct", "ΔU(F-2)", 1.3, Units.PERCENT), new Q("C-7/vd/dU_pct", "ΔU(C-7)", 0.7, Units.PERCENT));

    private static Q sum(TermFormulas terms, Trace t) {
        return terms.eval(t, "C-7/vd/dU_total", "", "cumulative-drop", "ΔU_total", "d", Units.PERCENT, DROPS,
                vars -> DemandFormulas.sum("cumulative-drop", "Voltage drop, origin to terminals", "ΔU_total", Units.PERCENT, vars,
                        "drops add along the path"));
    }

    @Test
    void theRecordedSumHasTheValueItsOwnTreeGivesAndTheNoOpTraceGives() {
        TermFormulas terms = new TermFormulas();
        TraceRecorder t = new TraceRecorder();
        Q recorded = sum(terms, t.section("C-7", "C-7", ""));
        Q unrecorded = sum(terms, Trace.noop());

        Step.Formula step = (Step.Formula) TraceWalk.steps(t.toSection()).get(0);
        Map<String, Double> values = new HashMap<>();
        for (Step.Binding b : step.bindings()) values.put(b.var().key(), b.q().value());
        // Exactly equal, not within a tolerance: the same operations in the same order.
        assertEquals(Evaluator.evaluate(step.expr(), values, step.id()), recorded.value(), 0.0);
        assertEquals(unrecorded.value(), recorded.value(), 0.0);
        // ((0.1 + 0.2) + 1.3) + 0.7, added left to right as the working shows it.
        assertEquals(((0.1 + 0.2) + 1.3) + 0.7, recorded.value(), 0.0);
        assertEquals(List.of("ΔU(F-1)", "ΔU(F-2)", "ΔU(C-7)"), step.bindings().stream().map(b -> b.var().symbol()).toList());
        assertEquals(List.of("F-1/vd/dU_pct", "F-2/vd/dU_pct", "C-7/vd/dU_pct"), step.uses());
    }

    @Test
    void aFormulaThatDoesNotUseEachTermOnceInOrderIsRefused() {
        TermFormulas terms = new TermFormulas();
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> terms.eval(new TraceRecorder(), "X/sum", "",
                "reversed", "S", "d", Units.PERCENT, DROPS.subList(0, 2),
                vars -> new Formula("reversed", "Reversed sum", "S", Units.PERCENT, Expr.add(Expr.v(vars.get(1)), Expr.v(vars.get(0))), "test")));
        assertEquals("reversed: the formula must use each term once, in order", e.getMessage());
    }
}
