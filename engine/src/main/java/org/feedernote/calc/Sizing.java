package org.feedernote.calc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.data.ReferenceData;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Circuit;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * Chooses the sizes given as 'auto': first the smallest standard size that passes the circuit's
 * own checks (capacity, overload); then, because the voltage-drop limit is cumulative, while some
 * load fails its drop limit, one size step at a time on the circuit of its path where the step
 * buys the most drop per unit of added conductor volume; last, each such step is undone again if
 * everything still passes without it. Candidates are evaluated with the no-op trace; the chosen
 * sizes are then calculated again with the recording trace. Sizes the designer gave are never changed.
 */
final class Sizing {
    private static final int MAX_STEPS = 10_000;
    /**
     * The largest single cable the sizing chooses: beyond it a designer runs cables in parallel
     * (common practice, no source).
     */
    static final double PRACTICAL_LARGEST_MM2 = 300;

    private final Engine.Run run;
    private final List<Double> sizes = ReferenceData.standardSizes();
    private final Map<String, Circuit> current = new LinkedHashMap<>();
    private final Map<String, List<String[]>> notes = new HashMap<>();
    private final Map<String, String> decidedBy = new HashMap<>();
    private final List<String> upsized = new ArrayList<>();
    private final Map<String, Double> firstChoice = new HashMap<>();

    Sizing(Engine.Run run) {
        this.run = run;
    }

    private static boolean auto(Circuit c) {
        return c.cable().size().auto();
    }

    private void note(String circuit, String title, String because, String outcome) {
        notes.computeIfAbsent(circuit, k -> new ArrayList<>()).add(new String[] {title, because, outcome});
    }

    static String mm2(double s) {
        return ReferenceData.sizeKey(s) + " mm²";
    }

    Map<String, Circuit> run() {
        if (nothingToChoose()) {
            // Every size given: no candidate to weigh, nothing a drop could enlarge. The final
            // pass calculates each circuit once; evaluating them here first would only repeat it.
            for (Circuit c : run.order()) current.put(c.id(), c);
            return current;
        }
        firstPass();
        for (Circuit c : run.order()) {
            Slot slot = new Slot(run.original(c.id()), current.get(c.id()), sizesFor(c));
            CircuitResult r = results.get(c.id());
            slot.ownPct = governingOwn(r);
            if (!slot.feeder) slot.limitPct = r.limitPercent().value();
            if (slot.startingChecked) slot.startingFails = startingFails(r.check("motor-starting"));
            slots.put(c.id(), slot);
        }
        for (Circuit c : run.order()) {
            Slot slot = slots.get(c.id());
            slot.path = run.pathTo(c.from()).stream().map(f -> slots.get(f.id())).toArray(Slot[]::new);
            for (Slot f : slot.path) f.below.add(slot);
        }
        for (Circuit c : run.order()) if (c.isFeeder()) feederSlots.add(slots.get(c.id()));
        balancing = true;
        for (Circuit c : run.order()) track(slots.get(c.id()));
        for (int step = 0; step < MAX_STEPS && !failingDrop.isEmpty(); step++) {
            if (!upsizeBest()) break;
        }
        balancing = false;
        trim();
        smallestProtectiveConductors();
        return current;
    }

    private boolean nothingToChoose() {
        for (Circuit c : run.order()) if (auto(c) || c.cable().cpc().auto()) return false;
        return true;
    }

    /**
     * The smallest size passing each circuit's own checks, level by level from the origin. A
     * circuit depends only on the feeders above it, never on another circuit of its own board or
     * level, so the circuits of a level are sized in parallel. The outcome is merged in calculation
     * order, so it is the same as one circuit after another.
     */
    private void firstPass() {
        for (List<Circuit> outgoing : run.levels()) {
            List<SideBySide.Outcome<FirstChoice>> choices = SideBySide.map(outgoing, c -> firstChoice(c, results));
            for (int i = 0; i < outgoing.size(); i++) {
                Circuit c = outgoing.get(i);
                FirstChoice f = choices.get(i).get();
                current.put(c.id(), f.chosen());
                results.put(c.id(), f.result());
                if (!f.notes().isEmpty()) notes.computeIfAbsent(c.id(), k -> new ArrayList<>()).addAll(f.notes());
                if (f.size() != null) firstChoice.put(c.id(), f.size());
                if (f.decidedBy() != null) decidedBy.put(c.id(), f.decidedBy());
            }
        }
    }

    /** Circuits whose protective conductor was chosen by calculation, with the size Table 54.2 would give. */
    private final Map<String, Double> cpcByCalculation = new HashMap<>();

