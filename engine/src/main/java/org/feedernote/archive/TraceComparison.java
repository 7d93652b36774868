package org.feedernote.archive;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** Compares two trace JSON documents step by step: every value and every check outcome. */
public final class TraceComparison {
    /** A relative tolerance far below any displayed precision: only real changes count. */
    public static final double RELATIVE = 1e-9;

    public record Difference(String circuit, String step, String quantity, String recorded, String recomputed) {
        public String text() {
            return circuit + ": " + quantity + " (" + step + "): recorded " + recorded + ", recomputed " + recomputed;
        }
    }

    private TraceComparison() {}

    public static List<Difference> compare(String recordedTrace, String recomputedTrace) {
        ObjectMapper m = new ObjectMapper();
        try {
            Map<String, JsonNode> a = steps(m.readTree(recordedTrace));
            Map<String, JsonNode> b = steps(m.readTree(recomputedTrace));
            List<Difference> out = new ArrayList<>();
            for (var e : a.entrySet()) {
                JsonNode x = e.getValue();
                JsonNode y = b.get(e.getKey());
                String circuit = e.getKey().contains("/") ? e.getKey().substring(0, e.getKey().indexOf('/')) : e.getKey();
                String quantity = x.path("title").asText() + (x.has("symbol") ? " " + x.get("symbol").asText() : "");
                if (y == null) {
                    out.add(new Difference(circuit, e.getKey(), quantity, describe(x), "(no such step)"));
                    continue;
                }
                if (x.has("outcome") && !x.get("outcome").asText().equals(y.path("outcome").asText())) {
                    out.add(new Difference(circuit, e.getKey(), quantity, x.get("outcome").asText(), y.path("outcome").asText()));
                }
                JsonNode vx = value(x);
                JsonNode vy = value(y);
                if (vx != null && vx.isNumber() && (vy == null || !vy.isNumber() || differs(vx.asDouble(), vy.asDouble()))) {
                    out.add(new Difference(circuit, e.getKey(), quantity, describe(x), vy == null ? "(none)" : describe(y)));
                }
            }
            for (String id : b.keySet()) {
                if (!a.containsKey(id)) {
                    JsonNode y = b.get(id);
                    String circuit = id.contains("/") ? id.substring(0, id.indexOf('/')) : id;
                    out.add(new Difference(circuit, id, y.path("title").asText(), "(no such step)", describe(y)));
                }
            }
            return out;
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalArgumentException("a trace is not valid JSON: " + e.getOriginalMessage(), e);
        }
    }

    static boolean differs(double a, double b) {
        return Math.abs(a - b) > RELATIVE * Math.max(Math.abs(a), Math.abs(b)) + 1e-15;
    }

    private static JsonNode value(JsonNode step) {
        JsonNode v = step.get("value");
        if (v != null && v.isObject()) return v.get("value");
        return v;
    }

    private static String describe(JsonNode step) {
        JsonNode v = value(step);
        String unit = step.has("unit") ? step.get("unit").asText() : step.path("value").path("unit").asText();
        return (v == null ? step.path("outcome").asText() : v.asText()) + (unit.isEmpty() ? "" : " " + unit);
    }

    private static Map<String, JsonNode> steps(JsonNode trace) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        for (JsonNode s : trace.path("sections")) collect(s, out);
        return out;
    }

    private static void collect(JsonNode section, Map<String, JsonNode> out) {
        for (JsonNode step : section.path("steps")) out.put(step.path("id").asText(), step);
        for (JsonNode sub : section.path("sections")) collect(sub, out);
    }
}
