package org.feedernote.calc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.data.ReferenceData;
import org.feedernote.model.Cable;
import org.feedernote.model.Circuit;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * Chooses the sizes given as 'auto': first the smallest standard size that passes the circuit's
 * own checks (capacity, overload); then, because the voltage-drop limit is cumulative, while some
 * load fails its drop limit, one size step at a time on the circuit of its path where the step
 * buys the most drop per unit of added conductor volume; last, each such step is undone again if
 * everything still passes without it ({@link DropBalancing}); then the smallest protective conductor
 * that passes by calculation. Candidates are evaluated with the no-op trace; the chosen sizes are
 * then calculated again with the recording trace. Sizes the designer gave are never changed.
 */
final class Sizing {
    private final Engine.Run run;
    private final List<Double> sizes = ReferenceData.standardSizes();
    /** The sizes chosen so far, by circuit, in calculation order. */
    final Map<String, Circuit> current = new LinkedHashMap<>();
    /** The decisions about each circuit's sizes, written into its "Size selection" section. */
    final Map<String, List<String[]>> notes = new HashMap<>();
    /** The check that decided each auto size the first pass or the balancing chose. */
    final Map<String, String> decidedBy = new HashMap<>();
    /** The size the first pass chose for each auto-sized circuit: the balancing never goes below it. */
    final Map<String, Double> firstChoice = new HashMap<>();

    Sizing(Engine.Run run) {
        this.run = run;
    }

    private static boolean auto(Circuit c) {
        return c.cable().size().auto();
    }

    /** Takes back the latest decision noted for a circuit (a step that was undone at once). */
    void withdrawLastNote(String circuit) {
        List<String[]> list = notes.get(circuit);
        if (list != null && !list.isEmpty()) list.remove(list.size() - 1);
    }

    void note(String circuit, String title, String because, String outcome) {
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
        new DropBalancing(this, run).run();
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

    /** Results of the sizes chosen by the first pass; feeders are recalculated as their paths change (see DropBalancing). */
    final Map<String, CircuitResult> results = new LinkedHashMap<>();

    /** Covered sizes by {@link #coverageKey}: few different cables and methods serve thousands of circuits. */
    private final Map<Long, List<Double>> coveredSizes = new java.util.concurrent.ConcurrentHashMap<>();

    /** The standard sizes the tables cover for this circuit's cable and method, ascending. */
    List<Double> sizesFor(Circuit c) {
        return coveredSizes.computeIfAbsent(coverageKey(c), k -> sizes.stream().filter(s -> covered(c, s)).toList());
    }

    /** What the covered sizes depend on (insulation, conductor, method, loaded conductors, formation) as one number. */
    private static long coverageKey(Circuit c) {
        Cable cable = c.cable();
        int loaded = c.phases() == 3 ? 3 : 2;
        int formation = cable.formation() == null ? 0 : cable.formation().ordinal() + 1;
        return ((((long) cable.insulation().ordinal() * 64 + cable.conductor().ordinal()) * 64 + c.conditions().method().ordinal()) * 8
                + loaded) * 64 + formation;
    }

    private boolean covered(Circuit c, double size) {
        int loaded = c.phases() == 3 ? 3 : 2;
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
        double largest = 0;
        for (double size : covered) if (size <= DropBalancing.PRACTICAL_LARGEST_MM2 + 1e-9) largest = size;
        CapacityCalc.Probe lastProbe = null;
        Map<Double, Double> izBySize = new java.util.TreeMap<>();
        for (double size : sizes) {
            if (!covered.contains(size) || size > largest + 1e-9) continue;
            Circuit candidate = withCpc(c, size);
            CapacityCalc.Probe probe = run.capacityCalc.probe(candidate);
            lastProbe = probe;
            izBySize.put(size, probe.capacity().iz().value());
            String quick = probe.shortfall();
            if (quick != null && size < largest - 1e-9) {
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
            String parallel = "";
            if (lastProbe != null && lastProbe.shortfall() != null && c.cable().parallel() == 1) {
                double iz = lastProbe.capacity().iz().value();
                double need = c.device().ratingA() != null ? c.device().ratingA() : run.designCurrent.get(c.id()).value();
                int n = (int) Math.ceil(need / iz - 1e-9);
                double each = last.cable().size().mm2();
                for (Map.Entry<Double, Double> e : izBySize.entrySet()) {
                    if (n * e.getValue() >= need - 1e-9) {
                        each = e.getKey();
                        break;
                    }
                }
                if (n > 1) parallel = "; " + n + " cables of " + mm2(each) + " in parallel would carry " + Decimals.trim(need)
                        + " A before the derating for their own grouping (give cable.parallel: " + n + " and check again)";
            }
            notes.add(new String[] {"No size passes", "no single cable up to " + mm2(last.cable().size().mm2()) + " (the largest the sizing chooses) passes"
                    + parallel, "the largest is used and the circuit fails"});
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
    Circuit withCpc(Circuit c, double size) {
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
