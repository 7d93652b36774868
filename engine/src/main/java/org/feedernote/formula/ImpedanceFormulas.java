package org.feedernote.formula;

import static org.feedernote.expr.Expr.*;
import static org.feedernote.formula.Sym.CBRT2;
import static org.feedernote.formula.Sym.PI;
import static org.feedernote.formula.Sym.SQRT3;
import static org.feedernote.formula.Sym.var;
import static org.feedernote.formula.Units.*;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;

/** Conductor resistance, a.c. effects, reactance from geometry, and the mV/A/m forms. */
public final class ImpedanceFormulas {
    private ImpedanceFormulas() {}

    private static final String IEC_60287_RESISTANCE = "IEC 60287-1-1:2006, 2.1.1 (R = R20·[1 + α20·(θ − 20)])";
    private static final String IEC_60287_SKIN = "IEC 60287-1-1:2006, 2.1.2 (skin effect factor)";
    private static final String IEC_60287_PROXIMITY = "IEC 60287-1-1:2006, 2.1.4 (proximity effect factor, three-core and three single-core cables)";
    private static final String INDUCTANCE = "L = K + 0.2·ln(2·s_g/d_c) mH/km per conductor, K by the number of wires: Electric Cables Handbook (BICC Cables, 3rd ed. 1997, edition recalled), inductance of cables";
    private static final String IEC_60287_PROXIMITY_TWO = "IEC 60287-1-1:2006, 2.1.4.1 (proximity effect factor, two-core cables and two single-core cables)";

    public static final Var R20 = var("R20", "R_20", OHM_PER_KM);
    public static final Var ALPHA = var("alpha20", "α_20", PER_K);
    public static final Var THETA = var("theta", "θ", DEG_C);
    public static final Var THETA_A = var("theta_a", "θ_a", DEG_C);
    public static final Var THETA_MAX = var("theta_max", "θ_max", DEG_C);
    public static final Var I_B = var("I_b", "I_b", A);
    public static final Var I_REF = var("I_ref", "I_z", A);
    public static final Var R_THETA = var("R_theta", "R_θ", OHM_PER_KM);
    public static final Var F = var("f", "f", HZ);
    public static final Var K_S = var("k_s", "k_s", NONE);
    public static final Var K_P = var("k_p", "k_p", NONE);
    public static final Var XS2 = var("xs2", "x_s²", NONE);
    public static final Var XP2 = var("xp2", "x_p²", NONE);
    public static final Var YS = var("ys", "y_s", NONE);
    public static final Var YP = var("yp", "y_p", NONE);
    public static final Var FP = var("Fp", "F_p", NONE);
    public static final Var DC = var("dc", "d_c", MM);
    public static final Var S_AXIS = var("s", "s", MM);
    public static final Var S_AREA = var("S", "S", MM2);
    public static final Var T_I = var("t_i", "t_i", MM);
    public static final Var T_S = var("t_s", "t_s", MM);
    public static final Var D_U = var("D_u", "D_u", MM);
    public static final Var D_E = var("D_e", "D_e", MM);
    public static final Var L_IND = var("L", "L", MH_PER_KM);
    public static final Var K_L = var("K", "K", MH_PER_KM);
    public static final Var N_W = var("n_w", "n_w", NONE);
    public static final Var R_AC = var("R_ac", "R_ac", OHM_PER_KM);
    public static final Var R = var("R", "R", OHM_PER_KM);
    public static final Var X = var("X", "X", OHM_PER_KM);
    public static final Var N_PAR = var("n", "n", NONE);
    public static final Var R_MV = var("r", "r", MV_PER_AM);
    public static final Var X_MV = var("x", "x", MV_PER_AM);

    public static final Formula RESISTANCE_AT_TEMPERATURE = new Formula("r-theta",
            "D.c. resistance at conductor temperature", "R_θ", OHM_PER_KM,
            mul(v(R20), add(n(1), mul(v(ALPHA), sub(v(THETA), n(20))))), IEC_60287_RESISTANCE);

