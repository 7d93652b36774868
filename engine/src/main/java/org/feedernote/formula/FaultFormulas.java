package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.SQRT3;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import java.util.List;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** Source impedance, fault currents, earth-fault loop, disconnection and adiabatic withstand. */
public final class FaultFormulas {
    private FaultFormulas() {}

    private static final String IEC_60909 = "IEC 60909-0:2016";

    public static final Var UK = var("uk", "u_k", PERCENT);
    public static final Var U = var("U", "U", V);
    public static final Var U0 = var("U0", "U_0", V);
    public static final Var SR = var("S_rT", "S_rT", KVA);
    public static final Var Z = var("Z", "Z", OHM);
    public static final Var R = var("R", "R", OHM);
    public static final Var X = var("X", "X", OHM);
    public static final Var XR = var("xr", "X/R", NONE);
    public static final Var C_MAX = var("c_max", "c_max", NONE);
    public static final Var C_MIN = var("c_min", "c_min", NONE);
    public static final Var IK = var("Ik", "I_k", KA);
    public static final Var ZE = var("Ze", "Z_e", OHM);
    public static final Var R_KM = var("R_km", "R", OHM_PER_KM);
    public static final Var X_KM = var("X_km", "X", OHM_PER_KM);
    public static final Var L = var("L", "L", M);
    public static final Var R20 = var("R20", "R_20", OHM_PER_KM);
    public static final Var ALPHA = var("alpha20", "α_20", PER_K);
    public static final Var THETA = var("theta", "θ", DEG_C);
    public static final Var N = var("n", "n", NONE);
    public static final Var ZS = var("Zs", "Z_s", OHM);
    public static final Var IA = var("Ia", "I_a", A);
    public static final Var MULT = var("m", "m", NONE);
    public static final Var IN = var("In", "I_n", A);
    public static final Var I_INST = var("Ii", "I_i", A);
    public static final Var IDN = var("Idn", "I_Δn", A);
    public static final Var RA = var("RA", "R_A", OHM);
    public static final Var K = var("K", "K", "A·√s/mm²");
    public static final Var BETA = var("beta", "β", DEG_C);
    public static final Var THETA_I = var("theta_i", "θ_i", DEG_C);
    public static final Var THETA_F = var("theta_f", "θ_f", DEG_C);
    public static final Var I = var("I", "I", A);
    public static final Var T = var("t", "t", S);
    public static final Var I2T = var("I2t", "I²t", "A²s");
    public static final Var KF = var("k", "k", "A·√s/mm²");
    public static final Var R1 = var("R1", "R_1", OHM);
    public static final Var R2 = var("R2", "R_2", OHM);
    public static final Var X_LOOP = var("Xloop", "X_loop", OHM);

    public static final Formula TRANSFORMER_IMPEDANCE = new Formula("z-transformer", "Transformer impedance", "Z_T", OHM,
            div(mul(div(v(UK), n(100)), sq(v(U))), mul(n(1000), v(SR))), IEC_60909 + ", 6.3.1, eq. (7) (S_rT in kVA)");

    public static final Formula NETWORK_IMPEDANCE = new Formula("z-network", "Network impedance at the origin", "Z_Q", OHM,
            div(mul(v(C_MAX), v(U)), mul(SQRT3, n(1000), v(IK))), IEC_60909 + ", 6.2, eq. (5) (I_k in kA)");

    public static final Formula RESISTANCE_FROM_XR = new Formula("r-from-xr", "Resistance from X/R", "R", OHM,
            div(v(Z), sqrt(add(n(1), sq(v(XR))))), "R = Z / √(1 + (X/R)²)");

    public static final Formula REACTANCE_FROM_XR = new Formula("x-from-xr", "Reactance from X/R", "X", OHM,
            mul(v(R), v(XR)), "X = R · (X/R)");

    public static final Formula HALF = new Formula("half-loop", "Phase impedance from the loop impedance", "Z", OHM,
            div(v(ZE), n(2)), "line and return path of equal impedance (common practice, no source)");

    public static final Formula DOUBLE = new Formula("double-phase", "Loop impedance from the phase impedance", "Z_e", OHM,
            mul(n(2), v(Z)), "line and return path of equal impedance (common practice, no source)");

    /** A run's resistance at a conductor temperature, in one step: the per-km value at θ times the length, over n in parallel. */
    public static final Formula RUN_RESISTANCE_AT = new Formula("r-run-at-theta", "Resistance of the run at temperature", "R", OHM,
            div(mul(v(R20), add(n(1), mul(v(ALPHA), sub(v(THETA), n(20)))), v(L)), mul(n(1000), v(N))),
            "IEC 60287-1-1:2006, 2.1.1 (R = R_20·[1 + α_20·(θ − 20)]) for the length L, n conductors in parallel");

