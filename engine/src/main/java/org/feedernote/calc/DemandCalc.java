package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;
import org.feedernote.formula.DemandFormulas;
import org.feedernote.formula.Formula;
import org.feedernote.formula.Units;
import org.feedernote.model.Board;
import org.feedernote.model.Circuit;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * The boards' demand, bottom-up: each phase's active, reactive and apparent power, the line and
 * neutral currents, and a feeder's design current (its most loaded phase).
 */
final class DemandCalc {
    private final Engine.Run run;
    /** A board's phase sums over anonymous terms, by unit and which terms count a third (see phaseSum); kept by the engine across runs. */
    private final Map<String, Formula> phaseSums;

    DemandCalc(Engine.Run run, Map<String, Formula> phaseSums) {
        this.run = run;
        this.phaseSums = phaseSums;
    }

/**
 * A board's sum for one phase, d · (x₁ + x₂/3 + …): three-phase loads contribute a third to
 * each phase. Its variables, in order of first appearance: d, then the terms.
 */
private static Formula phaseSumFormula(String title, String symbol, String unit, List<Var> terms, List<Boolean> third) {
    Expr sum = null;
    for (int i = 0; i < terms.size(); i++) {
        Expr e = third.get(i) ? Expr.div(Expr.v(terms.get(i)), Expr.n(3)) : Expr.v(terms.get(i));
        sum = sum == null ? e : Expr.add(sum, e);
    }
    return new Formula("board-phase-sum", title, symbol, unit, Expr.mul(Expr.v(DemandFormulas.D), sum),
            "P and Q summed separately (complex power); three-phase loads contribute a third to each phase; times the board's diversity");
}

    // ---------------- board demand and feeder design current ----------------

