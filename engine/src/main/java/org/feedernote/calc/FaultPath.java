package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;
import static org.feedernote.formula.FaultFormulas.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.data.DeviceData;
import org.feedernote.data.FaultData;
import org.feedernote.data.FuseSystem;
import org.feedernote.formula.TermFormulas;
import org.feedernote.data.ReferenceData;
import org.feedernote.expr.Var;
import org.feedernote.formula.Units;
import org.feedernote.model.*;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * The fault path: source impedance, fault levels at every board (IEC 60909-0), earth-fault loop
 * impedance and disconnection (IEC 60364-4-41), adiabatic withstand of line and protective
 * conductors (IEC 60364-4-43 and 60364-5-54) and breaking capacity. Impedances are added as
 * resistance and reactance separately, each sum a traced step.
 */
final class FaultPath {
    private static final String T_INSTANT = "instantaneous region: operation within 0.1 s (IEC 60364-4-43:2008, 434.5.2)";

    private final Installation inst;
    private final ReferenceData data;
    private final FaultData faults;
    private final Withstand withstand;
    private final DeviceData devices;
    private final Q u;
    private final Q u0;
    private Q cmax;
    private Q cmin;
    private SourceImpedance source;
    private final List<Assumption> sourceAssumptions = new ArrayList<>();
    private final TermFormulas termFormulas;

    FaultPath(Installation inst, ReferenceData data, Q u, Q u0, TermFormulas termFormulas) {
        this.termFormulas = termFormulas;
        this.inst = inst;
        this.data = data;
        this.faults = new FaultData(data);
        this.devices = new DeviceData(data);
        this.withstand = new Withstand(faults, devices);
        this.u = u;
        this.u0 = u0;
    }

    /** The result for one circuit: its fault figures, its checks, and for a feeder the board it supplies. */
    record CircuitFault(Q prospective, Q zs, Q zsMax, Q iefMin, List<CheckResult> checks, BoardFault downstream,
                        List<CheckResult> boardChecks) {}

    /**
     * The source's impedance as a motor's starting current sees it: per phase (r, x) for a
     * three-phase motor, the line-neutral loop for a single-phase one; without the corrections
     * that belong to the maximum fault currents (K_T). basis says what it is made of.
     */
    record SourceImpedance(Q r, Q x, Q rLoop, Q xLoop, String basis) {}

    /** What the source's figures rest on that the input does not give, set by {@link #origin}. */
    List<Assumption> sourceAssumptions() {
        return List.copyOf(sourceAssumptions);
    }

    /** The source impedance for the starting dip, set by {@link #origin}. */
    SourceImpedance source() {
        return source;
    }

    private static Q rel(Q q, String symbol) {
        return q.as(symbol);
    }

    // Steps named by owner and part ("C-12/fault" and "/R12"), joined only where recorded or read.

    private Q series(Trace t, String owner, String part, String title, String symbol, Q... terms) {
        return add(t, owner, part, title, symbol, false, terms);
    }

    private Q loop(Trace t, String owner, String part, String title, String symbol, Q... terms) {
        return add(t, owner, part, title, symbol, true, terms);
    }

    private Q add(Trace t, String owner, String part, String title, String symbol, boolean magnitudes, Q... terms) {
        return termFormulas.eval(t, owner, part, "", magnitudes ? "loop-sum" : "impedance-sum", symbol, "z", Units.OHM, List.of(terms),
                vars -> magnitudes ? arithmeticSum(title, symbol, vars) : sum(title, symbol, vars));
    }

    private Q magnitude(Trace t, String owner, String part, String symbol, Q r, Q x) {
        return MAGNITUDE.evalAs(symbol, t, owner, part, "", bind(R, r), bind(X, x));
    }

    // ---------------- the origin ----------------