    /**
     * cpc 'auto' of final circuits: from the Table 54.2 size downwards, the smallest standard size
     * that still passes the adiabatic check and disconnection (IEC 60364-5-54, 543.1.2: selection by
     * calculation). Feeders keep the table size, because their protective conductor is part of the
     * loop of every circuit below them. Not below 1.5 mm² in a multicore cable, 4 mm² separate.
     */
    private void smallestProtectiveConductors() {
        List<Circuit> finals = run.order().stream()
                .filter(c -> !run.original(c.id()).isFeeder() && run.original(c.id()).cable().cpc().auto()).toList();
        // Each final circuit's search depends only on the feeders above it (fixed by now): side by side.
        List<SideBySide.Outcome<Circuit>> found = SideBySide.map(finals, c -> smallestProtectiveConductor(current.get(c.id())));
        for (int i = 0; i < finals.size(); i++) {
            Circuit best = found.get(i).get();
            Circuit chosen = current.get(finals.get(i).id());
            if (best != chosen) {
                cpcByCalculation.put(chosen.id(), chosen.cable().cpc().mm2());
                current.put(chosen.id(), best);
            }
        }
    }

    private Circuit smallestProtectiveConductor(Circuit chosen) {
        double table = chosen.cable().cpc().mm2();
        double minimum = chosen.cable().type() == org.feedernote.model.CableType.MULTICORE ? 1.5 : 4;
        Circuit best = chosen;
        Engine.Run.OwnFigures own = null;
        for (int i = sizes.indexOf(table) - 1; i >= 0; i--) {
            double smaller = sizes.get(i);
            if (smaller < minimum - 1e-9 || !ReferenceData.standard().hasResistance(chosen.cable().conductor(), smaller)) break;
            Circuit candidate = best.withCable(best.cable().withCpc(smaller));
            // The protective conductor changes only the fault path: the rest is calculated once.
            if (own == null) own = run.ownFigures(chosen);
            CircuitResult r = run.evaluate(candidate, own, results);
            boolean ok = r.check("protective-conductor").pass() && r.check("disconnection").pass();
            if (!ok) break;
            best = candidate;
        }
        // Only the chosen protective conductor is calculated again (in the final pass).
        run.forgetEvaluationsOtherThan(best);
        return best;
    }

    /** Results of the sizes chosen by the first pass; feeders are recalculated as their paths change. */
    private final Map<String, CircuitResult> results = new LinkedHashMap<>();
    /** Final circuits that fail their drop or starting limit. */
    private final java.util.Set<String> failingDrop = new java.util.LinkedHashSet<>();
    private final Map<String, Slot> slots = new HashMap<>();

    /**
     * The sizing's working record of one circuit while drops are balanced: the loop that runs once
     * per enlargement walks these (paths as arrays, sizes cached) instead of maps keyed by id.
     */
    private static final class Slot {
        final String id;
        final Circuit original;
        final boolean autoSized;
        final boolean feeder;
        /** A motor whose starting dip is checked (the only circuits with a motor-starting check). */
        final boolean startingChecked;
        /** Sizes the tables cover for this cable and method, ascending. */
        final double[] covered;
        /** The feeders from the origin to the board the circuit starts at. */
        Slot[] path;
        /** The circuits below a feeder, in calculation order. */
        final List<Slot> below = new ArrayList<>();
        /** Own voltage drop per size: it does not depend on anything upstream. */
        final Map<Double, Double> ownDrop = new HashMap<>();
        Circuit current;
        /** The own drop at the current size; the drop from the origin is the sum along the path. */
        double ownPct;
        /**
         * A final circuit's drop limit (it follows from the kind of load and the design basis, not
         * from the sizes): read here by every circuit below a feeder each time the feeder grows.
         */
        double limitPct = Double.NaN;
        /** Whether no enlargement upstream can bring this load within its drop limit (null until asked). */
        Boolean beyondHelp;
        /** A feeder whose enlargement would make a device below it unable to break the fault current: it grows no more. */
        boolean blocked;
        /** A motor whose starting dip is checked: whether the dip exceeds its limit with the current sizes. */
        boolean startingFails;
        /**
         * While the circuit fails its limit: its place in the order failing loads were found in
         * (a load that stops failing and fails again goes to the end), else -1.
         */
        long seq = -1;
        /** For a feeder: the places of the failing loads below it; their number is the loads a step helps. */
        final java.util.TreeSet<Long> failingBelow = new java.util.TreeSet<>();
        /** For a failing final circuit that can grow: its next step, kept current while drops are balanced. */
        double from;
        double to;
        double gain;
        double cost;
        private Circuit nextFor;
        private double next;

