package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.SQRT3;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import java.util.ArrayList;
import java.util.List;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** Board demand: per-phase sums of P and Q with diversity, phase currents, neutral current. */
public final class DemandFormulas {
    private DemandFormulas() {}

    public static final Var D = var("d", "d", NONE);
    public static final Var P = var("P", "P", KW);
    public static final Var Q = var("Q", "Q", KVAR);
    public static final Var S = var("S", "S", KVA);
    public static final Var U0 = var("U0", "U_0", V);
    public static final Var P1 = var("P1", "P_L1", KW);
    public static final Var P2 = var("P2", "P_L2", KW);
    public static final Var P3 = var("P3", "P_L3", KW);
    public static final Var Q1 = var("Q1", "Q_L1", KVAR);
    public static final Var Q2 = var("Q2", "Q_L2", KVAR);
    public static final Var Q3 = var("Q3", "Q_L3", KVAR);

    /**
     * The diversified sum of n terms, d · (x₁ + … + xₙ). Built per board for its number of
     * circuits; the same tree gives the value and the shown working.
     */
    public static Formula diversifiedSum(String title, String symbol, String unit, List<Var> terms) {
        if (terms.isEmpty()) throw new IllegalArgumentException("a sum needs at least one term");
        Expr sum = v(terms.get(0));
        for (int i = 1; i < terms.size(); i++) sum = add(sum, v(terms.get(i)));
        return new Formula("diversified-sum", title, symbol, unit, mul(v(D), sum),
                "Complex sum of downstream demand (P and Q summed separately) with the board's diversity factor");
    }

    /** The plain sum of n terms, x₁ + … + xₙ. */
    public static Formula sum(String id, String title, String symbol, String unit, List<Var> terms, String reference) {
        if (terms.isEmpty()) throw new IllegalArgumentException("a sum needs at least one term");
        Expr sum = v(terms.get(0));
        for (int i = 1; i < terms.size(); i++) sum = add(sum, v(terms.get(i)));
        return new Formula(id, title, symbol, unit, sum, reference);
    }

    /** Term variables named after the circuits that supply them. */
    public static List<Var> terms(String prefix, List<String> names, String unit) {
        List<Var> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) out.add(var(prefix + i, prefix + "(" + names.get(i) + ")", unit));
        return out;
    }

    public static final Formula APPARENT = new Formula("apparent-power", "Apparent power", "S", KVA,
            sqrt(add(sq(v(P)), sq(v(Q)))), "S = √(P² + Q²)");

    public static final Formula PHASE_CURRENT = new Formula("phase-current", "Phase current", "I", A,
            div(mul(n(1000), v(S)), v(U0)), "I = S / U0 per phase");

    public static final Var U = var("U", "U", V);

    /** Balanced board: the per-phase third of a three-phase demand, I = S / (√3 · U). */
    public static final Formula PHASE_CURRENT_BALANCED = new Formula("phase-current-balanced", "Phase current", "I", A,
            div(mul(SQRT3, n(1000), v(S)), v(U)), "I = √3 · S_k / U for a balanced board (S_k = S/3), the same as S / (√3 · U)");

    public static final Formula POWER_FACTOR = new Formula("power-factor", "Power factor", "cos φ", NONE,
            div(v(P), v(S)), "cos φ = P / S");

    /**
     * Neutral current of a three-phase, four-wire supply: the phasor sum of the three line
     * currents, phase voltages at 0°, −120° and +120°. Written out in real and imaginary parts so
     * that the working can be followed by hand.
     */
    private static final Expr NEUTRAL_REAL =
            add(sub(v(P1), div(add(v(P2), v(P3)), n(2))), mul(div(SQRT3, n(2)), sub(v(Q3), v(Q2))));
    private static final Expr NEUTRAL_IMAGINARY =
            add(sub(div(add(v(Q2), v(Q3)), n(2)), v(Q1)), mul(div(SQRT3, n(2)), sub(v(P3), v(P2))));

    public static final Formula NEUTRAL_CURRENT = new Formula("neutral-current", "Neutral current", "I_N", A,
            div(mul(n(1000), sqrt(add(sq(NEUTRAL_REAL), sq(NEUTRAL_IMAGINARY)))), v(U0)),
            "Phasor sum of the line currents I_Lk = (P_k − jQ_k)/U0 rotated to 0°, −120°, +120° (fundamental only)");
}
