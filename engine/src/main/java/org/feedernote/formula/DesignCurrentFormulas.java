package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.SQRT3;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import org.feedernote.expr.Var;

/** Design current and load power: single-phase, three-phase and motors. */
public final class DesignCurrentFormulas {
    private DesignCurrentFormulas() {}

    private static final String IEC_60364_4_43 = "IEC 60364-4-43:2008, 433.1 (design current); a.c. power relations, common practice";

    public static final Var P = var("P", "P", KW);
    public static final Var P_OUT = var("P_out", "P_out", KW);
    public static final Var ETA = var("eta", "η", NONE);
    public static final Var S = var("S", "S", KVA);
    public static final Var Q = var("Q", "Q", KVAR);
    public static final Var COS_PHI = var("cos_phi", "cos φ", NONE);
    public static final Var U_LINE = var("U", "U", V);
    public static final Var U_PHASE = var("U0", "U_0", V);
    public static final Var I = var("I", "I", A);
    public static final Var K_ST = var("k_st", "k_st", NONE);
    public static final Var I_B = var("I_b", "I_b", A);

    public static final Formula MOTOR_INPUT_POWER = new Formula("motor-input-power",
            "Motor input power", "P", KW, div(v(P_OUT), v(ETA)),
            "Motor input power from rated output and efficiency (IEC 60034-2-1 definition of efficiency)");

    public static final Formula THREE_PHASE_FROM_POWER = new Formula("ib-3ph-power",
            "Design current", "I_b", A,
            div(mul(n(1000), v(P)), mul(SQRT3, v(U_LINE), v(COS_PHI))), IEC_60364_4_43);

    public static final Formula SINGLE_PHASE_FROM_POWER = new Formula("ib-1ph-power",
            "Design current", "I_b", A,
            div(mul(n(1000), v(P)), mul(v(U_PHASE), v(COS_PHI))), IEC_60364_4_43);

    public static final Formula THREE_PHASE_FROM_APPARENT = new Formula("ib-3ph-apparent",
            "Design current", "I_b", A,
            div(mul(n(1000), v(S)), mul(SQRT3, v(U_LINE))), IEC_60364_4_43);

    public static final Formula SINGLE_PHASE_FROM_APPARENT = new Formula("ib-1ph-apparent",
            "Design current", "I_b", A,
            div(mul(n(1000), v(S)), v(U_PHASE)), IEC_60364_4_43);

    public static final Formula ACTIVE_FROM_APPARENT = new Formula("p-from-s",
            "Active power", "P", KW, mul(v(S), v(COS_PHI)), "P = S · cos φ");

    public static final Formula REACTIVE_FROM_ACTIVE = new Formula("q-from-p",
            "Reactive power", "Q", KVAR,
            div(mul(v(P), sqrt(sub(n(1), sq(v(COS_PHI))))), v(COS_PHI)), "Q = P · tan φ");

    public static final Formula APPARENT_THREE_PHASE_FROM_CURRENT = new Formula("s-3ph-current",
            "Apparent power", "S", KVA, div(mul(SQRT3, v(U_LINE), v(I)), n(1000)), "S = √3 · U · I");

    public static final Formula APPARENT_SINGLE_PHASE_FROM_CURRENT = new Formula("s-1ph-current",
            "Apparent power", "S", KVA, div(mul(v(U_PHASE), v(I)), n(1000)), "S = U0 · I");

    public static final Formula STARTING_CURRENT = new Formula("motor-starting-current",
            "Motor starting current", "I_st", A, mul(v(K_ST), v(I_B)),
            "Starting current as a multiple of full-load current (motor data)");
}
