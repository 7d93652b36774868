package org.feedernote.calc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.model.CableType;
import org.feedernote.model.Circuit;
import org.feedernote.trace.Trace;

/**
 * The sizing's second and third stages: while some load fails its drop or starting limit, one size
 * step on the circuit of its path with the most drop reduction × failing loads helped per added
 * conductor volume; then each enlargement is undone again, last first, where the limits still hold
 * without it. Works on the sizes and results of the first pass ({@link Sizing}) and writes its
 * decisions into the sizing's notes.
 */
final class DropBalancing {
    private static final int MAX_STEPS = 10_000;
    /**
     * The largest single cable the sizing chooses: beyond it a designer runs cables in parallel
     * (common practice, no source).
     */
    static final double PRACTICAL_LARGEST_MM2 = 300;

    private final Sizing sizing;
    private final Engine.Run run;
    /** Circuits enlarged for a drop, in the order of the steps. */
    private final List<String> upsized = new ArrayList<>();

    DropBalancing(Sizing sizing, Engine.Run run) {
        this.sizing = sizing;
        this.run = run;
    }

    /** Balances the drops from the first pass's sizes, changing the sizing's current sizes and results. */
    void run() {
        for (Circuit c : run.order()) {
            Slot slot = new Slot(run.original(c.id()), sizing.current.get(c.id()), sizing.sizesFor(c));
            CircuitResult r = sizing.results.get(c.id());
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
    }

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
        sizing.current.put(slot.id, c);
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
            CircuitResult r = run.evaluate(slot.current, Trace.noop(), sizing.results);
            sizing.results.put(slot.id, r);
            if (slot.startingChecked) slot.startingFails = startingFails(r.check("motor-starting"));
        }
        List<Slot> motors = new ArrayList<>();
        for (Slot a : slot.below) {
            if (a.feeder) sizing.results.put(a.id, run.evaluate(a.current, Trace.noop(), sizing.results));
            else if (a.startingChecked) motors.add(a);
        }
        List<SideBySide.Outcome<CheckResult>> done = SideBySide.map(motors, a -> run.motorStartCheck(a.current, sizing.results));
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
                sizing.note(slot.id, "Voltage drop cannot be met", "its own drop alone is " + Decimals.fixed3(own) + " % at "
                        + Sizing.mm2(largest) + (slot.autoSized ? " (the largest size the sizing may choose)" : " (the size given)")
                        + ", above the limit " + Decimals.fixed3(slot.limitPct) + " %",
                        "no enlargement upstream can meet it: no feeder is enlarged for it, and the circuit fails its drop limit");
                sizing.decidedBy.put(slot.id, "voltage-drop");
            }
        }
        return slot.beyondHelp;
    }

    /** The largest covered size not above the practical largest single cable, or NaN. */
    private static double largestAllowed(Slot slot) {
        double best = Double.NaN;
        for (double size : slot.covered) if (size <= PRACTICAL_LARGEST_MM2 + 1e-9) best = size;
        return best;
    }

    private double ownDropAt(Slot k, double size) {
        return k.ownDrop.computeIfAbsent(size, sz -> run.ownDrop(sizing.withCpc(k.original, sz)).value());
    }

    private Double previousSize(Circuit c) {
        double now = c.cable().size().mm2();
        Double prev = null;
        for (double s : sizing.sizesFor(c)) if (s < now - 1e-9) prev = s;
        return prev;
    }

    private int conductors(Circuit c) {
        if (c.phases() == 3) {
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
                if (sizing.notes.getOrDefault(load, List.of()).stream().anyMatch(n -> n[0].equals("Voltage drop cannot be met"))) continue;
                sizing.note(load, "Voltage drop cannot be met", "no auto-sized circuit on the path of " + load + " can be enlarged further",
                        "the circuit fails its drop limit");
            }
            return false;
        }
        Candidate best = top.get(0);
        StringBuilder others = new StringBuilder();
        for (Candidate c : top) {
            if (others.length() > 0) others.append("; ");
            others.append(c.id()).append(' ').append(Sizing.mm2(c.from())).append(" → ").append(Sizing.mm2(c.to())).append(": ")
                    .append(Decimals.fixed3(c.gain())).append(" %·load per ").append(Decimals.fixed3(c.cost())).append(" dm³");
        }
        int failing = failingDrop.size();
        String failingList = failingDrop.stream().limit(5).reduce((x, y) -> x + ", " + y).orElse("")
                + (failing > 5 ? " and " + (failing - 5) + " more" : "");
        sizing.note(best.id(), "Enlarged for the cumulative voltage drop", "the drop limit fails at " + failingList + "; best candidates: " + others,
                Sizing.mm2(best.from()) + " → " + Sizing.mm2(best.to()) + ", the most drop per added conductor volume (" + Decimals.fixed3(best.gain())
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
                resize(f, sizing.withCpc(f.original, best.from()), ownDropAt(f, best.from()));
                changed(f);
                f.blocked = true;
                sizing.decidedBy.remove(f.id);
                sizing.withdrawLastNote(f.id);
                sizing.note(f.id, "Enlargement refused", Sizing.mm2(best.from()) + " → " + Sizing.mm2(best.to())
                        + " would raise the fault level below it so that the device of " + String.join(", ", lost) + " could no longer break it",
                        "kept at " + Sizing.mm2(best.from()) + "; it is not enlarged further");
                return true;
            }
        }
        for (Candidate c : batch) {
            sizing.note(c.id(), "Enlarged for the cumulative voltage drop", "its own drop limit fails; no feeder step buys more drop per volume",
                    Sizing.mm2(c.from()) + " → " + Sizing.mm2(c.to()) + " (" + Decimals.fixed3(c.gain()) + " % per " + Decimals.fixed3(c.cost()) + " dm³)");
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
            // Back-up protection: the combination's breaking capacity is what the check reads where the device's own falls short.
            if (a.current.device().backup() != null) icu = Math.max(icu == null ? 0 : icu, a.current.device().backup().combinedBreakingCapacityKa());
            Circuit upstream = run.feederOf.get(a.current.from());
            if (icu == null || upstream == null) continue;
            BoardFault at = sizing.results.get(upstream.id()).downstream();
            boolean three = a.current.phases() == 3;
            double ik = (three ? at.ik3() : at.ik1()).value();
            if (icu >= ik - 1e-12) ok.add(a.id);
        }
        return ok;
    }

    /** Enlarges a circuit chosen by a step; every candidate final circuit was failing when the step began. */
    private void apply(Slot slot, double size) {
        boolean ownDropFails = !slot.feeder && cumulative(slot) > slot.limitPct + 1e-9;
        Circuit k = slot.current;
        resize(slot, sizing.withCpc(slot.original, size), ownDropAt(slot, size));
        changed(slot);
        upsized.add(slot.id);
        boolean starting = !k.isFeeder() && !ownDropFails && k.load().startingCurrentMultiple() != null;
        sizing.decidedBy.put(slot.id, starting ? "motor-starting" : "voltage-drop");
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
            if (prev == null || prev < sizing.firstChoice.getOrDefault(id, 0.0) - 1e-9) continue;
            long failingBefore = failingAmong(slot);
            double savedPct = slot.ownPct;
            resize(slot, sizing.withCpc(slot.original, prev), ownDropAt(slot, prev));
            changed(slot);
            long failingAfter = failingAmong(slot);
            if (failingAfter > failingBefore) {
                resize(slot, k, savedPct);
                changed(slot);
            } else {
                sizing.note(id, "Enlargement undone", "the loads it was made for stay within their limits without it, once the other enlargements were made",
                        Sizing.mm2(k.cable().size().mm2()) + " → " + Sizing.mm2(prev));
            }
        }
    }

    /** How many of a circuit and the circuits below it fail their drop or starting limit. */
    private long failingAmong(Slot slot) {
        long n = failingDrop.contains(slot.id) ? 1 : 0;
        for (Slot a : slot.below) if (failingDrop.contains(a.id)) n++;
        return n;
    }
}
