package org.feedernote.archive;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.feedernote.trace.Section;
import org.feedernote.trace.TraceJson;

/**
 * Compares two traces step by step: every value and every check outcome. The traces are read one
 * top-level section (a circuit, the supply) at a time, so a trace of any size is compared in
 * little memory: a step is matched by its id with the step of the other trace, which in traces of
 * the same input is found in the section read beside it.
 */
public final class TraceComparison {
    /** A relative tolerance far below any displayed precision: only real changes count. */
    public static final double RELATIVE = 1e-9;

    private static final ObjectMapper MAPPER = new ObjectMapper();

    public record Difference(String circuit, String step, String quantity, String recorded, String recomputed) {
        public String text() {
            return circuit + ": " + quantity + " (" + step + "): recorded " + recorded + ", recomputed " + recomputed;
        }
    }

    private TraceComparison() {}

    /** Two trace JSON documents (see {@link #compare(Iterator, Iterator)}). */
    public static List<Difference> compare(String recordedTrace, String recomputedTrace) {
        return compare(sections(new java.io.ByteArrayInputStream(recordedTrace.getBytes(StandardCharsets.UTF_8))),
                sections(new java.io.ByteArrayInputStream(recomputedTrace.getBytes(StandardCharsets.UTF_8))));
    }

    /**
     * The differences between the recorded and the recomputed trace, given as their top-level
     * sections: first those of the recorded steps, in the recorded order (a step missing from the
     * recomputed trace, a changed outcome, a changed value), then the recomputed steps the recorded
     * trace does not have, in their order.
     *
     * @throws IllegalArgumentException where a trace is not valid JSON
     */
    public static List<Difference> compare(Iterator<JsonNode> recorded, Iterator<JsonNode> recomputed) {
        Map<String, Numbered> unmatchedRecorded = new LinkedHashMap<>();
        Map<String, JsonNode> unmatchedRecomputed = new LinkedHashMap<>();
        List<Found> found = new ArrayList<>();
        long[] place = {0};
        try {
            while (recorded.hasNext() || recomputed.hasNext()) {
                if (recorded.hasNext()) {
                    forEachStep(recorded.next(), x -> {
                        Numbered n = new Numbered(x, place[0]++);
                        JsonNode y = unmatchedRecomputed.remove(id(x));
                        if (y != null) compareStep(n, y, found);
                        else unmatchedRecorded.put(id(x), n);
                    });
                }
                if (recomputed.hasNext()) {
                    forEachStep(recomputed.next(), y -> {
                        Numbered n = unmatchedRecorded.remove(id(y));
                        if (n != null) compareStep(n, y, found);
                        else unmatchedRecomputed.put(id(y), y);
                    });
                }
            }
        } catch (UncheckedIOException e) {
            String why = e.getCause() instanceof JsonProcessingException j ? j.getOriginalMessage() : e.getCause().getMessage();
            throw new IllegalArgumentException("a trace is not valid JSON: " + why, e.getCause());
        }
        for (Numbered n : unmatchedRecorded.values()) {
            found.add(new Found(n.place(), new Difference(circuit(id(n.step())), id(n.step()), quantity(n.step()), describe(n.step()),
                    "(no such step)")));
        }
        found.sort(Comparator.comparingLong(Found::place));
        List<Difference> out = new ArrayList<>(found.size() + unmatchedRecomputed.size());
        for (Found f : found) out.add(f.difference());
        for (var e : unmatchedRecomputed.entrySet()) {
            JsonNode y = e.getValue();
            out.add(new Difference(circuit(e.getKey()), e.getKey(), y.path("title").asText(), "(no such step)", describe(y)));
        }
        return out;
    }

    /** A recorded step and its place in the recorded trace. */
    private record Numbered(JsonNode step, long place) {}

    /** A difference and the place of its recorded step, by which the differences are listed. */
    private record Found(long place, Difference difference) {}

