package org.feedernote.formula;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** Shorthand for writing catalogue formulas. */
final class Sym {
    private Sym() {}

    static Var var(String key, String symbol, String unit) {
        return new Var(key, symbol, unit);
    }

    static final Expr SQRT3 = Expr.sqrt(Expr.n(3));
    static final Expr PI = new Expr.Num(Math.PI, "π");
    static final Expr CBRT2 = new Expr.Num(Math.cbrt(2), "³√2");
}
