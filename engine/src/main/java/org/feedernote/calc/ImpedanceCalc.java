package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;
import static org.feedernote.formula.ImpedanceFormulas.*;

import org.feedernote.data.DataGapException;
import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Units;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.Formation;
import org.feedernote.model.Method;
import org.feedernote.trace.TableRef;
import org.feedernote.trace.Q;
import org.feedernote.trace.Trace;

/**
 * Cable impedance derived from published physics: IEC 60228 resistance at 20 °C, corrected to the
 * conductor temperature, with skin and proximity effect (IEC 60287-1-1; two conductors for a
 * single-phase circuit, three otherwise) from 50 mm², and the reactance from the geometry of the
 * formation: the stranded conductor's diameter and inductance constant by its number of wires, and
 * a three-phase flat group taken between its outer phases, the largest of its three drops.
 */
final class ImpedanceCalc {
    /** Below this size the a.c. increment (y_s + y_p) stays under 0.2 % and is neglected. */
    static final double AC_EFFECT_FROM_MM2 = 50;

    private final ReferenceData data;

    ImpedanceCalc(ReferenceData data) {
        this.data = data;
    }

    /**
     * @param theta the conductor temperature to use (already decided and traced)
     * @param frequency the supply frequency step
     * @param phases 1 (two conductors) or 3 (line-to-line)
     */
    ImpedanceResult impedance(Trace t, String id, Cable cable, Q theta, Q frequency, int phases) {
        return impedance(t, id, cable, theta, frequency, phases, FlatPhases.OUTER_PAIR);
    }

    /**
     * How a three-phase flat group's unequal phases are summed up: the drop between the two outer
     * phases (the largest; what the design uses), or the mean of the three (for comparison with tables
     * that print the mean).
     */
    enum FlatPhases { OUTER_PAIR, MEAN }

