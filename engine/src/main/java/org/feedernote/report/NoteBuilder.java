package org.feedernote.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.expr.Printer;
import org.feedernote.formula.Units;
import org.feedernote.model.Basis;
import org.feedernote.model.ImpedanceBasis;
import org.feedernote.model.Installation;
import org.feedernote.model.Project;
import org.feedernote.model.Setting;
import org.feedernote.model.Status;
import org.feedernote.model.Token;
import org.feedernote.report.view.*;
import org.feedernote.trace.Q;
import org.feedernote.trace.Section;
import org.feedernote.trace.Step;
import org.feedernote.trace.TableRef;
import org.feedernote.trace.TraceWalk;

/** Turns a result and its trace into the view the note's templates lay out. */
public final class NoteBuilder {
    /** Document identifiers such as "IEC 60364-5-52:2009" or "BS 7671:2018" inside a reference. */
    static final Pattern DOCUMENT = Pattern.compile("\\b(IEC|BS|EN|ISO|IEEE)\\s+[0-9][0-9A-Za-z\\-]*(?::\\d{4})?");

    public static final List<String> CAUTIONS = List.of(
            "This note supports, and does not replace, the judgement of a competent, licensed person, who must review and sign it before it is relied on.",
            "The applicable local wiring code and the manufacturer's data for the cables and devices actually installed govern wherever they differ from the values used here.",
            "Verify site conditions — route lengths, installation methods, grouping, ambient temperatures, and the supply's fault level and loop impedance — before construction and again at commissioning.");

    private NoteBuilder() {}

    public static NoteView build(Result result, ReferenceData data, String fingerprint, String engineVersion) {
        return build(result, data, fingerprint, engineVersion, null, List.of(), NoteLayout.COMPACT);
    }

    /** The number of the first worked section: 1 basis, 2 summary, 3 boards, 4 diagram, 5 drop profile, 6 cable data. */
    public static final int FIRST_WORKED = 7;
    /** The number of the cable-data section. */
    static final String CABLE_DATA = "6";

