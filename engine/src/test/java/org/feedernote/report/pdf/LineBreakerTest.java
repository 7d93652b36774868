package org.feedernote.report.pdf;

import static org.junit.jupiter.api.Assertions.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import com.lowagie.text.Element;

import org.feedernote.report.pdf.LineBreaker.Fragment;
import org.feedernote.report.pdf.LineBreaker.Line;
import org.feedernote.report.pdf.LineBreaker.Run;

/**
 * How a paragraph of the note is broken into lines: at spaces and line breaks only, greedy, a
 * symbol with its subscript kept whole, tab stops, a right float at the end of the last line, and
 * the four alignments. Widths are those of the embedded Liberation fonts (common practice of
 * typesetting, no source).
 */
class LineBreakerTest {
    private static Fonts fonts;
    private static Style body;
    private static Style sub;

    @BeforeAll
    static void styles() throws Exception {
        fonts = new Fonts();
        Style.Resolver r = new Style.Resolver(StyleSheet.parse("body { font-size: 10pt; } sub { font-size: 70%; vertical-align: sub; }"));
        body = r.resolve(r.root(), List.of(), "body", "", "");
        sub = r.resolve(body, List.<String[]>of(new String[] {"body", ""}), "sub", "", "");
    }

    private static List<Line> lines(List<Run> runs, float width, int align) {
        return LineBreaker.lines(fonts, runs, List.of(), List.of(), width, 0, null, 0, align);
    }

    private static List<Line> lines(String text, float width) {
        return lines(List.of(new Run(text, body)), width, Element.ALIGN_LEFT);
    }

    private static String text(Line line) {
        StringBuilder b = new StringBuilder();
        for (Fragment f : line.fragments()) b.append(f.text());
        return b.toString();
    }

    private static float end(Line line) {
        Fragment last = line.fragments().get(line.fragments().size() - 1);
        return last.x() + last.width();
    }

    private static float width(String text) {
        return fonts.width(body, text);
    }

    @Test
    void aLineBreaksAtASpaceNeverInsideAHyphenatedWord() {
        float w = width("alpha beta-ga");
        List<Line> out = lines("alpha beta-gamma delta", w);
        assertEquals("alpha", text(out.get(0)));
        assertTrue(text(out.get(1)).startsWith("beta-gamma"), text(out.get(1)));
    }

    @Test
    void whatFitsStaysOnOneLineWithItsSpaces() {
        List<Line> out = lines("Z = 0.35 Ω", 400);
        assertEquals(1, out.size());
        assertEquals("Z = 0.35 Ω", text(out.get(0)));
        assertEquals(1, out.get(0).fragments().size(), "one run of one style is one fragment");
    }

    @Test
    void aSymbolAndItsSubscriptMoveToTheNextLineTogether() {
        List<Run> runs = List.of(new Run("current in the circuit I", body), new Run("b", sub));
        float w = width("current in the circuit I") + 0.5f;
        List<Line> out = lines(runs, w, Element.ALIGN_LEFT);
        assertEquals(2, out.size());
        assertEquals("Ib", text(out.get(1)));
        assertSame(sub, out.get(1).fragments().get(1).style());
    }

    @Test
    void aWordWiderThanTheLineIsBrokenBetweenCharacters() {
        String word = "circuits[37].device.let_through_a2s";
        float w = width(word) / 3;
        List<Line> out = lines(word, w);
        assertTrue(out.size() >= 3);
        StringBuilder joined = new StringBuilder();
        for (Line l : out) {
            assertTrue(end(l) <= w + 0.01f, "line wider than the paragraph: " + text(l));
            joined.append(text(l));
        }
        assertEquals(word, joined.toString());
    }