    private static void compareStep(Numbered n, JsonNode y, List<Found> found) {
        JsonNode x = n.step();
        String id = id(x);
        String quantity = quantity(x);
        if (x.has("outcome") && !x.get("outcome").asText().equals(y.path("outcome").asText())) {
            found.add(new Found(n.place(), new Difference(circuit(id), id, quantity, x.get("outcome").asText(), y.path("outcome").asText())));
        }
        JsonNode vx = value(x);
        JsonNode vy = value(y);
        if (vx != null && vx.isNumber() && (vy == null || !vy.isNumber() || differs(vx.asDouble(), vy.asDouble()))) {
            found.add(new Found(n.place(), new Difference(circuit(id), id, quantity, describe(x), vy == null ? "(none)" : describe(y))));
        }
    }

    private static String id(JsonNode step) {
        return step.path("id").asText();
    }

    private static String circuit(String stepId) {
        return stepId.contains("/") ? stepId.substring(0, stepId.indexOf('/')) : stepId;
    }

    private static String quantity(JsonNode step) {
        return step.path("title").asText() + (step.has("symbol") ? " " + step.get("symbol").asText() : "");
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

    /** A section's steps, then those of its sub-sections, depth first (the order of the trace). */
    private static void forEachStep(JsonNode section, java.util.function.Consumer<JsonNode> action) {
        for (JsonNode step : section.path("steps")) action.accept(step);
        for (JsonNode sub : section.path("sections")) forEachStep(sub, action);
    }

    /** The top-level sections of a trace held in memory, each as the trace's JSON gives it. */
    public static Iterator<JsonNode> sections(Section root) {
        Iterator<Section> sections = root.sections().iterator();
        return new Iterator<>() {
            @Override public boolean hasNext() {
                return sections.hasNext();
            }

            @Override public JsonNode next() {
                try {
                    return MAPPER.readTree(TraceJson.section(sections.next()));
                } catch (JsonProcessingException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
    }

    /**
     * The top-level sections of a trace JSON document, read from the stream one at a time (the
     * stream is read as they are asked for; close it after). A read or syntax error surfaces as an
     * UncheckedIOException, which {@link #compare(Iterator, Iterator)} reports as invalid JSON.
     */
    public static Iterator<JsonNode> sections(InputStream json) {
        JsonParser parser;
        try {
            parser = MAPPER.getFactory().createParser(json);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new Iterator<>() {
            private boolean started;
            private boolean ended;
            private JsonNode ahead;

            @Override public boolean hasNext() {
                if (ahead == null && !ended) {
                    try {
                        ahead = read();
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }
                return ahead != null;
            }

            @Override public JsonNode next() {
                if (!hasNext()) throw new NoSuchElementException();
                JsonNode n = ahead;
                ahead = null;
                return n;
            }

            /** The next section, or null after the last: moves to the "sections" array first. */
            private JsonNode read() throws IOException {
                if (!started) {
                    started = true;
                    if (parser.nextToken() != JsonToken.START_OBJECT) throw new com.fasterxml.jackson.core.JsonParseException(parser, "a trace is a JSON object");
                    while (true) {
                        JsonToken t = parser.nextToken();
                        if (t == JsonToken.END_OBJECT) {
                            ended = true;
                            return null;
                        }
                        if (t != JsonToken.FIELD_NAME) throw new com.fasterxml.jackson.core.JsonParseException(parser, "a field name expected");
                        String name = parser.currentName();
                        JsonToken value = parser.nextToken();
                        if (name.equals("sections")) {
                            if (value != JsonToken.START_ARRAY) throw new com.fasterxml.jackson.core.JsonParseException(parser, "'sections' is an array");
                            break;
                        }
                        parser.skipChildren();
                    }
                }
                JsonToken t = parser.nextToken();
                if (t == JsonToken.END_ARRAY) {
                    ended = true;
                    return null;
                }
                if (t != JsonToken.START_OBJECT) throw new com.fasterxml.jackson.core.JsonParseException(parser, "a section is a JSON object");
                return MAPPER.readTree(parser);
            }
        };
    }
}
