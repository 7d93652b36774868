package org.feedernote.expr;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The evaluator's node for each operator computes exactly what the operator itself computes. */
class OperatorNodesTest {
    private static final Var A = new Var("a", "a", "");
    private static final Var B = new Var("b", "b", "");

    @ParameterizedTest
    @EnumSource(Op.class)
    void eachOperatorsNodeGivesTheOperatorsValueBitForBit(Op op) {
        Expr e = new Expr.Bin(op, new Expr.Ref(A), new Expr.Ref(B));
        SplittableRandom random = new SplittableRandom(20261203L + op.ordinal());
        for (int i = 0; i < 2_000; i++) {
            double a = random.nextDouble(0.01, 100) * (i % 3 == 0 ? -1 : 1);
            double b = random.nextDouble(0.01, 10);
            double expected = op.apply(a, b);
            if (!Double.isFinite(expected)) continue;
            assertEquals(expected, Evaluator.evaluate(e, Map.of("a", a, "b", b), "t"), 0.0, () -> op + " of " + a + ", " + b);
        }
    }

    @Test
    void aDivisionByZeroIsRefusedWithTheStepNamed() {
        Expr e = new Expr.Bin(Op.DIV, new Expr.Ref(A), new Expr.Ref(B));
        EvaluationException x = assertThrows(EvaluationException.class, () -> Evaluator.evaluate(e, Map.of("a", 1.0, "b", 0.0), "C-1/x"));
        assertEquals(true, x.getMessage().contains("division by zero") && x.getMessage().contains("C-1/x"), x.getMessage());
    }
}
