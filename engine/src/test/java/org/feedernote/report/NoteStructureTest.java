package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.CircuitResult;
import org.feedernote.report.view.SourceView;
import org.feedernote.report.view.SummaryRow;
import org.feedernote.trace.Step;
import org.feedernote.trace.TraceWalk;

/** The note's structure: sections, summary figures traced, sources listed, bytes repeatable. */
class NoteStructureTest {
    static NoteFixture note;
    static String text;

    @BeforeAll
    static void render() throws Exception {
        note = NoteFixture.of(Fixtures.inputs().resolve("bakery-small.yaml"));
        text = note.text();
    }

    @Test
    void everyCircuitHasItsSection() {
        for (CircuitResult c : note.result().circuits()) {
            assertTrue(text.contains("Circuit " + c.id() + " — "), "no section for " + c.id());
        }
    }

    @Test
    void everySummaryFigureIsTheFormattedValueOfItsTraceStep() {
        Map<String, Step> steps = TraceWalk.steps(note.result().trace()).stream().collect(Collectors.toMap(Step::id, Function.identity()));
        for (int i = 0; i < note.result().circuits().size(); i++) {
            CircuitResult c = note.result().circuits().get(i);
            SummaryRow row = note.view().summary().get(i);
            assertTrue(steps.containsKey(c.designCurrent().id()), c.id() + ": design current is a trace step");
            assertEquals(NumberFormatPolicy.number(value(steps.get(c.designCurrent().id())), "A"), row.designCurrent());
            assertEquals(NumberFormatPolicy.number(value(steps.get(c.dropPercent().id())), "%"), row.dropOwn());
            assertEquals(NumberFormatPolicy.number(value(steps.get(c.cumulativePercent().id())), "%"), row.dropTotal());
        }
    }

    private static double value(Step s) {
        if (s instanceof Step.Formula f) return f.value();
        if (s instanceof Step.Input in) return in.value();
        throw new AssertionError(s.id() + " is a " + s.kind());
    }

    @Test
    void everyCitedDocumentIsInTheSourcesAppendix() {
        Set<String> listed = note.view().documents().stream().map(SourceView::citation).collect(Collectors.toSet());
        for (Step s : TraceWalk.steps(note.result().trace())) {
            for (String doc : NoteBuilder.documentsIn(s.reference())) {
                // An undated citation is listed under the dated one of the same document.
                assertTrue(listed.contains(doc) || listed.stream().anyMatch(l -> l.startsWith(doc + ":")),
                        s.id() + " cites " + doc + ", which Appendix A does not list");
            }
        }
        assertTrue(text.contains("Appendix A"));
        assertTrue(note.view().tables().stream().allMatch(t -> text.contains(t.citation().substring(0, 10))));
    }

    @Test
    void everyDocumentInTheSourcesAppendixSaysWhatItIsAbout() {
        for (SourceView d : note.view().documents()) assertFalse(d.detail().isBlank(), d.citation() + " has no subject in Appendix A");
    }

    @Test
    void coverCarriesStampSignaturesCautionsAndFingerprint() {
        assertTrue(text.contains(note.result().pass() ? "CONFORMS" : "DOES NOT CONFORM"), "the stamp states the verdict");
        assertTrue(text.contains("FOR REVIEW"));
        assertTrue(text.contains("Prepared") && text.contains("Checked") && text.contains("Approved"));
        assertTrue(text.contains("competent, licensed person"));
        assertTrue(text.contains(note.view().fingerprint()));
        assertTrue(text.contains("Fingerprint " + note.view().fingerprintShort()));
        assertTrue(text.matches("(?s).*Page 1 of \\d+.*"));
    }

    @Test
    void twoRendersGiveTheSameBytes() throws Exception {
        NoteFixture again = NoteFixture.of(Fixtures.inputs().resolve("bakery-small.yaml"));
        assertArrayEquals(note.pdf(), again.pdf());
        assertEquals(note.trace(), again.trace());
    }

    @Test
    void idsWithAnUnderscoreArePrintedAsWrittenWhileSymbolsGetTheirSubscripts() throws Exception {
        String yaml = Fixtures.oneBoard("", Fixtures.circuit("L_1", "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}", 10,
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}"))
                .replace("id: B0", "id: DB_1").replace("from: B0", "from: DB_1");
        NoteFixture n = NoteFixture.of(Fixtures.parse(yaml));
        String xhtml = new NoteRenderer(null).xhtml(n.view());
        assertTrue(xhtml.contains("Circuit L_1"), "the circuit's id as written in its section title");
        assertTrue(xhtml.contains("from DB_1"), "the board's id as written in the subtitle");
        assertFalse(xhtml.contains("L<sub>1</sub>") || xhtml.contains("DB<sub>1</sub>"), "no id printed with a subscript");
        assertTrue(xhtml.contains("U<sub>0</sub>"), "symbols keep their subscripts");
    }

    @Test
    void textTheFontsCannotShowIsMarkedAndNamedNeverDroppedSilently() throws Exception {
        String yaml = Fixtures.oneBoard("", Fixtures.circuit("C1", "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}", 10,
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}")
                .replace("  from: B0", "  description: 泵房 pump room\n  from: B0"));
        NoteFixture n = NoteFixture.of(Fixtures.parse(yaml));
        String text = n.text();
        assertTrue(text.contains("□□ pump room"), "each character without a glyph is printed as a placeholder");
        assertTrue(text.contains("Characters not shown") && text.contains("U+623F") && text.contains("U+6CF5"),
                "Appendix B names the characters");
    }

    @Test
    void userTextCannotInjectMarkup() throws Exception {
        String yaml = Fixtures.oneBoard("", Fixtures.circuit("C1", "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}", 10,
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}"))
                .replace("title: Test", "title: \"<b>Bold</b> & <script>x</script>\"");
        NoteFixture n = NoteFixture.of(Fixtures.parse(yaml));
        String xhtml = new NoteRenderer(null).xhtml(n.view());
        assertFalse(xhtml.contains("<b>Bold</b>"));
        assertTrue(xhtml.contains("&lt;b&gt;Bold&lt;/b&gt; &amp; &lt;script&gt;"));
        assertTrue(n.text().contains("<b>Bold</b> & <script>x</script>"));
    }

    @Test
    void aDraftIsWatermarked() throws Exception {
        String yaml = Fixtures.oneBoard("", Fixtures.circuit("C1", "{kind: other, current_a: 5, power_factor: 0.9, phases: 1}", 10,
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}"));
        NoteFixture n = NoteFixture.of(Fixtures.parse(yaml));
        assertTrue(n.view().draft());
        long pages = Arrays.stream(n.text().split("\f")).count();
        assertTrue(n.text().split("DRAFT", -1).length - 1 >= pages, "every page carries the watermark");
    }
}