        Slot(Circuit original, Circuit current, List<Double> covered) {
            this.id = original.id();
            this.original = original;
            this.autoSized = original.cable().size().auto();
            this.feeder = original.isFeeder();
            this.startingChecked = !feeder && original.load().kind() == org.feedernote.model.LoadKind.MOTOR
                    && original.load().startingCurrentMultiple() != null;
            this.covered = covered.stream().mapToDouble(Double::doubleValue).toArray();
            this.current = current;
        }

        /** The next larger covered size than the current one, or NaN at the largest. */
        double next() {
            if (nextFor != current) {
                double now = current.cable().size().mm2();
                next = Double.NaN;
                for (double size : covered) {
                    if (size > now + 1e-9) {
                        next = size;
                        break;
                    }
                }
                nextFor = current;
            }
            return next;
        }

        boolean canGrow() {
            return autoSized && !blocked && !Double.isNaN(next()) && next() <= PRACTICAL_LARGEST_MM2 + 1e-9;
        }

        double ratio() {
            return cost > 0 ? gain / cost : 0;
        }
    }

    /** Feeders, in calculation order. */
    private final List<Slot> feederSlots = new ArrayList<>();
    /** True while drops are balanced: failing final circuits that can grow are kept in {@link #growable}. */
    private boolean balancing;
    private long nextSeq;
    /** Failing final circuits that can grow, best step first: most drop per volume, then the order found. */
    private final java.util.TreeSet<Slot> growable = new java.util.TreeSet<>((a, b) -> {
        int c = Double.compare(b.ratio(), a.ratio());
        return c != 0 ? c : Long.compare(a.seq, b.seq);
    });

    /** A final circuit's next step: the drop it buys and the conductor volume it adds. */
    private void refreshStep(Slot k) {
        Circuit c = k.current;
        double now = c.cable().size().mm2();
        double next = k.next();
        k.from = now;
        k.to = next;
        k.gain = k.ownPct - ownDropAt(k, next);
        k.cost = (next - now) * c.lengthM() * c.cable().parallel() * conductors(c) / 1000.0;
    }

    /** Gives a circuit another size and own drop, keeping the set of growable circuits in order. */
    private void resize(Slot slot, Circuit c, double ownPct) {
        boolean listed = balancing && growable.remove(slot);
        setCurrent(slot, c);
        slot.ownPct = ownPct;
        if (listed && slot.canGrow()) {
            refreshStep(slot);
            growable.add(slot);
        }
    }

    private void setCurrent(Slot slot, Circuit c) {
        slot.current = c;
        current.put(slot.id, c);
    }

    private double governingOwn(CircuitResult r) {
        boolean exact = run.inst.basis().voltageDropMethod().value() == org.feedernote.model.DropMethod.EXACT;
        return exact && r.dropExactPercent() != null ? r.dropExactPercent().value() : r.dropPercent().value();
    }

    private static double cumulative(Slot slot) {
        double sum = slot.ownPct;
        for (Slot f : slot.path) sum += f.ownPct;
        return sum;
    }

    private static boolean startingFails(CheckResult st) {
        return st != null && !st.pass();
    }

    /** Whether a final circuit fails its drop or starting limit with the current sizes. */
    private void track(Slot slot) {
        if (slot.feeder) return;
        boolean dropFails = cumulative(slot) > slot.limitPct + 1e-9;
        boolean fails = dropFails || slot.startingChecked && slot.startingFails;
        if (fails && slot.seq < 0 && dropFails && beyondHelp(slot)) return;
        if (fails && slot.seq < 0) {
            failingDrop.add(slot.id);
            slot.seq = nextSeq++;
            for (Slot f : slot.path) f.failingBelow.add(slot.seq);
            if (balancing && slot.canGrow()) {
                refreshStep(slot);
                growable.add(slot);
            }
        } else if (!fails && slot.seq >= 0) {
            failingDrop.remove(slot.id);
            growable.remove(slot);
            for (Slot f : slot.path) f.failingBelow.remove(slot.seq);
            slot.seq = -1;
        }
    }