    ImpedanceResult impedance(Trace t, String id, Cable cable, Q theta, Q frequency, int phases, FlatPhases flat) {
        double size = cable.size().mm2();
        Q r20 = data.resistance20(t, id, "/R20", cable.conductor(), size);
        Q alpha = data.alpha20(t, id, "/alpha20", cable.conductor());
        Q rTheta = RESISTANCE_AT_TEMPERATURE.eval(t, id, "/R_theta", "", bind(R20, r20), bind(ALPHA, alpha), bind(THETA, theta));

        Q area = Given.derived(t, id, "/S", "Nominal cross-section", "S", size, Units.MM2, "design input (cable.size_mm2)");
        Q wires = data.wireCount(t, id, "/n_w", size);
        Q dc = CONDUCTOR_DIAMETER.eval(t, id, "/dc", "", bind(S_AREA, area), bind(N_W, wires));
        Q ti = data.insulationThickness(t, id, "/t_i", cable.insulation(), size);
        Q spacing;
        Q gmd;
        if (cable.type() == CableType.MULTICORE && cable.formation() != null) {
            if (t.recording()) Given.note(t, id + "/formation", "Formation", "formation: " + cable.formation().token()
                    + " is given, but it applies to single-core cables; this multicore cable's geometry is that of its cores.", "");
        }
        if (cable.type() == CableType.SINGLE_CORE && cable.cores() > 0) {
            if (t.recording()) Given.note(t, id + "/cores", "Cores", "cores: " + cable.cores() + " is given, but it applies to multicore cables; ignored for single-core cables.", "");
        }
        if (cable.type() == CableType.MULTICORE) {
            spacing = CORE_SPACING.eval(t, id, "/s", "cores of a multicore cable", bind(DC, dc), bind(T_I, ti));
            gmd = Given.alias("s_g", spacing);
            if (t.recording()) Given.decision(t, id + "/gmd", "Geometric mean distance", "multicore cable: the cores sit at the corners of a triangle",
                    "s_g = s", "common practice", spacing.id());
        } else {
            Q du = DIAMETER_UNDER_SHEATH.eval(t, id, "/D_u", "", bind(DC, dc), bind(T_I, ti));
            Q ts = SHEATH_THICKNESS.eval(t, id, "/t_s", "", bind(D_U, du));
            Q de = CABLE_DIAMETER.eval(t, id, "/D_e", "", bind(D_U, du), bind(T_S, ts));
            Formation formation = cable.formation();
            spacing = formation == Formation.FLAT_SPACED
                    ? SPACING_SPACED.eval(t, id, "/s", "flat spaced", bind(D_E, de))
                    : SPACING_TOUCHING.eval(t, id, "/s", formation == Formation.TREFOIL ? "trefoil" : "flat touching", bind(D_E, de));
            if (phases == 3 && formation != Formation.TREFOIL) {
                gmd = flat == FlatPhases.MEAN
                        ? GMD_FLAT.eval(t, id, "/s_g", "flat formation, mean of the three phases", bind(S_AXIS, spacing))
                        : GMD_FLAT_OUTER.eval(t, id, "/s_g", "flat formation, between the outer phases", bind(S_AXIS, spacing));
                if (t.recording() && flat != FlatPhases.MEAN) Given.decision(t, id + "/flat", "Reactance of a flat group",
                        "the three phases of a flat group have unequal reactances; published mV/A/m tables take either the drop "
                                + "between the outer phases (the largest; BS 7671 Table 4D1B) or the mean of the three (Table 4E1B, some 25–30 % lower)",
                        "the outer phases' value is used for every flat group, on the safe side: it may exceed a table that prints the mean",
                        "common practice, no source", gmd.id());
            } else {
                gmd = Given.alias("s_g", spacing);
                if (t.recording()) Given.decision(t, id + "/gmd", "Geometric mean distance",
                        phases == 3 ? "trefoil: the three cables are equally spaced" : "single-phase: two conductors",
                        "s_g = s", "common practice", spacing.id());
            }
        }

        Q rAc;
        if (size >= AC_EFFECT_FROM_MM2) {
            Q ks = Given.lookup(t, data.skinCoefficient(id + "/k_s", cable.conductor()));
            Q kp = Given.lookup(t, data.proximityCoefficient(id + "/k_p", cable.conductor()));
            Q xs2 = SKIN_ARGUMENT.eval(t, id, "/xs2", "", bind(F, frequency), bind(K_S, ks), bind(R_THETA, rTheta));
            Q ys = SKIN_FACTOR.eval(t, id, "/ys", "", bind(XS2, xs2));
            Q xp2 = PROXIMITY_ARGUMENT.eval(t, id, "/xp2", "", bind(F, frequency), bind(K_P, kp), bind(R_THETA, rTheta));
            Q fp = PROXIMITY_BASE.eval(t, id, "/Fp", "", bind(XP2, xp2));
            Q yp = phases == 1
                    ? PROXIMITY_FACTOR_TWO.eval(t, id, "/yp", "two conductors", bind(FP, fp), bind(DC, dc), bind(S_AXIS, spacing))
                    : PROXIMITY_FACTOR.eval(t, id, "/yp", "three conductors", bind(FP, fp), bind(DC, dc), bind(S_AXIS, spacing));
            rAc = AC_RESISTANCE.eval(t, id, "/R_ac", "", bind(R_THETA, rTheta), bind(YS, ys), bind(YP, yp));
        } else {
            rAc = Given.alias("R_ac", rTheta);
            if (t.recording()) Given.decision(t, id + "/ac", "Skin and proximity effect",
                    "S = " + ReferenceData.sizeKey(size) + " mm² < " + ReferenceData.sizeKey(AC_EFFECT_FROM_MM2)
                            + " mm²: y_s + y_p stays below 0.2 %",
                    "neglected: R_ac = R_θ", "IEC 60287-1-1:2006, 2.1.2 and 2.1.4 (evaluated; negligible)", rTheta.id());
        }

        Q k = data.strandingConstant(t, id, "/K", wires);
        Q inductance = (cable.type() == CableType.MULTICORE ? INDUCTANCE_MULTICORE : INDUCTANCE_AT)
                .eval(t, id, "/L", "", bind(K_L, k), bind(S_G, gmd), bind(DC, dc));
        Q xPer = REACTANCE.eval(t, id, "/X1", "", bind(F, frequency), bind(L_IND, inductance));

        Q resistance;
        Q reactance;
        if (cable.parallel() > 1) {
            Q n = Given.derived(t, id, "/n", "Conductors in parallel per phase", "n", cable.parallel(), Units.NONE,
                    "design input (cable.parallel)");
            resistance = PARALLEL_RESISTANCE.eval(t, id, "/R", "", bind(R_AC, rAc), bind(N_PAR, n));
            reactance = PARALLEL_REACTANCE.eval(t, id, "/X", "", bind(X, xPer), bind(N_PAR, n));
        } else {
            resistance = Given.alias("R", rAc);
            reactance = Given.alias("X", xPer);
        }
        ImpedanceResult mv = mvPerAm(t, id, theta, resistance, reactance, phases);
        return new ImpedanceResult(mv.theta(), mv.resistance(), mv.reactance(), mv.r(), mv.x(), mv.z(), phases, r20, alpha);
    }

