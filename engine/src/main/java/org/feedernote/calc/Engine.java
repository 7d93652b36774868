package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.data.CapacityData;
import org.feedernote.data.DataGapException;
import org.feedernote.data.ReferenceData;
import org.feedernote.formula.CapacityFormulas;
import org.feedernote.expr.Expr;
import org.feedernote.expr.Var;
import org.feedernote.formula.DemandFormulas;
import org.feedernote.formula.DesignCurrentFormulas;
import org.feedernote.formula.Formula;
import org.feedernote.formula.TermFormulas;
import org.feedernote.formula.ImpedanceFormulas;
import org.feedernote.formula.Units;
import org.feedernote.formula.VoltageDropFormulas;
import org.feedernote.model.*;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;
import org.feedernote.trace.TraceRecorder;

/**
 * Calculates a whole installation: design currents bottom-up through the boards, then impedance
 * and voltage drop top-down from the origin, every number through the trace.
 */
public final class Engine {
    /** Contract checks that later capabilities add; reported so that nobody reads a partial result as complete. */
    static final List<String> NOT_YET = List.of();

    private final ReferenceData data;
    private final ImpedanceCalc impedance;
    private final CapacityData capacityData;
    private final TermFormulas termFormulas = new TermFormulas();
    /** A board's phase sums over anonymous terms, by unit and which terms count a third (see phaseSum). */
    private final Map<String, Formula> phaseSums = new java.util.concurrent.ConcurrentHashMap<>();

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

    public Engine(ReferenceData data) {
        this.data = data;
        this.impedance = new ImpedanceCalc(data);
        this.capacityData = new CapacityData(data);
    }

    public Result run(Installation inst) {
        return run(inst, true);
    }

    /**
     * @param record false where only the figures are wanted (the terminal summary, JSON): the
     *               same calculation with the no-op trace, and an empty trace in the result
     */
    public Result run(Installation inst, boolean record) {
        TraceRecorder root = new TraceRecorder();
        Run run = new Run(inst, root, record ? root : Trace.noop());
        run.calculate();
        return new Result(inst, run.boardResults(), run.circuitResults(), root.toSection(), NOT_YET);
    }

    /** Evaluations of a circuit kept for reuse: enough for a step undone and for the final pass. */
    private static final int EVALUATIONS_KEPT = 3;

    /**
     * One evaluation with the no-op trace: the circuit's sizes, the results of the feeders above it
     * it was calculated with, its result and its own figures. A circuit's result depends on nothing
     * else (design currents and the supply are fixed before sizing starts), so an evaluation of an
     * equal circuit under the same feeder results gives the same result: the sizing returns to
     * sizes it has tried (a step undone, the chosen size after a smaller one failed) and the final
     * pass of check repeats the sizing's last evaluations. Under other feeder results the own
     * figures still hold, and only the rest is calculated.
     */
    private record Evaluated(Circuit circuit, CircuitResult[] upstream, CircuitResult result, Run.OwnFigures own, Evaluated older) {
        static CircuitResult find(Evaluated e, Circuit c, CircuitResult[] upstream) {
            for (; e != null; e = e.older) {
                if (sameResults(e.upstream, upstream) && same(e.circuit, c)) return e.result;
            }
            return null;
        }

        /**
         * The own figures of an evaluation of an equal circuit, under any feeder results: they do
         * not depend on the circuits upstream (a motor recalculated after a feeder grew, a final
         * circuit in the final pass).
         */
        static Run.OwnFigures ownFigures(Evaluated e, Circuit c) {
            for (; e != null; e = e.older) if (same(e.circuit, c)) return e.own;
            return null;
        }

        private static boolean same(Circuit a, Circuit b) {
            return a == b || a.equals(b);
        }

        private static boolean sameResults(CircuitResult[] a, CircuitResult[] b) {
            if (a.length != b.length) return false;
            for (int i = 0; i < a.length; i++) if (a[i] != b[i]) return false;
            return true;
        }

        /** The evaluations of circuits equal to c among this and the older ones, or null. */
        Evaluated of(Circuit c) {
            Evaluated rest = older == null ? null : older.of(c);
            if (!same(circuit, c)) return rest;
            return rest == older ? this : new Evaluated(circuit, upstream, result, own, rest);
        }

        /** This and at most n - 1 older evaluations. */
        Evaluated keep(int n) {
            if (older == null) return this;
            if (n <= 1) return new Evaluated(circuit, upstream, result, own, null);
            Evaluated rest = older.keep(n - 1);
            return rest == older ? this : new Evaluated(circuit, upstream, result, own, rest);
        }
    }

    private static <V> Map<String, V> perCircuit(int circuits) {
        return new HashMap<>(Math.max(16, (int) (circuits / 0.75f) + 1));
    }

    /** The state of one calculation; discarded when it returns. */
    final class Run {
        final Installation inst;
        final Trace root;
        final Map<String, Board> boards = new LinkedHashMap<>();
        final Map<String, List<Circuit>> outgoing = new HashMap<>();
        final Map<String, Circuit> feederOf = new HashMap<>();
        final List<String> boardOrder = new ArrayList<>();
        final Map<String, Trace> circuitTrace;
        final Map<String, LoadDemand> demand;
        final Map<String, PhaseDemand> boardDemand = new HashMap<>();
        final Map<String, Q> designCurrent;
        final Map<String, Q> powerFactor;
        final Map<String, Q> neutral = new HashMap<>();
        final Map<String, List<Q>> phaseCurrents = new HashMap<>();
        final Map<String, String> connection;
        final Map<String, Q> boardDrop = new HashMap<>();
        final Map<String, CircuitResult> results;
        final Map<String, Circuit> originals;

        Q u;
        Q u0;
        Q f;
        Trace supplyTrace;
        FaultPath faultPath;
        BoardFault originFault;
        final Map<String, List<CheckResult>> boardChecks = new HashMap<>();
        Trace originTrace;

        Run(Installation inst, TraceRecorder recorder, Trace root) {
            this.inst = inst;
            this.root = root;
            // Maps by circuit made for every circuit at once rather than grown while the run fills them.
            int n = inst.circuits().size();
            circuitTrace = perCircuit(n);
            demand = perCircuit(n);
            designCurrent = perCircuit(n);
            powerFactor = perCircuit(n);
            connection = perCircuit(n);
            results = perCircuit(n);
            originals = perCircuit(n);
            calculated = perCircuit(n);
        }