    BoardFault origin(Trace t, String board) {
        Basis b = inst.basis();
        cmax = Given.setting(t, "fault/c_max", "Voltage factor for maximum fault currents", "c_max", b.voltageFactorMax(), Units.NONE,
                "IEC 60909-0:2016, Table 1 (low voltage, tolerance +10 %)");
        cmin = Given.setting(t, "fault/c_min", "Voltage factor for minimum fault currents", "c_min", b.voltageFactorMin(), Units.NONE,
                "IEC 60909-0:2016, Table 1 (low voltage)");
        String id = "fault/origin";
        Q r;
        Q x;
        Q rN = null;
        Q xN = null;
        Q ze;
        Supply.Source src = inst.supply().source();
        sourceAssumptions.clear();
        if (src instanceof Supply.Transformer tr) {
            if (tr.xrRatio() == null) sourceAssumptions.add(new Assumption("X/R of the transformer taken as 5 (fault levels, Z_e, the starting dip)",
                    "supply.source.transformer.x_r_ratio", false));
            if (tr.networkFaultLevelMva() == null) sourceAssumptions.add(new Assumption(
                    "the MV network taken as infinite: the largest fault currents, but Z_e and the starting dip without the network's share",
                    "supply.source.transformer.network_fault_level_mva", false));
            Q uk = Given.input(t, id + "/uk", "Transformer short-circuit impedance", "u_k", tr.impedancePercent(), Units.PERCENT,
                    "supply.source.transformer.impedance_percent");
            Q sr = Given.input(t, id + "/S_rT", "Transformer rating", "S_rT", tr.ratingKva(), Units.KVA, "supply.source.transformer.rating_kva");
            Q xr = Given.setting(t, id, "/xr", "X/R of the transformer", "X/R", new Setting<>(tr.xrRatio() == null ? 5.0 : tr.xrRatio(),
                    tr.xrRatio() != null, "supply.source.transformer.x_r_ratio"), Units.NONE, "assumption of this program: 5 (common practice, no source)");
            Q z = TRANSFORMER_IMPEDANCE.eval(t, id, "/Z_T", "", bind(UK, uk), bind(U, u), bind(SR, sr));
            Q rT = RESISTANCE_FROM_XR.evalAs("R_T", t, id, "/R_T", "", bind(Z, z), bind(XR, xr));
            Q xT = REACTANCE_FROM_XR.evalAs("X_T", t, id, "/X_T", "", bind(R, rT), bind(XR, xr));
            Q xRel = RELATIVE_REACTANCE.eval(t, id, "/x_T", "", bind(XT, xT), bind(SR, sr), bind(U, u));
            Q kT = TRANSFORMER_CORRECTION.eval(t, id, "/K_T", "", bind(C_MAX, cmax), bind(XT_REL, xRel));
            Q rTK = CORRECTED.evalAs("R_TK", t, id, "/R_TK", "resistance", bind(KT, kT), bind(Z, rel(rT, "R_T")));
            Q xTK = CORRECTED.evalAs("X_TK", t, id, "/X_TK", "reactance", bind(KT, kT), bind(Z, rel(xT, "X_T")));
            if (tr.networkFaultLevelMva() == null) {
                if (t.recording()) Given.decision(t, id + "/network", "MV network at the primary", "supply.source.transformer.network_fault_level_mva is not given",
                        "the network's impedance is neglected (an infinite network): the maximum fault currents are the largest possible for this transformer",
                        "IEC 60909-0:2016, 6.2", z.id());
                if (t.recording()) Given.decision(t, id + "/loop", "Loop impedance of the source", "a transformer at the origin (Dyn vector group, Z_0 ≈ Z_1)",
                        "the line-neutral loop for the maximum currents has the corrected impedance Z_TK; the earth-fault loop Z_e has Z_T, uncorrected",
                        "IEC 60909-0:2016, 6.3.3", z.id());
                r = rTK;
                x = xTK;
                rN = rTK;
                xN = xTK;
                ze = rel(z, "Z_e");
                source = new SourceImpedance(rT, xT, rT, xT, "the transformer's R_T and X_T (per phase; the line-neutral loop of a Dyn transformer is the same, Z_0 ≈ Z_1), without the correction K_T of the maximum fault currents");
            } else {
                Q skq = Given.input(t, id + "/SkQ", "Short-circuit power of the MV network at the primary", "S″_kQ", tr.networkFaultLevelMva(), "MVA",
                        "supply.source.transformer.network_fault_level_mva");
                Q zq = NETWORK_FROM_POWER.eval(t, id, "/Z_Qt", "", bind(C_MAX, cmax), bind(U, u), bind(SKQ, skq));
                Q xq = NETWORK_REACTANCE.eval(t, id, "/X_Qt", "", bind(ZQ, zq));
                Q rq = NETWORK_RESISTANCE.eval(t, id, "/R_Qt", "", bind(XQ, xq));
                if (t.recording()) Given.decision(t, id + "/loop", "Loop impedance of the source", "a Dyn transformer fed from an MV network of S″_kQ given",
                        "the three-phase path has Z_Qt + Z_TK; the single-phase loops take 2/3 of the network's impedance (the delta winding blocks its zero sequence)",
                        "IEC 60909-0:2016, 6.2, 6.3.3 and 7.1.2 (from memory)", z.id());
                r = series(t, id, "/R_src", "Resistance of the source, maximum currents", "R_Q + R_TK", rq, rTK);
                x = series(t, id, "/X_src", "Reactance of the source", "X_Q + X_TK", xq, xTK);
                Q rq23 = TWO_THIRDS.evalAs("R_Q,loop", t, id, "/R_Q_loop", "", bind(Z, rel(rq, "R_Qt")));
                Q xq23 = TWO_THIRDS.evalAs("X_Q,loop", t, id, "/X_Q_loop", "", bind(Z, rel(xq, "X_Qt")));
                rN = series(t, id, "/R_srcN", "Resistance of the source, line-neutral loop", "R_N", rq23, rTK);
                xN = series(t, id, "/X_srcN", "Reactance of the source, line-neutral loop", "X_N", xq23, xTK);
                Q rE = series(t, id, "/R_e", "Resistance of the source, earth-fault loop", "R_e", rq23, rT);
                Q xE = series(t, id, "/X_e", "Reactance of the source, earth-fault loop", "X_e", xq23, xT);
                ze = magnitude(t, id, "/Ze", "Z_e", rE, xE);
                Q rSt = series(t, id, "/R_src_st", "Resistance of the source, motor starting", "R_Q + R_T", rq, rT);
                Q xSt = series(t, id, "/X_src_st", "Reactance of the source, motor starting", "X_Q + X_T", xq, xT);
                source = new SourceImpedance(rSt, xSt, rE, xE, "the MV network's Z_Qt and the transformer's R_T and X_T (per phase; the line-neutral loop takes 2/3 of the network's impedance), without the correction K_T of the maximum fault currents");
            }
        } else {
            Supply.Utility ut = (Supply.Utility) src;
            if (ut.xrRatio() == null) sourceAssumptions.add(new Assumption("X/R of the network taken as 1 (fault levels, the starting dip)",
                    "supply.source.utility.x_r_ratio", false));
            if (ut.loopImpedanceOhm() == null) sourceAssumptions.add(new Assumption("Z_e taken as 2 · Z_Q, from the fault level",
                    "supply.source.utility.loop_impedance_ohm", false));
            if (ut.faultLevelKa() == null) sourceAssumptions.add(new Assumption("Z_Q taken as Z_e / 2, from the loop impedance (fault levels, the starting dip)",
                    "supply.source.utility.fault_level_ka", false));
            Q xr = Given.setting(t, id, "/xr", "X/R of the network", "X/R", new Setting<>(ut.xrRatio() == null ? 1.0 : ut.xrRatio(),
                    ut.xrRatio() != null, "supply.source.utility.x_r_ratio"), Units.NONE, "assumption of this program: 1 (common practice, no source)");
            Q zq;
            if (ut.faultLevelKa() != null) {
                Q ik = Given.input(t, id + "/Ik", "Prospective fault current at the origin", "I_k", ut.faultLevelKa(), Units.KA,
                        "supply.source.utility.fault_level_ka");
                zq = NETWORK_IMPEDANCE.eval(t, id, "/Z_Q", "", bind(C_MAX, cmax), bind(U, u), bind(IK, ik));
            } else {
                zq = null;
            }
            if (ut.loopImpedanceOhm() != null) {
                ze = Given.input(t, id + "/Ze", "External earth-fault loop impedance", "Z_e", ut.loopImpedanceOhm(), Units.OHM,
                        "supply.source.utility.loop_impedance_ohm");
            } else {
                ze = DOUBLE.eval(t, id, "/Ze", "no loop impedance given", bind(Z, zq));
            }
            if (zq == null) zq = HALF.evalAs("Z_Q", t, id, "/Z_Q", "no fault level given", bind(ZE, ze));
            r = RESISTANCE_FROM_XR.evalAs("R_Q", t, id, "/R_Q", "", bind(Z, zq), bind(XR, xr));
            x = REACTANCE_FROM_XR.evalAs("X_Q", t, id, "/X_Q", "", bind(R, r), bind(XR, xr));
        }
        if (!(src instanceof Supply.Transformer)) {
            Q zqLoop = DOUBLE.evalAs("Z_QN", t, id, "/Z_QN", "line-neutral loop of the network",
                    bind(Z, rel(magnitude(t, id, "/ZQ_mag", "Z_Q", r, x), "Z")));
            Q xr = rel(new Q(id + "/xr", "X/R", x.value() / r.value(), Units.NONE), "X/R");
            rN = RESISTANCE_FROM_XR.evalAs("R_QN", t, id, "/R_QN", "", bind(Z, zqLoop), bind(XR, xr));
            xN = REACTANCE_FROM_XR.evalAs("X_QN", t, id, "/X_QN", "", bind(R, rN), bind(XR, xr));
            source = new SourceImpedance(r, x, rN, xN, "the network's R_Q and X_Q (per phase) and its line-neutral loop R_QN and X_QN");
        }
        return atBoard(t, id, board, r, x, rN, xN, ze, ze);
    }

