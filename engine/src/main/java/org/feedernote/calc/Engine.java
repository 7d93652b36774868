package org.feedernote.calc;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.data.CapacityData;
import org.feedernote.data.DataGapException;
import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Formula;
import org.feedernote.formula.TermFormulas;
import org.feedernote.formula.Units;
import org.feedernote.model.*;
import org.feedernote.trace.Q;
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
        return new Result(inst, run.boardResults(), run.circuitResults(), root.toSection(), NOT_YET, run.faultPath.sourceAssumptions());
    }

    /** Evaluations of a circuit kept for reuse: enough for a step undone and for the final pass. */
    private static final int EVALUATIONS_KEPT = 3;

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
        /** The phase (0, 1, 2) of each feeder to a single-phase board. */
        final Map<String, Integer> feederPhase = new HashMap<>();
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

        /** The stages of the calculation, each in its own class, working on this run's state. */
        final LoadCalc loadCalc;
        final DemandCalc demandCalc;
        final CapacityCalc capacityCalc;
        final DropCalc dropCalc;

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
            loadCalc = new LoadCalc(this);
            demandCalc = new DemandCalc(this, phaseSums);
            capacityCalc = new CapacityCalc(this, capacityData, termFormulas);
            dropCalc = new DropCalc(this, data, impedance, termFormulas);
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
            List<SideBySide.Outcome<LoadCalc.LoadFigures>> loads = SideBySide.map(loaded, loadCalc::loadDemand);
            for (int i = 0; i < loaded.size(); i++) {
                LoadCalc.LoadFigures l = loads.get(i).get();
                String id = loaded.get(i).id();
                designCurrent.put(id, l.ib());
                if (l.pf() != null) powerFactor.put(id, l.pf());
                demand.put(id, l.demand());
            }
            for (String b : boardOrder) loadCalc.allocatePhases(b);
            for (int i = boardOrder.size() - 1; i >= 0; i--) demandCalc.boardDemand(boardOrder.get(i));
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
                    if (c.isFeeder()) boardDrop.put(c.to(), r.result().cumulativePercent().as("ΔU(" + c.to() + ")"));
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

        // ---------------- one circuit: device, capacity, impedance, drop, checks ----------------

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
            return known != null ? known : ownFigures(c, (CapacityCalc.Capacity) null);
        }

        /** As {@link #ownFigures(Circuit)}, with the capacity a {@link #probe} has made. */
        OwnFigures ownFigures(Circuit c, CapacityCalc.Capacity known) {
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
        record OwnFigures(Circuit circuit, int phases, Q ib, Q pf, Q in, Q i2, CapacityCalc.Capacity cap, List<CheckResult> checks,
                          ImpedanceResult z, Trace vt, String vid, Q length, Q un, Q dropV, Q dropPct, Q dropExactPct, Q own) {}

        private OwnFigures ownFigures(Circuit c, Trace ct) {
            return ownFigures(c, ct, null);
        }

        /** @param known the circuit's capacity with the no-op trace where a probe has made it, else null */
        private OwnFigures ownFigures(Circuit c, Trace ct, CapacityCalc.Capacity known) {
            int phases = c.phases();
            Q ib = designCurrent.get(c.id());
            Q pf = powerFactor.get(c.id());
            CapacityCalc.OwnCapacity k = capacityCalc.ownCapacity(ct, c, phases, ib, known);
            DropCalc.OwnDrop d = dropCalc.ownDrop(ct, c, phases, ib, pf, k.cap().iz());
            return new OwnFigures(c, phases, ib, pf, k.in(), k.i2(), k.cap(), List.copyOf(k.checks()), d.z(), d.vt(), d.vid(), d.length(),
                    d.un(), d.dropV(), d.dropPct(), d.dropExactPct(), d.own());
        }

        /** A circuit's own voltage drop with the no-op trace, for the sizing's weighing of a larger size (see DropCalc). */
        Q ownDrop(Circuit c) {
            try {
                OwnFigures known = Evaluated.ownFigures(evaluated.get(c.id()), c);
                if (known != null) return known.own();
                return dropCalc.ownDrop(c);
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        /** The rest of the calculation of c from its own figures: cumulative drop, motor starting, fault path. */
        private CircuitResult completed(Circuit c, Trace ct, OwnFigures o, Map<String, CircuitResult> done, boolean finalPass) {
            String id = c.id();
            List<CheckResult> checks = new ArrayList<>(o.checks());
            DropCalc.PathDrop drop = dropCalc.pathDrop(ct, c, o, done, checks);
            Trace ft = !ct.recording() ? ct : ct.section(id + "/fault", "Fault path", "earth-fault loop, disconnection, short-circuit withstand, breaking capacity");
            Q thetaMax = data.maxTemperature(ft, id, "/fault/theta_max", c.cable().insulation());
            FaultPath.CircuitFault fault = faultPath.circuit(ft, c, o.z(), boardFault(c.from(), done), o.length(), o.in(), o.phases(),
                    thetaMax, o.checks().stream().allMatch(CheckResult::pass));
            checks.addAll(fault.checks());
            if (c.isFeeder() && finalPass) {
                boardChecks.put(c.to(), faultPath.boardWithstand(ft, boards.get(c.to()), fault.downstream()));
            }
            String governing = Checks.closestToLimit(checks);
            return new CircuitResult(id, c, o.phases(), connection.getOrDefault(id, "L1 L2 L3"), o.ib(), o.pf(),
                    c.isFeeder() ? neutral.get(c.to()) : null, o.in(), o.i2(), o.cap().it(), o.cap().factor(), o.cap().iz(), o.z(),
                    o.length(), o.dropV(), o.dropPct(), o.dropExactPct(), drop.cumulative(), drop.limit(), drop.dip(), fault.prospective(), fault.zs(),
                    fault.zsMax(), fault.iefMin(), fault.downstream(), List.copyOf(checks), governing);
        }

        /** A gap in the tables, named by the circuit where it was met (unless it already is). */
        private static DataGapException locatedAt(Circuit c, DataGapException e) {
            if (e.located()) return e;
            return new DataGapException(c.where().text() + ": " + c.where().path() + " (" + c.id() + "): " + e.getMessage(), true);
        }

        /**
         * The motor-starting check of a motor circuit with the no-op trace, under the feeder results
         * in done: what the sizing reads of a motor while the feeders above it grow (the dip adds
         * their drops; the rest of the motor's figures is calculated again in the final pass).
         */
        CheckResult motorStartCheck(Circuit c, Map<String, CircuitResult> done) {
            try {
                return dropCalc.motorStart(Trace.noop(), c, ownFigures(c), done).check();
            } catch (DataGapException e) {
                throw locatedAt(c, e);
            }
        }

        String describeSource() {
            Supply.Source s = inst.supply().source();
            if (s instanceof Supply.Transformer t) return Decimals.trim(t.ratingKva()) + " kVA transformer, u_k " + Decimals.trim(t.impedancePercent()) + " %";
            return "supply from the distribution network";
        }

        BoardFault boardFault(String board, Map<String, CircuitResult> done) {
            Circuit feeder = feederOf.get(board);
            return feeder == null ? originFault : done.get(feeder.id()).downstream();
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
                        phaseCurrents.get(b.id()), neutral.get(b.id()), bf.ik3(), bf.ze(), boardChecks.getOrDefault(b.id(), List.of()), bf.ik1()));
            }
            return out;
        }

        List<CircuitResult> circuitResults() {
            return inst.circuits().stream().map(c -> results.get(c.id())).toList();
        }
    }

}