    /** The mV/A/m figures of a conductor impedance for single-phase or three-phase use. */
    ImpedanceResult mvPerAm(Trace t, String id, Q theta, Q resistance, Q reactance, int phases) {
        String tag = phases == 3 ? "3ph" : "1ph";
        Q r = (phases == 3 ? R_THREE_PHASE : R_SINGLE_PHASE).eval(t, id + "/r_" + tag, "", bind(R, resistance));
        Q x = (phases == 3 ? X_THREE_PHASE : X_SINGLE_PHASE).eval(t, id + "/x_" + tag, "", bind(X, reactance));
        Q z = Z_MV.eval(t, id + "/z_" + tag, "", bind(R_MV, r), bind(X_MV, x));
        return new ImpedanceResult(theta, resistance, reactance, r, x, z, phases, null, null);
    }

    /** A column of a voltage-drop table: the r and x columns of the CSV and the words that name it in the note. */
    record DropColumn(String r, String x, String label, String because) {}

    /**
     * The column of the table a cable's circuit reads: for single-core cables, by enclosure (reference
     * methods A and B, in conduit or trunking) and then by formation; for multicore cables, by phases.
     */
    static DropColumn dropColumn(Cable cable, Method method, int phases) {
        if (cable.type() == CableType.MULTICORE) {
            return phases == 3
                    ? new DropColumn("r3", "x3", "col. 4: three- or four-core cable, three-phase a.c.", "multicore cable, three-phase")
                    : new DropColumn("r1", "x1", "col. 3: two-core cable, single-phase a.c.", "multicore cable, single-phase");
        }
        boolean enclosed = method == Method.A1 || method == Method.A2 || method == Method.B1 || method == Method.B2;
        String how = "single-core cables, reference method " + method.token();
        Formation f = cable.formation();
        if (phases == 1) {
            if (enclosed) return new DropColumn("r1_enclosed", "x1_enclosed",
                    "col. 3: 2 cables, single-phase a.c., enclosed in conduit or trunking (methods A and B)", how + " (enclosed), single-phase");
            if (f == Formation.FLAT_SPACED) return new DropColumn("r1_spaced", "x1_spaced",
                    "col. 5: 2 cables, single-phase a.c., spaced", how + ", flat spaced, single-phase");
            return new DropColumn("r1_touching", "x1_touching", "col. 4: 2 cables, single-phase a.c., touching",
                    how + ", " + f.token() + ", single-phase (two cables: touching)");
        }
        if (enclosed) return new DropColumn("r3_enclosed", "x3_enclosed",
                "col. 6: 3 or 4 cables, three-phase a.c., enclosed in conduit or trunking (methods A and B)", how + " (enclosed), three-phase");
        if (f == Formation.TREFOIL) return new DropColumn("r3_trefoil", "x3_trefoil",
                "col. 7: 3 or 4 cables, three-phase a.c., touching, trefoil", how + ", trefoil, three-phase");
        if (f == Formation.FLAT_SPACED) return new DropColumn("r3_flat_spaced", "x3_flat_spaced",
                "col. 9: 3 or 4 cables, three-phase a.c., spaced, flat", how + ", flat spaced, three-phase");
        return new DropColumn("r3_flat_touching", "x3_flat_touching", "col. 8: 3 or 4 cables, three-phase a.c., touching, flat",
                how + ", flat touching, three-phase");
    }