    private BoardFault atBoard(Trace t, String id, String board, Q r3, Q x3, Q rN, Q xN, Q ze, Q zeF) {
        Q z3 = magnitude(t, id, "/Z3", "|Z_3|", rel(r3, "R"), rel(x3, "X"));
        Q ik3 = THREE_PHASE_FAULT.evalAs("I_k3(" + board + ")", t, id, "/Ik3", "at board " + board, bind(C_MAX, cmax), bind(U, u),
                bind(Z, z3));
        Q zn = magnitude(t, id, "/ZN", "|Z_N|", rel(rN, "R"), rel(xN, "X"));
        Q ik1 = SINGLE_PHASE_FAULT.evalAs("I_k1(" + board + ")", t, id, "/Ik1", "at board " + board, bind(C_MAX, cmax), bind(U0, u0),
                bind(Z, zn));
        return new BoardFault(r3, x3, rN, xN, rel(ze, "Z_e(" + board + ")"), rel(zeF, "Z_ef(" + board + ")"), ik3, ik1);
    }

    /** A board's rated short-circuit withstand against the fault level, where a rating is given. */
    List<CheckResult> boardWithstand(Trace t, Board board, BoardFault at) {
        if (board.faultRatingKa() == null) return List.of();
        Q rating = Given.input(t, "fault/" + board.id() + "/Icw", "Rated short-circuit withstand of board " + board.id(), "I_cw",
                board.faultRatingKa(), Units.KA, board.where().path() + ".fault_rating_ka");
        Q ik = rel(at.ik3(), "I_k3");
        boolean pass = rating.value() >= ik.value() - 1e-12;
        if (t.recording()) t.add(new Step.Check("fault/" + board.id() + "/check", "Board withstand", "breaking-capacity", rating, "≥", ik, pass,
                "IEC 61439-1:2011, 9.3 (rated short-circuit withstand ≥ prospective fault current)"));
        return List.of(new CheckResult("breaking-capacity", "Board withstand", pass, rating.value(), ik.value(), Units.KA, true,
                "fault/" + board.id() + "/check"));
    }

