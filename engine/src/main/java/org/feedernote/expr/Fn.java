package org.feedernote.expr;

import java.util.function.DoubleUnaryOperator;

/** Functions of one argument, with their display prefix and evaluation side by side. */
public enum Fn {
    SQRT("√", Math::sqrt),
    LN("ln", Math::log);

    private final String shown;
    private final DoubleUnaryOperator eval;

    Fn(String shown, DoubleUnaryOperator eval) {
        this.shown = shown;
        this.eval = eval;
    }

    public String shown() { return shown; }
    public double apply(double x) { return eval.applyAsDouble(x); }
}
