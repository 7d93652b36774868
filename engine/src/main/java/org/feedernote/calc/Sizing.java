package org.feedernote.calc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.data.CapacityData;
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

    private final Engine.Run run;
    private final List<Double> sizes = ReferenceData.standardSizes();
    private final Map<String, Circuit> current = new LinkedHashMap<>();
    private final Map<String, List<String[]>> notes = new HashMap<>();
    private final Map<String, String> decidedBy = new HashMap<>();
    private final List<String> upsized = new ArrayList<>();

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
        Map<String, CircuitResult> working = new HashMap<>();
        for (Circuit c : run.order()) {
            Circuit chosen = auto(c) ? smallestPassingOwnChecks(c, working) : withCpc(c, c.cable().size().mm2());
            current.put(c.id(), chosen);
            working.put(c.id(), run.evaluate(chosen, Trace.noop(), working));
        }
        for (int step = 0; step < MAX_STEPS; step++) {
            Map<String, CircuitResult> results = evaluateAll();
            List<CircuitResult> failing = results.values().stream()
                    .filter(r -> !r.circuit().isFeeder() && failsDrop(r)).toList();
            if (failing.isEmpty()) break;
            if (!upsizeBest(failing, results)) break;
        }
        trim();
        return current;
    }

    private static boolean failsDrop(CircuitResult r) {
        return r.checks().stream().anyMatch(k -> !k.pass() && (k.name().equals("voltage-drop") || k.name().equals("motor-starting")));
    }

    private Map<String, CircuitResult> evaluateAll() {
        Map<String, CircuitResult> results = new LinkedHashMap<>();
        for (Circuit c : run.order()) results.put(c.id(), run.evaluate(current.get(c.id()), Trace.noop(), results));
        return results;
    }

    private boolean covered(Circuit c, double size) {
        int loaded = (c.isFeeder() || c.load().phases() == 3) ? 3 : 2;
        return run.capacityData().covers(c.cable().insulation(), c.cable().conductor(), c.conditions().method(), loaded,
                c.cable().formation(), size) && ReferenceData.standard().hasResistance(c.cable().conductor(), size);
    }

    private Circuit smallestPassingOwnChecks(Circuit c, Map<String, CircuitResult> working) {
        Circuit last = null;
        String lastReason = null;
        for (double size : sizes) {
            if (!covered(c, size)) continue;
            Circuit candidate = withCpc(c, size);
            CircuitResult r = run.evaluate(candidate, Trace.noop(), working);
            String reason = ownFailure(r);
            if (reason == null) {
                if (lastReason != null) decidedBy.put(c.id(), lastReasonCheck);
                note(c.id(), "Size chosen", "the smallest standard size that passes the capacity, overload, disconnection and withstand checks",
                        mm2(size));
                return candidate;
            }
            note(c.id(), "Size rejected", mm2(size), "rejected: " + reason);
            last = candidate;
            lastReason = reason;
        }
        if (last == null) {
            throw new org.feedernote.data.DataGapException("no tabulated size covers circuit " + c.id());
        }
        note(c.id(), "No size passes", "no standard size up to " + mm2(last.cable().size().mm2()) + " passes", "the largest is used and the circuit fails");
        return last;
    }

    private String lastReasonCheck = "capacity";

    /** Why a candidate fails its own checks, in words, or null when it passes them. */
    private String ownFailure(CircuitResult r) {
        CheckResult cap = r.check("capacity");
        if (cap != null && !cap.pass()) {
            lastReasonCheck = "capacity";
            return String.format(Locale.ROOT, "I_z %s A < I_n %s A", Engine.trim(r.capacity().value()), Engine.trim(r.rating().value()))
                    + (r.rating().value() < r.designCurrent().value() ? " (and I_n < I_b)" : "");
        }
        CheckResult ol = r.check("overload");
        if (ol != null && !ol.pass()) {
            lastReasonCheck = "overload";
            return String.format(Locale.ROOT, "I_2 %s A > 1.45 · I_z = %s A", Engine.trim(ol.value()), Engine.trim(ol.limit()));
        }
        CheckResult dc = r.check("disconnection");
        if (dc != null && !dc.pass() && dc.determined()) {
            lastReasonCheck = "disconnection";
            return String.format(Locale.ROOT, "Z_s %s Ω > Z_s,max %s Ω", Engine.trim(dc.value()), Engine.trim(dc.limit()));
        }
        CheckResult sc = r.check("short-circuit");
        if (sc != null && !sc.pass() && sc.determined()) {
            lastReasonCheck = "short-circuit";
            return String.format(Locale.ROOT, "S below the adiabatic minimum %s mm²", Engine.trim(sc.limit()));
        }
        CheckResult pc = r.check("protective-conductor");
        if (pc != null && !pc.pass() && pc.determined() && r.circuit().cable().cpc().mm2() < r.circuit().cable().size().mm2()) {
            lastReasonCheck = "protective-conductor";
            return String.format(Locale.ROOT, "protective conductor below the adiabatic minimum %s mm²", Engine.trim(pc.limit()));
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

    private Double nextSize(Circuit c) {
        double now = c.cable().size().mm2();
        for (double s : sizes) if (s > now + 1e-9 && covered(c, s)) return s;
        return null;
    }

    private Double previousSize(Circuit c) {
        double now = c.cable().size().mm2();
        Double prev = null;
        for (double s : sizes) if (s < now - 1e-9 && covered(c, s)) prev = s;
        return prev;
    }

    private int conductors(Circuit c) {
        if (c.isFeeder() || c.load().phases() == 3) {
            return c.cable().type() == CableType.MULTICORE && c.cable().cores() >= 4 ? 4 : 3;
        }
        return 2;
    }

    private boolean upsizeBest(List<CircuitResult> failing, Map<String, CircuitResult> results) {
        Map<String, List<String>> helps = new LinkedHashMap<>();
        for (CircuitResult load : failing) {
            List<Circuit> path = new ArrayList<>(run.pathTo(load.circuit().from()));
            path.add(current.get(load.id()));
            for (Circuit k : path) {
                Circuit orig = run.original(k.id());
                if (auto(orig) && nextSize(current.get(k.id())) != null) helps.computeIfAbsent(k.id(), x -> new ArrayList<>()).add(load.id());
            }
        }
        String best = null;
        double bestRatio = -1;
        double bestGain = 0;
        double bestCost = 0;
        StringBuilder others = new StringBuilder();
        for (var e : helps.entrySet()) {
            Circuit k = current.get(e.getKey());
            double next = nextSize(k);
            Circuit up = withCpc(run.original(k.id()), next);
            CircuitResult now = results.get(k.id());
            CircuitResult after = run.evaluate(up, Trace.noop(), results);
            double gain = (now.dropPercent().value() - after.dropPercent().value()) * e.getValue().size();
            double cost = (next - k.cable().size().mm2()) * k.lengthM() * k.cable().parallel() * conductors(k) / 1000.0;
            double ratio = cost > 0 ? gain / cost : 0;
            if (others.length() > 0) others.append("; ");
            others.append(String.format(Locale.ROOT, "%s %s → %s: %.3f %%·load per %.3f dm³", k.id(), mm2(k.cable().size().mm2()),
                    mm2(next), gain, cost));
            if (ratio > bestRatio + 1e-15) {
                bestRatio = ratio;
                best = k.id();
                bestGain = gain;
                bestCost = cost;
            }
        }
        if (best == null || bestGain <= 0) {
            for (CircuitResult load : failing) {
                note(load.id(), "Voltage drop cannot be met", "no auto-sized circuit on the path of " + load.id() + " can be enlarged further",
                        "the circuit fails its drop limit");
            }
            return false;
        }
        Circuit k = current.get(best);
        double next = nextSize(k);
        String failingIds = failing.stream().map(CircuitResult::id).reduce((a, b) -> a + ", " + b).orElse("");
        note(best, "Enlarged for the cumulative voltage drop", "the drop limit fails at " + failingIds + "; candidates: " + others,
                String.format(Locale.ROOT, "%s → %s, the most drop per added conductor volume (%.3f %% per %.3f dm³)",
                        mm2(k.cable().size().mm2()), mm2(next), bestGain, bestCost));
        current.put(best, withCpc(run.original(best), next));
        upsized.add(best);
        decidedBy.put(best, failing.get(0).checks().stream().anyMatch(c -> !c.pass() && c.name().equals("voltage-drop"))
                ? "voltage-drop" : "motor-starting");
        return true;
    }

    /** Undoes enlargements that turned out unnecessary once others were made (last first). */
    private void trim() {
        for (int i = upsized.size() - 1; i >= 0; i--) {
            String id = upsized.get(i);
            Circuit k = current.get(id);
            Double prev = previousSize(k);
            if (prev == null) continue;
            Map<String, CircuitResult> before = evaluateAll();
            long failingBefore = before.values().stream().filter(r -> !r.pass()).count();
            current.put(id, withCpc(run.original(id), prev));
            Map<String, CircuitResult> after = evaluateAll();
            long failingAfter = after.values().stream().filter(r -> !r.pass()).count();
            if (failingAfter > failingBefore || !after.get(id).checks().stream().filter(c -> !c.pass()).toList().isEmpty()
                    && before.get(id).pass()) {
                current.put(id, k);
            } else {
                note(id, "Enlargement undone", "later enlargements upstream made it unnecessary", mm2(k.cable().size().mm2()) + " → " + mm2(prev));
                if (i < upsized.size()) upsized.remove(i);
            }
        }
    }

    /** Writes the decisions about a circuit's sizes into its section, before its calculation. */
    void record(Trace ct, Circuit original, Circuit sized) {
        boolean autoSize = original.cable().size().auto();
        boolean autoCpc = original.cable().cpc().auto();
        if (!autoSize && !autoCpc) return;
        Trace t = ct.section(original.id() + "/size", "Size selection", "size_mm2: " + (autoSize ? "auto" : "given")
                + ", cpc_mm2: " + (autoCpc ? "auto" : "given"));
        int i = 0;
        for (String[] n : notes.getOrDefault(original.id(), List.of())) {
            t.add(new Step.Decision(original.id() + "/size/" + (++i), n[0], n[1], n[2], "", List.of()));
        }
        if (autoCpc) {
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