    // ---------------- one circuit ----------------

    /** The symbols, step ids and forms of the conductor resistances at one temperature. */
    private record Temperature(String r1, String r2, String r1Step, String r2Step, String lineForm, String cpcForm) {}

    private static final Temperature AT_MAX = new Temperature("R_1", "R_2", "/R1", "/R2", "line, at θ_max", "cpc, at θ_max");
    private static final Temperature AT_FINAL = new Temperature("R_1f", "R_2f", "/R1f", "/R2f", "line, at θ_f", "cpc, at θ_f");

    /** R_1 and R_2 of the route at a temperature: line and protective conductor for the length. */
    private record Conductors(Q r1, Q r2) {}

    private Conductors conductors(Trace t, String id, Temperature at, Q theta, Q r20, Q cpc20, Q alpha, Q length, Q n) {
        Q r1 = RUN_RESISTANCE_AT.evalAs(at.r1(), t, id, at.r1Step(), at.lineForm(), bind(R20, r20), bind(ALPHA, alpha),
                bind(THETA, theta), bind(L, length), bind(N, n));
        Q r2 = RUN_RESISTANCE_AT.evalAs(at.r2(), t, id, at.r2Step(), at.cpcForm(), bind(R20, rel(cpc20, "R_20")), bind(ALPHA, alpha),
                bind(THETA, theta), bind(L, length), bind(N, n));
        return new Conductors(r1, r2);
    }