    /**
     * After a size change: a feeder or motor is calculated again, and below a feeder every feeder
     * (their fault levels depend on it), top-down, then the starting check of every motor (its dip
     * adds each upstream feeder's drop; nothing else of a final circuit is read while drops are
     * balanced, and the final pass calculates it all again), so that what the sizing reads of the
     * circuits upstream is never stale; then the drops are re-summed. The motors depend only on
     * the feeders, so their checks are made side by side; the first data gap in calculation order
     * is the one reported.
     */
    private void changed(Slot slot) {
        if (slot.feeder || slot.startingChecked) {
            CircuitResult r = run.evaluate(slot.current, Trace.noop(), results);
            results.put(slot.id, r);
            if (slot.startingChecked) slot.startingFails = startingFails(r.check("motor-starting"));
        }
        List<Slot> motors = new ArrayList<>();
        for (Slot a : slot.below) {
            if (a.feeder) results.put(a.id, run.evaluate(a.current, Trace.noop(), results));
            else if (a.startingChecked) motors.add(a);
        }
        List<SideBySide.Outcome<CheckResult>> done = SideBySide.map(motors, a -> run.motorStartCheck(a.current, results));
        for (int i = 0; i < motors.size(); i++) motors.get(i).startingFails = startingFails(done.get(i).get());
        track(slot);
        for (Slot a : slot.below) track(a);
    }

    /**
     * Whether a load's own drop alone, at the largest size it may have (its given size, or the
     * largest size the sizing may choose), exceeds its limit: then no enlargement upstream can
     * bring it within the limit, and none is made for it. Decided once; noted on the load.
     */
    private boolean beyondHelp(Slot slot) {
        if (slot.beyondHelp == null) {
            double largest = slot.autoSized ? largestAllowed(slot) : slot.current.cable().size().mm2();
            double own = Double.isNaN(largest) ? Double.NaN : ownDropAt(slot, largest);
            slot.beyondHelp = own > slot.limitPct + 1e-9;
            if (slot.beyondHelp) {
                note(slot.id, "Voltage drop cannot be met", "its own drop alone is " + Decimals.fixed3(own) + " % at "
                        + mm2(largest) + (slot.autoSized ? " (the largest size the sizing may choose)" : " (the size given)")
                        + ", above the limit " + Decimals.fixed3(slot.limitPct) + " %",
                        "no enlargement upstream can meet it: no feeder is enlarged for it, and the circuit fails its drop limit");
                decidedBy.put(slot.id, "voltage-drop");
            }
        }
        return slot.beyondHelp;
    }

    /** The largest covered size not above the practical largest single cable, or NaN. */
    private double largestAllowed(Slot slot) {
        double best = Double.NaN;
        for (double size : slot.covered) if (size <= PRACTICAL_LARGEST_MM2 + 1e-9) best = size;
        return best;
    }

    private double ownDropAt(Slot k, double size) {
        return k.ownDrop.computeIfAbsent(size, sz -> run.ownDrop(withCpc(k.original, sz)).value());
    }

    /** Covered sizes by {@link #coverageKey}: few different cables and methods serve thousands of circuits. */
    private final Map<Long, List<Double>> coveredSizes = new java.util.concurrent.ConcurrentHashMap<>();

    /** The standard sizes the tables cover for this circuit's cable and method, ascending. */
    private List<Double> sizesFor(Circuit c) {
        return coveredSizes.computeIfAbsent(coverageKey(c), k -> sizes.stream().filter(s -> covered(c, s)).toList());
    }

    /** What the covered sizes depend on (insulation, conductor, method, loaded conductors, formation) as one number. */
    private static long coverageKey(Circuit c) {
        Cable cable = c.cable();
        int loaded = (c.isFeeder() || c.load().phases() == 3) ? 3 : 2;
        int formation = cable.formation() == null ? 0 : cable.formation().ordinal() + 1;
        return ((((long) cable.insulation().ordinal() * 64 + cable.conductor().ordinal()) * 64 + c.conditions().method().ordinal()) * 8
                + loaded) * 64 + formation;
    }

    private boolean covered(Circuit c, double size) {
        int loaded = (c.isFeeder() || c.load().phases() == 3) ? 3 : 2;
        return run.capacityData().covers(c.cable().insulation(), c.cable().conductor(), c.conditions().method(), loaded,
                c.cable().formation(), size) && ReferenceData.standard().hasResistance(c.cable().conductor(), size);
    }

    /**
     * The first pass for one circuit: the size chosen, its evaluation, and the decisions to record.
     * Made without touching the sizing's state, so the circuits of a board can be sized side by side.
     */
    private record FirstChoice(Circuit chosen, CircuitResult result, List<String[]> notes, Double size, String decidedBy) {}

    /** Why a candidate fails its own checks (in words) and the check's name. */
    private record Failure(String reason, String check) {}