        void calculate() {
            topology();
            supply();
            for (String b : boardOrder) {
                for (Circuit c : outgoing.getOrDefault(b, List.of())) {
                    if (!root.recording()) {
                        circuitTrace.put(c.id(), root);
                        continue;
                    }
                    String sub = c.isFeeder() ? "feeder " + c.from() + " → " + c.to() : "from " + c.from();
                    String title = "Circuit " + c.id() + (c.description().isEmpty() ? "" : " — " + c.description());
                    circuitTrace.put(c.id(), root.section(c.id(), title, sub));
                }
            }
            originTrace = root.section(boardOrder.get(0) + "/demand", "Demand at the origin board " + boardOrder.get(0),
                    boards.get(boardOrder.get(0)).description());
            // Each final circuit's design current depends on its load alone: side by side, kept in input order.
            List<Circuit> loaded = inst.circuits().stream().filter(c -> !c.isFeeder()).toList();
            List<SideBySide.Outcome<LoadFigures>> loads = SideBySide.map(loaded, this::loadDemand);
            for (int i = 0; i < loaded.size(); i++) {
                LoadFigures l = loads.get(i).get();
                String id = loaded.get(i).id();
                designCurrent.put(id, l.ib());
                if (l.pf() != null) powerFactor.put(id, l.pf());
                demand.put(id, l.demand());
            }
            for (String b : boardOrder) allocatePhases(b);
            for (int i = boardOrder.size() - 1; i >= 0; i--) boardDemand(boardOrder.get(i));
            Q zero = Given.derived(supplyTrace, "origin/dU", "Voltage drop at the origin", "ΔU", 0, Units.PERCENT,
                    "the origin is the reference point of the cumulative drop");
            boardDrop.put(boardOrder.get(0), zero);
            Sizing sizing = new Sizing(this);
            Map<String, Circuit> sized = sizing.run();
            // Top-down with the recording trace. The final circuits of a level depend only on the
            // feeders above them and write only into their own sections: they are calculated side
            // by side, and their results merged in calculation order.
            for (List<Circuit> out : levels()) {
                List<Circuit> finals = out.stream().filter(c -> !c.isFeeder()).toList();
                List<SideBySide.Outcome<Recorded>> recorded = SideBySide.map(finals,
                        original -> record(sizing, original, sized.get(original.id())));
                Map<String, SideBySide.Outcome<Recorded>> byId = new HashMap<>();
                for (int i = 0; i < finals.size(); i++) byId.put(finals.get(i).id(), recorded.get(i));
                for (Circuit original : out) {
                    Recorded r = original.isFeeder() ? record(sizing, original, sized.get(original.id())) : byId.get(original.id()).get();
                    Circuit c = r.result().circuit();
                    results.put(c.id(), r.result());
                    calculated.put(c.id(), r.calculated());
                    if (c.isFeeder()) boardDrop.put(c.to(), relabel(r.result().cumulativePercent(), "ΔU(" + c.to() + ")"));
                }
            }
        }

        /**
         * A circuit of the final pass: its result as calculated (what the circuits below read) and
         * as reported (with the check that governed its size).
         */
        private record Recorded(CircuitResult calculated, CircuitResult result) {}

        /** The results of the final pass as calculated, for the circuits below (results adds the governing check). */
        private final Map<String, CircuitResult> calculated;

        private Recorded record(Sizing sizing, Circuit original, Circuit c) {
            Trace ct = circuitTrace.get(c.id());
            sizing.record(ct, original, c);
            CircuitResult r = evaluate(c, ct, calculated, true);
            ct.complete();
            return new Recorded(r, r.withGoverning(sizing.governing(c.id(), r)));
        }

        void topology() {
            for (Circuit c : inst.circuits()) originals.put(c.id(), c);
            for (Board b : inst.boards()) boards.put(b.id(), b);
            for (Circuit c : inst.circuits()) {
                outgoing.computeIfAbsent(c.from(), k -> new ArrayList<>()).add(c);
                if (c.isFeeder()) feederOf.put(c.to(), c);
            }
            String origin = inst.boards().stream().filter(b -> !feederOf.containsKey(b.id())).findFirst()
                    .orElseThrow().id();
            Deque<String> queue = new ArrayDeque<>(List.of(origin));
            while (!queue.isEmpty()) {
                String b = queue.removeFirst();
                boardOrder.add(b);
                for (Circuit c : outgoing.getOrDefault(b, List.of())) if (c.isFeeder()) queue.addLast(c.to());
            }
        }

        void supply() {
            supplyTrace = root.section("supply", "Supply and origin", "");
            Basis basis = inst.basis();
            u = Given.input(supplyTrace, "supply/U", "Nominal line voltage", "U", inst.supply().lineVoltageV(), Units.V, "supply.line_voltage_v");
            u0 = Given.input(supplyTrace, "supply/U0", "Nominal phase voltage", "U_0", inst.supply().phaseVoltageV(), Units.V, "supply.phase_voltage_v");
            f = Given.setting(supplyTrace, "basis/f", "Supply frequency", "f", basis.frequencyHz(), Units.HZ, "default of this program");
            faultPath = new FaultPath(inst, data, u, u0, termFormulas);
            String origin = boardOrder.get(0);
            Trace ft = supplyTrace.section("fault/origin", "Fault level at the origin board " + origin, describeSource());
            originFault = faultPath.origin(ft, origin);
            boardChecks.put(origin, faultPath.boardWithstand(ft, boards.get(origin), originFault));
        }

        // ---------------- design current of final circuits ----------------

        /** A final circuit's design current, power factor (null where unknown) and demand. */
        record LoadFigures(Q ib, Q pf, LoadDemand demand) {}