    /**
     * Estimated operating temperature: the temperature rise above ambient grows with the square of
     * the current, reaching θ_max at the reference current.
     */
    public static final Formula ESTIMATED_TEMPERATURE = new Formula("theta-estimated",
            "Estimated conductor operating temperature", "θ", DEG_C,
            add(v(THETA_A), mul(sub(v(THETA_MAX), v(THETA_A)), sq(div(v(I_B), v(I_REF))))),
            "Temperature rise proportional to I² (IEC 60287-1-1:2006, 1.4 / 2.1; same relation as BS 7671:2018 Appendix 4, 6.1), from memory");

    private static Expr xSquared(Var k) {
        return div(mul(n(8), PI, v(F), new Expr.Num(1e-4, "0.0001"), v(k)), v(R_THETA));
    }

    public static final Formula SKIN_ARGUMENT = new Formula("xs2", "Skin effect argument", "x_s²", NONE,
            xSquared(K_S), IEC_60287_SKIN + "; R_θ in Ω/km");

    public static final Formula SKIN_FACTOR = new Formula("ys", "Skin effect factor", "y_s", NONE,
            div(sq(v(XS2)), add(n(192), mul(new Expr.Num(0.8, "0.8"), sq(v(XS2))))), IEC_60287_SKIN);

    public static final Formula PROXIMITY_ARGUMENT = new Formula("xp2", "Proximity effect argument", "x_p²", NONE,
            xSquared(K_P), IEC_60287_PROXIMITY + "; R_θ in Ω/km");

    public static final Formula PROXIMITY_BASE = new Formula("Fp", "Proximity effect base term", "F_p", NONE,
            div(sq(v(XP2)), add(n(192), mul(new Expr.Num(0.8, "0.8"), sq(v(XP2))))), IEC_60287_PROXIMITY);

    public static final Formula PROXIMITY_FACTOR = new Formula("yp", "Proximity effect factor", "y_p", NONE,
            mul(v(FP), sq(div(v(DC), v(S_AXIS))),
                    add(mul(new Expr.Num(0.312, "0.312"), sq(div(v(DC), v(S_AXIS)))),
                            div(new Expr.Num(1.18, "1.18"), add(v(FP), new Expr.Num(0.27, "0.27"))))),
            IEC_60287_PROXIMITY);

    public static final Formula PROXIMITY_FACTOR_TWO = new Formula("yp-two", "Proximity effect factor, two conductors", "y_p", NONE,
            mul(v(FP), sq(div(v(DC), v(S_AXIS))), new Expr.Num(2.9, "2.9")), IEC_60287_PROXIMITY_TWO);

    public static final Formula AC_RESISTANCE = new Formula("r-ac", "A.c. resistance", "R_ac", OHM_PER_KM,
            mul(v(R_THETA), add(add(n(1), v(YS)), v(YP))), "IEC 60287-1-1:2006, 2.1 (R = R′(1 + y_s + y_p))");

    /**
     * A concentric-lay conductor of n_w equal round wires has m = (√(12·n_w − 3) − 3)/6 layers
     * around its centre wire and a diameter of (2m + 1) wire diameters, i.e. √(12·n_w − 3)/3 of them.
     */
    public static final Formula CONDUCTOR_DIAMETER = new Formula("dc", "Diameter over the stranded conductor", "d_c", MM,
            mul(div(sqrt(sub(mul(n(12), v(N_W)), n(3))), n(3)), sqrt(div(mul(n(4), v(S_AREA)), mul(PI, v(N_W))))),
            "Concentric-lay stranding of n_w equal round wires of total area S: d_c = (√(12·n_w − 3)/3)·√(4S/(π·n_w)) "
                    + "(geometry; a compacted conductor is smaller, a manufacturer's data govern)");