    /** @param changesSince the revision a list of changes is given against, or null for none */
    public static NoteView build(Result result, ReferenceData data, String fingerprint, String engineVersion,
                                 String changesSince, List<String> changes, NoteLayout layout) {
        Installation inst = result.input();
        Project p = inst.project();
        int failing = result.failingChecks();
        int checks = result.circuits().stream().mapToInt(c -> c.checks().size()).sum();
        boolean complete = result.notPerformed().isEmpty();
        String verdict;
        String detail;
        if (failing > 0) {
            verdict = "DOES NOT CONFORM";
            detail = failing + (failing == 1 ? " check fails" : " checks fail") + " — see the summary schedule";
        } else if (!complete) {
            verdict = "NOT SHOWN TO CONFORM";
            detail = "the checks made pass, but " + result.notPerformed().size() + " kinds of check are not made by this version";
        } else {
            verdict = "CONFORMS";
            detail = "all " + checks + " checks pass";
        }
        CoverView cover = new CoverView(p.title(), p.reference(), p.revision(), p.date(), p.client(), statusLabel(p.status()),
                verdict, detail, failing == 0 && complete,
                List.of(new CoverView.Signature("Prepared", p.preparedBy()), new CoverView.Signature("Checked", p.checkedBy()),
                        new CoverView.Signature("Approved", p.approvedBy())),
                p.revisions().stream().map(r -> new CoverView.RevisionRow(r.revision(), r.date(), r.description())).toList(),
                result.notPerformed(), result.circuits().size(), checks);

        Map<String, String> circuitSection = new LinkedHashMap<>();
        int n = FIRST_WORKED;
        Map<String, Step> index = new java.util.HashMap<>();
        for (Step s : TraceWalk.steps(result.trace())) index.put(s.id(), s);
        for (Section s : result.trace().sections()) circuitSection.put(s.id(), Integer.toString(n++));
        Set<String> ids = new TreeSet<>();
        for (CircuitResult c : result.circuits()) {
            ids.add(c.id());
            ids.add(c.circuit().from());
            if (c.circuit().to() != null) ids.add(c.circuit().to());
        }
        ids.removeIf(id -> id.indexOf('_') < 0);
        Context cx = new Context(index, List.copyOf(ids));
        List<Section> compactSections = result.trace().sections().stream().filter(s -> !layout.fullFor(s.id())).toList();
        CompactBuilder.Cables cables = CompactBuilder.cables(compactSections, cx, CABLE_DATA);
        Map<String, CircuitResult> byId = new java.util.HashMap<>();
        for (CircuitResult c : result.circuits()) byId.put(c.id(), c);
        List<WorkedSection> sections = new LazySections(result.trace().sections(), cx, layout, byId, cables);
        List<ContentsEntry> contents = contents(result.trace().sections(), p.title());

        List<SummaryRow> summary = new ArrayList<>();
        for (CircuitResult c : result.circuits()) summary.add(summaryRow(c, circuitSection.get(c.id())));

        List<Step> steps = TraceWalk.steps(result.trace());
        Set<String> documents = new TreeSet<>();
        Set<String> other = new TreeSet<>();
        Map<String, TableRef> tables = new LinkedHashMap<>();
        Set<String> unverified = new TreeSet<>();
        for (Step s : steps) {
            if (s instanceof Step.Lookup l) {
                // A table counts as recalled in the appendix where any value the note used from it is.
                tables.merge(l.table().id(), l.table(), (a, b) -> a.fromMemory() ? a : b);
                if (l.table().fromMemory()) unverified.add(l.table().citation() + " — " + l.row() + ", " + l.column());
            }
            String ref = s.reference() == null ? "" : s.reference();
            Matcher m = DOCUMENT.matcher(ref);
            boolean any = false;
            while (m.find()) {
                documents.add(m.group());
                any = true;
            }
            if (!any && !ref.isEmpty()) other.add(ref);
        }
        for (String standard : standards()) {
            Matcher m = DOCUMENT.matcher(standard);
            while (m.find()) documents.add(m.group());
        }
        // A document cited both with and without its date is listed once, dated.
        documents.removeIf(d -> d.indexOf(':') < 0 && documents.stream().anyMatch(o -> o.startsWith(d + ":")));
        List<SourceView> docs = documents.stream().map(d -> new SourceView(d, documentTitle(d), false)).toList();
        List<SourceView> tableViews = tables.values().stream()
                // The compact note names each table; the full working adds the record of the copies it was checked against.
                .map(t -> new SourceView(t.citation(), t.title() + (t.notes().isEmpty() || !layout.full() ? "" : ". " + t.notes()), t.fromMemory()))
                .toList();
        List<SourceView> others = other.stream().map(o -> new SourceView(o, "", false)).toList();

        List<ListingLine> listing = listing(inst.sourceText());
        String shortPrint = fingerprint.substring(0, 12);
        String running = p.title() + " · " + p.reference() + " rev " + p.revision();
        List<String> cautions = new ArrayList<>(CAUTIONS);
        cautions.add(unverified.isEmpty()
                ? "Every tabulated value this note uses was checked against a published copy of its table (Appendix A names each)."
                : unverified.size() + " tabulated value" + (unverified.size() == 1 ? " this note uses was" : "s this note uses were")
                        + " recalled from the published standards and not yet checked against a published copy (listed in 1.5); check them against the current edition before relying on them.");
        return new NoteView(cover, basis(inst), standards(), cautions, withRunAssumptions(assumptions(inst.basis().impedance().value()), result), List.copyOf(unverified), summary, sections, docs, tableViews, others,
                listing, fileName(inst.sourceName()), fingerprint, shortPrint, p.status() == Status.DRAFT, engineVersion,
                data.version(), running, changesSince, changes, layout.token(), layout.description(), CompactBuilder.boards(result),
                cables.views(), contents);
    }

    /** The printed contents: the front sections, every worked section, the appendices. */
    static List<ContentsEntry> contents(List<Section> worked, String title) {
        List<ContentsEntry> out = new ArrayList<>(worked.size() + 8);
        String[] front = {"Design basis and assumptions", "Summary schedule", "Board schedule", "Single-line diagram", "Voltage-drop profile", "Cable data"};
        for (int i = 0; i < front.length; i++) out.add(new ContentsEntry(Integer.toString(i + 1), front[i], "s-" + (i + 1), 0));
        int n = FIRST_WORKED;
        for (Section s : worked) {
            out.add(new ContentsEntry(Integer.toString(n), s.title() + (s.subtitle() == null || s.subtitle().isEmpty() ? "" : " — " + s.subtitle()), "s-" + n, 1));
            n++;
        }
        out.add(new ContentsEntry("A", "Sources", "s-A", 0));
        out.add(new ContentsEntry("B", "Design input", "s-B", 0));
        return out;
    }