    @Test
    void aLineBreakStartsANewLine() {
        List<Line> out = lines("first\nsecond", 400);
        assertEquals(List.of("first", "second"), out.stream().map(LineBreakerTest::text).toList());
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5})
    void noLineIsWiderThanTheParagraphAndNoWordIsLost(int seed) {
        Random random = new Random(seed);
        String[] words = {"ΔU", "=", "100", "·", "I", "(R·cosφ", "+", "X·sinφ)", "breaking-capacity", "L1", "mV/A/m", "4.00", "%"};
        List<String> chosen = new ArrayList<>();
        for (int i = 0; i < 60; i++) chosen.add(words[random.nextInt(words.length)]);
        String text = String.join(" ", chosen);
        float w = 80 + random.nextInt(200);
        List<Line> out = lines(text, w);
        List<String> back = new ArrayList<>();
        for (Line l : out) {
            assertTrue(end(l) <= w + 0.01f, "line wider than " + w + ": " + text(l));
            back.addAll(List.of(text(l).split(" ")));
        }
        assertEquals(chosen, back);
    }

    @Test
    void aTabStopPlacesWhatFollowsAtIt() {
        List<Line> out = LineBreaker.lines(fonts, List.of(new Run("3.5.1", body), new Run(null, body), new Run("Voltage factor", body)),
                List.of(), List.of(45f), 400, 0, null, 0, Element.ALIGN_LEFT);
        assertEquals(45f, out.get(0).fragments().get(1).x(), 0.001f);
    }

    @Test
    void aRightFloatEndsAtTheRightEdgeOfTheLastLine() {
        List<Line> out = LineBreaker.lines(fonts, List.of(new Run("Voltage drop", body)), List.of(new Run("phasor form", body)),
                List.of(), 300, 0, null, 0, Element.ALIGN_LEFT);
        assertEquals(1, out.size());
        assertEquals(300f, end(out.get(0)), 0.01f);
    }

    @Test
    void aRightFloatThatDoesNotFitGoesOnALineOfItsOwn() {
        String title = "Voltage drop, exact phasor form";
        List<Line> out = LineBreaker.lines(fonts, List.of(new Run(title, body)), List.of(new Run("phasor form", body)),
                List.of(), width(title) + 10, 0, null, 0, Element.ALIGN_LEFT);
        assertEquals(2, out.size());
        assertEquals("phasor form", text(out.get(1)));
    }

    @Test
    void rightAlignedAndCentredLinesSitAgainstTheRightEdgeAndInTheMiddle() {
        float w = 300;
        Line right = lines(List.of(new Run("Page 3", body)), w, Element.ALIGN_RIGHT).get(0);
        assertEquals(w, end(right), 0.01f);
        Line centred = lines(List.of(new Run("Page 3", body)), w, Element.ALIGN_CENTER).get(0);
        assertEquals(w - end(centred), centred.fragments().get(0).x(), 0.01f);
    }

    @Test
    void justifiedLinesFillTheWidthExceptTheLast() {
        String text = "The applicable local wiring code and the manufacturer's data for the cables and devices govern.";
        float w = width(text) / 2 + 20;
        List<Line> out = lines(List.of(new Run(text, body)), w, Element.ALIGN_JUSTIFIED);
        assertTrue(out.size() >= 2);
        for (int i = 0; i < out.size() - 1; i++) assertEquals(w, end(out.get(i)), 0.01f, "line " + (i + 1) + " is not justified");
        assertTrue(end(out.get(out.size() - 1)) < w - 1, "the last line is set ragged");
    }

    @Test
    void aListMarkerHangsInTheIndentAndTheTextFollowsIt() {
        float hang = 11.3f;
        List<Line> out = LineBreaker.lines(fonts, List.of(new Run("Values are kept unrounded throughout", body)), List.of(), List.of(),
                400, -hang, new Run("•", body), hang, Element.ALIGN_LEFT);
        assertEquals(-hang, out.get(0).fragments().get(0).x(), 0.001f);
        assertEquals(0f, out.get(0).fragments().get(1).x(), 0.001f);
    }
}
