package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.feedernote.formula.DesignCurrentFormulas;
import org.feedernote.formula.Units;
import org.feedernote.model.Circuit;
import org.feedernote.model.Load;
import org.feedernote.model.LoadKind;
import org.feedernote.model.Phase;
import org.feedernote.trace.Q;
import org.feedernote.trace.Trace;

/** The loads: each final circuit's design current, power factor and demand, and the phase it is connected to. */
final class LoadCalc {
    private final Engine.Run run;

    LoadCalc(Engine.Run run) {
        this.run = run;
    }

    /** A final circuit's design current, power factor (null where unknown) and demand. */
    record LoadFigures(Q ib, Q pf, LoadDemand demand) {}

    LoadFigures loadDemand(Circuit c) {
        Trace t = run.circuitTrace.get(c.id()).section(c.id() + "/ib", "Design current", "");
        Load load = c.load();
        String id = c.id() + "/ib";
        String path = c.where().path() + ".load";
        boolean three = load.phases() == 3;
        String phaseForm = three ? "three-phase" : "single-phase";
        Q pf = load.powerFactor() == null ? null
                : Given.input(t, id, "/cos_phi", "Power factor", "cos φ", load.powerFactor(), Units.NONE, path, ".power_factor");
        Q p = null;
        Q q = null;
        Q s = null;
        Q ib;
        if (load.powerKw() != null) {
            if (load.kind() == LoadKind.MOTOR) {
                Q out = Given.input(t, id, "/P_out", "Rated output", "P_out", load.powerKw(), Units.KW, path, ".power_kw");
                Q eta = Given.input(t, id, "/eta", "Efficiency", "η", load.efficiency(), Units.NONE, path, ".efficiency");
                p = DesignCurrentFormulas.MOTOR_INPUT_POWER.eval(t, id, "/P", "", bind(DesignCurrentFormulas.P_OUT, out),
                        bind(DesignCurrentFormulas.ETA, eta));
            } else {
                p = Given.input(t, id, "/P", "Input power", "P", load.powerKw(), Units.KW, path, ".power_kw");
            }
            ib = (three ? DesignCurrentFormulas.THREE_PHASE_FROM_POWER : DesignCurrentFormulas.SINGLE_PHASE_FROM_POWER)
                    .eval(t, id, "/I_b", phaseForm + ", power known", bind(DesignCurrentFormulas.P, p),
                            bind(DesignCurrentFormulas.COS_PHI, pf),
                            bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? run.u : run.u0));
        } else if (load.apparentKva() != null) {
            s = Given.input(t, id, "/S", "Apparent power", "S", load.apparentKva(), Units.KVA, path, ".apparent_kva");
            ib = (three ? DesignCurrentFormulas.THREE_PHASE_FROM_APPARENT : DesignCurrentFormulas.SINGLE_PHASE_FROM_APPARENT)
                    .eval(t, id, "/I_b", phaseForm + ", apparent power known", bind(DesignCurrentFormulas.S, s),
                            bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? run.u : run.u0));
            if (pf != null) {
                p = DesignCurrentFormulas.ACTIVE_FROM_APPARENT.eval(t, id, "/P", "", bind(DesignCurrentFormulas.S, s),
                        bind(DesignCurrentFormulas.COS_PHI, pf));
            }
        } else {
            ib = Given.input(t, id, "/I_b", "Design current (load current given)", "I_b", load.currentA(), Units.A, path, ".current_a");
            s = (three ? DesignCurrentFormulas.APPARENT_THREE_PHASE_FROM_CURRENT : DesignCurrentFormulas.APPARENT_SINGLE_PHASE_FROM_CURRENT)
                    .eval(t, id, "/S", phaseForm, bind(DesignCurrentFormulas.I, ib),
                            bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? run.u : run.u0));
            if (pf != null) {
                p = DesignCurrentFormulas.ACTIVE_FROM_APPARENT.eval(t, id, "/P", "", bind(DesignCurrentFormulas.S, s),
                        bind(DesignCurrentFormulas.COS_PHI, pf));
            }
        }
        if (pf != null) {
            q = DesignCurrentFormulas.REACTIVE_FROM_ACTIVE.eval(t, id, "/Q", "", bind(DesignCurrentFormulas.P, p),
                    bind(DesignCurrentFormulas.COS_PHI, pf));
            s = null;
        } else {
            if (t.recording()) Given.note(t, id + "/pf-unknown", "Power factor not given",
                    "The power factor is unknown: the voltage drop uses z (the impedance form) and the load's apparent power is added arithmetically to the board's demand, which overstates it.",
                    "BS 7671:2018 Appendix 4, 6.4");
        }
        if (c.designCurrentA() != null) {
            Q derived = ib;
            ib = Given.input(t, id, "/I_b_given", "Design current given by the designer", "I_b", c.designCurrentA(), Units.A,
                    c.where().path(), ".design_current_a");
            if (t.recording()) Given.decision(t, id + "/override", "Design current override",
                    String.format(Locale.ROOT, "design_current_a is given; the derived value was %s A", Decimals.trim(derived.value())),
                    "I_b = design_current_a is used for this circuit's checks; the board's demand uses the load's power",
                    "design input", derived.id(), ib.id());
        }
        return new LoadFigures(ib, pf, new LoadDemand(c.id(), load.phases(), 0, p, q, s, pf != null));
    }

    // ---------------- phase allocation ----------------

    void allocatePhases(String board) {
        Circuit boardFeeder = run.feederOf.get(board);
        if (boardFeeder != null && boardFeeder.singlePhaseFeeder()) {
            onePhaseBoard(board, run.feederPhase.get(boardFeeder.id()));
            return;
        }
        double[] load = new double[3];
        List<Circuit> auto = new ArrayList<>();
        for (Circuit c : run.outgoing.getOrDefault(board, List.of())) {
            if (c.isFeeder() && !c.singlePhaseFeeder()) continue;
            if (c.phases() == 3) {
                LoadDemand d = run.demand.get(c.id());
                for (int k = 0; k < 3; k++) load[k] += d.apparentKva() / 3;
                run.connection.put(c.id(), "L1 L2 L3");
            } else if (c.phase() == Phase.AUTO) {
                auto.add(c);
            } else {
                int k = c.phase().ordinal();
                load[k] += apparentKva(c);
                connect(c, k);
                Given.decision(run.circuitTrace.get(c.id()), c.id() + "/phase", "Phase", "phase given in the design input",
                        "connected to " + c.phase().token(), "design input");
            }
        }
        auto.sort(Comparator.comparingDouble((Circuit c) -> -apparentKva(c)));
        for (Circuit c : auto) {
            int best = 0;
            for (int k = 1; k < 3; k++) if (load[k] < load[best] - 1e-12) best = k;
            Trace t = run.circuitTrace.get(c.id());
            String before = !t.recording() ? "" : "phase loads before allocation L1 " + Decimals.trim(load[0]) + " kVA, L2 " + Decimals.trim(load[1])
                    + " kVA, L3 " + Decimals.trim(load[2]) + " kVA";
            load[best] += apparentKva(c);
            connect(c, best);
            if (t.recording()) Given.decision(t, c.id() + "/phase", "Phase (allocated)",
                    "phase: auto; " + before + " (largest single-phase loads first, each to the least-loaded phase"
                            + (c.isFeeder() ? "; a single-phase board counts with the apparent power of its loads times its diversity" : "") + ")",
                    "connected to L" + (best + 1), "common practice, no source");
        }
    }

    /** A single-phase board: every circuit it supplies is on its feeder's phase. */
    private void onePhaseBoard(String board, int k) {
        for (Circuit c : run.outgoing.getOrDefault(board, List.of())) {
            connect(c, k);
            Trace t = run.circuitTrace.get(c.id());
            if (t.recording()) Given.decision(t, c.id() + "/phase", "Phase", "board " + board + " is single-phase, fed on L" + (k + 1),
                    "connected to L" + (k + 1), "design input");
        }
    }

    private void connect(Circuit c, int k) {
        if (c.isFeeder()) {
            run.feederPhase.put(c.id(), k);
        } else {
            run.demand.put(c.id(), withPhase(run.demand.get(c.id()), k + 1));
        }
        run.connection.put(c.id(), "L" + (k + 1));
    }

    /** A single-phase circuit's apparent power for balancing the phases; a single-phase board's, its loads' times its diversity. */
    private double apparentKva(Circuit c) {
        if (!c.isFeeder()) return run.demand.get(c.id()).apparentKva();
        double sum = 0;
        for (Circuit below : run.outgoing.getOrDefault(c.to(), List.of())) sum += apparentKva(below);
        return run.boards.get(c.to()).diversity().value() * sum;
    }

    LoadDemand withPhase(LoadDemand d, int phase) {
        return new LoadDemand(d.circuitId(), d.phases(), phase, d.p(), d.q(), d.s(), d.powerFactorKnown());
    }
}
