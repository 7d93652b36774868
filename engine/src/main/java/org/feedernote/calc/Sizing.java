package org.feedernote.calc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.data.CableBuildData;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Basis;
import org.feedernote.model.Cable;
import org.feedernote.model.CpcKind;
import org.feedernote.model.Circuit;
import org.feedernote.model.Setting;
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
        // Only a separate conductor can be chosen apart from the cable: a core and the cpc of a
        // twin-and-earth cable follow the cable's size.
        List<Circuit> finals = run.order().stream()
                .filter(c -> !run.original(c.id()).isFeeder() && run.original(c.id()).cable().cpc().auto()
                        && run.original(c.id()).cable().separateCpc()).toList();
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
        double minimum = separateMinimum(chosen);
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

    /**
     * The standard sizes the sizing may choose for this circuit, ascending: those the tables cover for
     * its cable and method (and, for twin and earth, that are made), none below the design basis's
     * smallest line conductor.
     */
    List<Double> sizesFor(Circuit c) {
        double minimum = minimumSize();
        return tabulatedSizes(c).stream().filter(s -> s >= minimum - 1e-9).toList();
    }

    /** The smallest line conductor of the design basis (basis.minimum_size_mm2). */
    private double minimumSize() {
        return run.inst.basis().minimumSizeMm2().value();
    }

    /** The sizes the tables cover for this circuit's cable and method, ascending (and, for twin and earth, that are made). */
    private List<Double> tabulatedSizes(Circuit c) {
        List<Double> covered = coveredSizes.computeIfAbsent(coverageKey(c), k -> sizes.stream().filter(s -> covered(c, s)).toList());
        if (c.cable().cpcKind() != CpcKind.TWIN_AND_EARTH || !c.cable().cpc().auto()) return covered;
        return covered.stream().filter(s -> twinAndEarthCpc(c, s) != null).toList();
    }

    private static final CableBuildData BUILDS = new CableBuildData(ReferenceData.standard());

    /** The cpc of a twin-and-earth cable of this line size, or null where none is made or its cpc's resistance is not tabulated. */
    private static Double twinAndEarthCpc(Circuit c, double size) {
        Double cpc = BUILDS.twinAndEarthCpcMm2(size);
        return cpc != null && ReferenceData.standard().hasResistance(c.cable().conductor(), cpc) ? cpc : null;
    }

    /** The smallest separate protective conductor (IEC 60364-5-54, 543.1.3). */
    private static double separateMinimum(Circuit c) {
        return CpcKind.separateMinimumMm2(c.cable().conductor(), c.conditions().method());
    }

    /** What the covered sizes depend on (insulation, conductor, method, loaded conductors, formation) as one number. */
    private static long coverageKey(Circuit c) {
        Cable cable = c.cable();
        int loaded = c.phases() == 3 ? 3 : 2;
        int formation = cable.formation() == null ? 0 : cable.formation().ordinal() + 1;
        return (((((long) cable.insulation().ordinal() * 64 + cable.conductor().ordinal()) * 64 + c.conditions().method().ordinal()) * 8
                + loaded) * 64 + formation) * 2 + (c.conditions().vertical() ? 1 : 0);
    }

    private boolean covered(Circuit c, double size) {
        int loaded = c.phases() == 3 ? 3 : 2;
        return run.capacityData().covers(c.cable().insulation(), c.cable().conductor(), c.conditions().method(), loaded,
                c.cable().formation(), c.conditions().vertical(), size) && ReferenceData.standard().hasResistance(c.cable().conductor(), size);
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
        List<Double> belowMinimum = tabulatedSizes(c).stream().filter(s -> !covered.contains(s)).toList();
        if (!belowMinimum.isEmpty()) {
            Setting<Double> minimum = run.inst.basis().minimumSizeMm2();
            notes.add(new String[] {"Smallest size", "the design basis's smallest line conductor is " + mm2(minimum.value()) + " (basis.minimum_size_mm2"
                    + (minimum.given() ? ", design input" : ", default: " + Basis.MINIMUM_SIZE_SOURCE) + ")",
                    belowMinimum.stream().map(Sizing::mm2).collect(java.util.stream.Collectors.joining(", ")) + " not considered"});
        }
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

    /**
     * cpc 'auto' follows the cable's construction: a core equals the line conductors; a twin-and-earth
     * cable has the cpc BS 6004 gives it; a separate conductor starts at IEC 60364-5-54 Table 54.2
     * (same material as the line conductor), never below the 543.1.3 minimum.
     */
    Circuit withCpc(Circuit c, double size) {
        Cable cable = c.cable().withSize(size);
        if (c.cable().cpc().auto()) cable = cable.withCpc(cpcFor(c, size));
        return c.withCable(cable);
    }

    double cpcFor(Circuit c, double size) {
        CpcKind kind = c.cable().cpcKind();
        if (kind == CpcKind.CORE) return size;
        if (kind == CpcKind.TWIN_AND_EARTH) {
            Double cpc = twinAndEarthCpc(c, size);
            // Only sizes that are made are candidates (sizesFor); a size outside them is never chosen.
            return cpc != null ? cpc : size;
        }
        return Math.max(table54_2(size), separateMinimum(c));
    }

    static double table54_2(double size) {
        if (size <= 16) return size;
        if (size <= 35) return 16;
        double half = size / 2;
        List<Double> standard = ReferenceData.standardSizes();
        for (double s : standard) if (s >= half - 1e-9) return s;
        return standard.get(standard.size() - 1);
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
        if (!autoCpc) return;
        t.add(constructionDecision(original));
        Cable cable = sized.cable();
        double s = cable.size().mm2();
        String id = original.id() + "/size/cpc";
        if (cable.cpcKind() == CpcKind.CORE) {
            t.add(new Step.Decision(id, "Protective conductor", "cpc_mm2: auto; a core of the cable, the same size as the line conductors S = " + mm2(s),
                    "cpc = " + mm2(cable.cpc().mm2()), "IEC 60364-5-54:2011, Table 54.2 (S ≤ 16 mm²: cpc = S; a core of the cable meets every row)", List.of()));
        } else if (cable.cpcKind() == CpcKind.TWIN_AND_EARTH) {
            Step.Lookup cpc = BUILDS.twinAndEarthCpc(original.id() + "/size/cpc_te", s);
            t.add(cpc);
            t.add(new Step.Decision(id, "Protective conductor", "cpc_mm2: auto; the cpc of the " + mm2(s) + " flat twin-and-earth cable is "
                    + mm2(cpc.result().value()) + "; a cpc smaller than the line conductor is shown adequate by the adiabatic check below",
                    "cpc = " + mm2(cable.cpc().mm2()), "BS 6004:2012 (flat cables with cpc); IEC 60364-5-54:2011, 543.1.2", List.of(cpc.result().id())));
        } else if (cpcByCalculation.containsKey(original.id())) {
            t.add(new Step.Decision(id, "Protective conductor", "cpc_mm2: auto, a separate conductor; Table 54.2 with the 543.1.3 minimum would give "
                    + mm2(cpcByCalculation.get(original.id())) + "; the smallest standard size, not below " + mm2(separateMinimum(original))
                    + ", that passes the adiabatic check and disconnection",
                    "cpc = " + mm2(cable.cpc().mm2()) + " (selection by calculation; see the fault path below)",
                    "IEC 60364-5-54:2011, 543.1.2 and 543.1.3", List.of()));
        } else {
            String rule = s <= 16 ? "S ≤ 16 mm²: cpc = S" : s <= 35 ? "16 mm² < S ≤ 35 mm²: cpc = 16 mm²" : "S > 35 mm²: cpc = S/2, next standard size";
            double table = table54_2(s);
            double minimum = separateMinimum(original);
            boolean raised = minimum > table + 1e-9;
            t.add(new Step.Decision(id, "Protective conductor", "cpc_mm2: auto, a separate conductor; line conductor S = " + mm2(s) + "; " + rule
                    + (raised ? "; below the minimum of " + mm2(minimum) + " for a separate conductor" + separateMinimumWhy(original) : ""),
                    "cpc = " + mm2(cable.cpc().mm2()), raised ? "IEC 60364-5-54:2011, Table 54.2 and 543.1.3" : "IEC 60364-5-54:2011, Table 54.2",
                    List.of()));
        }
    }

    private static String separateMinimumWhy(Circuit c) {
        if (c.cable().conductor() == org.feedernote.model.Conductor.ALUMINIUM) return " of aluminium";
        return CpcKind.mechanicallyProtected(c.conditions().method())
                ? " protected against mechanical damage (method " + c.conditions().method().token() + ": conduit or trunking)"
                : " not protected against mechanical damage (method " + c.conditions().method().token() + ": not in conduit or trunking)";
    }

    /** How the protective conductor is made, stated or by default, and what cpc_mm2: auto may choose from therefore. */
    private static Step.Decision constructionDecision(Circuit original) {
        Cable cable = original.cable();
        CpcKind kind = cable.cpcKind();
        String given = cable.cpcKindStated() ? "cpc_kind: " + kind.token() + " (design input)" : defaultReason(original);
        String outcome = switch (kind) {
            case CORE -> "a core of the cable: cpc = S at every size";
            case TWIN_AND_EARTH -> "the cpc of the flat twin-and-earth cable: only the sizes made (up to "
                    + mm2(CableBuildData.TWIN_AND_EARTH_LARGEST_MM2) + ") whose cpc the tables give";
            default -> "a separate conductor: Table 54.2 or selection by calculation, not below " + mm2(separateMinimum(original))
                    + " (" + separateMinimumWhy(original).trim() + ")";
        };
        String ref = kind == CpcKind.TWIN_AND_EARTH ? "BS 6004:2012; IEC 60364-5-54:2011, 543.1" : kind == CpcKind.CORE
                ? "IEC 60364-5-54:2011, 543.2.1" : "IEC 60364-5-54:2011, 543.1.2, 543.1.3 and Table 54.2";
        return new Step.Decision(original.id() + "/size/cpc-kind", "Construction of the protective conductor", given, outcome, ref, List.of());
    }

    private static String defaultReason(Circuit c) {
        Cable cable = c.cable();
        if (cable.type() == org.feedernote.model.CableType.SINGLE_CORE) return "cpc_kind not given: single-core cables have no core for it, so by default a separate conductor";
        int phases = c.isFeeder() ? 3 : c.load().phases();
        String live = phases == 1 ? "2 live conductors (L, N)" : c.load() != null && c.load().kind() == org.feedernote.model.LoadKind.MOTOR
                ? "3 live conductors (a three-phase motor is taken without neutral; common practice, no source)"
                : "4 live conductors (three-phase with neutral)";
        String otherwise = phases == 3 && cable.cores() == 4 ? " (state cpc_kind: core where the circuit has no neutral)"
                : cable.conductor() == org.feedernote.model.Conductor.COPPER && cable.insulation() == org.feedernote.model.Insulation.PVC
                        && cable.cores() <= 3 ? " (state cpc_kind: twin-and-earth for a flat twin-and-earth cable)" : "";
        return "cpc_kind not given: a " + cable.cores() + "-core cable on a circuit of " + live + (cable.cpcKind() == CpcKind.CORE
                ? " has a core more: by default that core" : " has no core to spare: by default a separate conductor" + otherwise);
    }

    /** The check that decided an auto size, or the closest to its limit for given sizes. */
    String governing(String id, CircuitResult r) {
        if (!r.pass()) return r.failing().get(0).name();
        String d = decidedBy.get(id);
        if (d != null && run.original(id).cable().size().auto()) return d;
        return r.governingCheck();
    }
}
