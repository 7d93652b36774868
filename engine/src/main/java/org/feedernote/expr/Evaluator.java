package org.feedernote.expr;

import java.util.Map;
import java.util.function.ToDoubleFunction;

/** Evaluates an expression tree against bound values; every failure is loud and names the step. */
public final class Evaluator implements Expr.Visitor<Double> {
    private final ToDoubleFunction<Var> values;
    private final String stepId;

    private Evaluator(ToDoubleFunction<Var> values, String stepId) {
        this.values = values;
        this.stepId = stepId;
    }

    public static double evaluate(Expr expr, Map<String, Double> values, String stepId) {
        return evaluate(expr, (ToDoubleFunction<Var>) v -> {
            Double d = values.get(v.key());
            if (d == null) throw new EvaluationException(stepId, "symbol " + v.symbol() + " is not bound");
            return d;
        }, stepId);
    }

    /** @param values gives each variable's bound value; it throws where a variable is unbound */
    public static double evaluate(Expr expr, ToDoubleFunction<Var> values, String stepId) {
        double result = expr.accept(new Evaluator(values, stepId));
        if (!Double.isFinite(result)) {
            throw new EvaluationException(stepId, "the result is not a finite number (" + result + ")");
        }
        return result;
    }

    @Override public Double num(Expr.Num num) { return num.value(); }

    @Override public Double ref(Expr.Ref ref) {
        return values.applyAsDouble(ref.var());
    }

    @Override public Double bin(Expr.Bin bin) {
        double a = bin.left().accept(this);
        double b = bin.right().accept(this);
        if (bin.op() == Op.DIV && b == 0.0) throw new EvaluationException(stepId, "division by zero");
        return bin.op().apply(a, b);
    }

    @Override public Double call(Expr.Call call) {
        double x = call.arg().accept(this);
        if (call.fn() == Fn.SQRT && x < 0) {
            throw new EvaluationException(stepId, "square root of a negative number (" + x + ")");
        }
        if (call.fn() == Fn.LN && x <= 0) {
            throw new EvaluationException(stepId, "logarithm of a non-positive number (" + x + ")");
        }
        return call.fn().apply(x);
    }
}