    /** Characters of the input listing per printed line (7 pt mono across the text width). */
    static final int LISTING_WIDTH = 104;

    /**
     * The input as written, line by line, numbered as the file's lines are (the numbers error
     * messages give); a line longer than the page is continued on unnumbered lines.
     */
    static List<ListingLine> listing(String source) {
        String[] lines = source.replace("\r\n", "\n").split("\n", -1);
        int n = lines.length;
        if (n > 0 && lines[n - 1].isEmpty()) n--;
        List<ListingLine> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            String line = lines[i];
            out.add(new ListingLine(Integer.toString(i + 1), line.substring(0, Math.min(line.length(), LISTING_WIDTH))));
            for (int from = LISTING_WIDTH; from < line.length(); from += LISTING_WIDTH) {
                out.add(new ListingLine("", line.substring(from, Math.min(line.length(), from + LISTING_WIDTH))));
            }
        }
        return out;
    }

    public static String fileName(String path) {
        int slash = Math.max(path.lastIndexOf('/'), path.lastIndexOf('\\'));
        return slash < 0 ? path : path.substring(slash + 1);
    }

    public static String statusLabel(Status s) {
        return s.token().replace('-', ' ').toUpperCase(Locale.ROOT);
    }

    static List<String> standards() {
        return List.of(
                "IEC 60364-4-41:2005 — Protection for safety: protection against electric shock",
                "IEC 60364-4-43:2008 — Protection for safety: protection against overcurrent",
                "IEC 60364-5-52:2009 — Selection and erection: wiring systems (current-carrying capacity, voltage drop, Annex G)",
                "IEC 60228:2004 — Conductors of insulated cables",
                "IEC 60287-1-1:2006 — Electric cables: calculation of the current rating (resistance, skin and proximity effect)",
                "IEC 60502-1:2004 — Power cables with extruded insulation, 1 kV (dimensions used for reactance)",
                "BS 7671:2018 Appendix 4 — voltage drop in mV/A/m (the form of the figures; values here are derived)");
    }

    /**
     * What the other documents a note may cite are about, by number (any edition); subjects from
     * the standards' titles, shortened (from memory).
     */
    private static final Map<String, String> SUBJECTS = Map.ofEntries(
            Map.entry("IEC 60364-5-54", "Selection and erection: earthing arrangements and protective conductors"),
            Map.entry("IEC 60364-1", "Fundamental principles, assessment of general characteristics, definitions"),
            Map.entry("IEC 60909-0", "Short-circuit currents in three-phase a.c. systems: calculation of currents"),
            Map.entry("IEC 60898-1", "Circuit-breakers for overcurrent protection for household and similar installations (a.c.)"),
            Map.entry("EN 60898-1", "Circuit-breakers for overcurrent protection for household and similar installations (a.c.)"),
            Map.entry("IEC 60947-2", "Low-voltage switchgear and controlgear: circuit-breakers"),
            Map.entry("IEC 61009-1", "Residual current operated circuit-breakers with integral overcurrent protection (RCBOs)"),
            Map.entry("IEC 61008-1", "Residual current operated circuit-breakers without integral overcurrent protection (RCCBs)"),
            Map.entry("IEC 60269-1", "Low-voltage fuses: general requirements"),
            Map.entry("IEC 61439-1", "Low-voltage switchgear and controlgear assemblies: general rules"),
            Map.entry("IEC 60038", "IEC standard voltages"),
            Map.entry("IEC 60034-2-1", "Rotating electrical machines: losses and efficiency from tests"));

    static String documentTitle(String doc) {
        for (String s : standards()) if (s.startsWith(doc)) return s.substring(doc.length()).replaceFirst("^\\s*—\\s*", "");
        String number = doc.replaceFirst(":\\d{4}$", "");
        return SUBJECTS.getOrDefault(number, "");
    }

    static List<String> assumptions(ImpedanceBasis impedance) {
        return List.of(
                "Values are kept unrounded throughout; the working shows them rounded for display, so a result may differ in its last digit from a recalculation with the displayed figures.",
                "Voltage drops are referred to the nominal voltage: line-to-line for three-phase circuits, line-to-neutral for single-phase circuits; the same percentage either way for a balanced load.",
                "Feeder design currents come from the complex sum (P and Q separately) of the circuits of the board they feed, per phase, times the board's diversity; the most loaded phase governs.",
                impedance == ImpedanceBasis.TABULATED
                        ? "Cable r and x are read from the BS 7671:2018 Appendix 4 voltage-drop tables (mV/A/m, copper, at the maximum conductor operating temperature); the fault path keeps the IEC 60228 conductor resistances and takes its reactance from the table's x."
                        : "Cable reactance is derived from the geometry (round conductors of the nominal area, IEC 60502-1 insulation thickness); shaped conductors and armour change it slightly.");
    }

    /** The general assumptions, then those of this run that a verdict or a size rests on, each with the key that replaces it. */
    static List<String> withRunAssumptions(List<String> general, Result result) {
        List<String> lines = result.assumptionLines();
        if (lines.isEmpty()) return general;
        List<String> all = new ArrayList<>(general);
        for (String line : lines) all.add("Resting on an assumption, not data: " + line + ".");
        return List.copyOf(all);
    }

    static List<BasisRow> basis(Installation inst) {
        Basis b = inst.basis();
        List<BasisRow> rows = new ArrayList<>();
        rows.add(new BasisRow("Nominal voltage", trim(inst.supply().lineVoltageV()) + " V line / " + trim(inst.supply().phaseVoltageV()) + " V phase", "given", "supply"));
        rows.add(row("Frequency", b.frequencyHz(), " Hz", "IEC 60038"));
        rows.add(new BasisRow("System earthing", b.earthing().value().token(), b.earthing().given() ? "given" : "default", "IEC 60364-1"));
        if (b.limitsByKind()) {
            String limits = b.voltageDropLimitsByKind().entrySet().stream()
                    .map(e -> e.getKey() + " " + trim(e.getValue()) + " %").collect(Collectors.joining(", "));
            rows.add(new BasisRow("Voltage-drop limits, origin to terminals", limits + " ('other' applies to kinds not listed)", "given", "IEC 60364-5-52:2009, 525"));
        } else {
            rows.add(row("Voltage-drop limit, origin to terminals", b.voltageDropLimitPercent(), " %", "IEC 60364-5-52:2009, 525 and Annex G"));
        }
        rows.add(new BasisRow("Voltage-drop form checked", b.voltageDropMethod().value().token(), b.voltageDropMethod().given() ? "given" : "default", "IEC 60364-5-52:2009, Annex G"));
        rows.add(new BasisRow("Conductor temperature for the voltage drop", b.conductorTemperature().value().token(),
                b.conductorTemperature().given() ? "given" : "default", "IEC 60364-5-52:2009, Table 52.1"));
        // Shown where given or tabulated: the notes of inputs without the key stay as they were.
        if (b.impedance().given() || b.impedance().value() == ImpedanceBasis.TABULATED) {
            rows.add(new BasisRow("Impedance for the voltage drop", b.impedance().value().token(), b.impedance().given() ? "given" : "default",
                    b.impedance().value() == ImpedanceBasis.TABULATED ? "BS 7671:2018 Appendix 4, voltage-drop tables" : "IEC 60228, IEC 60287-1-1 (derived)"));
        }
        rows.add(row("Ambient air temperature", b.ambientAirC(), " °C", "IEC 60364-5-52:2009, 523.1"));
        rows.add(row("Ground temperature", b.ambientGroundC(), " °C", "IEC 60364-5-52:2009, 523.1"));
        rows.add(row("Disconnection time, final circuits", b.disconnectionTimeFinalS(), " s", "IEC 60364-4-41:2005, Table 41.1"));
        rows.add(row("Disconnection time, distribution circuits", b.disconnectionTimeDistributionS(), " s", "IEC 60364-4-41:2005, 411.3.2.3"));
        rows.add(row("Motor-starting dip limit", b.motorStartingLimitPercent(), " %", "common practice, no source"));
        rows.add(row("Smallest conductor size", b.minimumSizeMm2(), " mm²", "IEC 60364-5-52:2009, Table 52.2 (from memory)"));
        return rows;
    }

    private static BasisRow row(String item, Setting<?> s, String unit, String basis) {
        Object v = s.value();
        String text = v instanceof Double d ? trim(d) + unit : (v instanceof Token t ? t.token() : String.valueOf(v));
        return new BasisRow(item, text, s.given() ? "given" : "default", basis);
    }

    static String trim(double v) {
        return NumberFormatPolicy.number(v, Units.M);
    }

    static SummaryRow summaryRow(CircuitResult c, String section) {
        var circuit = c.circuit();
        String fromTo = circuit.isFeeder() ? circuit.from() + " → " + circuit.to() : circuit.from();
        String load = circuit.isFeeder() ? "feeder" : circuit.load().kind().token() + ", " + c.connection();
        String cable = (circuit.cable().parallel() > 1 ? circuit.cable().parallel() + " × " : "")
                + ReferenceData.sizeKey(circuit.cable().size().mm2()) + " / " + ReferenceData.sizeKey(circuit.cable().cpc().mm2());
        String rating = ratingText(c);
        String governing = (c.pass() ? c.governingCheck()
                : c.failing().stream().map(CheckResult::name).collect(Collectors.joining(", ")))
                + (c.assumptionsBearing().isEmpty() ? "" : " (assumed, 1.4)");
        return new SummaryRow(c.id(), fromTo, load, fmt(c.designCurrent()), rating, cable, fmt(c.dropPercent()),
                fmt(c.cumulativePercent()), c.limitPercent() == null ? "—" : fmt(c.limitPercent()),
                c.pass() ? "PASS" : "FAIL", c.pass(), governing, section);
    }

    /**
     * The device's rated current as given, or as the program chose it for rating_a: auto (marked
     * so); "—" only where the result has none.
     */
    static String ratingText(CircuitResult c) {
        Double given = c.circuit().device().ratingA();
        if (given != null) return trim(given);
        return c.rating() == null ? "—" : trim(c.rating().value()) + " (chosen)";
    }

    static String fmt(Q q) {
        return NumberFormatPolicy.number(q.value(), q.unit());
    }

    // ---------------- worked steps ----------------

    /**
     * The worked sections, each built when it is asked for and not kept: a note of ten thousand
     * circuits is laid out one section at a time without holding every step's view at once.
     */
    private static final class LazySections extends java.util.AbstractList<WorkedSection> {
        private final List<Section> sections;
        private final Context cx;
        private final NoteLayout layout;
        private final Map<String, CircuitResult> results;
        private final CompactBuilder.Cables cables;

        LazySections(List<Section> sections, Context cx, NoteLayout layout, Map<String, CircuitResult> results, CompactBuilder.Cables cables) {
            this.sections = sections;
            this.cx = cx;
            this.layout = layout;
            this.results = results;
            this.cables = cables;
        }

        @Override public WorkedSection get(int i) {
            Section s = sections.get(i);
            String number = Integer.toString(i + FIRST_WORKED);
            if (layout.fullFor(s.id())) return section(s, number, true, cx);
            return CompactBuilder.section(s, number, results.get(s.id()), cables.labelOf().get(s.id()), cables.cableOf().get(s.id()), cx);
        }

        @Override public int size() {
            return sections.size();
        }
    }

    /**
     * What the views of the worked sections need: the steps by id, and the installation's ids that
     * hold an underscore, which are printed as written (never as a symbol with a subscript).
     */
    record Context(Map<String, Step> index, List<String> verbatim, Map<String, String> references) {
        Context(Map<String, Step> index, List<String> verbatim) {
            this(index, verbatim, new java.util.concurrent.ConcurrentHashMap<>());
        }

        String math(String text) {
            return Html.math(text, verbatim);
        }

        /**
         * A reference as markup, made once per distinct text: a note's references repeat (a few
         * hundred texts over thousands of steps), so this cache stays small.
         */
        String reference(String raw, java.util.function.UnaryOperator<String> shorten) {
            return references.computeIfAbsent(raw, r -> math(shorten.apply(r)));
        }
    }

    static SectionView section(Section s, String number, boolean newPage, Context cx) {
        List<StepView> steps = new ArrayList<>();
        List<SectionView> subs = new ArrayList<>();
        int i = 1;
        for (Step step : s.steps()) steps.add(step(step, number + "." + i++, cx));
        for (Section sub : s.sections()) subs.add(section(sub, number + "." + i++, false, cx));
        String subtitle = s.subtitle() == null ? "" : s.subtitle();
        return new SectionView(number, "s-" + number, s.title(), subtitle, cx.math(s.title()), cx.math(subtitle), newPage, steps, subs);
    }

    static String valueHtml(double value, String unit) {
        String text = NumberFormatPolicy.quantity(value, unit);
        return Html.math(value < 0 ? "(" + text + ")" : text);
    }

    /** A bound value at its display precision; a given or tabulated value is shown as written. */
    static String boundHtml(Q q, Context cx) {
        Step source = cx.index().get(q.id());
        if (source instanceof Step.Input || source instanceof Step.Lookup) {
            String text = NumberFormatPolicy.given(q.value(), q.unit());
            return Html.math(q.value() < 0 ? "(" + text + ")" : text);
        }
        return valueHtml(q.value(), q.unit());
    }

    static StepView step(Step step, String number, Context cx) {
        if (step instanceof Step.Formula f) {
            Map<String, Q> bound = new LinkedHashMap<>();
            f.bindings().forEach(b -> bound.put(b.var().key(), b.q()));
            String symbolic = cx.math(f.symbol()) + " = " + cx.math(Printer.symbolic(f.expr()));
            String substituted = "= " + Printer.substituted(f.expr(), v -> {
                Q q = bound.get(v.key());
                return "\u0001" + boundHtml(q, cx) + "\u0002";
            });
            substituted = unwrapMarked(substituted, cx);
            String result = "= " + valueHtml(f.value(), f.unit());
            return view(cx, number, "formula", f.title(), f.form(), symbolic, substituted, result, f.reference(), "", "", "", true);
        }
        if (step instanceof Step.Input in) {
            String origin = switch (in.origin()) {
                case GIVEN -> "design input, " + in.keyPath();
                case DEFAULT -> "default (" + in.keyPath() + " not given): " + in.reference();
                case DERIVED -> in.reference();
            };
            return view(cx, number, "input", in.title(), "", cx.math(in.symbol()) + " = " + cx.math(NumberFormatPolicy.given(in.value(), in.unit())),
                    "", "", origin, "", "", "", true);
        }
        if (step instanceof Step.Lookup l) {
            String source = l.table().citation() + " — " + l.row() + ", " + l.column() + (l.table().fromMemory() ? " (from memory)" : "");
            return view(cx, number, "lookup", l.title(), "", cx.math(l.symbol()) + " = " + cx.math(NumberFormatPolicy.given(l.value(), l.unit())),
                    "", "", source, "", "", "", true);
        }
        if (step instanceof Step.Factor fa) {
            return view(cx, number, "factor", fa.title(), "", cx.math(fa.symbol()) + " = " + valueHtml(fa.value(), ""),
                    "", "", fa.reference(), fa.reason(), "", "", true);
        }
        if (step instanceof Step.Check c) {
            String line = cx.math(c.value().symbol()) + " = " + valueHtml(c.value().value(), c.value().unit()) + " " + Html.escape(c.comparison())
                    + " " + valueHtml(c.limit().value(), c.limit().unit()) + " = " + cx.math(c.limit().symbol());
            return view(cx, number, "check", c.title(), "limit " + NumberFormatPolicy.quantity(c.limit().value(), c.limit().unit()),
                    line, "", "", c.reference(), "", "", "", c.pass());
        }
        if (step instanceof Step.Decision d) {
            return view(cx, number, "decision", d.title(), "", "", "", "", d.reference(), d.because(), d.outcome(), "", true);
        }
        Step.Note note = (Step.Note) step;
        return view(cx, number, "note", note.title(), "", "", "", "", note.reference(), "", "", note.text(), true);
    }

    /** Every text field of a step view is escaped, with symbol subscripts marked up. */
    private static StepView view(Context cx, String number, String kind, String title, String form, String symbolic, String substituted,
                                 String result, String source, String because, String outcome, String text, boolean pass) {
        return new StepView(number, kind, cx.math(title), cx.math(form), symbolic, substituted, result, cx.math(source),
                cx.math(because), cx.math(outcome), cx.math(text), pass);
    }

    /**
     * The printer works on plain text; values were inserted as pre-escaped markup between marker
     * characters. Escape everything outside the markers, keep what is inside.
     */
    static String unwrapMarked(String text, Context cx) {
        StringBuilder out = new StringBuilder();
        int i = 0;
        while (i < text.length()) {
            int start = text.indexOf('\u0001', i);
            if (start < 0) {
                out.append(cx.math(text.substring(i)));
                break;
            }
            out.append(cx.math(text.substring(i, start)));
            int end = text.indexOf('\u0002', start);
            out.append(text, start + 1, end);
            i = end + 1;
        }
        return out.toString();
    }

    /** Every document identifier a reference string names (for tests of the sources appendix). */
    public static Set<String> documentsIn(String reference) {
        Set<String> out = new LinkedHashSet<>();
        Matcher m = DOCUMENT.matcher(reference == null ? "" : reference);
        while (m.find()) out.add(m.group());
        return out;
    }
}
