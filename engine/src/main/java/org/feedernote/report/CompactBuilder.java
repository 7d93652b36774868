package org.feedernote.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.model.Board;
import org.feedernote.report.view.BoardRow;
import org.feedernote.report.view.CableView;
import org.feedernote.report.view.CompactSectionView;
import org.feedernote.report.view.CompactSectionView.CheckRow;
import org.feedernote.report.view.CompactSectionView.InputRow;
import org.feedernote.report.view.CompactSectionView.LineGroup;
import org.feedernote.report.view.LineView;
import org.feedernote.report.view.StepView;
import org.feedernote.trace.Q;
import org.feedernote.trace.Section;
import org.feedernote.trace.Step;
import org.feedernote.trace.TableRef;

/**
 * The compact form of the worked sections: the same steps as the full working, numbered the same,
 * each in one line; a cable's impedance derived once per distinct cable in the cable-data section.
 * Every line is made from the step's own view ({@link NoteBuilder#step}), so both forms show the
 * same figures.
 */
final class CompactBuilder {
    /** Sub-section ids of a circuit that hold its cable's impedance. */
    static final String IMPEDANCE = "/z";

    /** An edition in parentheses after a document's date: Appendix A gives each document's edition. */
    private static final Pattern EDITION = Pattern.compile(" \\((?:edition [^)]*|[a-z]+ edition|edition recalled)\\)");

    /** At most this many circuit ids are named under a cable; the rest are counted. */
    static final int USED_BY_NAMED = 12;

    private CompactBuilder() {}

    /** The distinct cables of the installation and, for each circuit with a cable, its cable's label. */
    record Cables(List<CableView> views, Map<String, String> labelOf, Map<String, CableView> cableOf) {}

    static Cables cables(List<Section> sections, NoteBuilder.Context cx, String sectionNumber) {
        Map<String, CableView> byKey = new LinkedHashMap<>();
        Map<String, List<String>> users = new LinkedHashMap<>();
        Map<String, String> labelOf = new HashMap<>();
        Map<String, CableView> cableOf = new HashMap<>();
        for (Section s : sections) {
            Section z = impedanceOf(s);
            if (z == null) continue;
            List<LineView> lines = new ArrayList<>();
            for (Step step : z.steps()) lines.add(line(step, "", cx));
            String title = z.subtitle() == null ? z.title() : z.subtitle();
            String key = title + "\u0000" + lines;
            CableView known = byKey.get(key);
            if (known == null) {
                int n = byKey.size() + 1;
                String label = "K" + n;
                List<LineView> numbered = new ArrayList<>(lines.size());
                int i = 1;
                String above = null;
                for (LineView l : lines) {
                    numbered.add(new LineView(sectionNumber + "." + n + "." + i++, l.quantity(), l.working(), l.reference(),
                            !l.reference().isEmpty() && l.reference().equals(above)));
                    above = l.reference();
                }
                known = new CableView(label, "s-" + sectionNumber + "." + n, cx.math(title), "", numbered);
                byKey.put(key, known);
            }
            users.computeIfAbsent(known.label(), k -> new ArrayList<>()).add(s.id());
            cableOf.put(s.id(), known);
            labelOf.put(s.id(), known.label() + " (" + sectionNumber + "." + known.label().substring(1) + ")");
        }
        List<CableView> views = new ArrayList<>(byKey.size());
        for (CableView v : byKey.values()) {
            List<String> ids = users.get(v.label());
            String named = String.join(", ", ids.subList(0, Math.min(ids.size(), USED_BY_NAMED)));
            String usedBy = ids.size() <= USED_BY_NAMED ? named : named + " and " + (ids.size() - USED_BY_NAMED) + " more";
            views.add(new CableView(v.label(), v.anchor(), v.titleHtml(), cx.math(usedBy), v.lines()));
        }
        return new Cables(List.copyOf(views), labelOf, cableOf);
    }

    private static Section impedanceOf(Section circuit) {
        for (Section sub : circuit.sections()) if (sub.id().endsWith(IMPEDANCE)) return sub;
        return null;
    }

