package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import org.feedernote.expr.Var;

/** Voltage drop: the approximate and the exact phasor forms, percentages, motor starting. */
public final class VoltageDropFormulas {
    private VoltageDropFormulas() {}

    private static final String APPROX = "IEC 60364-5-52:2009, Annex G (u = b(ρ_1 L/S · cos φ + λ L · sin φ) I_B); BS 7671:2018 Appendix 4, 6.4";

    public static final Var R = var("r", "r", MV_PER_AM);
    public static final Var X = var("x", "x", MV_PER_AM);
    public static final Var Z = var("z", "z", MV_PER_AM);
    public static final Var COS_PHI = var("cos_phi", "cos φ", NONE);
    public static final Var SIN_PHI = var("sin_phi", "sin φ", NONE);
    public static final Var I = var("I", "I_b", A);
    public static final Var L = var("L", "L", M);
    public static final Var U_N = var("U_n", "U_n", V);
    public static final Var DU = var("dU", "ΔU", V);
    public static final Var I_ST = var("I_st", "I_st", A);
    public static final Var I_B = var("I_b", "I_b", A);
    public static final Var DU_PCT = var("dU_pct", "ΔU", PERCENT);

    public static final Formula SIN_FROM_COS = new Formula("sin-phi", "Sine of the phase angle", "sin φ", NONE,
            sqrt(sub(n(1), sq(v(COS_PHI)))), "sin φ = √(1 − cos² φ)");

    public static final Formula APPROXIMATE = new Formula("du-approx", "Voltage drop", "ΔU", V,
            div(mul(add(mul(v(R), v(COS_PHI)), mul(v(X), v(SIN_PHI))), v(I), v(L)), n(1000)), APPROX);

    public static final Formula UNKNOWN_POWER_FACTOR = new Formula("du-z", "Voltage drop", "ΔU", V,
            div(mul(v(Z), v(I), v(L)), n(1000)),
            "BS 7671:2018 Appendix 4, 6.4 (z used where the power factor is not known)");

    /**
     * Exact drop with the sending-end voltage held at U_n: |U_s| = |U_r + I·Z| solved for U_r.
     * Written in line quantities for three-phase circuits (r, x line-to-line) and in phase
     * quantities for single-phase ones; the relation is the same.
     */
    public static final Formula EXACT = new Formula("du-exact", "Voltage drop, exact phasor form", "ΔU", V,
            add(sub(v(U_N), sqrt(sub(sq(v(U_N)),
                            sq(div(mul(v(I), v(L), sub(mul(v(X), v(COS_PHI)), mul(v(R), v(SIN_PHI)))), n(1000)))))),
                    div(mul(v(I), v(L), add(mul(v(R), v(COS_PHI)), mul(v(X), v(SIN_PHI)))), n(1000))),
            "Phasor relation U_s = U_r + I·(R + jX), sending end at nominal voltage (circuit theory, common practice)");

    public static final Formula PERCENT_OF_NOMINAL = new Formula("du-percent", "Voltage drop in per cent of nominal", "ΔU", PERCENT,
            div(mul(n(100), v(DU)), v(U_N)), "Per cent of the nominal voltage (line for three-phase, phase for single-phase)");

    public static final Var COS_ST = var("cos_phi_st", "cos φ_st", NONE);
    public static final Var SIN_ST = var("sin_phi_st", "sin φ_st", NONE);

    public static final Formula SIN_FROM_COS_STARTING = new Formula("sin-phi-st", "Sine of the starting phase angle", "sin φ_st", NONE,
            sqrt(sub(n(1), sq(v(COS_ST)))), "sin φ = √(1 − cos² φ)");

    public static final Formula MOTOR_STARTING = new Formula("du-start", "Voltage drop while the motor starts", "ΔU_st", V,
            div(mul(add(mul(v(R), v(COS_ST)), mul(v(X), v(SIN_ST))), v(I_ST), v(L)), n(1000)), APPROX + ", at the starting current and power factor");

    public static final Formula STARTING_INCREMENT = new Formula("du-start-increment", "Added drop in the feeder while the motor starts", "ΔU_st", PERCENT,
            div(mul(n(100), add(mul(v(R), v(COS_ST)), mul(v(X), v(SIN_ST))), sub(v(I_ST), v(I_B)), v(L)), mul(n(1000), v(U_N))),
            "Starting current in excess of the running current, at the starting power factor (common practice, no source)");

    public static final Var R_S = var("R_s", "R_s", OHM);
    public static final Var X_S = var("X_s", "X_s", OHM);
    public static final Var U_0 = var("U_0", "U_0", V);

    /**
     * The dip across the source (transformer or network) while a motor starts: the whole starting
     * current flows through it, and the origin is at U_n before the motor starts. R_s and X_s are
     * per phase for a three-phase motor, the line-neutral loop for a single-phase one; either way
     * the drop is referred to U_0 (IEC 60364-5-52 Annex G's Δu = 100 u / U_0, with b = 1).
     */
    public static final Formula SOURCE_STARTING = new Formula("du-start-source", "Dip across the source while the motor starts", "ΔU_st", PERCENT,
            div(mul(n(100), add(mul(v(R_S), v(COS_ST)), mul(v(X_S), v(SIN_ST))), v(I_ST)), v(U_0)),
            "IEC 60364-5-52:2009, Annex G (u = b(R cos φ + X sin φ) I_B, Δu = 100 u/U_0, b = 1), with the source impedance of IEC 60909-0:2016, 6.2 and 6.3.1, at the starting current and power factor");
}
