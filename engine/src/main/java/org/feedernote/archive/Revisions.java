package org.feedernote.archive;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Installation;
import org.feedernote.trace.Q;

/**
 * What changed between two revisions of a design: circuits added and removed, inputs changed,
 * and results changed — verdicts first, then sizes, then figures beyond a stated tolerance.
 */
public final class Revisions {
    /** Figures that moved by less than this fraction are not reported. */
    public static final double TOLERANCE = 0.005;

    public record Change(String kind, String circuit, String what, String before, String after) {
        public String text() {
            String where = circuit.isEmpty() ? "" : circuit + ": ";
            if (before.isEmpty() && after.isEmpty()) return where + what;
            return where + what + ": " + before + " → " + after;
        }
    }

    public record Report(String before, String after, List<Change> verdicts, List<Change> added, List<Change> removed,
                         List<Change> sizes, List<Change> inputs, List<Change> figures) {
        public boolean empty() {
            return verdicts.isEmpty() && added.isEmpty() && removed.isEmpty() && sizes.isEmpty() && inputs.isEmpty() && figures.isEmpty();
        }

        public List<Change> all() {
            List<Change> out = new ArrayList<>(verdicts);
            out.addAll(added);
            out.addAll(removed);
            out.addAll(sizes);
            out.addAll(inputs);
            out.addAll(figures);
            return out;
        }
    }

    private Revisions() {}

    public static Report compare(String beforeName, Installation a, Result ra, String afterName, Installation b, Result rb) {
        List<Change> verdicts = new ArrayList<>();
        List<Change> added = new ArrayList<>();
        List<Change> removed = new ArrayList<>();
        List<Change> sizes = new ArrayList<>();
        List<Change> inputs = new ArrayList<>();
        List<Change> figures = new ArrayList<>();
        if (ra.pass() != rb.pass()) {
            verdicts.add(new Change("verdict", "", "overall verdict", ra.pass() ? "PASS" : "FAIL", rb.pass() ? "PASS" : "FAIL"));
        }
        Map<String, CircuitResult> ca = new LinkedHashMap<>();
        ra.circuits().forEach(c -> ca.put(c.id(), c));
        Map<String, CircuitResult> cb = new LinkedHashMap<>();
        rb.circuits().forEach(c -> cb.put(c.id(), c));
        for (String id : cb.keySet()) if (!ca.containsKey(id)) added.add(new Change("added", id, "circuit added", "", ""));
        for (String id : ca.keySet()) if (!cb.containsKey(id)) removed.add(new Change("removed", id, "circuit removed", "", ""));
        for (var e : ca.entrySet()) {
            CircuitResult x = e.getValue();
            CircuitResult y = cb.get(e.getKey());
            if (y == null) continue;
            String id = e.getKey();
            if (x.pass() != y.pass()) {
                verdicts.add(new Change("verdict", id, "verdict", verdict(x), verdict(y)));
            }
            size(sizes, id, "cable size", x.circuit().cable().size().mm2(), y.circuit().cable().size().mm2(), "mm²");
            size(sizes, id, "protective conductor", x.circuit().cable().cpc().mm2(), y.circuit().cable().cpc().mm2(), "mm²");
            if (x.circuit().cable().parallel() != y.circuit().cable().parallel()) {
                sizes.add(new Change("size", id, "conductors in parallel", "" + x.circuit().cable().parallel(), "" + y.circuit().cable().parallel()));
            }
            size(sizes, id, "device rating", x.rating().value(), y.rating().value(), "A");
            figure(figures, id, "design current I_b", x.designCurrent(), y.designCurrent());
            figure(figures, id, "own voltage drop", x.dropPercent(), y.dropPercent());
            figure(figures, id, "voltage drop from the origin", x.cumulativePercent(), y.cumulativePercent());
            figure(figures, id, "current-carrying capacity I_z", x.capacity(), y.capacity());
            figure(figures, id, "earth-fault loop impedance Z_s", x.loopImpedance(), y.loopImpedance());
            figure(figures, id, "prospective fault current", x.faultAtOrigin(), y.faultAtOrigin());
        }
        inputs(inputs, a, b);
        return new Report(beforeName, afterName, verdicts, added, removed, sizes, inputs, figures);
    }

    private static String verdict(CircuitResult c) {
        return c.pass() ? "PASS" : "FAIL (" + String.join(", ", c.failing().stream().map(k -> k.name()).toList()) + ")";
    }

    private static void size(List<Change> out, String id, String what, double a, double b, String unit) {
        if (Math.abs(a - b) > 1e-9) out.add(new Change("size", id, what, ReferenceData.sizeKey(a) + " " + unit, ReferenceData.sizeKey(b) + " " + unit));
    }