    /** A worked section as one compact block, numbered as {@link NoteBuilder#section} numbers it. */
    static CompactSectionView section(Section s, String number, CircuitResult result, String cableRef, CableView cable, NoteBuilder.Context cx) {
        // A line the cable data or this block already shows (the same quantity, the same working) is not repeated.
        java.util.Set<String> shown = new java.util.HashSet<>();
        if (cable != null) for (LineView l : cable.lines()) shown.add(l.working());
        List<InputRow> inputs = new ArrayList<>();
        List<LineGroup> groups = new ArrayList<>();
        List<CheckRow> checks = new ArrayList<>();
        String governing = governingStep(result);
        int i = 1;
        List<LineView> own = new ArrayList<>();
        for (Step step : s.steps()) collect(step, number + "." + i++, cx, inputs, own, checks, governing, shown);
        if (!own.isEmpty()) groups.add(new LineGroup("", "", "", rows(own), null));
        for (Section sub : s.sections()) {
            String subNumber = number + "." + i++;
            String subtitle = sub.subtitle() == null ? "" : sub.subtitle();
            if (sub.id().endsWith(IMPEDANCE) && cableRef != null) {
                groups.add(new LineGroup(subNumber, cx.math(sub.title()), cx.math(subtitle), List.of(), cx.math(cableRef)));
                continue;
            }
            List<LineView> lines = new ArrayList<>();
            flatten(sub, subNumber, cx, inputs, lines, checks, governing, shown);
            groups.add(new LineGroup(subNumber, cx.math(sub.title()), cx.math(subtitle), rows(lines), null));
        }
        String subtitle = s.subtitle() == null ? "" : s.subtitle();
        return new CompactSectionView(number, "s-" + number, s.title(), cx.math(s.title()), cx.math(subtitle), false,
                inputRows(inputs), groups, checks);
    }

    /** Characters of plain text that fit half a block line (6.3 pt sans in about 73 mm). */
    static final int HALF_LINE = 64;