    /**
     * @param overloadProtected whether the circuit's own checks found the device protecting it
     *                          against overload (capacity and overload met): the condition of 435.1
     */
    CircuitFault circuit(Trace t, Circuit c, ImpedanceResult z, BoardFault at, Q length, Q in, int phases, Q thetaMax,
                         boolean overloadProtected) {
        String id = c.id() + "/fault";
        Cable cable = c.cable();
        Q n = Given.derived(t, id, "/n", "Conductors in parallel per phase", "n", cable.parallel(), Units.NONE,
                "design input (cable.parallel)");
        Q r20 = rel(z.r20(), "R_20");
        Q alpha = rel(z.alpha(), "α_20");
        Q xLoop = LOOP_REACTANCE.evalAs("X_loop", t, id, "/Xloop", "line and protective conductor", bind(X_KM, z.reactance()),
                bind(L, length));
        Q thetaF = faults.finalTemperature(t, id, "/theta_f", cable.insulation());
        Q cpc20 = data.resistance20(t, id, "/R20_cpc", cable.conductor(), cable.cpc().mm2());
        Conductors hot = conductors(t, id, AT_MAX, thetaMax, r20, cpc20, alpha, length, n);
        Conductors fin = conductors(t, id, AT_FINAL, thetaF, r20, cpc20, alpha, length, n);
        Q r1 = hot.r1();
        Q r2 = hot.r2();
        Q r1f = fin.r1();
        Q r2f = fin.r2();

        Q zs = FAR_END_LOOP.evalAs("Z_s", t, id, "/Zs", "at θ_max", bind(ZE, rel(at.ze(), "Z_e")), bind(R1, r1), bind(R2, r2),
                bind(X_LOOP, xLoop));
        Q zsf = FAR_END_LOOP.evalAs("Z_sf", t, id, "/Zsf", "at θ_f", bind(ZE, rel(at.zeF(), "Z_ef")), bind(R1, rel(r1f, "R_1f")),
                bind(R2, rel(r2f, "R_2f")), bind(X_LOOP, xLoop));
        Q ief = MIN_EARTH_FAULT.evalAs("I_ef,min", t, id, "/Ief", "far end", bind(C_MIN, cmin), bind(U0, u0), bind(ZS, zsf));

        List<CheckResult> checks = new ArrayList<>();
        Disconnection d = disconnection(t, c, id, zs, in);
        boolean gGTaken = c.device().kind() == DeviceKind.FUSE && c.device().disconnectionCurrentA() == null && d.check().determined();
        checks.add(!gGTaken ? d.check() : d.check().assuming(new Assumption(
                "the fuse taken as gG (IEC 60269-2, BS 88-2 systems E and G): its disconnection current from the published maximum Z_s",
                c.where().path() + ".device.disconnection_current_a", false)));
        Q prospective = rel(phases == 3 ? at.ik3() : at.ik1(), phases == 3 ? "I_k3" : "I_k1");
        Withstand.Operation op = new Withstand.Operation(d.ia(), d.time(), d.idn());
        CheckResult breaking = withstand.breaking(t, c, id + "/bc", prospective);
        checks.add(withstand.line(t, c, id + "/sc", prospective, op, in, thetaMax, overloadProtected, breaking));
        checks.add(withstand.protective(t, c, id + "/pc", ief, op, in, thetaMax));
        checks.add(breaking);

        BoardFault downstream = null;
        if (c.isFeeder()) {
            // The phase path at 20 °C serves the maximum fault currents at the board the feeder supplies.
            Q r1_20 = LENGTH_RESISTANCE.evalAs("R_1,20", t, id, "/R1_20", "line conductor at 20 °C", bind(R_KM, r20),
                    bind(L, length), bind(N, n));
            Q x1 = LENGTH_REACTANCE.evalAs("X_1", t, id, "/X1", "line conductor", bind(X_KM, z.reactance()), bind(L, length));
            Trace bt = t.section(id + "/board", "Fault levels at board " + c.to(), "");
            String bid = "fault/" + c.to();
            Q r3 = series(bt, bid, "/R3", "Phase resistance to board " + c.to() + ", 20 °C", "R_3", rel(at.r3(), "R_3(" + c.from() + ")"), r1_20);
            Q x3 = series(bt, bid, "/X3", "Phase reactance to board " + c.to(), "X_3", rel(at.x3(), "X_3(" + c.from() + ")"), x1);
            Q rN = series(bt, bid, "/RN", "Line-neutral loop resistance to board " + c.to() + ", 20 °C", "R_N",
                    rel(at.rN(), "R_N(" + c.from() + ")"), rel(r1_20, "R_1,20"), rel(r1_20, "R_neutral,20"));
            Q xN = series(bt, bid, "/XN", "Line-neutral loop reactance to board " + c.to(), "X_N", rel(at.xN(), "X_N(" + c.from() + ")"), xLoop);
            downstream = atBoard(bt, bid, c.to(), r3, x3, rN, xN, zs, zsf);
            if (c.singlePhaseFeeder()) {
                // A single-phase board has no three-phase fault: its prospective current is the line-to-neutral one.
                if (bt.recording()) Given.decision(bt, bid + "/one-phase", "Fault level of a single-phase board",
                        "board " + c.to() + " is fed by a single-phase circuit", "its prospective fault current is I_k1, the line-to-neutral value",
                        "IEC 60909-0:2016, 7.1.2", downstream.ik1().id());
                downstream = new BoardFault(downstream.r3(), downstream.x3(), downstream.rN(), downstream.xN(), downstream.ze(),
                        downstream.zeF(), downstream.ik1(), downstream.ik1());
            }
        }
        return new FaultPath.CircuitFault(prospective, zs, d.zsMax(), ief, checks, downstream, List.of());
    }

