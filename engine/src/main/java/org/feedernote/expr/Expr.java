package org.feedernote.expr;

/**
 * A formula's expression tree. The same tree is evaluated for the number and walked for the
 * shown working, so the two cannot drift apart.
 */
public sealed interface Expr permits Expr.Ref, Expr.Num, Expr.Bin, Expr.Call {

    /** One method per node kind: a new kind is a compile error in every visitor until handled. */
    interface Visitor<R> {
        R ref(Ref ref);
        R num(Num num);
        R bin(Bin bin);
        R call(Call call);
    }

    <R> R accept(Visitor<R> visitor);

    /** A reference to a named variable of the formula. */
    record Ref(Var var) implements Expr {
        public <R> R accept(Visitor<R> v) { return v.ref(this); }
    }

    /** A numeric constant, shown as written (for instance 1000 or 3). */
    record Num(double value, String shown) implements Expr {
        public <R> R accept(Visitor<R> v) { return v.num(this); }
    }

    /** A binary operation. */
    record Bin(Op op, Expr left, Expr right) implements Expr {
        public <R> R accept(Visitor<R> v) { return v.bin(this); }
    }

    /** A function of one argument (square root, natural logarithm). */
    record Call(Fn fn, Expr arg) implements Expr {
        public <R> R accept(Visitor<R> v) { return v.call(this); }
    }

    static Expr v(Var var) { return new Ref(var); }

    static Expr n(double value) {
        String shown = value == Math.rint(value) && Math.abs(value) < 1e15
                ? Long.toString((long) value) : Double.toString(value);
        return new Num(value, shown);
    }

    static Expr add(Expr a, Expr b) { return new Bin(Op.ADD, a, b); }
    static Expr sub(Expr a, Expr b) { return new Bin(Op.SUB, a, b); }
    static Expr mul(Expr a, Expr b) { return new Bin(Op.MUL, a, b); }
    static Expr mul(Expr a, Expr b, Expr... more) {
        Expr e = mul(a, b);
        for (Expr m : more) e = mul(e, m);
        return e;
    }
    static Expr div(Expr a, Expr b) { return new Bin(Op.DIV, a, b); }
    static Expr pow(Expr a, Expr b) { return new Bin(Op.POW, a, b); }
    static Expr sq(Expr a) { return pow(a, n(2)); }
    static Expr sqrt(Expr a) { return new Call(Fn.SQRT, a); }
    static Expr ln(Expr a) { return new Call(Fn.LN, a); }
    static Expr max(Expr a, Expr b) { return new Bin(Op.MAX, a, b); }
}