    private FirstChoice firstChoice(Circuit c, Map<String, CircuitResult> working) {
        if (!auto(c)) {
            Circuit chosen = withCpc(c, c.cable().size().mm2());
            return new FirstChoice(chosen, run.evaluate(chosen, Trace.noop(), working), List.of(), null, null);
        }
        FirstChoice f = smallestPassingOwnChecks(c, working);
        // The sizing never returns below its first choice: the smaller sizes' evaluations would
        // only be carried through every collection of the run.
        run.forgetEvaluationsOtherThan(f.chosen());
        return f;
    }

    private FirstChoice smallestPassingOwnChecks(Circuit c, Map<String, CircuitResult> working) {
        List<String[]> notes = new ArrayList<>();
        Circuit firstCoordinated = null;
        Circuit last = null;
        String lastReason = null;
        String lastReasonCheck = "capacity";
        List<Double> covered = sizesFor(c);
        for (double size : sizes) {
            if (!covered.contains(size)) continue;
            Circuit candidate = withCpc(c, size);
            CapacityCalc.Probe probe = run.capacityCalc.probe(candidate);
            String quick = probe.shortfall();
            if (quick != null && size < sizes.get(sizes.size() - 1)) {
                notes.add(new String[] {"Size rejected", quick, mm2(size) + " rejected"});
                lastReason = quick;
                lastReasonCheck = "capacity";
                last = candidate;
                continue;
            }
            // The probe's capacity serves the evaluation too (the same figures, made once).
            CircuitResult r = run.evaluate(candidate, run.ownFigures(candidate, probe.capacity()), working);
            if (firstCoordinated == null && r.check("capacity").pass() && r.check("overload").pass()) firstCoordinated = candidate;
            Failure failure = ownFailure(r);
            if (failure == null) {
                notes.add(new String[] {"Size chosen", "the smallest standard size that passes the capacity, overload, disconnection and withstand checks",
                        mm2(size)});
                return new FirstChoice(candidate, r, notes, size, lastReason != null ? lastReasonCheck : null);
            }
            notes.add(new String[] {"Size rejected", failure.reason(), mm2(size) + " rejected"});
            last = candidate;
            lastReason = failure.reason();
            lastReasonCheck = failure.check();
        }
        if (last == null) {
            String why;
            try {
                run.capacityCalc.capacityShortfall(withCpc(c, 25));
                why = "the packaged tables cover no standard size of this cable for this method";
            } catch (org.feedernote.data.DataGapException e) {
                why = e.getMessage();
            }
            throw new org.feedernote.data.DataGapException(c.where().text() + ": " + c.where().path() + " (" + c.id()
                    + "): size_mm2: auto cannot be chosen: " + why, true);
        }
        Circuit chosen;
        if (firstCoordinated != null) {
            notes.add(new String[] {"No size passes", "no standard size up to " + mm2(last.cable().size().mm2()) + " passes every check ("
                    + lastReason + " at the largest); a larger cable cannot mend this", "the smallest size passing capacity and overload, "
                    + mm2(firstCoordinated.cable().size().mm2()) + ", is used and the circuit fails"});
            chosen = firstCoordinated;
        } else {
            notes.add(new String[] {"No size passes", "no standard size up to " + mm2(last.cable().size().mm2()) + " passes",
                    "the largest is used and the circuit fails"});
            chosen = last;
        }
        return new FirstChoice(chosen, run.evaluate(chosen, Trace.noop(), working), notes, null, null);
    }

    /** Why a candidate fails its own checks, or null when it passes them. */
    private Failure ownFailure(CircuitResult r) {
        CheckResult cap = r.check("capacity");
        if (cap != null && !cap.pass()) {
            return new Failure("I_z " + Decimals.trim(r.capacity().value()) + " A < I_n " + Decimals.trim(r.rating().value()) + " A"
                    + (r.rating().value() < r.designCurrent().value() ? " (and I_n < I_b)" : ""), "capacity");
        }
        CheckResult ol = r.check("overload");
        if (ol != null && !ol.pass()) {
            return new Failure("I_2 " + Decimals.trim(ol.value()) + " A > 1.45 · I_z = " + Decimals.trim(ol.limit()) + " A", "overload");
        }
        CheckResult dc = r.check("disconnection");
        if (dc != null && !dc.pass() && dc.determined()) {
            return new Failure("Z_s " + Decimals.trim(dc.value()) + " Ω > Z_s,max " + Decimals.trim(dc.limit()) + " Ω", "disconnection");
        }
        CheckResult sc = r.check("short-circuit");
        if (sc != null && !sc.pass() && sc.determined()) {
            return new Failure("S below the adiabatic minimum " + Decimals.trim(sc.limit()) + " mm²", "short-circuit");
        }
        CheckResult pc = r.check("protective-conductor");
        // A larger cable helps its protective conductor only where that conductor follows the cable's size.
        if (pc != null && !pc.pass() && pc.determined() && run.original(r.id()).cable().cpc().auto()) {
            return new Failure("protective conductor below the adiabatic minimum " + Decimals.trim(pc.limit()) + " mm²", "protective-conductor");
        }
        return null;
    }