    /**
     * The disconnection check and what the withstand checks need of it: the current that operates
     * the overcurrent part within the required time (null where unknown), that time, and I_Δn of an
     * RCD part (null without one).
     */
    record Disconnection(CheckResult check, Q zsMax, Q ia, Q time, Q idn) {}

    private Disconnection disconnection(Trace t, Circuit c, String id, Q zs, Q in) {
        Device dev = c.device();
        Basis b = inst.basis();
        boolean socket = c.load() != null && c.load().kind() == LoadKind.SOCKET;
        boolean finalTime = !c.isFeeder() && (in.value() <= (socket ? 63 : 32) + 1e-9);
        boolean tt = b.earthing().value() == Earthing.TT;
        Setting<Double> ts = finalTime ? b.disconnectionTimeFinalS() : b.disconnectionTimeDistributionS();
        // The basis defaults are TN's; a TT installation that does not set them takes TT's times.
        if (tt && !ts.given()) ts = new Setting<>(finalTime ? 0.2 : 1.0, false, ts.path());
        if (t.recording()) Given.decision(t, id + "/t-rule", "Required disconnection time",
                (c.isFeeder() ? "a distribution circuit (feeder)" : (finalTime ? "a final circuit with I_n ≤ " + (socket ? "63 A (socket outlets)" : "32 A")
                        : "a final circuit with I_n > " + (socket ? "63 A" : "32 A"))) + "; " + b.earthing().value().token() + " system",
                finalTime ? "the final-circuit time applies" : "the distribution-circuit time applies",
                "IEC 60364-4-41:2005+AMD1:2017, 411.3.2.2 to 411.3.2.4 (from memory)", in.id());
        Q time = Given.setting(t, id, "/t", "Maximum disconnection time", "t", ts, Units.S,
                finalTime ? (tt ? "IEC 60364-4-41:2005, Table 41.1 (TT, 230 V: 0.2 s)" : "IEC 60364-4-41:2005, Table 41.1 (TN, 230 V: 0.4 s)")
                        : (tt ? "IEC 60364-4-41:2005, 411.3.2.4 (TT: 1 s)" : "IEC 60364-4-41:2005, 411.3.2.3 (TN: 5 s)"));
        String name = "disconnection";
        String title = "Automatic disconnection: Z_s ≤ Z_s,max";
        if (b.earthing().value() == Earthing.TT && dev.rcdResidualA() != null) {
            Q ra = Given.input(t, id + "/RA", "Earth electrode resistance", "R_A", b.earthElectrodeOhm(), Units.OHM, "basis.earth_electrode_resistance_ohm");
            Q idn = Given.input(t, id, "/Idn", "Rated residual operating current", "I_Δn", dev.rcdResidualA(), Units.A, c.where().path(),
                    ".device.residual_current_a");
            Q ul = TOUCH_VOLTAGE.eval(t, id, "/UL", "TT system, RCD", bind(RA, ra), bind(IDN, idn));
            Q limit = Given.derived(t, id, "/UL_max", "Conventional touch-voltage limit", "U_L,max", 50, Units.V,
                    "IEC 60364-4-41:2005, 411.5.3");
            boolean pass = ul.value() <= 50 + 1e-12;
            if (t.recording()) t.add(new Step.Check(id + "/check", "Fault protection by RCD: R_A · I_Δn ≤ 50 V", name, ul, "≤", limit, pass,
                    "IEC 60364-4-41:2005, 411.5.3"));
            Q ia = tripCurrent(t, c, id, in, time);
            return new Disconnection(new CheckResult(name, "R_A · I_Δn ≤ 50 V", pass, ul.value(), 50, Units.V, false, id, "/check"), null, ia, time, idn);
        }
        if (b.earthing().value() == Earthing.TT) {
            if (t.recording()) Given.note(t, id + "/tt-ocpd", "TT system without an RCD", "Fault protection by the overcurrent device: Z_s · I_a ≤ U_0 (IEC 60364-4-41:2005, 411.5.4).", "");
        }
        Q ia = tripCurrent(t, c, id, in, time);
        if (ia == null) {
            String missing = dev.kind() == DeviceKind.MCCB ? "device.instantaneous_a (the MCCB's instantaneous setting; or short_time_a with a delay within the time)"
                    : "device.disconnection_current_a (the fuse's current for disconnection within " + NumberFormatPolicyLite.s(time.value()) + " s, from the manufacturer's curve)";
            if (t.recording()) Given.decision(t, id + "/check", "Automatic disconnection", "the input does not give " + missing,
                    "FAIL: disconnection cannot be shown", "IEC 60364-4-41:2005, 411.4.4");
            return new Disconnection(CheckResult.undetermined(name, title, Units.OHM, id, "/check", c.where().path() + "." + missing + " is not given"),
                    null, null, time, null);
        }
        Q zmax = MAX_LOOP.eval(t, id, "/Zs_max", "", bind(C_MIN, cmin), bind(U0, u0), bind(IA, ia));
        boolean pass = zs.value() <= zmax.value() + 1e-12;
        if (t.recording()) t.add(new Step.Check(id + "/check1", title, name, rel(zs, "Z_s"), "≤", rel(zmax, "Z_s,max"), pass,
                "IEC 60364-4-41:2005, 411.4.4"));
        if (!pass && dev.rcdResidualA() != null) {
            Q idn = Given.input(t, id, "/Idn", "Rated residual operating current", "I_Δn", dev.rcdResidualA(), Units.A, c.where().path(),
                    ".device.residual_current_a");
            Q iaR = RCD_TRIP.eval(t, id, "/Ia_rcd", "the RCD part of the device", bind(IDN, idn));
            Q zmaxR = MAX_LOOP.evalAs("Z_s,max(RCD)", t, id, "/Zs_max_rcd", "RCD", bind(C_MIN, cmin), bind(U0, u0), bind(IA, iaR));
            boolean passR = zs.value() <= zmaxR.value() + 1e-12;
            if (t.recording()) t.add(new Step.Check(id + "/check2", "Automatic disconnection by the RCD: Z_s ≤ Z_s,max(RCD)", name, rel(zs, "Z_s"), "≤",
                    zmaxR, passR, "IEC 60364-4-41:2005, 411.4.5"));
            return new Disconnection(new CheckResult(name, title, passR, zs.value(), zmaxR.value(), Units.OHM, false, id, "/check2"),
                    zmaxR, ia, time, idn);
        }
        return new Disconnection(new CheckResult(name, title, pass, zs.value(), zmax.value(), Units.OHM, false, id, "/check1"),
                zmax, ia, time, null);
    }

