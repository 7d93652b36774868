package org.feedernote.expr;

import java.util.Map;

/** Evaluates an expression tree against bound values; every failure is loud and names the step. */
public final class Evaluator {
    private Evaluator() {}

    /**
     * Evaluates a tree against values bound by variable key (for re-checking a recorded step from
     * its bindings): the same compiled evaluation the formulas use.
     */
    public static double evaluate(Expr expr, Map<String, Double> values, String stepId) {
        java.util.List<Var> vars = new java.util.ArrayList<>();
        collect(expr, vars);
        double[] bound = new double[vars.size()];
        for (int i = 0; i < bound.length; i++) {
            Double d = values.get(vars.get(i).key());
            if (d == null) throw new EvaluationException(stepId, "symbol " + vars.get(i).symbol() + " is not bound");
            bound[i] = d;
        }
        return compile(expr, vars).evaluate(bound, stepId, "");
    }

    private static void collect(Expr e, java.util.List<Var> vars) {
        if (e instanceof Expr.Bin bin) {
            collect(bin.left(), vars);
            collect(bin.right(), vars);
        } else if (e instanceof Expr.Call call) {
            collect(call.arg(), vars);
        } else if (e instanceof Expr.Ref ref && !vars.contains(ref.var())) {
            vars.add(ref.var());
        }
    }

    /**
     * The tree made ready for evaluation against an array of values, one per variable in the order
     * given: references become array indices, so an evaluation allocates nothing.
     */
    public static Compiled compile(Expr expr, java.util.List<Var> vars) {
        // Slots by variable, found once: a board's phase sum has a term per circuit of the board.
        Map<Var, Integer> slots = new java.util.HashMap<>();
        for (int i = 0; i < vars.size(); i++) slots.putIfAbsent(vars.get(i), i);
        return new Compiled(node(expr, slots));
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

    private static Node node(Expr e, Map<Var, Integer> slots) {
        if (e instanceof Expr.Bin bin) {
            Node left = node(bin.left(), slots);
            Node right = node(bin.right(), slots);
            // A node class per operator: the operation is written in the node rather than called
            // through the operator's function object, one dispatch fewer per node. Each computes
            // exactly what Op.apply computes for its operator (OperatorNodesTest holds them to it).
            return switch (bin.op()) {
                case ADD -> new Node() {
                    @Override double value(double[] values, String owner, String step) {
                        return left.value(values, owner, step) + right.value(values, owner, step);
                    }
                };
                case SUB -> new Node() {
                    @Override double value(double[] values, String owner, String step) {
                        return left.value(values, owner, step) - right.value(values, owner, step);
                    }
                };
                case MUL -> new Node() {
                    @Override double value(double[] values, String owner, String step) {
                        return left.value(values, owner, step) * right.value(values, owner, step);
                    }
                };
                case DIV -> new Node() {
                    @Override double value(double[] values, String owner, String step) {
                        double a = left.value(values, owner, step);
                        double b = right.value(values, owner, step);
                        if (b == 0.0) throw new EvaluationException(owner + step, "division by zero");
                        return a / b;
                    }
                };
                case POW, MAX -> {
                    Op op = bin.op();
                    yield new Node() {
                        @Override double value(double[] values, String owner, String step) {
                            double a = left.value(values, owner, step);
                            return op.apply(a, right.value(values, owner, step));
                        }
                    };
                }
            };
        }
        if (e instanceof Expr.Ref ref) {
            Integer slot = slots.get(ref.var());
            if (slot == null) throw new IllegalArgumentException(ref.var().symbol() + " is not among the variables given");
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
        Node arg = node(call.arg(), slots);
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
