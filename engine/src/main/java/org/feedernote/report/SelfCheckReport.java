package org.feedernote.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.feedernote.report.view.SelfCheckView;
import org.feedernote.verification.PublishedCase;
import org.feedernote.verification.PublishedCase.Outcome;
import org.feedernote.verification.SelfVerification;

/** The self-verification as a terminal table, as JSON, and as the view the PDF template lays out. */
public final class SelfCheckReport {
    private SelfCheckReport() {}

    /** Figures of a computed value shown beside the published one: one more than the tables print. */
    private static final int COMPUTED_FIGURES = 4;

    public static final List<String> CAUTIONS = List.of(
            "Agreement with these published values shows that the program reproduces them; it does not make any design conform. "
                    + "A competent, licensed person reviews every calculation note before it is relied on.",
            "The applicable local wiring code and the manufacturer's data for the cables and devices actually installed govern "
                    + "wherever they differ from the values used here.",
            "Values marked \u201cfrom memory\u201d were recalled from the document named, not read from a copy: confirm them against the "
                    + "document before relying on them.");

    static String expected(PublishedCase c) {
        return withUnit(NumberFormatPolicy.given(c.expected(), ""), c.unit());
    }

    static String computed(Outcome o) {
        return Double.isFinite(o.computed()) ? withUnit(NumberFormatPolicy.significant(o.computed(), COMPUTED_FIGURES), o.publishedCase().unit())
                : "not computed";
    }

    static String tolerance(PublishedCase c) {
        double band = c.tolerance().band(c.expected());
        if (band <= 1e-9) return "exact";
        String text = "± " + NumberFormatPolicy.significant(band, 2);
        return c.unit().isEmpty() ? text : text + " " + c.unit();
    }

    private static String withUnit(String n, String unit) {
        return unit.isEmpty() ? n : n + " " + unit;
    }

    private static String verdict(Outcome o) {
        return o.pass() ? "PASS" : "FAIL";
    }

    public static String summaryLine(SelfVerification v) {
        return v.passed() + " of " + v.outcomes().size() + " published cases pass" + (v.allPass() ? "" : "; "
                + (v.outcomes().size() - v.passed()) + " FAIL");
    }

    /** The table for the terminal: one line per case, the count last. */
    public static String text(SelfVerification v) {
        List<String[]> lines = new ArrayList<>();
        lines.add(new String[] {"ID", "RESULT", "EXPECTED", "COMPUTED", "TOLERANCE", "QUANTITY — SOURCE"});
        for (Outcome o : v.outcomes()) {
            PublishedCase c = o.publishedCase();
            String tail = c.quantity() + " — " + c.source().text() + (o.problem().isEmpty() ? "" : " — " + o.problem());
            lines.add(new String[] {c.id(), verdict(o), expected(c), computed(o), tolerance(c), tail});
        }
        int[] widths = new int[5];
        for (String[] l : lines) for (int i = 0; i < widths.length; i++) widths[i] = Math.max(widths[i], l[i].length());
        StringBuilder b = new StringBuilder();
        b.append("Self-verification of feedernote ").append(v.engineVersion()).append(" (reference data ").append(v.dataVersion())
                .append(") against published values\n");
        for (String[] l : lines) {
            for (int i = 0; i < widths.length; i++) b.append(l[i]).append(" ".repeat(widths[i] - l[i].length() + 2));
            b.append(l[5]).append('\n');
        }
        b.append(summaryLine(v)).append('\n');
        return b.toString();
    }

    public static String json(SelfVerification v) {
        StringWriter out = new StringWriter();
        try (JsonGenerator g = new ObjectMapper().getFactory().createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeNumberField("format", 1);
            g.writeStringField("engine_version", v.engineVersion());
            g.writeStringField("reference_data", v.dataVersion());
            g.writeStringField("verdict", v.allPass() ? "PASS" : "FAIL");
            g.writeNumberField("passed", v.passed());
            g.writeNumberField("total", v.outcomes().size());
            g.writeArrayFieldStart("cases");
            for (Outcome o : v.outcomes()) {
                PublishedCase c = o.publishedCase();
                g.writeStartObject();
                g.writeStringField("id", c.id());
                g.writeStringField("quantity", c.quantity());
                g.writeObjectFieldStart("source");
                g.writeStringField("document", c.source().document());
                g.writeStringField("place", c.source().place());
                g.writeStringField("seen", c.source().seen());
                g.writeEndObject();
                g.writeNumberField("expected", c.expected());
                g.writeStringField("unit", c.unit());
                g.writeObjectFieldStart("tolerance");
                g.writeNumberField("absolute", c.tolerance().absolute());
                g.writeNumberField("relative", c.tolerance().relative());
                g.writeNumberField("band", c.tolerance().band(c.expected()));
                g.writeStringField("why", c.tolerance().why());
                g.writeEndObject();
                if (Double.isFinite(o.computed())) g.writeNumberField("computed", o.computed());
                else g.writeNullField("computed");
                g.writeStringField("verdict", verdict(o));
                if (!o.problem().isEmpty()) g.writeStringField("problem", o.problem());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out + "\n";
    }

    /** The view the selfcheck.ftlh template lays out. */
    public static SelfCheckView view(SelfVerification v) {
        List<SelfCheckView.Row> rows = new ArrayList<>();
        for (Outcome o : v.outcomes()) {
            PublishedCase c = o.publishedCase();
            rows.add(new SelfCheckView.Row(Html.escape(c.id()), Html.math(c.quantity()), Html.math(c.source().text()), Html.math(expected(c)),
                    Html.math(computed(o)), Html.math(tolerance(c)), o.pass(), Html.escape(o.problem())));
        }
        return new SelfCheckView(Html.escape(v.engineVersion()), Html.escape(v.dataVersion()), CAUTIONS.stream().map(Html::escape).toList(),
                rows, v.passed(), v.outcomes().size(), v.allPass());
    }
}