    /** The current that operates the device within the required time, or null where the input lacks it. */
    private Q tripCurrent(Trace t, Circuit c, String id, Q in, Q time) {
        Device dev = c.device();
        if (dev.disconnectionCurrentA() != null) {
            return Given.input(t, id, "/Ia", "Current that operates the device within the time (manufacturer's curve)", "I_a",
                    dev.disconnectionCurrentA(), Units.A, c.where().path(), ".device.disconnection_current_a");
        }
        switch (dev.kind()) {
            case MCB:
            case RCBO: {
                Q mq = Given.lookup(t, devices.instantaneousUpperMultiple(id + "/m", dev.curve()));
                return TRIP_MULTIPLE.eval(t, id, "/Ia", t.recording() ? "type " + dev.curve().token() : "", bind(MULT, mq), bind(IN, in));
            }
            case FUSE: {
                Step.Lookup ia = devices.fuseOperatingCurrent(id + "/Ia", FuseSystem.BS88_2, in.value(), time.value());
                if (ia == null) return null;
                if (t.recording()) Given.decision(t, id + "/fuse-basis", "Characteristic of the fuse",
                        "the input gives no disconnection_current_a", "the fuse is taken as a gG fuse to IEC 60269-2 (BS 88-2, systems E and G): "
                                + "the current that operates it within t follows from the published maximum Z_s", "BS 7671:2008+A1:2011, Tables 41.2 and 41.4");
                return Given.lookup(t, ia);
            }
            case MCCB: {
                Q ia = null;
                if (dev.instantaneousA() != null) {
                    Q ii = Given.input(t, id, "/Ii", "Instantaneous trip setting", "I_i", dev.instantaneousA(), Units.A, c.where().path(),
                            ".device.instantaneous_a");
                    ia = MCCB_TRIP.eval(t, id, "/Ia", "MCCB", bind(I_INST, ii));
                }
                if (dev.shortTimeA() != null && dev.shortTimeDelayS() <= time.value() + 1e-12) {
                    Q isd = Given.input(t, id, "/Isd", "Short-time pick-up setting", "I_sd", dev.shortTimeA(), Units.A, c.where().path(),
                            ".device.short_time_a");
                    Q iaSd = MCCB_SHORT_TIME_TRIP.evalAs("I_a,sd", t, id, "/Ia_sd", "short-time release", bind(I_SD, isd));
                    if (t.recording()) Given.decision(t, id + "/Ia-basis", "Release that disconnects within t",
                            "the short-time delay t_sd = " + Decimals.trim(dev.shortTimeDelayS()) + " s is within t = " + Decimals.trim(time.value())
                                    + " s" + (ia == null ? "" : "; I_a,sd = " + Decimals.trim(iaSd.value()) + " A against I_a = " + Decimals.trim(ia.value())
                                    + " A of the instantaneous release"),
                            ia == null || iaSd.value() < ia.value() ? "the short-time release, the lower current" : "the instantaneous release, the lower current",
                            "IEC 60364-4-41:2005, 411.4.4", iaSd.id());
                    if (ia == null || iaSd.value() < ia.value()) ia = iaSd.as("I_a");
                }
                return ia;
            }
            default:
                return null;
        }
    }

    /** Plain number text for decisions (the report's policy is not reachable from calc). */
    static final class NumberFormatPolicyLite {
        static String s(double v) { return Decimals.trim(v); }
        static String a(double v) { return String.format(Locale.ROOT, "%.1f", v); }
        static String ka(double v) { return String.format(Locale.ROOT, "%.2f", v); }
    }
}