    /** cpc 'auto' follows IEC 60364-5-54 Table 54.2 (same material as the line conductor). */
    private Circuit withCpc(Circuit c, double size) {
        Cable cable = c.cable().withSize(size);
        if (c.cable().cpc().auto()) cable = cable.withCpc(cpcFor(size));
        return c.withCable(cable);
    }

    double cpcFor(double size) {
        if (size <= 16) return size;
        if (size <= 35) return 16;
        double half = size / 2;
        for (double s : sizes) if (s >= half - 1e-9) return s;
        return sizes.get(sizes.size() - 1);
    }

    private Double previousSize(Circuit c) {
        double now = c.cable().size().mm2();
        Double prev = null;
        for (double s : sizesFor(c)) if (s < now - 1e-9) prev = s;
        return prev;
    }

    private int conductors(Circuit c) {
        if (c.isFeeder() || c.load().phases() == 3) {
            return c.cable().type() == CableType.MULTICORE && c.cable().cores() >= 4 ? 4 : 3;
        }
        return 2;
    }

    /** A possible step: a circuit, its next size, the drop it buys (times the failing loads it helps) and the volume it adds. */
    private record Candidate(Slot slot, double from, double to, double gain, double cost, long seq, int depth) {
        double ratio() { return cost > 0 ? gain / cost : 0; }
        String id() { return slot.id; }

        static Candidate of(Slot finalCircuit) {
            Slot k = finalCircuit;
            return new Candidate(k, k.from, k.to, k.gain, k.cost, k.seq, k.path.length);
        }
    }

    /**
     * The order of candidates: most drop per added volume first; equal ratios in the order the
     * circuits were met going through the failing loads in the order found, each load's feeders
     * from the origin down and then the load itself.
     */
    private static final java.util.Comparator<Candidate> BEST_FIRST = (x, y) -> {
        int c = Double.compare(y.ratio(), x.ratio());
        if (c != 0) return c;
        c = Long.compare(x.seq(), y.seq());
        return c != 0 ? c : Integer.compare(x.depth(), y.depth());
    };