    public static final Formula CORE_SPACING = new Formula("s-core", "Axial spacing of adjacent cores", "s", MM,
            add(v(DC), mul(n(2), v(T_I))), "Cores touching: s = d_c + 2·t_i");

    public static final Formula DIAMETER_UNDER_SHEATH = new Formula("d-under-sheath", "Diameter over insulation", "D_u", MM,
            add(v(DC), mul(n(2), v(T_I))), "D_u = d_c + 2·t_i");

    public static final Formula SHEATH_THICKNESS = new Formula("t-sheath", "Sheath thickness", "t_s", MM,
            max(new Expr.Num(1.4, "1.4"), add(mul(new Expr.Num(0.035, "0.035"), v(D_U)), n(1))),
            "IEC 60502-1:2004, 14.3 (t_s = 0.035·D + 1.0, at least 1.4 mm for single-core), from memory");

    public static final Formula CABLE_DIAMETER = new Formula("d-cable", "Overall diameter of a single-core cable", "D_e", MM,
            add(v(D_U), mul(n(2), v(T_S))), "D_e = D_u + 2·t_s");

    public static final Formula SPACING_TOUCHING = new Formula("s-touching", "Axial spacing, cables touching", "s", MM,
            v(D_E), "Trefoil or flat touching: s = D_e");

    public static final Formula SPACING_SPACED = new Formula("s-spaced", "Axial spacing, spaced one diameter", "s", MM,
            mul(n(2), v(D_E)),
            "Flat spaced: clearance of one cable diameter, as IEC 60364-5-52:2009, Table B.52.12 (spaced)");

    public static final Formula GMD_FLAT = new Formula("gmd-flat", "Geometric mean distance, flat formation", "s_g", MM,
            mul(CBRT2, v(S_AXIS)), "s_g = ³√(s · s · 2s) = ³√2 · s (common practice)");

    public static final Formula GMD_FLAT_OUTER = new Formula("gmd-flat-outer", "Equivalent spacing between the outer phases, flat formation", "s_g", MM,
            mul(n(2), v(S_AXIS)),
            "Flat group, not transposed: the drop between the two outer phases is that of a phase at spacing 2s, the largest "
                    + "of the three line-to-line drops (from the flux linkages of the three conductors; BS 7671:2018 Table 4D1B "
                    + "flat columns correspond to it, Table 4E1B to the mean ³√2·s)");

    public static final Var S_G = var("s_g", "s_g", MM);

    private static Expr inductance() {
        return add(v(K_L), mul(new Expr.Num(0.2, "0.2"), ln(div(mul(n(2), v(S_G)), v(DC)))));
    }

    public static final Formula INDUCTANCE_AT = new Formula("inductance", "Inductance per conductor", "L", MH_PER_KM,
            inductance(), INDUCTANCE);

    public static final Formula INDUCTANCE_MULTICORE = new Formula("inductance-multicore", "Inductance per conductor, multicore cable", "L", MH_PER_KM,
            mul(new Expr.Num(1.02, "1.02"), inductance()),
            INDUCTANCE + "; × 1.02 for 2-, 3- and 4-core cables with circular or sector-shaped conductors (same source)");

    public static final Formula REACTANCE = new Formula("reactance", "Reactance per conductor", "X", OHM_PER_KM,
            div(mul(n(2), PI, v(F), v(L_IND)), n(1000)), "X = 2π·f·L (L in mH/km)");

    public static final Formula PARALLEL_RESISTANCE = new Formula("r-parallel", "Resistance per phase, conductors in parallel", "R", OHM_PER_KM,
            div(v(R_AC), v(N_PAR)), "n equal conductors in parallel share the current equally (IEC 60364-5-52:2009, 523.7)");

    public static final Formula PARALLEL_REACTANCE = new Formula("x-parallel", "Reactance per phase, conductors in parallel", "X", OHM_PER_KM,
            div(v(X), v(N_PAR)), "n equal conductors in parallel share the current equally (IEC 60364-5-52:2009, 523.7)");

