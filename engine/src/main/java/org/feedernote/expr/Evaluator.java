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

    /**
     * The tree made ready for evaluation against an array of values, one per variable in the order
     * given: references become array indices, so an evaluation allocates nothing. Same operations
     * in the same order as {@link #evaluate(Expr, ToDoubleFunction, String)}, hence the same result.
     */
    public static Compiled compile(Expr expr, java.util.List<Var> vars) {
        return new Compiled(node(expr, vars));
    }

    public static final class Compiled {
        private final Node root;

        private Compiled(Node root) {
            this.root = root;
        }

        /**
         * @param values the value of each variable, in the order the tree was compiled with
         * @param owner  with step, the id of the step evaluated (joined only for a message)
         */
        public double evaluate(double[] values, String owner, String step) {
            double result = root.value(values, owner, step);
            if (!Double.isFinite(result)) {
                throw new EvaluationException(owner + step, "the result is not a finite number (" + result + ")");
            }
            return result;
        }
    }

    private abstract static class Node {
        abstract double value(double[] values, String owner, String step);
    }

    private static Node node(Expr e, java.util.List<Var> vars) {
        if (e instanceof Expr.Bin bin) {
            Node left = node(bin.left(), vars);
            Node right = node(bin.right(), vars);
            Op op = bin.op();
            return new Node() {
                @Override double value(double[] values, String owner, String step) {
                    double a = left.value(values, owner, step);
                    double b = right.value(values, owner, step);
                    if (op == Op.DIV && b == 0.0) throw new EvaluationException(owner + step, "division by zero");
                    return op.apply(a, b);
                }
            };
        }
        if (e instanceof Expr.Ref ref) {
            int slot = -1;
            for (int i = 0; i < vars.size(); i++) if (vars.get(i) == ref.var()) slot = i;
            if (slot < 0) throw new IllegalArgumentException(ref.var().symbol() + " is not among the variables given");
            int index = slot;
            return new Node() {
                @Override double value(double[] values, String owner, String step) { return values[index]; }
            };
        }
        if (e instanceof Expr.Num num) {
            double v = num.value();
            return new Node() {
                @Override double value(double[] values, String owner, String step) { return v; }
            };
        }
        if (!(e instanceof Expr.Call call)) throw new IllegalStateException("no evaluation for " + e);
        Node arg = node(call.arg(), vars);
        Fn fn = call.fn();
        return new Node() {
            @Override double value(double[] values, String owner, String step) {
                double x = arg.value(values, owner, step);
                if (fn == Fn.SQRT && x < 0 || fn == Fn.LN && x <= 0) checkArgument(fn, x, owner + step);
                return fn.apply(x);
            }
        };
    }

    private static void checkArgument(Fn fn, double x, String stepId) {
        if (fn == Fn.SQRT && x < 0) throw new EvaluationException(stepId, "square root of a negative number (" + x + ")");
        if (fn == Fn.LN && x <= 0) throw new EvaluationException(stepId, "logarithm of a non-positive number (" + x + ")");
    }
}