    /**
     * One step of the balancing: the candidate with the most drop per added volume is enlarged,
     * and with it every final circuit whose step beats every feeder step. Feeders are weighed
     * afresh (their helped loads change); final circuits are kept in order in {@link #growable},
     * so a step costs what it changes, not the number of failing loads.
     */
    private boolean upsizeBest() {
        List<Candidate> feeders = new ArrayList<>();
        for (Slot f : feederSlots) {
            if (f.failingBelow.isEmpty() || !f.canGrow()) continue;
            Circuit c = f.current;
            double now = c.cable().size().mm2();
            double next = f.next();
            double gain = (f.ownPct - ownDropAt(f, next)) * f.failingBelow.size();
            double cost = (next - now) * c.lengthM() * c.cable().parallel() * conductors(c) / 1000.0;
            feeders.add(new Candidate(f, now, next, gain, cost, f.failingBelow.first(), f.path.length));
        }
        feeders.sort(BEST_FIRST);
        List<Candidate> top = new ArrayList<>(3);
        java.util.Iterator<Slot> finals = growable.iterator();
        Candidate nextFinal = finals.hasNext() ? Candidate.of(finals.next()) : null;
        int fi = 0;
        while (top.size() < 3 && (fi < feeders.size() || nextFinal != null)) {
            Candidate feeder = fi < feeders.size() ? feeders.get(fi) : null;
            if (nextFinal == null || (feeder != null && BEST_FIRST.compare(feeder, nextFinal) < 0)) {
                top.add(feeder);
                fi++;
            } else {
                top.add(nextFinal);
                nextFinal = finals.hasNext() ? Candidate.of(finals.next()) : null;
            }
        }
        if (top.isEmpty() || top.get(0).gain() <= 0) {
            for (String load : failingDrop) {
                if (notes.getOrDefault(load, List.of()).stream().anyMatch(n -> n[0].equals("Voltage drop cannot be met"))) continue;
                note(load, "Voltage drop cannot be met", "no auto-sized circuit on the path of " + load + " can be enlarged further",
                        "the circuit fails its drop limit");
            }
            return false;
        }
        Candidate best = top.get(0);
        StringBuilder others = new StringBuilder();
        for (Candidate c : top) {
            if (others.length() > 0) others.append("; ");
            others.append(c.id()).append(' ').append(mm2(c.from())).append(" → ").append(mm2(c.to())).append(": ")
                    .append(Decimals.fixed3(c.gain())).append(" %·load per ").append(Decimals.fixed3(c.cost())).append(" dm³");
        }
        int failing = failingDrop.size();
        String failingList = failingDrop.stream().limit(5).reduce((x, y) -> x + ", " + y).orElse("")
                + (failing > 5 ? " and " + (failing - 5) + " more" : "");
        note(best.id(), "Enlarged for the cumulative voltage drop", "the drop limit fails at " + failingList + "; best candidates: " + others,
                mm2(best.from()) + " → " + mm2(best.to()) + ", the most drop per added conductor volume (" + Decimals.fixed3(best.gain())
                        + " % per " + Decimals.fixed3(best.cost()) + " dm³)");
        // Circuits of their own (no circuit below them) whose step buys at least as much as the best
        // feeder step would be chosen next anyway, one after another: a final circuit's gain does
        // not change when another final circuit grows, and a feeder's only falls. Take them now
        // (chosen before any is enlarged, as the order stood at the start of the step).
        double bestFeeder = feeders.stream().mapToDouble(Candidate::ratio).max().orElse(0);
        List<Candidate> batch = new ArrayList<>();
        if (!best.slot().feeder) {
            for (Slot k : growable) {
                if (k == best.slot()) continue;
                if (k.ratio() < bestFeeder) break;
                if (k.gain <= 0) continue;
                batch.add(Candidate.of(k));
            }
        }
        weighNextSteps(best, batch);
        java.util.Set<String> breakingBefore = best.slot().feeder ? breakingMetBelow(best.slot()) : null;
        apply(best.slot(), best.to());
        if (breakingBefore != null) {
            java.util.Set<String> lost = new java.util.TreeSet<>(breakingBefore);
            lost.removeAll(breakingMetBelow(best.slot()));
            if (!lost.isEmpty()) {
                Slot f = best.slot();
                upsized.remove(upsized.size() - 1);
                resize(f, withCpc(f.original, best.from()), ownDropAt(f, best.from()));
                changed(f);
                f.blocked = true;
                decidedBy.remove(f.id);
                note(f.id, "Enlargement refused", mm2(best.from()) + " → " + mm2(best.to()) + " would raise the fault level below it so that the device of "
                        + String.join(", ", lost) + " could no longer break it", "kept at " + mm2(best.from()) + "; it is not enlarged further");
                return true;
            }
        }
        for (Candidate c : batch) {
            note(c.id(), "Enlarged for the cumulative voltage drop", "its own drop limit fails; no feeder step buys more drop per volume",
                    mm2(c.from()) + " → " + mm2(c.to()) + " (" + Decimals.fixed3(c.gain()) + " % per " + Decimals.fixed3(c.cost()) + " dm³)");
            apply(c.slot(), c.to());
        }
        return true;
    }

    /**
     * The own drop each circuit about to be enlarged would have one size further, which its next
     * step is weighed by once it has grown: found side by side beforehand, since a circuit's own
     * drop depends on nothing upstream. A data gap is left to the step itself, which meets it in
     * order, as it would have without this.
     */
    private void weighNextSteps(Candidate best, List<Candidate> batch) {
        List<Candidate> growing = new ArrayList<>(batch.size() + 1);
        growing.add(best);
        growing.addAll(batch);
        (growing.size() > 8 ? growing.parallelStream() : growing.stream()).forEach(c -> {
            Slot k = c.slot();
            for (double size : k.covered) {
                if (size > c.to() + 1e-9) {
                    try {
                        ownDropAt(k, size);
                    } catch (RuntimeException gap) {
                        // met again, in order, when the step weighs this size
                    }
                    break;
                }
            }
        });
    }

    /**
     * The circuits below a feeder whose device can break the prospective fault current at its
     * origin with the sizes as they stand (a device without a breaking capacity is never counted).
     */
    private java.util.Set<String> breakingMetBelow(Slot feeder) {
        java.util.Set<String> ok = new java.util.HashSet<>();
        for (Slot a : feeder.below) {
            Double icu = a.current.device().breakingCapacityKa();
            Circuit upstream = run.feederOf.get(a.current.from());
            if (icu == null || upstream == null) continue;
            BoardFault at = results.get(upstream.id()).downstream();
            boolean three = a.feeder || a.current.load().phases() == 3;
            double ik = (three ? at.ik3() : at.ik1()).value();
            if (icu >= ik - 1e-12) ok.add(a.id);
        }
        return ok;
    }