    private static final String MV_PER_AM_NOTE = "1 Ω/km = 1 mV/A/m; mV/A/m as in BS 7671:2018 Appendix 4 voltage-drop tables";

    public static final Formula R_THREE_PHASE = new Formula("r-3ph", "Resistive voltage drop per ampere per metre, three-phase (line-to-line)", "r", MV_PER_AM,
            mul(SQRT3, v(R)), MV_PER_AM_NOTE);
    public static final Formula X_THREE_PHASE = new Formula("x-3ph", "Reactive voltage drop per ampere per metre, three-phase (line-to-line)", "x", MV_PER_AM,
            mul(SQRT3, v(X)), MV_PER_AM_NOTE);
    public static final Formula R_SINGLE_PHASE = new Formula("r-1ph", "Resistive voltage drop per ampere per metre, single-phase (two conductors)", "r", MV_PER_AM,
            mul(n(2), v(R)), MV_PER_AM_NOTE);
    public static final Formula X_SINGLE_PHASE = new Formula("x-1ph", "Reactive voltage drop per ampere per metre, single-phase (two conductors)", "x", MV_PER_AM,
            mul(n(2), v(X)), MV_PER_AM_NOTE);
    public static final Formula Z_MV = new Formula("z", "Impedance voltage drop per ampere per metre", "z", MV_PER_AM,
            sqrt(add(sq(v(R_MV)), sq(v(X_MV)))), "z = √(r² + x²)");

    // ---------------- tabulated impedance (basis.impedance: tabulated) ----------------

    private static final String BS_7671_TABLES = "BS 7671:2018 Appendix 4 voltage-drop tables (mV/A/m per cable, at the maximum conductor operating temperature)";

    public static final Var R_T = var("r_t", "r_t", MV_PER_AM);
    public static final Var X_T = var("x_t", "x_t", MV_PER_AM);

    public static final Formula R_TABULATED_PARALLEL = new Formula("r-tabulated-parallel",
            "Resistive voltage drop per ampere per metre, cables in parallel", "r", MV_PER_AM,
            div(v(R_T), v(N_PAR)), BS_7671_TABLES + "; n equal cables in parallel share the current equally (IEC 60364-5-52:2009, 523.7)");

    public static final Formula X_TABULATED_PARALLEL = new Formula("x-tabulated-parallel",
            "Reactive voltage drop per ampere per metre, cables in parallel", "x", MV_PER_AM,
            div(v(X_T), v(N_PAR)), BS_7671_TABLES + "; n equal cables in parallel share the current equally (IEC 60364-5-52:2009, 523.7)");

    private static final String PER_CONDUCTOR = "the mV/A/m forms read backwards: a three-phase figure is √3 times, a single-phase one 2 times the "
            + "impedance of one conductor (1 mV/A/m = 1 Ω/km)";

    public static final Formula R_CONDUCTOR_THREE_PHASE = new Formula("r-conductor-3ph",
            "Resistance per conductor, from the three-phase figure", "R", OHM_PER_KM, div(v(R_MV), SQRT3), PER_CONDUCTOR);
    public static final Formula X_CONDUCTOR_THREE_PHASE = new Formula("x-conductor-3ph",
            "Reactance per conductor, from the three-phase figure", "X", OHM_PER_KM, div(v(X_MV), SQRT3), PER_CONDUCTOR);
    public static final Formula R_CONDUCTOR_SINGLE_PHASE = new Formula("r-conductor-1ph",
            "Resistance per conductor, from the single-phase figure", "R", OHM_PER_KM, div(v(R_MV), n(2)), PER_CONDUCTOR);
    public static final Formula X_CONDUCTOR_SINGLE_PHASE = new Formula("x-conductor-1ph",
            "Reactance per conductor, from the single-phase figure", "X", OHM_PER_KM, div(v(X_MV), n(2)), PER_CONDUCTOR);
}
