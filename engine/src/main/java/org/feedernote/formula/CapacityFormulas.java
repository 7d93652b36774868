package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import java.util.List;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** Current-carrying capacity, correction factors, device coordination. */
public final class CapacityFormulas {
    private CapacityFormulas() {}

    public static final Var I_T = var("I_t", "I_t", A);
    public static final Var C = var("C", "C", NONE);
    public static final Var N = var("n", "n", NONE);
    public static final Var I_B = var("I_b", "I_b", A);
    public static final Var H = var("h", "h", PERCENT);
    public static final Var K2 = var("k2", "k_2", NONE);
    public static final Var I_N = var("I_n", "I_n", A);
    public static final Var I_Z = var("I_z", "I_z", A);

    /** The product of the correction factors that apply, C = C_a · C_g · …; built per circuit. */
    public static Formula correctionProduct(List<Var> factors) {
        if (factors.isEmpty()) throw new IllegalArgumentException("no factors");
        Expr e = v(factors.get(0));
        for (int i = 1; i < factors.size(); i++) e = mul(e, v(factors.get(i)));
        return new Formula("correction-product", "Combined correction factor", "C", NONE, e,
                "IEC 60364-5-52:2009, 523 and Annex B (factors applied together)");
    }

    public static final Formula CAPACITY = new Formula("capacity", "Current-carrying capacity", "I_z", A,
            mul(v(I_T), v(C)), "IEC 60364-5-52:2009, 523 (I_z = I_t · C)");

    public static final Formula CAPACITY_PARALLEL = new Formula("capacity-parallel", "Current-carrying capacity, conductors in parallel", "I_z", A,
            mul(v(N), v(I_T), v(C)), "IEC 60364-5-52:2009, 523.7 (equal conductors in parallel)");

    public static final Formula NEUTRAL_FROM_HARMONICS = new Formula("neutral-harmonic", "Neutral current from third harmonics", "I_N", A,
            mul(n(3), div(v(H), n(100)), v(I_B)), "IEC 60364-5-52:2009, Annex E (third harmonics add in the neutral)");

    public static final Formula CONVENTIONAL_TRIPPING = new Formula("i2", "Conventional tripping current", "I_2", A,
            mul(v(K2), v(I_N)), "IEC 60364-4-43:2008, 433.1 (I_2, the current that ensures operation within the conventional time)");

    public static final Formula OVERLOAD_LIMIT = new Formula("overload-limit", "Overload limit", "I_ol", A,
            mul(new Expr.Num(1.45, "1.45"), v(I_Z)), "IEC 60364-4-43:2008, 433.1 (I_2 ≤ 1.45 · I_z)");
}
