package org.feedernote.expr;

import java.util.Map;
import java.util.function.ToDoubleFunction;

/** Evaluates an expression tree against bound values; every failure is loud and names the step. */
public final class Evaluator {
    private Evaluator() {}

    public static double evaluate(Expr expr, Map<String, Double> values, String stepId) {
        return evaluate(expr, (ToDoubleFunction<Var>) v -> {
            Double d = values.get(v.key());
            if (d == null) throw new EvaluationException(stepId, "symbol " + v.symbol() + " is not bound");
            return d;
        }, stepId);
    }

    /** @param values gives each variable's bound value; it throws where a variable is unbound */
    public static double evaluate(Expr expr, ToDoubleFunction<Var> values, String stepId) {
        double result = value(expr, values, stepId);
        if (!Double.isFinite(result)) {
            throw new EvaluationException(stepId, "the result is not a finite number (" + result + ")");
        }
        return result;
    }

    /**
     * Evaluates on primitives (not through a visitor returning Double): the engine evaluates
     * formulas millions of times during sizing, and boxing every node's value would dominate.
     */
    static double value(Expr e, ToDoubleFunction<Var> values, String stepId) {
        if (e instanceof Expr.Bin bin) {
            double a = value(bin.left(), values, stepId);
            double b = value(bin.right(), values, stepId);
            if (bin.op() == Op.DIV && b == 0.0) throw new EvaluationException(stepId, "division by zero");
            return bin.op().apply(a, b);
        }
        if (e instanceof Expr.Ref ref) return values.applyAsDouble(ref.var());
        if (e instanceof Expr.Num num) return num.value();
        if (!(e instanceof Expr.Call call)) throw new IllegalStateException(stepId + ": no evaluation for " + e);
        double x = value(call.arg(), values, stepId);
        checkArgument(call.fn(), x, stepId);
        return call.fn().apply(x);
    }

    private static void checkArgument(Fn fn, double x, String stepId) {
        if (fn == Fn.SQRT && x < 0) throw new EvaluationException(stepId, "square root of a negative number (" + x + ")");
        if (fn == Fn.LN && x <= 0) throw new EvaluationException(stepId, "logarithm of a non-positive number (" + x + ")");
    }
}
