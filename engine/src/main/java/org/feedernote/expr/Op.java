package org.feedernote.expr;

import java.util.function.DoubleBinaryOperator;

/**
 * Binary operators. Display symbols, precedence and evaluation stand side by side so that a new
 * operator is one edit here and one case in the printer's switch (a compile error if missed).
 */
public enum Op {
    ADD(" + ", " + ", 1, false, (a, b) -> a + b),
    SUB(" − ", " − ", 1, true, (a, b) -> a - b),
    MUL(" · ", " × ", 2, false, (a, b) -> a * b),
    DIV(" / ", " / ", 2, true, (a, b) -> a / b),
    POW("^", "^", 3, true, Math::pow),
    MAX("max", "max", 4, false, Math::max);

    private final String symbolic;
    private final String substituted;
    private final int precedence;
    private final boolean rightNeedsTighter;
    private final DoubleBinaryOperator eval;

    Op(String symbolic, String substituted, int precedence, boolean rightNeedsTighter,
       DoubleBinaryOperator eval) {
        this.symbolic = symbolic;
        this.substituted = substituted;
        this.precedence = precedence;
        this.rightNeedsTighter = rightNeedsTighter;
        this.eval = eval;
    }

    public String symbolic() { return symbolic; }
    public String substituted() { return substituted; }
    public int precedence() { return precedence; }
    /** True where a right operand of equal precedence needs brackets (a − (b − c), a / (b · c)). */
    public boolean rightNeedsTighter() { return rightNeedsTighter; }
    public double apply(double a, double b) { return eval.applyAsDouble(a, b); }
}