    /** Enlarges a circuit chosen by a step; every candidate final circuit was failing when the step began. */
    private void apply(Slot slot, double size) {
        boolean ownDropFails = !slot.feeder && cumulative(slot) > slot.limitPct + 1e-9;
        Circuit k = slot.current;
        resize(slot, withCpc(slot.original, size), ownDropAt(slot, size));
        changed(slot);
        upsized.add(slot.id);
        boolean starting = !k.isFeeder() && !ownDropFails && k.load().startingCurrentMultiple() != null;
        decidedBy.put(slot.id, starting ? "motor-starting" : "voltage-drop");
    }

    /** Undoes enlargements that turned out unnecessary once others were made (last first). */
    private void trim() {
        java.util.Set<String> done = new java.util.HashSet<>();
        for (int i = upsized.size() - 1; i >= 0; i--) {
            String id = upsized.get(i);
            if (!done.add(id)) continue;
            Slot slot = slots.get(id);
            Circuit k = slot.current;
            Double prev = previousSize(k);
            if (prev == null || prev < firstChoice.getOrDefault(id, 0.0) - 1e-9) continue;
            long failingBefore = failingAmong(slot);
            double savedPct = slot.ownPct;
            resize(slot, withCpc(slot.original, prev), ownDropAt(slot, prev));
            changed(slot);
            long failingAfter = failingAmong(slot);
            if (failingAfter > failingBefore) {
                resize(slot, k, savedPct);
                changed(slot);
            } else {
                note(id, "Enlargement undone", "the loads it was made for stay within their limits without it, once the other enlargements were made",
                        mm2(k.cable().size().mm2()) + " → " + mm2(prev));
            }
        }
    }

    /** How many of a circuit and the circuits below it fail their drop or starting limit. */
    private long failingAmong(Slot slot) {
        long n = failingDrop.contains(slot.id) ? 1 : 0;
        for (Slot a : slot.below) if (failingDrop.contains(a.id)) n++;
        return n;
    }

    /** Writes the decisions about a circuit's sizes into its section, before its calculation. */
    void record(Trace ct, Circuit original, Circuit sized) {
        boolean autoSize = original.cable().size().auto();
        boolean autoCpc = original.cable().cpc().auto();
        if (!autoSize && !autoCpc && !notes.containsKey(original.id()) || !ct.recording()) return;
        Trace t = ct.section(original.id() + "/size", "Size selection", "size_mm2: " + (autoSize ? "auto" : "given")
                + ", cpc_mm2: " + (autoCpc ? "auto" : "given"));
        int i = 0;
        for (String[] n : notes.getOrDefault(original.id(), List.of())) {
            t.add(new Step.Decision(original.id() + "/size/" + (++i), n[0], n[1], n[2], "", List.of()));
        }
        if (autoCpc && cpcByCalculation.containsKey(original.id())) {
            t.add(new Step.Decision(original.id() + "/size/cpc", "Protective conductor", "cpc_mm2: auto; Table 54.2 would give "
                    + mm2(cpcByCalculation.get(original.id())) + "; the smallest standard size that passes the adiabatic check and disconnection",
                    "cpc = " + mm2(sized.cable().cpc().mm2()) + " (selection by calculation; see the fault path below)",
                    "IEC 60364-5-54:2011, 543.1.2", List.of()));
        } else if (autoCpc) {
            double s = sized.cable().size().mm2();
            String rule = s <= 16 ? "S ≤ 16 mm²: cpc = S" : s <= 35 ? "16 mm² < S ≤ 35 mm²: cpc = 16 mm²" : "S > 35 mm²: cpc = S/2, next standard size";
            t.add(new Step.Decision(original.id() + "/size/cpc", "Protective conductor", "cpc_mm2: auto; line conductor S = " + mm2(s) + "; " + rule,
                    "cpc = " + mm2(sized.cable().cpc().mm2()), "IEC 60364-5-54:2011, Table 54.2", List.of()));
        }
    }

    /** The check that decided an auto size, or the closest to its limit for given sizes. */
    String governing(String id, CircuitResult r) {
        if (!r.pass()) return r.failing().get(0).name();
        String d = decidedBy.get(id);
        if (d != null && run.original(id).cable().size().auto()) return d;
        return r.governingCheck();
    }
}
