package org.feedernote.expr;

import java.util.function.Function;

/**
 * Walks an expression tree into text. The caller decides how a variable is shown (its symbol,
 * or its value with unit); brackets follow from operator precedence.
 */
public final class Printer implements Expr.Visitor<String> {
    public enum Mode { SYMBOLIC, SUBSTITUTED }

    private final Mode mode;
    private final Function<Var, String> leaf;

    private Printer(Mode mode, Function<Var, String> leaf) {
        this.mode = mode;
        this.leaf = leaf;
    }

    public static String symbolic(Expr expr) {
        return expr.accept(new Printer(Mode.SYMBOLIC, Var::symbol));
    }

    public static String substituted(Expr expr, Function<Var, String> valueText) {
        return expr.accept(new Printer(Mode.SUBSTITUTED, valueText));
    }

    @Override public String num(Expr.Num num) { return num.shown(); }

    @Override public String ref(Expr.Ref ref) { return leaf.apply(ref.var()); }

    @Override public String call(Expr.Call call) {
        String arg = call.arg().accept(this);
        boolean bare = call.fn() == Fn.SQRT && call.arg() instanceof Expr.Num;
        return bare ? call.fn().shown() + arg : call.fn().shown() + "(" + arg + ")";
    }

    @Override public String bin(Expr.Bin bin) {
        Op op = bin.op();
        if (op == Op.MAX) {
            return "max(" + bin.left().accept(this) + ", " + bin.right().accept(this) + ")";
        }
        if (op == Op.POW) {
            String base = wrap(bin.left(), op.precedence(), true);
            String exponent = superscript(bin.right());
            return exponent != null ? base + exponent : base + "^" + wrap(bin.right(), op.precedence(), true);
        }
        String left = wrap(bin.left(), op.precedence(), false);
        String right = wrap(bin.right(), op.precedence(), op.rightNeedsTighter());
        return left + (mode == Mode.SYMBOLIC ? op.symbolic() : op.substituted()) + right;
    }

    private String wrap(Expr child, int parentPrecedence, boolean tighter) {
        String text = child.accept(this);
        if (child instanceof Expr.Bin b && b.op() != Op.MAX) {
            int p = b.op().precedence();
            if (p < parentPrecedence || (tighter && p == parentPrecedence)) return "(" + text + ")";
        }
        if (mode == Mode.SUBSTITUTED && child instanceof Expr.Ref && parentPrecedence >= Op.POW.precedence()) {
            return "(" + text + ")";
        }
        return text;
    }

    private static String superscript(Expr exponent) {
        if (exponent instanceof Expr.Num num) {
            if (num.value() == 2) return "²";
            if (num.value() == 3) return "³";
        }
        return null;
    }
}