    /**
     * The cable's r and x read from the BS 7671 Appendix 4 voltage-drop table of its insulation and
     * type (basis.impedance: tabulated), divided among cables in parallel; R and X per conductor read
     * back from them for the fault path's reactance and a single-phase motor's starting on a
     * three-phase feeder; R_20 and α_20 looked up for the fault path's resistances, which stay on IEC
     * 60228 (the tables give one a.c. figure at θ_max and none for the protective conductor).
     *
     * @param theta the table's conductor temperature (θ_max, already traced)
     */
    ImpedanceResult tabulated(Trace t, String id, Cable cable, Method method, Q theta, int phases) {
        double size = cable.size().mm2();
        boolean multicore = cable.type() == CableType.MULTICORE;
        String file = ReferenceData.dropTableFile(cable.insulation(), multicore);
        TableRef ref = data.dropTableRef(file);
        if (cable.conductor() != Conductor.COPPER) {
            throw new DataGapException(id + ": " + ref.citation() + " is for copper conductors; no mV/A/m table for "
                    + cable.conductor().token() + " conductors is packaged (basis.impedance: tabulated)");
        }
        DropColumn col = dropColumn(cable, method, phases);
        if (t.recording()) {
            Given.decision(t, id + "/table", "Voltage-drop table and column", "basis.impedance = tabulated; " + col.because()
                            + (multicore ? "; the input does not say whether the cable is armoured: the armoured multicore table is the one packaged" : ""),
                    ref.citation() + ", " + col.label(), "BS 7671:2018 Appendix 4, voltage-drop tables", theta.id());
        }
        String tag = phases == 3 ? "3ph" : "1ph";
        Q rT = data.dropPerAmpereMetre(t, id, "/r_tab", "Resistive voltage drop per ampere per metre, tabulated", "r_t", file, size,
                col.r(), col.label() + ", r");
        Q xT;
        if (size <= 16 && !data.hasDropFigure(file, size, col.x())) {
            xT = Given.derived(t, id, "/x_tab", "Reactive voltage drop per ampere per metre, tabulated", "x_t", 0, Units.MV_PER_AM,
                    ref.citation() + " prints one figure up to 16 mm², read as r; x is not tabulated and is taken as 0 (the drop is then r·cos φ·I·L)");
        } else {
            xT = data.dropPerAmpereMetre(t, id, "/x_tab", "Reactive voltage drop per ampere per metre, tabulated", "x_t", file, size,
                    col.x(), col.label() + ", x");
        }
        Q r;
        Q x;
        if (cable.parallel() > 1) {
            Q n = Given.derived(t, id, "/n", "Cables in parallel per phase", "n", cable.parallel(), Units.NONE, "design input (cable.parallel)");
            r = R_TABULATED_PARALLEL.eval(t, id, "/r_" + tag, "", bind(R_T, rT), bind(N_PAR, n));
            x = X_TABULATED_PARALLEL.eval(t, id, "/x_" + tag, "", bind(X_T, xT), bind(N_PAR, n));
        } else {
            r = Given.alias("r", rT);
            x = Given.alias("x", xT);
        }
        Q z = Z_MV.eval(t, id + "/z_" + tag, "", bind(R_MV, r), bind(X_MV, x));
        Q resistance = (phases == 3 ? R_CONDUCTOR_THREE_PHASE : R_CONDUCTOR_SINGLE_PHASE).eval(t, id, "/R", "", bind(R_MV, r));
        Q reactance = (phases == 3 ? X_CONDUCTOR_THREE_PHASE : X_CONDUCTOR_SINGLE_PHASE).eval(t, id, "/X", "", bind(X_MV, x));
        Q r20 = data.resistance20(t, id, "/R20", cable.conductor(), size);
        Q alpha = data.alpha20(t, id, "/alpha20", cable.conductor());
        if (t.recording()) {
            Given.decision(t, id + "/fault-basis", "Impedance for the fault path",
                    "the table gives one a.c. figure at θ_max for the line conductors and none for the protective conductor, while the fault "
                            + "currents need the resistances at 20 °C, at θ_max and at the final temperature, line and protective conductor alike",
                    "resistances R_1 and R_2 from IEC 60228 R_20 corrected with α_20, as with derived impedances (line and protective conductor "
                            + "from one source); reactance X per conductor from the table's x (X = x/" + (phases == 3 ? "√3" : "2") + ")",
                    "common practice, no source", r20.id(), reactance.id());
        }
        return new ImpedanceResult(theta, resistance, reactance, r, x, z, phases, r20, alpha);
    }
}