        LoadFigures loadDemand(Circuit c) {
            Trace t = circuitTrace.get(c.id()).section(c.id() + "/ib", "Design current", "");
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
                                bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? u : u0));
            } else if (load.apparentKva() != null) {
                s = Given.input(t, id, "/S", "Apparent power", "S", load.apparentKva(), Units.KVA, path, ".apparent_kva");
                ib = (three ? DesignCurrentFormulas.THREE_PHASE_FROM_APPARENT : DesignCurrentFormulas.SINGLE_PHASE_FROM_APPARENT)
                        .eval(t, id, "/I_b", phaseForm + ", apparent power known", bind(DesignCurrentFormulas.S, s),
                                bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? u : u0));
                if (pf != null) {
                    p = DesignCurrentFormulas.ACTIVE_FROM_APPARENT.eval(t, id, "/P", "", bind(DesignCurrentFormulas.S, s),
                            bind(DesignCurrentFormulas.COS_PHI, pf));
                }
            } else {
                ib = Given.input(t, id, "/I_b", "Design current (load current given)", "I_b", load.currentA(), Units.A, path, ".current_a");
                s = (three ? DesignCurrentFormulas.APPARENT_THREE_PHASE_FROM_CURRENT : DesignCurrentFormulas.APPARENT_SINGLE_PHASE_FROM_CURRENT)
                        .eval(t, id, "/S", phaseForm, bind(DesignCurrentFormulas.I, ib),
                                bind(three ? DesignCurrentFormulas.U_LINE : DesignCurrentFormulas.U_PHASE, three ? u : u0));
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
                        String.format(Locale.ROOT, "design_current_a is given; the derived value was %s A", trim(derived.value())),
                        "I_b = design_current_a is used for this circuit's checks; the board's demand uses the load's power",
                        "design input", derived.id(), ib.id());
            }
            return new LoadFigures(ib, pf, new LoadDemand(c.id(), load.phases(), 0, p, q, s, pf != null));
        }

        // ---------------- phase allocation ----------------

        void allocatePhases(String board) {
            double[] load = new double[3];
            List<Circuit> auto = new ArrayList<>();
            for (Circuit c : outgoing.getOrDefault(board, List.of())) {
                if (c.isFeeder()) continue;
                LoadDemand d = demand.get(c.id());
                if (d.phases() == 3) {
                    for (int k = 0; k < 3; k++) load[k] += d.apparentKva() / 3;
                    connection.put(c.id(), "L1 L2 L3");
                } else if (c.phase() == Phase.AUTO) {
                    auto.add(c);
                } else {
                    int k = c.phase().ordinal();
                    load[k] += d.apparentKva();
                    demand.put(c.id(), withPhase(d, k + 1));
                    connection.put(c.id(), c.phase().token());
                    Given.decision(circuitTrace.get(c.id()), c.id() + "/phase", "Phase", "phase given in the design input",
                            "connected to " + c.phase().token(), "design input");
                }
            }
            auto.sort(Comparator.comparingDouble((Circuit c) -> -demand.get(c.id()).apparentKva()));
            for (Circuit c : auto) {
                int best = 0;
                for (int k = 1; k < 3; k++) if (load[k] < load[best] - 1e-12) best = k;
                Trace t = circuitTrace.get(c.id());
                String before = !t.recording() ? "" : "phase loads before allocation L1 " + trim(load[0]) + " kVA, L2 " + trim(load[1])
                        + " kVA, L3 " + trim(load[2]) + " kVA";
                LoadDemand d = demand.get(c.id());
                load[best] += d.apparentKva();
                demand.put(c.id(), withPhase(d, best + 1));
                connection.put(c.id(), "L" + (best + 1));
                if (t.recording()) Given.decision(t, c.id() + "/phase", "Phase (allocated)",
                        "phase: auto; " + before + " (largest single-phase loads first, each to the least-loaded phase)",
                        "connected to L" + (best + 1), "common practice, no source");
            }
        }

        LoadDemand withPhase(LoadDemand d, int phase) {
            return new LoadDemand(d.circuitId(), d.phases(), phase, d.p(), d.q(), d.s(), d.powerFactorKnown());
        }

        // ---------------- board demand and feeder design current ----------------

        void boardDemand(String boardId) {
            Board board = boards.get(boardId);
            Circuit feeder = feederOf.get(boardId);
            Trace t = feeder == null
                    ? originTrace
                    : circuitTrace.get(feeder.id()).section(feeder.id() + "/ib", "Design current", "from the demand of board " + boardId);
            String id = boardId + "/demand";
            Q d = Given.setting(t, id, "/d", "Diversity factor of board " + boardId, "d", board.diversity(), Units.NONE,
                    "default: no diversity");
            Q[] p = new Q[3];
            Q[] q = new Q[3];
            Q[] su = new Q[3];
            List<Circuit> circuits = outgoing.getOrDefault(boardId, List.of());
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
                        PhaseDemand child = boardDemand.get(c.to());
                        if (child.p()[k] != null) { pTerms.add(relabel(child.p()[k], "P_" + ph + "(" + c.to() + ")")); pThird.add(false); }
                        if (child.q()[k] != null) { qTerms.add(relabel(child.q()[k], "Q_" + ph + "(" + c.to() + ")")); qThird.add(false); }
                        if (child.unknownS()[k] != null) { sTerms.add(relabel(child.unknownS()[k], "S_u," + ph + "(" + c.to() + ")")); sThird.add(false); }
                    } else {
                        LoadDemand ld = demand.get(c.id());
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
            boardDemand.put(boardId, pd);

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
                        ? DemandFormulas.PHASE_CURRENT_BALANCED.evalAs("I_" + ph, t, id + "/I_" + ph, ph + ", balanced", bind(DemandFormulas.S, sk), bind(DemandFormulas.U, u))
                        : DemandFormulas.PHASE_CURRENT.evalAs("I_" + ph, t, id + "/I_" + ph, ph, bind(DemandFormulas.S, sk), bind(DemandFormulas.U0, u0));
                currents.add(relabel(ik, "I_" + ph));
                if (su[k] == null && sk.value() > 0) {
                    pfs.add(relabel(DemandFormulas.POWER_FACTOR.evalAs("cos φ_" + ph, t, id + "/cos_phi_" + ph, ph, bind(DemandFormulas.P, pk), bind(DemandFormulas.S, sk)), "cos φ_" + ph));
                } else {
                    pfs.add(null);
                }
            }
            phaseCurrents.put(boardId, currents);
            if (su[0] == null && su[1] == null && su[2] == null) {
                Q[] pp = new Q[3];
                Q[] qq = new Q[3];
                for (int k = 0; k < 3; k++) {
                    pp[k] = p[k] != null ? p[k] : zero(t, id + "/P0n_L" + (k + 1), "P_L" + (k + 1), Units.KW);
                    qq[k] = q[k] != null ? q[k] : zero(t, id + "/Q0n_L" + (k + 1), "Q_L" + (k + 1), Units.KVAR);
                }
                neutral.put(boardId,
                        DemandFormulas.NEUTRAL_CURRENT.eval(t, id, "/I_N", "phasor sum of the line currents",
                                bind(DemandFormulas.P1, pp[0]), bind(DemandFormulas.P2, pp[1]), bind(DemandFormulas.P3, pp[2]),
                                bind(DemandFormulas.Q1, qq[0]), bind(DemandFormulas.Q2, qq[1]), bind(DemandFormulas.Q3, qq[2]),
                                bind(DemandFormulas.U0, u0)));
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
                            String.format(Locale.ROOT, "design_current_a is given; the derived value was %s A", trim(derived.value())),
                            "I_b = design_current_a is used for this feeder's checks; upstream demand uses the board's power",
                            "design input", derived.id(), ib.id());
                }
                designCurrent.put(feeder.id(), ib);
                if (pfs.get(worst) != null) powerFactor.put(feeder.id(), pfs.get(worst));
                connection.put(feeder.id(), "L1 L2 L3");
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

        // ---------------- one circuit: device, capacity, impedance, drop, checks ----------------        // ---------------- one circuit: device, capacity, impedance, drop, checks ----------------

        /** Circuits in the order they are calculated: board by board from the origin. */
        List<Circuit> order() {
            List<Circuit> out = new ArrayList<>();
            for (String b : boardOrder) out.addAll(outgoing.getOrDefault(b, List.of()));
            return out;
        }

        /**
         * The circuits of {@link #order()} by the distance of their board from the origin: a circuit
         * depends only on the feeders above it, all of them in earlier levels, so a level's circuits
         * can be calculated side by side. Read level after level, the circuits are in {@link #order()}
         * (the boards are in breadth-first order).
         */
        List<List<Circuit>> levels() {
            Map<String, Integer> depth = new HashMap<>();
            List<List<Circuit>> levels = new ArrayList<>();
            for (String b : boardOrder) {
                Circuit feeder = feederOf.get(b);
                int d = feeder == null ? 0 : depth.get(feeder.from()) + 1;
                depth.put(b, d);
                if (d == levels.size()) levels.add(new ArrayList<>());
                levels.get(d).addAll(outgoing.getOrDefault(b, List.of()));
            }
            return levels;
        }

        /** The feeders from the origin down to the board a circuit starts at, origin first. */
        List<Circuit> pathTo(String board) {
            List<Circuit> path = new ArrayList<>();
            while (feederOf.containsKey(board)) {
                Circuit f = feederOf.get(board);
                path.add(0, f);
                board = f.from();
            }
            return path;
        }

        /** The evaluations of each circuit with the no-op trace kept for reuse, the latest first. */
        private final Map<String, Evaluated> evaluated = new java.util.concurrent.ConcurrentHashMap<>();

        /**
         * Drops the kept evaluations of the circuit's other sizes, which the sizing will not ask
         * for again. Only the memory changes: a kept evaluation saves work, never alters a result.
         */
        void forgetEvaluationsOtherThan(Circuit c) {
            evaluated.computeIfPresent(c.id(), (id, e) -> e.of(c));
        }

        /** The feeders from the origin down to each board, origin first. */
        private final Map<String, Circuit[]> feederPaths = new java.util.concurrent.ConcurrentHashMap<>();

        Circuit[] feederPath(String board) {
            return feederPaths.computeIfAbsent(board, b -> pathTo(b).toArray(new Circuit[0]));
        }

        /**
         * Calculates one circuit with fixed sizes. done holds the results of the upstream feeders.
         * With a no-op trace this is the cheap evaluation the sizing loop uses.
         */
        CircuitResult evaluate(Circuit c, Trace ct, Map<String, CircuitResult> done) {
            return evaluate(c, ct, done, false);
        }

        /**
         * @param finalPass true for the calculation of the chosen sizes whose results are reported:
         *                  only then does a feeder decide the withstand of the board it supplies
         *                  (with the recording trace or not), never for a sizing candidate
         */
        private CircuitResult evaluate(Circuit c, Trace ct, Map<String, CircuitResult> done, boolean finalPass) {
            return evaluate(c, ct, done, finalPass, null);
        }

        /**
         * A circuit's own figures with the no-op trace, for the sizing: its own voltage drop, and
         * the evaluations of protective conductors of another size, which reuse them.
         */
        OwnFigures ownFigures(Circuit c) {
            // The sizing asks again for circuits it has evaluated (the chosen size, a size tried before).
            OwnFigures known = Evaluated.ownFigures(evaluated.get(c.id()), c);
            return known != null ? known : ownFigures(c, (Capacity) null);
        }

        /** As {@link #ownFigures(Circuit)}, with the capacity a {@link #probe} has made. */
        OwnFigures ownFigures(Circuit c, Capacity known) {
            try {
                return ownFigures(c, Trace.noop(), known);
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        /** Calculates c, which differs from the circuit of own at most in its protective conductor, from own. */
        CircuitResult evaluate(Circuit c, OwnFigures own, Map<String, CircuitResult> done) {
            // A guard against a mistake in this class, asked of every protective-conductor candidate: the
            // tests run with assertions on.
            assert c.withCable(c.cable().withCpc(own.circuit().cable().cpc().mm2()))
                    .equals(own.circuit().withCable(own.circuit().cable().withCpc(own.circuit().cable().cpc().mm2())))
                    : c.id() + ": own figures of another circuit";
            return evaluate(c, Trace.noop(), done, false, own);
        }

        private CircuitResult evaluate(Circuit c, Trace ct, Map<String, CircuitResult> done, boolean finalPass, OwnFigures own) {
            try {
                if (ct.recording()) return evaluateUnchecked(c, ct, done, finalPass);
                Circuit[] path = feederPath(c.from());
                CircuitResult[] upstream = new CircuitResult[path.length];
                for (int i = 0; i < path.length; i++) upstream[i] = done.get(path[i].id());
                Evaluated before = evaluated.get(c.id());
                CircuitResult known = Evaluated.find(before, c, upstream);
                if (known == null) {
                    if (own == null) own = Evaluated.ownFigures(before, c);
                    if (own == null) own = ownFigures(c, ct);
                    known = completed(c, ct, own, done, finalPass);
                    evaluated.put(c.id(), new Evaluated(c, upstream, known, own, before).keep(EVALUATIONS_KEPT));
                } else if (finalPass && c.isFeeder()) {
                    boardChecks.put(c.to(), faultPath.boardWithstand(ct, boards.get(c.to()), known.downstream()));
                }
                return known;
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        private CircuitResult evaluateUnchecked(Circuit c, Trace ct, Map<String, CircuitResult> done, boolean finalPass) {
            return completed(c, ct, ownFigures(c, ct), done, finalPass);
        }

        /**
         * What a circuit's own sizes and conditions give, before the circuits upstream or its
         * protective conductor enter: the device, the capacity and its checks, the impedance and the
         * circuit's own voltage drop. checks is not to be changed (it is shared between the
         * evaluations that complete these figures); vt is the voltage-drop section, continued by them.
         */
        record OwnFigures(Circuit circuit, int phases, Q ib, Q pf, Q in, Q i2, Capacity cap, List<CheckResult> checks,
                          ImpedanceResult z, Trace vt, String vid, Q length, Q un, Q dropV, Q dropPct, Q dropExactPct, Q own) {}

        private OwnFigures ownFigures(Circuit c, Trace ct) {
            return ownFigures(c, ct, null);
        }

        /** @param known the circuit's capacity with the no-op trace where a probe has made it, else null */
        private OwnFigures ownFigures(Circuit c, Trace ct, Capacity known) {
            int phases = c.isFeeder() ? 3 : c.load().phases();
            Q ib = designCurrent.get(c.id());
            Q pf = powerFactor.get(c.id());
            String id = c.id();

            Trace dt = ct.recording() ? ct.section(id + "/dev", "Protective device", describeDevice(c.device())) : ct;
            Q in = c.device().ratingA() != null
                    ? Given.input(dt, id, "/dev/I_n", "Rated current of the device", "I_n", c.device().ratingA(), Units.A, c.where().path(),
                            ".device.rating_a")
                    : Given.lookupUsing(dt, capacityData.ratingAtLeast(id + "/dev/I_n", c.device().kind(), ib.value()), ib);
            Q k2 = Given.lookup(dt, capacityData.k2(id + "/dev/k2", c.device().kind()));
            Q i2 = CapacityFormulas.CONVENTIONAL_TRIPPING.eval(dt, id, "/dev/I_2", "", bind(CapacityFormulas.K2, k2),
                    bind(CapacityFormulas.I_N, in));

            Trace kt = ct.recording() ? ct.section(id + "/cap", "Current-carrying capacity", describeConditions(c)) : ct;
            Capacity cap = known != null && !kt.recording() ? known : capacity(kt, c, phases, ib);

            List<CheckResult> checks = new ArrayList<>();
            Q demand = cap.neutralDesign() != null ? cap.neutralDesign() : ib;
            checks.add(capacityCheck(kt, id, demand, in, cap.iz()));
            Q limit145 = CapacityFormulas.OVERLOAD_LIMIT.eval(kt, id, "/cap/1.45Iz", "", bind(CapacityFormulas.I_Z, cap.iz()));
            checks.add(check(kt, id, "/cap/overload", "overload", "Overload: I_2 ≤ 1.45 · I_z", relabel(i2, "I_2"), limit145,
                    "IEC 60364-4-43:2008, 433.1"));

            OwnDrop d = ownDrop(ct, c, phases, ib, pf, cap.iz());
            return new OwnFigures(c, phases, ib, pf, in, i2, cap, List.copyOf(checks), d.z(), d.vt(), d.vid(), d.length(), d.un(),
                    d.dropV(), d.dropPct(), d.dropExactPct(), d.own());
        }

        /** A circuit's impedance and own voltage drop (sections z and vd), the part of its own figures its drop needs. */
        record OwnDrop(ImpedanceResult z, Trace vt, String vid, Q length, Q un, Q dropV, Q dropPct, Q dropExactPct, Q own) {}

        /** @param iz the circuit's current-carrying capacity, read only where the conductor temperature is estimated from it */
        private OwnDrop ownDrop(Trace ct, Circuit c, int phases, Q ib, Q pf, Q iz) {
            String id = c.id();
            Trace zt = ct.recording() ? ct.section(id + "/z", "Cable impedance", describeCable(c.cable())) : ct;
            Q theta = temperature(zt, c, ib, iz);
            ImpedanceResult z = impedance.impedance(zt, id + "/z", c.cable(), theta, f, phases);

            Trace vt = !ct.recording() ? ct : ct.section(id + "/vd", "Voltage drop", phases == 3 ? "three-phase, referred to U" : "single-phase, referred to U_0");
            String vid = id + "/vd";
            Q length = Given.input(vt, vid, "/L", "Route length", "L", c.lengthM(), Units.M, c.where().path(), ".length_m");
            Q un = Given.alias("U_n", phases == 3 ? u : u0);
            Q dropV;
            Q sin = null;
            if (pf != null) {
                sin = VoltageDropFormulas.SIN_FROM_COS.eval(vt, vid, "/sin_phi", "", bind(VoltageDropFormulas.COS_PHI, pf));
                dropV = VoltageDropFormulas.APPROXIMATE.eval(vt, vid, "/dU", "power factor known", bind(VoltageDropFormulas.R, z.r()),
                        bind(VoltageDropFormulas.X, z.x()), bind(VoltageDropFormulas.COS_PHI, pf), bind(VoltageDropFormulas.SIN_PHI, sin),
                        bind(VoltageDropFormulas.I, ib), bind(VoltageDropFormulas.L, length));
            } else {
                dropV = VoltageDropFormulas.UNKNOWN_POWER_FACTOR.eval(vt, vid, "/dU", "power factor unknown",
                        bind(VoltageDropFormulas.Z, z.z()), bind(VoltageDropFormulas.I, ib), bind(VoltageDropFormulas.L, length));
            }
            Q dropPct = VoltageDropFormulas.PERCENT_OF_NOMINAL.eval(vt, vid, "/dU_pct", "", bind(VoltageDropFormulas.DU, dropV),
                    bind(VoltageDropFormulas.U_N, un));
            Q dropExactPct = null;
            double quadrature = pf == null ? 0
                    : ib.value() * length.value() * (z.x().value() * pf.value() - z.r().value() * sin.value()) / 1000;
            boolean exactSolvable = pf != null && Math.abs(quadrature) < un.value();
            if (pf != null && !exactSolvable) {
                if (vt.recording()) Given.decision(vt, vid + "/exact-none", "Voltage drop, exact phasor form",
                        "the quadrature drop I_b·L·(x·cos φ − r·sin φ) exceeds U_n",
                        "the exact form has no solution: the cable cannot deliver I_b over this length", "circuit theory", dropPct.id());
            }
            if (exactSolvable) {
                Q dropExact = VoltageDropFormulas.EXACT.evalAs("ΔU_exact", vt, vid, "/dU_exact", "phasor form",
                        bind(VoltageDropFormulas.U_N, un), bind(VoltageDropFormulas.R, z.r()), bind(VoltageDropFormulas.X, z.x()),
                        bind(VoltageDropFormulas.COS_PHI, pf), bind(VoltageDropFormulas.SIN_PHI, sin), bind(VoltageDropFormulas.I, ib),
                        bind(VoltageDropFormulas.L, length));
                dropExactPct = relabel(VoltageDropFormulas.PERCENT_OF_NOMINAL.evalAs("ΔU_exact", vt, vid, "/dU_exact_pct", "exact form",
                        bind(VoltageDropFormulas.DU, dropExact), bind(VoltageDropFormulas.U_N, un)), "ΔU_exact");
            }
            boolean exactGoverns = inst.basis().voltageDropMethod().value() == DropMethod.EXACT && dropExactPct != null;
            if (inst.basis().voltageDropMethod().value() == DropMethod.EXACT) {
                if (vt.recording()) Given.decision(vt, vid + "/method", "Voltage-drop form checked", "basis.voltage_drop_method = exact"
                                + (dropExactPct == null ? ", but the exact form is not available" : ""),
                        dropExactPct == null ? "the approximate form governs" : "the exact phasor form governs",
                        "design input", (dropExactPct == null ? dropPct : dropExactPct).id());
            } else {
                if (vt.recording()) Given.decision(vt, vid + "/method", "Voltage-drop form checked",
                        "basis.voltage_drop_method = approximate" + (inst.basis().voltageDropMethod().given() ? "" : " (default)"),
                        "the approximate form governs" + (dropExactPct != null ? "; the exact form is shown for comparison" : ""),
                        "IEC 60364-5-52:2009, Annex G", dropPct.id());
            }
            Q own = relabel(exactGoverns ? dropExactPct : dropPct, "ΔU(" + id + ")");
            return new OwnDrop(z, vt, vid, length, un, dropV, dropPct, dropExactPct, own);
        }

        /**
         * A circuit's own voltage drop with the no-op trace, for the sizing's weighing of a larger
         * size: the device and the capacity checks are not made, and the capacity only where the
         * conductor temperature is estimated from it.
         */
        Q ownDrop(Circuit c) {
            try {
                OwnFigures known = Evaluated.ownFigures(evaluated.get(c.id()), c);
                if (known != null) return known.own();
                int phases = c.isFeeder() ? 3 : c.load().phases();
                Q ib = designCurrent.get(c.id());
                Q iz = inst.basis().conductorTemperature().value() == ConductorTemperature.MAXIMUM ? null
                        : capacity(Trace.noop(), c, phases, ib).iz();
                return ownDrop(Trace.noop(), c, phases, ib, powerFactor.get(c.id()), iz).own();
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        /** The rest of the calculation of c from its own figures: cumulative drop, motor starting, fault path. */
        private CircuitResult completed(Circuit c, Trace ct, OwnFigures o, Map<String, CircuitResult> done, boolean finalPass) {
            String id = c.id();
            List<CheckResult> checks = new ArrayList<>(o.checks());
            Trace vt = o.vt();
            Q cumulative = cumulative(vt, c, o.own(), done);
            Q limit = null;
            Q dip = null;
            if (c.isFeeder()) {
                if (vt.recording()) Given.note(vt, o.vid() + "/board", "Cumulative drop at board " + c.to(),
                        "Checked against the limit at the terminals of each load supplied from " + c.to() + ".", "");
            } else {
                limit = limit(vt, c);
                checks.add(check(vt, o.vid(), "/check", "voltage-drop", "Voltage drop, origin to terminals", cumulative, limit,
                        "IEC 60364-5-52:2009, 525 and Annex G"));
                if (c.load().kind() == LoadKind.MOTOR && c.load().startingCurrentMultiple() != null) {
                    Trace st = !ct.recording() ? ct : ct.section(id + "/st", "Motor starting", "voltage dip at the motor terminals while it starts");
                    MotorStart start = motorStart(st, c, o, done);
                    dip = start.dip();
                    checks.add(start.check());
                } else if (c.load().kind() == LoadKind.MOTOR) {
                    if (vt.recording()) Given.note(vt, id + "/st/none", "Motor starting",
                            "No starting_current_multiple is given: the starting dip is not checked.", "");
                }
            }
            Trace ft = !ct.recording() ? ct : ct.section(id + "/fault", "Fault path", "earth-fault loop, disconnection, short-circuit withstand, breaking capacity");
            Q thetaMax = data.maxTemperature(ft, id, "/fault/theta_max", c.cable().insulation());
            FaultPath.CircuitFault fault = faultPath.circuit(ft, c, o.z(), boardFault(c.from(), done), o.length(), o.in(), o.phases(),
                    thetaMax, o.checks().stream().allMatch(CheckResult::pass));
            checks.addAll(fault.checks());
            if (c.isFeeder() && finalPass) {
                boardChecks.put(c.to(), faultPath.boardWithstand(ft, boards.get(c.to()), fault.downstream()));
            }
            String governing = closestToLimit(checks);
            return new CircuitResult(id, c, o.phases(), connection.getOrDefault(id, "L1 L2 L3"), o.ib(), o.pf(),
                    c.isFeeder() ? neutral.get(c.to()) : null, o.in(), o.i2(), o.cap().it(), o.cap().factor(), o.cap().iz(), o.z(),
                    o.length(), o.dropV(), o.dropPct(), o.dropExactPct(), cumulative, limit, dip, fault.prospective(), fault.zs(),
                    fault.zsMax(), fault.iefMin(), fault.downstream(), List.copyOf(checks), governing);
        }

        /**
         * The capacity check alone (device and tabulated capacity), for skipping sizes quickly while
         * sizing; the reason in words, or null when it passes.
         */
        String capacityShortfall(Circuit c) {
            return probe(c).shortfall();
        }

        /** The capacity check alone: why it fails (null where it passes), and the capacity, for the evaluation that may follow. */
        record Probe(String shortfall, Capacity capacity) {}

        Probe probe(Circuit c) {
            Trace t = Trace.noop();
            int phases = c.isFeeder() ? 3 : c.load().phases();
            Q ib = designCurrent.get(c.id());
            double in = c.device().ratingA() != null ? c.device().ratingA()
                    : capacityData.ratingAtLeast("probe", c.device().kind(), ib.value()).value();
            Capacity cap = capacity(t, c, phases, ib);
            double need = cap.neutralDesign() != null ? Math.max(in, cap.neutralDesign().value()) : in;
            if (cap.iz().value() + 1e-9 < need) {
                return new Probe("I_z " + trim(cap.iz().value()) + " A < I_n " + trim(in) + " A", cap);
            }
            return new Probe(null, cap);
        }

        /** The check nearest its limit; on a tie, the one listed first. */
        String closestToLimit(List<CheckResult> checks) {
            CheckResult best = null;
            for (CheckResult k : checks) if (best == null || k.utilisation() > best.utilisation() + 1e-9) best = k;
            return best == null ? "voltage-drop" : best.name();
        }

        /** Tabulated capacity, the correction factors that apply, and I_z. */
        record Capacity(Q it, Q factor, Q iz, Q neutralDesign) {}

        Capacity capacity(Trace t, Circuit c, int phases, Q ib) {
            String id = c.id() + "/cap";
            Cable cable = c.cable();
            Method method = c.conditions().method();
            int loaded = phases == 3 ? 3 : 2;
            if (t.recording()) Given.decision(t, id + "/loaded", "Loaded conductors", phases == 3 ? "three-phase circuit (neutral current not counted)"
                    : "single-phase circuit: line and neutral", loaded + " loaded conductors", "IEC 60364-5-52:2009, 523.6");
            Q it = capacityData.tabulated(t, id, "/I_t", cable.insulation(), cable.conductor(), method, loaded,
                    cable.type(), cable.formation(), cable.size().mm2());
            List<Q> factors = new ArrayList<>();
            boolean ground = method == Method.D1 || method == Method.D2;
            Setting<Double> amb = c.conditions().ambientC().given() ? c.conditions().ambientC()
                    : (ground ? inst.basis().ambientGroundC() : inst.basis().ambientAirC());
            Q thetaA = Given.setting(t, id, "/theta_a", ground ? "Ground temperature" : "Ambient air temperature", "θ_a", amb, Units.DEG_C,
                    ground ? "IEC 60364-5-52:2009, reference ground temperature 20 °C" : "IEC 60364-5-52:2009, reference ambient 30 °C");
            factors.add(Given.lookupUsing(t, ground ? capacityData.ambientGround(id + "/C_a", cable.insulation(), amb.value())
                    : capacityData.ambientAir(id + "/C_a", cable.insulation(), amb.value()), thetaA));
            int n = c.conditions().groupedCircuits();
            if (n > 1) {
                factors.add(Given.lookup(t, capacityData.grouping(id + "/C_g", method, c.conditions().groupArrangement(), n)));
            } else {
                if (t.recording()) Given.decision(t, id + "/C_g", "Grouping", "grouped_circuits = 1" + (c.conditions().groupedCircuits() == 1 ? " (alone)" : ""),
                        "no grouping factor", "IEC 60364-5-52:2009, Table B.52.17");
            }
            if (c.conditions().thermalInsulationMm() > 0) {
                factors.add(Given.lookup(t, capacityData.thermalInsulation(id + "/C_i", c.conditions().thermalInsulationMm())));
            }
            if (ground) {
                Q rho = Given.setting(t, id, "/rho", "Soil thermal resistivity", "ρ_T", c.conditions().soilResistivityKmW(), "K·m/W",
                        "IEC 60364-5-52:2009, reference 2.5 K·m/W");
                factors.add(Given.lookupUsing(t, capacityData.soil(id + "/C_s", method, rho.value()), rho));
            }
            Q neutralDesign = null;
            Double h = c.conditions().thirdHarmonicPercent();
            boolean fourCore = cable.type() == CableType.MULTICORE && cable.cores() >= 4 && phases == 3;
            if (h != null && h > 0 && fourCore) {
                CapacityData.Harmonic band = capacityData.harmonic(id + "/C_h", h);
                factors.add(Given.lookup(t, band.factor()));
                if (band.neutralBasis()) {
                    Q hq = Given.input(t, id, "/h", "Third-harmonic content", "h", h, Units.PERCENT, c.where().path(),
                            ".installation.third_harmonic_percent");
                    neutralDesign = CapacityFormulas.NEUTRAL_FROM_HARMONICS.eval(t, id, "/I_N", "size by the neutral current",
                            bind(CapacityFormulas.H, hq), bind(CapacityFormulas.I_B, ib));
                }
            } else if (h != null && h > 0) {
                if (t.recording()) Given.note(t, id + "/C_h", "Third-harmonic currents", "The harmonic reduction of IEC 60364-5-52 Annex E applies to four- and five-core cables of three-phase circuits only; not applied here.",
                        "IEC 60364-5-52:2009, Annex E");
            }
            Q product = termFormulas.eval(t, id + "/C", "", "correction-product", "C", "c", Units.NONE, factors,
                    CapacityFormulas::correctionProduct);
            Q iz;
            if (cable.parallel() > 1) {
                Q np = Given.derived(t, id, "/n", "Conductors in parallel per phase", "n", cable.parallel(), Units.NONE,
                        "design input (cable.parallel)");
                iz = CapacityFormulas.CAPACITY_PARALLEL.eval(t, id, "/I_z", "", bind(CapacityFormulas.N, np),
                        bind(CapacityFormulas.I_T, it), bind(CapacityFormulas.C, product));
            } else {
                iz = CapacityFormulas.CAPACITY.eval(t, id, "/I_z", "", bind(CapacityFormulas.I_T, it), bind(CapacityFormulas.C, product));
            }
            return new Capacity(it, product, iz, neutralDesign);
        }

        /**
         * Ib ≤ In ≤ Iz, reported with the contract's convention: value I_z against limit I_n, or,
         * where I_b exceeds I_n, value I_n against limit I_b (the comparison that fails).
         */
        CheckResult capacityCheck(Trace t, String circuit, Q ib, Q in, Q iz) {
            boolean first = ib.value() <= in.value() + 1e-9;
            boolean second = in.value() <= iz.value() + 1e-9;
            if (t.recording()) {
                String id = circuit + "/cap/check";
                t.add(new Step.Check(id + "1", "Coordination: I_b ≤ I_n", "capacity", relabel(ib, ib.symbol()), "≤", relabel(in, "I_n"),
                        first, "IEC 60364-4-43:2008, 433.1"));
                t.add(new Step.Check(id + "2", "Coordination: I_n ≤ I_z", "capacity", relabel(in, "I_n"), "≤", relabel(iz, "I_z"),
                        second, "IEC 60364-4-43:2008, 433.1"));
            }
            if (!first) return new CheckResult("capacity", "Ib ≤ In ≤ Iz", false, in.value(), ib.value(), Units.A, true, circuit, "/cap/check1");
            return new CheckResult("capacity", "Ib ≤ In ≤ Iz", second, iz.value(), in.value(), Units.A, true, circuit, "/cap/check2");
        }

        Q temperature(Trace t, Circuit c, Q ib, Q iz) {
            String id = c.id() + "/z";
            Q thetaMax = data.maxTemperature(t, id, "/theta_max", c.cable().insulation());
            Setting<ConductorTemperature> setting = inst.basis().conductorTemperature();
            if (setting.value() == ConductorTemperature.MAXIMUM || ib.value() >= iz.value()) {
                String because = setting.value() == ConductorTemperature.MAXIMUM
                        ? "basis.conductor_temperature = maximum" + (setting.given() ? "" : " (default)")
                        : "basis.conductor_temperature = estimated, but I_b ≥ I_z";
                if (t.recording()) Given.decision(t, id + "/theta", "Conductor temperature for the voltage drop", because,
                        "θ = θ_max of " + c.cable().insulation().token().toUpperCase(Locale.ROOT) + " = " + trim(thetaMax.value()) + " °C",
                        "IEC 60364-5-52:2009, Table 52.1", thetaMax.id());
                return relabel(thetaMax, "θ");
            }
            boolean ground = c.conditions().method() == Method.D1 || c.conditions().method() == Method.D2;
            Setting<Double> amb = c.conditions().ambientC().given() ? c.conditions().ambientC()
                    : (ground ? inst.basis().ambientGroundC() : inst.basis().ambientAirC());
            Q thetaA = Given.setting(t, id, "/theta_a", ground ? "Ground temperature" : "Ambient air temperature", "θ_a", amb, Units.DEG_C,
                    "IEC 60364-5-52:2009, reference ambient");
            return ImpedanceFormulas.ESTIMATED_TEMPERATURE.eval(t, id, "/theta", "estimated", bind(ImpedanceFormulas.THETA_A, thetaA),
                    bind(ImpedanceFormulas.THETA_MAX, thetaMax), bind(ImpedanceFormulas.I_B, ib),
                    bind(ImpedanceFormulas.I_REF, iz));
        }

        Q cumulative(Trace t, Circuit c, Q own, Map<String, CircuitResult> done) {
            List<Q> terms = new ArrayList<>();
            for (Circuit f : feederPath(c.from())) {
                CircuitResult r = done.get(f.id());
                Q used = r.dropExactPercent() != null && inst.basis().voltageDropMethod().value() == DropMethod.EXACT
                        ? r.dropExactPercent() : r.dropPercent();
                // Shown by the feeder's name; a candidate's sum (no-op trace) reads only the value.
                terms.add(t.recording() ? relabel(used, "ΔU(" + f.id() + ")") : used);
            }
            terms.add(own);
            if (terms.size() == 1) {
                return relabel(own, "ΔU_total");
            }
            return termFormulas.eval(t, c.id(), "/vd/dU_total", "", "cumulative-drop", "ΔU_total", "d", Units.PERCENT, terms,
                    vars -> DemandFormulas.sum("cumulative-drop", "Voltage drop, origin to " + (c.isFeeder() ? "board " + c.to() : "terminals"),
                            "ΔU_total", Units.PERCENT, vars, "Drops add along the path from the origin (each feeder's percentage plus the circuit's own)"));
        }

        Q limit(Trace t, Circuit c) {
            Basis basis = inst.basis();
            if (basis.limitsByKind()) {
                String kind = c.load().kind().token();
                boolean own = basis.voltageDropLimitsByKind().containsKey(kind);
                String key = own ? kind : LoadKind.OTHER.token();
                double limit = basis.voltageDropLimitsByKind().get(key);
                // The texts of the step are written only where it is recorded (not for sizing candidates).
                if (!t.recording()) return new Q(c.id(), "/vd/limit", "ΔU_max", limit, Units.PERCENT);
                return Given.input(t, c.id() + "/vd/limit", "Voltage-drop limit for " + kind + " loads", "ΔU_max", limit, Units.PERCENT,
                        basis.voltageDropLimitsPath() + "." + key);
            }
            return Given.setting(t, c.id(), "/vd/limit", "Voltage-drop limit, origin to terminals", "ΔU_max", basis.voltageDropLimitPercent(),
                    Units.PERCENT, "default of this program: 4 % (IEC 60364-5-52:2009, Annex G, Table G.52.1, other uses, public supply)");
        }

        Q starting(Trace t, Circuit c, ImpedanceResult z, Q ib, Q length, Q un, Map<String, CircuitResult> done) {
            String id = c.id() + "/st";
            Q k = Given.input(t, id, "/k_st", "Starting current multiple", "k_st", c.load().startingCurrentMultiple(), Units.NONE,
                    c.where().path(), ".load.starting_current_multiple");
            Q ist = DesignCurrentFormulas.STARTING_CURRENT.eval(t, id, "/I_st", "", bind(DesignCurrentFormulas.K_ST, k),
                    bind(DesignCurrentFormulas.I_B, ib));
            Q cosSt = Given.setting(t, id, "/cos_phi_st", "Power factor while starting", "cos φ_st", c.load().startingPowerFactor(),
                    Units.NONE, "default of this program: 0.3 (common practice, no source)");
            Q sinSt = VoltageDropFormulas.SIN_FROM_COS_STARTING.eval(t, id, "/sin_phi_st", "", bind(VoltageDropFormulas.COS_ST, cosSt));
            Q du = VoltageDropFormulas.MOTOR_STARTING.eval(t, id, "/dU", "", bind(VoltageDropFormulas.R, z.r()),
                    bind(VoltageDropFormulas.X, z.x()), bind(VoltageDropFormulas.COS_ST, cosSt), bind(VoltageDropFormulas.SIN_ST, sinSt),
                    bind(VoltageDropFormulas.I_ST, ist), bind(VoltageDropFormulas.L, length));
            Q own = relabel(VoltageDropFormulas.PERCENT_OF_NOMINAL.evalAs("ΔU_st", t, id, "/dU_pct", "",
                    bind(VoltageDropFormulas.DU, du), bind(VoltageDropFormulas.U_N, un)), "ΔU_st(" + c.id() + ")");
            List<Q> terms = new ArrayList<>();
            int phases = c.load().phases();
            for (Circuit f : feederPath(c.from())) {
                CircuitResult fr = done.get(f.id());
                ImpedanceResult fz = phases == 3 ? fr.impedance()
                        : impedance.mvPerAm(t, id + "/" + f.id() + "/z", fr.impedance().theta(), fr.impedance().resistance(),
                        fr.impedance().reactance(), 1);
                Q inc = VoltageDropFormulas.STARTING_INCREMENT.eval(t, id + "/" + f.id() + "/inc", "feeder " + f.id(),
                        bind(VoltageDropFormulas.R, fz.r()), bind(VoltageDropFormulas.X, fz.x()), bind(VoltageDropFormulas.COS_ST, cosSt),
                        bind(VoltageDropFormulas.SIN_ST, sinSt), bind(VoltageDropFormulas.I_ST, ist), bind(VoltageDropFormulas.I_B, ib),
                        bind(VoltageDropFormulas.L, fr.length()), bind(VoltageDropFormulas.U_N, un));
                terms.add(relabel(fr.dropPercent(), "ΔU(" + f.id() + ")"));
                terms.add(relabel(inc, "ΔU_st(" + f.id() + ")"));
            }
            terms.add(own);
            if (terms.size() == 1) return relabel(own, "ΔU_st,total");
            return termFormulas.eval(t, id + "/dU_total", "", "starting-dip-total", "ΔU_st,total", "d", Units.PERCENT, terms,
                    vars -> DemandFormulas.sum("starting-dip-total", "Voltage dip at the motor terminals while it starts", "ΔU_st,total",
                            Units.PERCENT, vars, "Running drop of each upstream feeder, its added drop from the starting current, and the motor circuit's drop at starting current"));
        }

        /** A gap in the tables, named by the circuit where it was met (unless it already is). */
        private static DataGapException locatedAt(Circuit c, DataGapException e) {
            if (e.located()) return e;
            return new DataGapException(c.where().text() + ": " + c.where().path() + " (" + c.id() + "): " + e.getMessage(), true);
        }

        /** A motor's dip while it starts and its check against the limit. */
        record MotorStart(Q dip, CheckResult check) {}

        private MotorStart motorStart(Trace st, Circuit c, OwnFigures o, Map<String, CircuitResult> done) {
            String id = c.id();
            Q dip = starting(st, c, o.z(), o.ib(), o.length(), o.un(), done);
            Q stLimit = Given.setting(st, id, "/st/limit", "Limit of the starting dip", "ΔU_st,max",
                    inst.basis().motorStartingLimitPercent(), Units.PERCENT,
                    "default of this program (common practice, no source)");
            return new MotorStart(dip, check(st, id, "/st/check", "motor-starting", "Voltage dip while the motor starts", dip, stLimit,
                    "common practice, no source"));
        }

        /**
         * The motor-starting check of a motor circuit with the no-op trace, under the feeder results
         * in done: what the sizing reads of a motor while the feeders above it grow (the dip adds
         * their drops; the rest of the motor's figures is calculated again in the final pass).
         */
        CheckResult motorStartCheck(Circuit c, Map<String, CircuitResult> done) {
            try {
                return motorStart(Trace.noop(), c, ownFigures(c), done).check();
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        /** value ≤ limit, for the step owner + part (joined only where the step is recorded or its id read). */
        CheckResult check(Trace t, String owner, String part, String name, String title, Q value, Q limit, String reference) {
            boolean pass = value.value() <= limit.value() + 1e-12;
            if (t.recording()) {
                t.add(new Step.Check(owner + part, title, name, value, "≤", limit, pass, reference));
            }
            return new CheckResult(name, title, pass, value.value(), limit.value(), limit.unit(), false, owner, part);
        }

        String describeSource() {
            Supply.Source s = inst.supply().source();
            if (s instanceof Supply.Transformer t) return trim(t.ratingKva()) + " kVA transformer, u_k " + trim(t.impedancePercent()) + " %";
            return "supply from the distribution network";
        }

        BoardFault boardFault(String board, Map<String, CircuitResult> done) {
            Circuit feeder = feederOf.get(board);
            return feeder == null ? originFault : done.get(feeder.id()).downstream();
        }

        String describeDevice(Device d) {
            String kind = switch (d.kind()) {
                case MCB -> "MCB" + (d.curve() == null ? "" : " type " + d.curve().token());
                case RCBO -> "RCBO" + (d.curve() == null ? "" : " type " + d.curve().token());
                case MCCB -> "MCCB";
                case FUSE -> "gG fuse";
            };
            return kind + (d.ratingA() == null ? ", rating auto" : ", " + trim(d.ratingA()) + " A");
        }

        String describeConditions(Circuit c) {
            Conditions k = c.conditions();
            return "method " + k.method().token() + (k.groupedCircuits() > 1 ? ", grouped with " + (k.groupedCircuits() - 1)
                    + " other circuit" + (k.groupedCircuits() > 2 ? "s" : "") + " (" + k.groupArrangement().token() + ")" : ", alone");
        }

        String describeCable(Cable cable) {
            String size = (cable.parallel() > 1 ? cable.parallel() + " × " : "") + ReferenceData.sizeKey(cable.size().mm2()) + " mm²";
            String kind = cable.type() == CableType.MULTICORE ? cable.cores() + "-core" : "single-core, " + cable.formation().token();
            return size + " " + cable.conductor().token() + ", " + cable.insulation().token().toUpperCase(Locale.ROOT) + ", " + kind;
        }

        Circuit original(String id) {
            return originals.get(id);
        }

        CapacityData capacityData() {
            return capacityData;
        }

        List<BoardResult> boardResults() {
            List<BoardResult> out = new ArrayList<>();
            for (Board b : inst.boards()) {
                Circuit feeder = feederOf.get(b.id());
                BoardFault bf = feeder == null ? originFault : results.get(feeder.id()).downstream();
                out.add(new BoardResult(b.id(), b.description(), feeder == null ? null : feeder.id(), boardDrop.get(b.id()),
                        phaseCurrents.get(b.id()), neutral.get(b.id()), bf.ik3(), bf.ze(), boardChecks.getOrDefault(b.id(), List.of())));
            }
            return out;
        }

        List<CircuitResult> circuitResults() {
            return inst.circuits().stream().map(c -> results.get(c.id())).toList();
        }
    }

    /**
     * A value with three decimals and no trailing zeros ("1.25", "16", "-0"): the same text as
     * String.format("%.3f") with the zeros stripped, without the formatter (this runs for every
     * candidate the sizing tries).
     */
    static String trim(double v) {
        if (!Double.isFinite(v)) return Double.toString(v);
        // Whole numbers (ratings, sizes, lengths) are most of them: the same text without BigDecimal.
        if (v != 0 && v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        long k = thousandths(v);
        if (k != UNSURE) return k == 0 ? zero(v, "0") : withThousandths(k, true);
        java.math.BigDecimal d = threeDecimals(v);
        if (d.signum() == 0) return zero(v, "0");
        return d.stripTrailingZeros().toPlainString();
    }

    /**
     * A value with three decimals ("1.250", "-0.000"): the same text as String.format(Locale.ROOT,
     * "%.3f", v), without the formatter, which costs tens of microseconds a call before the JIT has
     * compiled it (the balancing writes several per step). Both round half up the shortest decimal
     * form of the value, Double.toString's.
     */
    static String fixed3(double v) {
        if (!Double.isFinite(v)) return Double.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity";
        long k = thousandths(v);
        if (k != UNSURE) return k == 0 ? zero(v, "0.000") : withThousandths(k, false);
        java.math.BigDecimal d = threeDecimals(v);
        String plain = d.toPlainString();
        return d.signum() == 0 ? zero(v, plain) : plain;
    }

    private static final long UNSURE = Long.MIN_VALUE;

    /**
     * The value in thousandths, rounded as threeDecimals rounds it, or UNSURE. The shortest decimal
     * form lies within an ulp of the value and 1000 · v is within an ulp of its product: where no
     * rounding boundary (a half thousandth) lies within those distances of the product, both round
     * the same way, and no decimal string need be made. Near a boundary the caller takes the
     * decimal route.
     */
    private static long thousandths(double v) {
        double x = v * 1000;
        if (!(Math.abs(x) < 0x1p52)) return UNSURE;
        double below = Math.floor(x);
        double fromHalf = Math.abs(x - below - 0.5);
        if (fromHalf <= 2 * (Math.ulp(x) + 1000 * Math.ulp(v))) return UNSURE;
        return (long) (x - below < 0.5 ? below : below + 1);
    }

    /** "-0" style text for a value that rounds to zero: negative values keep their sign, as BigDecimal's text does not. */
    private static String zero(double v, String plain) {
        return v < 0 || (v == 0 && 1 / v < 0) ? "-" + plain : plain;
    }

    /** k thousandths as plain text: "12.5" (trailing zeros stripped) or "12.500". */
    private static String withThousandths(long k, boolean strip) {
        long a = Math.abs(k);
        long whole = a / 1000;
        int frac = (int) (a % 1000);
        StringBuilder b = new StringBuilder(24);
        if (k < 0) b.append('-');
        b.append(whole);
        if (strip && frac == 0) return b.toString();
        b.append('.');
        int digits = 3;
        if (strip) while (frac % 10 == 0) { frac /= 10; digits--; }
        String f = Integer.toString(frac);
        for (int i = f.length(); i < digits; i++) b.append('0');
        return b.append(f).toString();
    }

    /** The shortest decimal form of a finite value (Double.toString's) rounded half up to three decimals. */
    private static java.math.BigDecimal threeDecimals(double v) {
        return new java.math.BigDecimal(Double.toString(v)).setScale(3, java.math.RoundingMode.HALF_UP);
    }
}