    public static final Formula LENGTH_RESISTANCE = new Formula("r-length", "Resistance of the run", "R", OHM,
            div(mul(v(R_KM), v(L)), mul(n(1000), v(N))), "R = R′ · L / n (n conductors in parallel)");

    public static final Formula LENGTH_REACTANCE = new Formula("x-length", "Reactance of the run", "X", OHM,
            div(mul(v(X_KM), v(L)), n(1000)), "X = X′ · L (X′ per phase, parallel conductors included)");

    public static final Formula LOOP_REACTANCE = new Formula("x-loop", "Reactance of the loop", "X", OHM,
            div(mul(n(2), v(X_KM), v(L)), n(1000)), "outgoing and return conductor of the same geometry (common practice, no source)");

    public static final Formula MAGNITUDE = new Formula("z-magnitude", "Impedance magnitude", "|Z|", OHM,
            sqrt(add(sq(v(R)), sq(v(X)))), "|Z| = √(R² + X²)");

    /**
     * The earth-fault loop impedance at a circuit's far end in one step: the supply side's Z_e and
     * the cable's loop (R_1 + R_2 with the loop reactance) added as magnitudes, as the hand method does.
     */
    public static final Formula FAR_END_LOOP = new Formula("zs-far-end", "Earth-fault loop impedance at the far end", "Z_s", OHM,
            add(v(ZE), sqrt(add(sq(add(v(R1), v(R2))), sq(v(X_LOOP))))),
            "IEC 60364-4-41:2005, 411.4.4 (Z_s = Z_e + Z_loop), magnitudes added arithmetically (on the safe side)");

    public static final Formula THREE_PHASE_FAULT = new Formula("ik3", "Maximum three-phase fault current", "I_k3", KA,
            div(mul(v(C_MAX), v(U)), mul(SQRT3, v(Z), n(1000))), IEC_60909 + ", 7.1.1, eq. (29)");

    public static final Formula SINGLE_PHASE_FAULT = new Formula("ik1", "Maximum line-to-neutral fault current", "I_k1", KA,
            div(mul(v(C_MAX), v(U0)), mul(v(Z), n(1000))), IEC_60909 + ", c_max · U_0 / |Z_loop| (line-to-neutral loop)");

    public static final Formula MIN_EARTH_FAULT = new Formula("ief-min", "Minimum earth-fault current", "I_ef", A,
            div(mul(v(C_MIN), v(U0)), v(ZS)), IEC_60909 + ", c_min · U_0 / |Z_s| with conductors at the end-of-fault temperature");

    public static final Formula MAX_LOOP = new Formula("zs-max", "Maximum earth-fault loop impedance", "Z_s,max", OHM,
            div(mul(v(C_MIN), v(U0)), v(IA)), "IEC 60364-4-41:2005, 411.4.4 (Z_s · I_a ≤ U_0), with c_min = 0.95 as BS 7671:2018, Appendix 3");

    public static final Formula TRIP_MULTIPLE = new Formula("ia-multiple", "Current that operates the device within the time", "I_a", A,
            mul(v(MULT), v(IN)), "IEC 60898-1:2015, Table 7 (upper limit of the instantaneous tripping range)");

    public static final Formula MCCB_TRIP = new Formula("ia-mccb", "Current that operates the device within the time", "I_a", A,
            mul(new Expr.Num(1.2, "1.2"), v(I_INST)), "IEC 60947-2:2016, 8.3.3.1.2 (instantaneous setting, tolerance +20 %)");

    public static final Var I_SD = var("Isd", "I_sd", A);

    public static final Formula MCCB_SHORT_TIME_TRIP = new Formula("ia-mccb-sd", "Current that operates the short-time release within its delay", "I_a", A,
            mul(new Expr.Num(1.2, "1.2"), v(I_SD)), "IEC 60947-2:2016, 8.3.3.1.2 (short-time pick-up, tolerance +20 %; from memory)");

    public static final Formula RCD_TRIP = new Formula("ia-rcd", "Current that operates the RCD within 40 ms", "I_a", A,
            mul(n(5), v(IDN)), "IEC 61008-1 / IEC 61009-1 (operation at 5 I_Δn)");

    public static final Formula TOUCH_VOLTAGE = new Formula("tt-touch", "Touch voltage at the rated residual current", "U_L", V,
            mul(v(RA), v(IDN)), "IEC 60364-4-41:2005, 411.5.3 (R_A · I_Δn ≤ 50 V)");

    public static final Formula K_FACTOR = new Formula("k-factor", "Adiabatic factor", "k", "A·√s/mm²",
            mul(v(K), sqrt(ln(add(n(1), div(sub(v(THETA_F), v(THETA_I)), add(v(BETA), v(THETA_I))))))),
            "IEC 60364-5-54:2011, Annex A, formula (A.1)");

