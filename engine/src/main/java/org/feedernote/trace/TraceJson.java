package org.feedernote.trace;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.feedernote.expr.Printer;

/** The versioned JSON form of a trace. Field order is fixed, so the same trace gives the same bytes. */
public final class TraceJson {
    public static final int FORMAT_VERSION = 1;
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private TraceJson() {}

    public static String write(Section root, String engineVersion, String dataVersion, String fingerprint) {
        java.io.StringWriter out = new java.io.StringWriter();
        try {
            write(root, engineVersion, dataVersion, fingerprint, out);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out.toString();
    }

    /**
     * Streams the trace to {@code out} section by section, so a trace of any size is written
     * without holding its text (or a tree of it) in memory. The same bytes as {@link #write(Section, String, String, String)}.
     */
    public static void write(Section root, String engineVersion, String dataVersion, String fingerprint, java.io.Writer out)
            throws java.io.IOException {
        write(root, engineVersion, dataVersion, fingerprint, out, done -> {});
    }

    /** As above; sectionsWritten hears the number of top-level sections written so far, after each. */
    public static void write(Section root, String engineVersion, String dataVersion, String fingerprint, java.io.Writer out,
                             java.util.function.IntConsumer sectionsWritten) throws java.io.IOException {
        try (com.fasterxml.jackson.core.JsonGenerator g = MAPPER.getFactory().createGenerator(out)) {
            g.disable(com.fasterxml.jackson.core.JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("format", "feedernote-trace");
            g.writeNumberField("version", FORMAT_VERSION);
            g.writeStringField("engine_version", engineVersion);
            g.writeStringField("reference_data", dataVersion);
            g.writeStringField("fingerprint", fingerprint);
            g.writeArrayFieldStart("sections");
            int done = 0;
            for (Section s : root.sections()) {
                MAPPER.writeTree(g, section(s));
                sectionsWritten.accept(++done);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        out.write("\n");
    }

    private static ObjectNode section(Section s) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("id", s.id());
        n.put("title", s.title());
        if (!s.subtitle().isEmpty()) n.put("subtitle", s.subtitle());
        ArrayNode steps = n.putArray("steps");
        for (Step step : s.steps()) steps.add(step(step));
        if (!s.sections().isEmpty()) {
            ArrayNode subs = n.putArray("sections");
            for (Section c : s.sections()) subs.add(section(c));
        }
        return n;
    }

    private static ObjectNode q(Q q) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("from", q.id());
        n.put("symbol", q.symbol());
        n.put("value", q.value());
        n.put("unit", q.unit());
        return n;
    }

    static ObjectNode step(Step step) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("kind", step.kind());
        n.put("id", step.id());
        n.put("title", step.title());
        if (step instanceof Step.Input s) {
            n.put("symbol", s.symbol()); n.put("value", s.value()); n.put("unit", s.unit());
            n.put("key_path", s.keyPath()); n.put("origin", s.origin().name().toLowerCase(java.util.Locale.ROOT));
        } else if (step instanceof Step.Lookup s) {
            n.put("symbol", s.symbol()); n.put("value", s.value()); n.put("unit", s.unit());
            ObjectNode table = n.putObject("table");
            table.put("id", s.table().id()); table.put("source", s.table().source()); table.put("edition", s.table().edition());
            table.put("table", s.table().table()); table.put("from_memory", s.table().fromMemory());
            n.put("row", s.row()); n.put("column", s.column()); n.put("method", s.method());
        } else if (step instanceof Step.Factor s) {
            n.put("symbol", s.symbol()); n.put("value", s.value()); n.put("reason", s.reason());
        } else if (step instanceof Step.Formula s) {
            n.put("symbol", s.symbol()); n.put("formula", s.formulaId());
            n.put("expression", s.symbol() + " = " + Printer.symbolic(s.expr()));
            if (!s.form().isEmpty()) n.put("form", s.form());
            ArrayNode b = n.putArray("bindings");
            for (Step.Binding binding : s.bindings()) {
                ObjectNode bn = q(binding.q());
                bn.put("symbol", binding.var().symbol());
                bn.put("variable", binding.var().key());
                b.add(bn);
            }
            n.put("value", s.value()); n.put("unit", s.unit());
        } else if (step instanceof Step.Check s) {
            n.put("check", s.name());
            n.set("value", q(s.value()));
            n.put("comparison", s.comparison());
            n.set("limit", q(s.limit()));
            n.put("outcome", s.pass() ? "PASS" : "FAIL");
        } else if (step instanceof Step.Decision s) {
            n.put("because", s.because()); n.put("outcome", s.outcome());
        } else if (step instanceof Step.Note s) {
            n.put("text", s.text());
        }
        n.put("reference", step.reference() == null ? "" : step.reference());
        ArrayNode uses = n.putArray("uses");
        step.uses().forEach(uses::add);
        return n;
    }
}