    private static void figure(List<Change> out, String id, String what, Q a, Q b) {
        if (a == null || b == null) return;
        double x = a.value();
        double y = b.value();
        if (Math.abs(x - y) > TOLERANCE * Math.max(Math.abs(x), Math.abs(y)) + 1e-12) {
            out.add(new Change("figure", id, what, fmt(x) + " " + a.unit(), fmt(y) + " " + b.unit()));
        }
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    /** Differences in the canonical inputs, key path by key path; circuits are matched by id. */
    private static void inputs(List<Change> out, Installation a, Installation b) {
        ObjectMapper m = new ObjectMapper();
        try {
            JsonNode x = m.readTree(a.canonicalJson());
            JsonNode y = m.readTree(b.canonicalJson());
            for (String section : List.of("project", "basis", "supply")) walk(out, "", section, x.get(section), y.get(section));
            Map<String, JsonNode> bx = byId(x.get("boards"));
            Map<String, JsonNode> by = byId(y.get("boards"));
            for (var e : bx.entrySet()) if (by.containsKey(e.getKey())) walk(out, e.getKey(), "", e.getValue(), by.get(e.getKey()));
            Map<String, JsonNode> cx = byId(x.get("circuits"));
            Map<String, JsonNode> cy = byId(y.get("circuits"));
            for (var e : cx.entrySet()) if (cy.containsKey(e.getKey())) walk(out, e.getKey(), "", e.getValue(), cy.get(e.getKey()));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Map<String, JsonNode> byId(JsonNode list) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        if (list != null) for (JsonNode n : list) out.put(n.path("id").asText(), n);
        return out;
    }

    private static void walk(List<Change> out, String circuit, String path, JsonNode a, JsonNode b) {
        if (a == null && b == null) return;
        if (a != null && b != null && a.isObject() && b.isObject()) {
            Set<String> keys = new LinkedHashSet<>();
            a.fieldNames().forEachRemaining(keys::add);
            b.fieldNames().forEachRemaining(keys::add);
            for (String k : keys) walk(out, circuit, path.isEmpty() ? k : path + "." + k, a.get(k), b.get(k));
            return;
        }
        if (a == null || b == null || !a.equals(b)) {
            out.add(new Change("input", circuit, path, shown(a), shown(b)));
        }
    }

    /**
     * A value of the input as a reader writes it: a word or number as it is, a mapping as its
     * entries (key: value, …), a list as its items separated by semicolons — never as JSON.
     */
    static String shown(JsonNode n) {
        if (n == null || n.isMissingNode()) return "(absent)";
        if (n.isTextual()) return "\"" + n.asText() + "\"";
        if (n.isObject()) {
            List<String> entries = new java.util.ArrayList<>();
            n.fields().forEachRemaining(e -> entries.add(e.getKey() + ": " + shown(e.getValue())));
            return "{" + String.join(", ", entries) + "}";
        }
        if (n.isArray()) {
            if (n.isEmpty()) return "(none)";
            List<String> items = new java.util.ArrayList<>();
            n.forEach(i -> items.add(shown(i)));
            return String.join("; ", items);
        }
        return n.toString();
    }

    public static String text(Report r) {
        StringBuilder s = new StringBuilder();
        s.append("Changes from ").append(r.before()).append(" to ").append(r.after()).append('\n');
        if (r.empty()) return s.append("No changes.\n").toString();
        section(s, "Verdicts", r.verdicts());
        section(s, "Circuits added", r.added());
        section(s, "Circuits removed", r.removed());
        section(s, "Sizes", r.sizes());
        section(s, "Inputs", r.inputs());
        section(s, "Figures (changes beyond " + (TOLERANCE * 100) + " %)", r.figures());
        return s.toString();
    }

    private static void section(StringBuilder s, String title, List<Change> changes) {
        if (changes.isEmpty()) return;
        s.append('\n').append(title).append('\n');
        for (Change c : changes) s.append("  ").append(c.text()).append('\n');
    }

    public static String json(Report r) {
        ObjectMapper m = new ObjectMapper();
        ObjectNode root = m.createObjectNode();
        root.put("before", r.before());
        root.put("after", r.after());
        root.put("tolerance", TOLERANCE);
        put(root.putArray("verdicts"), r.verdicts());
        put(root.putArray("added"), r.added());
        put(root.putArray("removed"), r.removed());
        put(root.putArray("sizes"), r.sizes());
        put(root.putArray("inputs"), r.inputs());
        put(root.putArray("figures"), r.figures());
        try {
            return m.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void put(ArrayNode arr, List<Change> changes) {
        for (Change c : changes) {
            ObjectNode n = arr.addObject();
            n.put("circuit", c.circuit());
            n.put("what", c.what());
            n.put("before", c.before());
            n.put("after", c.after());
        }
    }

}