    void boardDemand(String boardId) {
        Board board = run.boards.get(boardId);
        Circuit feeder = run.feederOf.get(boardId);
        Trace t = feeder == null
                ? run.originTrace
                : run.circuitTrace.get(feeder.id()).section(feeder.id() + "/ib", "Design current", "from the demand of board " + boardId);
        String id = boardId + "/demand";
        Q d = Given.setting(t, id, "/d", "Diversity factor of board " + boardId, "d", board.diversity(), Units.NONE,
                "default: no diversity");
        Q[] p = new Q[3];
        Q[] q = new Q[3];
        Q[] su = new Q[3];
        List<Circuit> circuits = run.outgoing.getOrDefault(boardId, List.of());
        for (int k = 0; k < 3; k++) {
            String ph = "L" + (k + 1);
            List<Q> pTerms = new ArrayList<>();
            List<Boolean> pThird = new ArrayList<>();
            List<Q> qTerms = new ArrayList<>();
            List<Boolean> qThird = new ArrayList<>();
            List<Q> sTerms = new ArrayList<>();
            List<Boolean> sThird = new ArrayList<>();
            for (Circuit c : circuits) {
                if (c.isFeeder()) {
                    PhaseDemand child = run.boardDemand.get(c.to());
                    if (child.p()[k] != null) { pTerms.add(relabel(child.p()[k], "P_" + ph + "(" + c.to() + ")")); pThird.add(false); }
                    if (child.q()[k] != null) { qTerms.add(relabel(child.q()[k], "Q_" + ph + "(" + c.to() + ")")); qThird.add(false); }
                    if (child.unknownS()[k] != null) { sTerms.add(relabel(child.unknownS()[k], "S_u," + ph + "(" + c.to() + ")")); sThird.add(false); }
                } else {
                    LoadDemand ld = run.demand.get(c.id());
                    boolean onThis = ld.phases() == 3 || ld.phase() == k + 1;
                    if (!onThis) continue;
                    boolean third = ld.phases() == 3;
                    if (ld.powerFactorKnown()) {
                        pTerms.add(relabel(ld.p(), "P(" + c.id() + ")")); pThird.add(third);
                        qTerms.add(relabel(ld.q(), "Q(" + c.id() + ")")); qThird.add(third);
                    } else {
                        sTerms.add(relabel(ld.s(), "S(" + c.id() + ")")); sThird.add(third);
                    }
                }
            }
            p[k] = phaseSum(t, id + "/P_" + ph, "Active power on " + ph, "P_" + ph, Units.KW, d, pTerms, pThird);
            q[k] = phaseSum(t, id + "/Q_" + ph, "Reactive power on " + ph, "Q_" + ph, Units.KVAR, d, qTerms, qThird);
            su[k] = phaseSum(t, id + "/Su_" + ph, "Apparent power of loads of unknown power factor on " + ph, "S_u," + ph, Units.KVA, d, sTerms, sThird);
        }
        PhaseDemand pd = new PhaseDemand(p, q, su);
        run.boardDemand.put(boardId, pd);

        boolean balanced = same(p) && same(q) && same(su);
        if (balanced) {
            if (t.recording()) Given.decision(t, id + "/balanced", "Balance of the phases", "every load on the board is three-phase",
                    "the phases carry equal demand: I = √3 · S_k / U (the three-phase form)", "common practice");
        }
        List<Q> currents = new ArrayList<>();
        List<Q> pfs = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            String ph = "L" + (k + 1);
            Q pk = p[k] != null ? p[k] : zero(t, id + "/P0_" + ph, "P_" + ph, Units.KW);
            Q qk = q[k] != null ? q[k] : zero(t, id + "/Q0_" + ph, "Q_" + ph, Units.KVAR);
            Q sk = DemandFormulas.APPARENT.evalAs(su[k] != null ? "S_pq," + ph : "S_" + ph, t, id + "/S_" + ph, ph, bind(DemandFormulas.P, pk), bind(DemandFormulas.Q, qk));
            if (su[k] != null) {
                sk = DemandFormulas.sum("apparent-with-unknown", "Apparent power on " + ph + " with loads of unknown power factor",
                        "S_" + ph, Units.KVA, List.of(var("a", sk), var("b", su[k])),
                        "Loads of unknown power factor added arithmetically (on the safe side)")
                        .eval(t, id + "/S_total_" + ph, ph, bind(var("a", sk), sk), bind(var("b", su[k]), su[k]));
            }
            sk = relabel(sk, "S_" + ph);
            Q ik = balanced
                    ? DemandFormulas.PHASE_CURRENT_BALANCED.evalAs("I_" + ph, t, id + "/I_" + ph, ph + ", balanced", bind(DemandFormulas.S, sk), bind(DemandFormulas.U, run.u))
                    : DemandFormulas.PHASE_CURRENT.evalAs("I_" + ph, t, id + "/I_" + ph, ph, bind(DemandFormulas.S, sk), bind(DemandFormulas.U0, run.u0));
            currents.add(relabel(ik, "I_" + ph));
            if (su[k] == null && sk.value() > 0) {
                pfs.add(relabel(DemandFormulas.POWER_FACTOR.evalAs("cos φ_" + ph, t, id + "/cos_phi_" + ph, ph, bind(DemandFormulas.P, pk), bind(DemandFormulas.S, sk)), "cos φ_" + ph));
            } else {
                pfs.add(null);
            }
        }
        run.phaseCurrents.put(boardId, currents);
        if (su[0] == null && su[1] == null && su[2] == null) {
            Q[] pp = new Q[3];
            Q[] qq = new Q[3];
            for (int k = 0; k < 3; k++) {
                pp[k] = p[k] != null ? p[k] : zero(t, id + "/P0n_L" + (k + 1), "P_L" + (k + 1), Units.KW);
                qq[k] = q[k] != null ? q[k] : zero(t, id + "/Q0n_L" + (k + 1), "Q_L" + (k + 1), Units.KVAR);
            }
            run.neutral.put(boardId,
                    DemandFormulas.NEUTRAL_CURRENT.eval(t, id, "/I_N", "phasor sum of the line currents",
                            bind(DemandFormulas.P1, pp[0]), bind(DemandFormulas.P2, pp[1]), bind(DemandFormulas.P3, pp[2]),
                            bind(DemandFormulas.Q1, qq[0]), bind(DemandFormulas.Q2, qq[1]), bind(DemandFormulas.Q3, qq[2]),
                            bind(DemandFormulas.U0, run.u0)));
        } else {
            if (t.recording()) Given.note(t, id + "/I_N", "Neutral current", "Not determined: some loads on this board have no power factor, so their phase angle is unknown.", "");
        }
        if (feeder != null) {
            Var i1 = new Var("I1", "I_L1", Units.A);
            Var i2 = new Var("I2", "I_L2", Units.A);
            Var i3 = new Var("I3", "I_L3", Units.A);
            Formula most = new Formula("ib-most-loaded-phase", "Design current", "I_b", Units.A,
                    Expr.max(Expr.v(i1), Expr.max(Expr.v(i2), Expr.v(i3))),
                    "A feeder's design current is that of its most loaded phase (IEC 60364-4-43:2008, 433.1)");
            Q ib = most.eval(t, feeder.id(), "/ib/I_b", "feeder, most loaded phase", bind(i1, currents.get(0)),
                    bind(i2, currents.get(1)), bind(i3, currents.get(2)));
            int worst = 0;
            for (int k = 1; k < 3; k++) if (currents.get(k).value() > currents.get(worst).value()) worst = k;
            if (feeder.designCurrentA() != null) {
                Q derived = ib;
                ib = Given.input(t, feeder.id(), "/ib/I_b_given", "Design current given by the designer", "I_b",
                        feeder.designCurrentA(), Units.A, feeder.where().path(), ".design_current_a");
                if (t.recording()) Given.decision(t, feeder.id() + "/ib/override", "Design current override",
                        String.format(Locale.ROOT, "design_current_a is given; the derived value was %s A", Decimals.trim(derived.value())),
                        "I_b = design_current_a is used for this feeder's checks; upstream demand uses the board's power",
                        "design input", derived.id(), ib.id());
            }
            run.designCurrent.put(feeder.id(), ib);
            if (pfs.get(worst) != null) run.powerFactor.put(feeder.id(), pfs.get(worst));
            if (!feeder.singlePhaseFeeder()) run.connection.put(feeder.id(), "L1 L2 L3");
        }
    }

    boolean same(Q[] qs) {
        if (qs[0] == null || qs[1] == null || qs[2] == null) return qs[0] == null && qs[1] == null && qs[2] == null;
        double a = qs[0].value();
        return Math.abs(qs[1].value() - a) <= 1e-9 * Math.abs(a) && Math.abs(qs[2].value() - a) <= 1e-9 * Math.abs(a);
    }

    Var var(String key, Q q) {
        return new Var(key, q.symbol(), q.unit());
    }

    Q zero(Trace t, String id, String symbol, String unit) {
        return Given.derived(t, id, "Nothing connected", symbol, 0, unit, "no circuit contributes");
    }

    Q relabel(Q q, String symbol) {
        return q.as(symbol);
    }

    Q phaseSum(Trace t, String id, String title, String symbol, String unit, Q d, List<Q> terms, List<Boolean> third) {
        if (terms.isEmpty()) return null;
        StringBuilder shape = new StringBuilder(unit).append(' ');
        for (Boolean b : third) shape.append(b ? '3' : '1');
        // The same sum over anonymous terms, kept for each shape: it values the shown one.
        Formula twin = phaseSums.computeIfAbsent(shape.toString(), k -> {
            List<Var> anonymous = new ArrayList<>();
            for (int i = 0; i < terms.size(); i++) anonymous.add(new Var("x" + i, "x" + i, unit));
            return phaseSumFormula("", "", unit, anonymous, third);
        });
        List<Var> vars = new ArrayList<>(terms.size() + 1);
        vars.add(DemandFormulas.D);
        Step.Binding[] bindings = new Step.Binding[terms.size() + 1];
        for (int i = 0; i < terms.size(); i++) {
            Q term = terms.get(i);
            Var v = new Var("x" + i, term.symbol(), unit);
            vars.add(v);
            bindings[i] = bind(v, term);
        }
        bindings[terms.size()] = bind(DemandFormulas.D, d);
        return phaseSumFormula(title, symbol, unit, vars.subList(1, vars.size()), third).evalLike(twin, vars, t, id, "", bindings);
    }
}