    /** Lines in rows: two consecutive short lines side by side, every other line alone. */
    static List<List<LineView>> rows(List<LineView> lines) {
        List<List<LineView>> rows = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            LineView l = lines.get(i);
            if (i + 1 < lines.size() && fitsHalf(l) && fitsHalf(lines.get(i + 1))) {
                rows.add(List.of(l, lines.get(i + 1)));
                i++;
            } else {
                rows.add(List.of(l));
            }
        }
        return rows;
    }

    /** Inputs in rows: two consecutive short ones side by side, every other one alone. */
    static List<List<InputRow>> inputRows(List<InputRow> inputs) {
        List<List<InputRow>> rows = new ArrayList<>();
        for (int i = 0; i < inputs.size(); i++) {
            if (i + 1 < inputs.size() && fitsHalf(inputs.get(i)) && fitsHalf(inputs.get(i + 1))) {
                rows.add(List.of(inputs.get(i), inputs.get(i + 1)));
                i++;
            } else {
                rows.add(List.of(inputs.get(i)));
            }
        }
        return rows;
    }

    private static boolean fitsHalf(InputRow in) {
        int origin = in.origin().isEmpty() ? 0 : plainLength(in.origin()) + 3;
        return plainLength(in.quantity()) + plainLength(in.value()) + 2 + origin * 0.92 <= HALF_LINE;
    }

    private static boolean fitsHalf(LineView l) {
        if (l.working().isEmpty()) return false;
        int reference = l.ditto() ? 7 : l.reference().isEmpty() ? 0 : plainLength(l.reference()) + 3;
        return plainLength(l.quantity()) + plainLength(l.working()) + 2 + reference * 0.88 <= HALF_LINE;
    }

    /** The length of the text of markup: tags not counted, an entity counted as one character. */
    private static int plainLength(String html) {
        int n = 0;
        for (int i = 0; i < html.length(); i++) {
            char c = html.charAt(i);
            if (c == '<') {
                int end = html.indexOf('>', i);
                if (end < 0) break;
                i = end;
            } else if (c == '&') {
                int end = html.indexOf(';', i);
                if (end > i && end - i <= 8) i = end;
                n++;
            } else {
                n++;
            }
        }
        return n;
    }

    /** A sub-section's steps and those of its own sub-sections (numbered as in the full working), in order. */
    private static void flatten(Section sub, String number, NoteBuilder.Context cx, List<InputRow> inputs, List<LineView> lines,
                                List<CheckRow> checks, String governing, java.util.Set<String> shown) {
        int i = 1;
        for (Step step : sub.steps()) collect(step, number + "." + i++, cx, inputs, lines, checks, governing, shown);
        for (Section deeper : sub.sections()) {
            String deeperNumber = number + "." + i++;
            lines.add(new LineView(deeperNumber, "<b>" + cx.math(deeper.title()) + "</b>", "", "", false));
            flatten(deeper, deeperNumber, cx, inputs, lines, checks, governing, shown);
        }
    }

    private static void collect(Step step, String number, NoteBuilder.Context cx, List<InputRow> inputs, List<LineView> lines,
                                List<CheckRow> checks, String governing, java.util.Set<String> shown) {
        if (step instanceof Step.Input in) {
            StepView v = NoteBuilder.step(step, number, cx);
            inputs.add(new InputRow(number, v.title(), v.symbolicHtml(), originHtml(in, cx)));
        } else if (step instanceof Step.Check c) {
            StepView v = NoteBuilder.step(step, number, cx);
            checks.add(new CheckRow(number, v.title(),
                    cx.math(c.value().symbol()) + " = " + NoteBuilder.valueHtml(c.value().value(), c.value().unit()),
                    Html.escape(c.comparison()),
                    NoteBuilder.valueHtml(c.limit().value(), c.limit().unit()) + " = " + cx.math(c.limit().symbol()),
                    c.pass(), c.id().equals(governing), v.source()));
        } else {
            LineView l = line(step, number, cx);
            if (!shown.add(l.working())) return;
            String above = lines.isEmpty() ? null : lines.get(lines.size() - 1).reference();
            // The hand calculation's ditto: the same reference as the line above.
            lines.add(new LineView(l.number(), l.quantity(), l.working(), l.reference(), !l.reference().isEmpty() && l.reference().equals(above)));
        }
    }

    /** The step id of the check that governs a passing circuit, or "" for none. */
    private static String governingStep(CircuitResult r) {
        if (r == null || !r.pass() || r.governingCheck() == null) return "";
        CheckResult c = r.check(r.governingCheck());
        return c == null ? "" : c.stepId();
    }

    /** {@link #origin} as markup, each distinct text made once. */
    private static String originHtml(Step.Input in, NoteBuilder.Context cx) {
        String key = ownKey(in.keyPath());
        return cx.reference("O\u0000" + in.origin() + "\u0000" + key + "\u0000" + in.reference(), k -> origin(in.origin(), key, in.reference()));
    }

    /** A key path without the circuit's own position in the file ("circuits[12]."): the block names the circuit. */
    static String ownKey(String keyPath) {
        if (!keyPath.startsWith("circuits[")) return keyPath;
        int end = keyPath.indexOf("].");
        return end < 0 ? keyPath : keyPath.substring(end + 2);
    }

    /** Where an input comes from. */
    static String origin(Step.Origin origin, String key, String reference) {
        return switch (origin) {
            case GIVEN -> "given: " + key;
            case DEFAULT -> "default, " + key + " not given: " + shortReference(reference);
            case DERIVED -> shortReference(reference);
        };
    }

    /** A step in one line, from its full view. */
    static LineView line(Step step, String number, NoteBuilder.Context cx) {
        StepView v = NoteBuilder.step(step, number, cx);
        String quantity = v.title() + (v.form().isEmpty() ? "" : " <i>" + v.form() + "</i>");
        String reference = referenceHtml(step, cx);
        return switch (v.kind()) {
            case "formula" -> new LineView(number, quantity, v.symbolicHtml() + " " + v.substitutedHtml() + " " + v.resultHtml(), reference, false);
            case "input" -> new LineView(number, quantity, v.symbolicHtml(), originHtml((Step.Input) step, cx), false);
            case "lookup", "check" -> new LineView(number, quantity, v.symbolicHtml(), reference, false);
            case "factor" -> new LineView(number, quantity, v.symbolicHtml() + " — " + v.because(), reference, false);
            case "decision" -> new LineView(number, quantity, "Since " + v.because() + " → " + v.outcome(), reference, false);
            default -> new LineView(number, quantity, v.text(), reference, false);
        };
    }

    /** {@link #referenceText} as markup, each distinct text made once (the lookup's row and column are part of it). */
    private static String referenceHtml(Step step, NoteBuilder.Context cx) {
        if (step instanceof Step.Lookup l) {
            TableRef t = l.table();
            return cx.reference("L\u0000" + t.source() + "\u0000" + t.table() + "\u0000" + l.row() + "\u0000" + l.column() + "\u0000" + t.fromMemory(),
                    k -> referenceText(step));
        }
        return cx.reference("R\u0000" + (step.reference() == null ? "" : step.reference()), k -> referenceText(step));
    }

    /**
     * A step's reference as the compact block gives it: for a lookup the document and table (without
     * its edition and glosses: Appendix A gives both), the row and column, and whether the cell is
     * recalled; for any other step the clause ({@link #clause}).
     */
    private static String referenceText(Step step) {
        if (step instanceof Step.Lookup l) {
            String table = gloss(EDITION.matcher(l.table().table()).replaceAll(""));
            return l.table().source() + ", " + table + " — " + l.row() + ", " + l.column() + (l.table().fromMemory() ? " (from memory)" : "");
        }
        return clause(step.reference());
    }

    /** Where in a document: a table, annex, equation or figure, or a numbered clause. */
    private static final Pattern LOCATOR = Pattern.compile("\\G[:\\d]*[,\\s]*(?:\\((?:edition|[a-z]+ edition)[^)]*\\)[,\\s]*)?"
            + "((?:Table|Tables|Annex|eq\\.|Figure|Appendix)\\s*[A-Z0-9][\\w.()]*|\\d+(?:\\.\\d+)+)");

    /**
     * The clause a reference cites, shortened: each document named (number and year) with the
     * table, annex, equation or clause that follows it, and the reference's standing (common
     * practice, from memory) where it says so. A reference that cites no document keeps only its
     * standing, or nothing: the full working gives it whole.
     */
    static String clause(String reference) {
        if (reference == null || reference.isEmpty()) return "";
        StringBuilder out = new StringBuilder();
        Matcher doc = NoteBuilder.DOCUMENT.matcher(reference);
        int cited = 0;
        while (doc.find() && cited < 2) {
            if (cited++ > 0) out.append(" / ");
            out.append(doc.group());
            Matcher where = LOCATOR.matcher(reference);
            where.region(doc.end(), reference.length());
            if (where.find()) out.append(", ").append(where.group(1));
        }
        String lower = reference.toLowerCase(java.util.Locale.ROOT);
        List<String> standing = new ArrayList<>();
        if (lower.contains("common practice")) standing.add("common practice");
        if (lower.contains("no source")) standing.add("no source");
        if (lower.contains("from memory") || lower.contains("recalled")) standing.add("from memory");
        if (lower.contains("assumption")) standing.add("assumption");
        if (lower.contains("manufacturer")) standing.add("manufacturer's data govern");
        if (!standing.isEmpty()) out.append(out.length() == 0 ? "" : "; ").append(String.join(", ", standing));
        return out.toString();
    }

    private static String gloss(String text) {
        Matcher m = GLOSS.matcher(text);
        StringBuilder out = new StringBuilder();
        while (m.find()) m.appendReplacement(out, STANDING.matcher(m.group()).find() ? Matcher.quoteReplacement(m.group()) : "");
        m.appendTail(out);
        return out.toString();
    }

    /**
     * A reference as the compact block shows it: without the editions in parentheses (Appendix A
     * lists every document with its edition); a reference that cites no document and carries no
     * mark of its standing (common practice, from memory, an assumption) only explains the formula
     * beside it, and is left to the full working.
     */
    static String shortReference(String reference) {
        if (reference == null) return "";
        if (!NoteBuilder.DOCUMENT.matcher(reference).find() && !STANDING.matcher(reference).find()) return "";
        String shorter = EDITION.matcher(reference).replaceAll("");
        Matcher m = GLOSS.matcher(shorter);
        StringBuilder out = new StringBuilder();
        while (m.find()) m.appendReplacement(out, STANDING.matcher(m.group()).find() ? Matcher.quoteReplacement(m.group()) : "");
        m.appendTail(out);
        return out.toString();
    }

    /** A gloss in parentheses that begins with a lower-case word ("(design current)"): the full working keeps it. */
    private static final Pattern GLOSS = Pattern.compile(" \\([a-z][^()]*(?:\\([^()]*\\)[^()]*)*\\)");

    /** Words that say what a reference without a document rests on. */
    private static final Pattern STANDING = Pattern.compile("common practice|from memory|recalled|[Hh]andbook|assum|no source|manufacturer|design input|default|given");

    /** The board schedule: per board its fault levels, Ze, demand, diversity and drop from the origin. */
    static List<BoardRow> boards(Result result) {
        Map<String, Board> model = new HashMap<>();
        for (Board b : result.input().boards()) model.put(b.id(), b);
        List<BoardRow> rows = new ArrayList<>();
        for (BoardResult b : result.boards()) {
            Q worst = null;
            int phase = 0;
            for (int p = 0; p < b.phaseCurrents().size(); p++) {
                Q q = b.phaseCurrents().get(p);
                if (worst == null || q.value() > worst.value()) {
                    worst = q;
                    phase = p;
                }
            }
            String demand = worst == null ? "—" : NoteBuilder.fmt(worst) + (b.phaseCurrents().size() > 1 ? " (L" + (phase + 1) + ")" : "");
            Board m = model.get(b.id());
            String diversity = m == null ? "—" : NoteBuilder.trim(m.diversity().value()) + (m.diversity().given() ? "" : " (default)");
            rows.add(new BoardRow(b.id(), b.fedBy() == null ? "origin" : b.fedBy(), NoteBuilder.fmt(b.faultKa()),
                    b.faultLineNeutralKa() == null ? "—" : NoteBuilder.fmt(b.faultLineNeutralKa()), NoteBuilder.fmt(b.loopImpedance()),
                    demand, diversity, b.dropPercent() == null ? "—" : NoteBuilder.fmt(b.dropPercent()), b.pass()));
        }
        return rows;
    }
}