    public static final Formula ENERGY = new Formula("i2t", "Let-through energy (operation within t)", "I²t", "A²s",
            mul(sq(v(I)), v(T)), "IEC 60364-4-43:2008, 434.5.2 (I²t with t the operating time)");

    public static final Formula MIN_SIZE = new Formula("s-min", "Minimum cross-section for the let-through energy", "S_min", MM2,
            div(sqrt(v(I2T)), v(KF)), "IEC 60364-4-43:2008, 434.5.2 and IEC 60364-5-54:2011, 543.1.2 (S ≥ √(I²t) / k)");

    // ---- the MV network behind a transformer, and the transformer's correction factor ----

    public static final Var SKQ = var("SkQ", "S″_kQ", "MVA");
    public static final Var ZQ = var("ZQ", "Z_Qt", OHM);
    public static final Var XQ = var("XQ", "X_Qt", OHM);
    public static final Var XT = var("XT", "X_T", OHM);
    public static final Var XT_REL = var("xT", "x_T", NONE);
    public static final Var KT = var("KT", "K_T", NONE);

    public static final Formula NETWORK_FROM_POWER = new Formula("z-network-power", "MV network impedance referred to the LV side", "Z_Qt", OHM,
            div(mul(v(C_MAX), sq(v(U))), mul(n(1000000), v(SKQ))),
            IEC_60909 + ", 6.2, eq. (1) referred to the LV side through the rated voltage ratio (S″_kQ in MVA; from memory)");

    public static final Formula NETWORK_REACTANCE = new Formula("x-network", "MV network reactance", "X_Qt", OHM,
            mul(new Expr.Num(0.995, "0.995"), v(ZQ)), IEC_60909 + ", 6.2: X_Q = 0.995 Z_Q where R_Q is not known (from memory)");

    public static final Formula NETWORK_RESISTANCE = new Formula("r-network", "MV network resistance", "R_Qt", OHM,
            mul(new Expr.Num(0.1, "0.1"), v(XQ)), IEC_60909 + ", 6.2: R_Q = 0.1 X_Q where R_Q is not known (from memory)");

    public static final Formula RELATIVE_REACTANCE = new Formula("x-t-relative", "Relative reactance of the transformer", "x_T", NONE,
            div(mul(v(XT), n(1000), v(SR)), sq(v(U))), IEC_60909 + ", 6.3.3: x_T = X_T / (U_rT² / S_rT)");

    public static final Formula TRANSFORMER_CORRECTION = new Formula("k-t", "Impedance correction factor of the transformer", "K_T", NONE,
            div(mul(new Expr.Num(0.95, "0.95"), v(C_MAX)), add(n(1), mul(new Expr.Num(0.6, "0.6"), v(XT_REL)))),
            IEC_60909 + ", 6.3.3, eq. (12a) (network transformer; from memory)");

    public static final Formula CORRECTED = new Formula("z-corrected", "Corrected transformer impedance component", "Z_TK", OHM,
            mul(v(KT), v(Z)), IEC_60909 + ", 6.3.3: Z_TK = K_T · Z_T (for the maximum short-circuit currents)");

    public static final Formula TWO_THIRDS = new Formula("two-thirds", "Network share of the single-phase loop", "Z", OHM,
            div(mul(n(2), v(Z)), n(3)),
            "Dyn transformer: the network enters the positive and negative sequences only, the loop (2Z_1 + Z_0)/3 takes 2/3 of it (IEC 60909-0:2016, 7.1.2; from memory)");

    public static final Var IK_KA = var("Ik_kA", "I_k", KA);

    public static final Formula A_FROM_KA = new Formula("a-from-ka", "Fault current in A", "I", A, mul(n(1000), v(IK_KA)), "1 kA = 1000 A");

    /** Magnitudes added arithmetically, Z_s = Z_e + Z_loop: the hand method, never below the phasor sum. */
    public static Formula arithmeticSum(String title, String symbol, List<Var> terms) {
        Expr e = v(terms.get(0));
        for (int i = 1; i < terms.size(); i++) e = add(e, v(terms.get(i)));
        return new Formula("loop-sum", title, symbol, OHM, e,
                "IEC 60364-4-41:2005, 411.4.4 (Z_s = Z_e + Z_loop), magnitudes added arithmetically (on the safe side)");
    }

    /** A sum of n impedance components along a path. */
    public static Formula sum(String title, String symbol, List<Var> terms) {
        Expr e = v(terms.get(0));
        for (int i = 1; i < terms.size(); i++) e = add(e, v(terms.get(i)));
        return new Formula("impedance-sum", title, symbol, OHM, e, "impedances in series add (R and X separately)");
    }
}
