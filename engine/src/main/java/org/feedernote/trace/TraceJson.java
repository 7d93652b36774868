package org.feedernote.trace;

import java.io.IOException;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;

import org.feedernote.expr.Printer;

/** The versioned JSON form of a trace. Field order is fixed, so the same trace gives the same bytes. */
public final class TraceJson {
    public static final int FORMAT_VERSION = 1;
    private static final JsonFactory FACTORY = new JsonFactory();

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
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
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
                section(g, s);
                sectionsWritten.accept(++done);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        out.write("\n");
    }

    /**
     * One top-level section as JSON, alone (compact): the same fields and values as in the whole
     * trace, for comparing a trace section by section without writing all of it.
     */
    public static String section(Section s) {
        java.io.StringWriter out = new java.io.StringWriter();
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            section(g, s);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out.toString();
    }

    // Written field by field onto the generator (no tree per section), in the order a reader of the
    // format expects; the golden traces (golden-reports/*.trace.json) hold the bytes.

    private static void section(JsonGenerator g, Section s) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", s.id());
        g.writeStringField("title", s.title());
        if (!s.subtitle().isEmpty()) g.writeStringField("subtitle", s.subtitle());
        g.writeArrayFieldStart("steps");
        for (Step step : s.steps()) step(g, step);
        g.writeEndArray();
        if (!s.sections().isEmpty()) {
            g.writeArrayFieldStart("sections");
            for (Section c : s.sections()) section(g, c);
            g.writeEndArray();
        }
        g.writeEndObject();
    }

    /** A quantity a step used; shownAs is the symbol it is shown by there (a binding's variable's). */
    private static void q(JsonGenerator g, Q q, String shownAs) throws IOException {
        g.writeStringField("from", q.id());
        g.writeStringField("symbol", shownAs);
        g.writeNumberField("value", q.value());
        g.writeStringField("unit", q.unit());
    }

    private static void step(JsonGenerator g, Step step) throws IOException {
        g.writeStartObject();
        g.writeStringField("kind", step.kind());
        g.writeStringField("id", step.id());
        g.writeStringField("title", step.title());
        if (step instanceof Step.Input s) {
            g.writeStringField("symbol", s.symbol()); g.writeNumberField("value", s.value()); g.writeStringField("unit", s.unit());
            g.writeStringField("key_path", s.keyPath()); g.writeStringField("origin", s.origin().name().toLowerCase(java.util.Locale.ROOT));
        } else if (step instanceof Step.Lookup s) {
            g.writeStringField("symbol", s.symbol()); g.writeNumberField("value", s.value()); g.writeStringField("unit", s.unit());
            g.writeObjectFieldStart("table");
            g.writeStringField("id", s.table().id()); g.writeStringField("source", s.table().source());
            g.writeStringField("edition", s.table().edition()); g.writeStringField("table", s.table().table());
            g.writeBooleanField("from_memory", s.table().fromMemory());
            g.writeEndObject();
            g.writeStringField("row", s.row()); g.writeStringField("column", s.column()); g.writeStringField("method", s.method());
        } else if (step instanceof Step.Factor s) {
            g.writeStringField("symbol", s.symbol()); g.writeNumberField("value", s.value()); g.writeStringField("reason", s.reason());
        } else if (step instanceof Step.Formula s) {
            g.writeStringField("symbol", s.symbol()); g.writeStringField("formula", s.formulaId());
            g.writeStringField("expression", s.symbol() + " = " + Printer.symbolic(s.expr()));
            if (!s.form().isEmpty()) g.writeStringField("form", s.form());
            g.writeArrayFieldStart("bindings");
            for (Step.Binding binding : s.bindings()) {
                g.writeStartObject();
                q(g, binding.q(), binding.var().symbol());
                g.writeStringField("variable", binding.var().key());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeNumberField("value", s.value()); g.writeStringField("unit", s.unit());
        } else if (step instanceof Step.Check s) {
            g.writeStringField("check", s.name());
            g.writeObjectFieldStart("value");
            q(g, s.value(), s.value().symbol());
            g.writeEndObject();
            g.writeStringField("comparison", s.comparison());
            g.writeObjectFieldStart("limit");
            q(g, s.limit(), s.limit().symbol());
            g.writeEndObject();
            g.writeStringField("outcome", s.pass() ? "PASS" : "FAIL");
        } else if (step instanceof Step.Decision s) {
            g.writeStringField("because", s.because()); g.writeStringField("outcome", s.outcome());
        } else if (step instanceof Step.Note s) {
            g.writeStringField("text", s.text());
        }
        g.writeStringField("reference", step.reference() == null ? "" : step.reference());
        g.writeArrayFieldStart("uses");
        for (String used : step.uses()) g.writeString(used);
        g.writeEndArray();
        g.writeEndObject();
    }
}
