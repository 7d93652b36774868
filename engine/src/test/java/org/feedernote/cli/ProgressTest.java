package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

/** Progress of a long note: on a terminal a single rewritten line naming each stage; elsewhere nothing. */
class ProgressTest {
    private static void runAllStages(Progress p, int sections) {
        p.stage("calculating 500 circuits");
        p.stage("preparing the note");
        for (int i = 1; i <= sections; i++) p.counted("writing the trace: section", i, sections);
        p.stage("laying out the front matter and the summary schedule");
        for (int i = 1; i <= sections; i++) p.sectionDone(i, sections);
        p.stage("finishing the PDF");
        p.endLine();
    }

    @Test
    void nothingIsWrittenWhenStandardErrorIsNotATerminal() {
        StringWriter text = new StringWriter();
        PrintWriter err = new PrintWriter(text);
        Progress p = Progress.onTerminal(err, false, 10_000, System.nanoTime());
        runAllStages(p, 500);
        assertEquals("", text.toString());
        assertSame(err, p.messages(err), "messages go straight to standard error");
    }

    @Test
    void aSmallNoteShowsNoProgress() {
        StringWriter text = new StringWriter();
        Progress p = Progress.onTerminal(new PrintWriter(text), true, 7, System.nanoTime());
        runAllStages(p, 7);
        assertEquals("", text.toString());
    }

    @Test
    void checkShowsProgressOnlyForAVeryLargeInstallation() {
        StringWriter text = new StringWriter();
        Progress p = Progress.onTerminal(new PrintWriter(text), true, 10_000, Progress.CHECK_SHOWN_FROM_CIRCUITS, System.nanoTime());
        p.stage("calculating 10000 circuits");
        p.endLine();
        assertEquals("", text.toString(), "10 000 circuits take a second or two: no line");
        Progress large = Progress.onTerminal(new PrintWriter(text), true, 100_000, Progress.CHECK_SHOWN_FROM_CIRCUITS, System.nanoTime());
        large.stage("calculating 100000 circuits");
        large.endLine();
        assertEquals("\rfeedernote: calculating 100000 circuits (0 s)" + System.lineSeparator(), text.toString());
    }

    @Test
    void checkNamesTheReadingOfAVeryLargeInputBeforeItsCircuitsAreCounted() {
        StringWriter text = new StringWriter();
        Progress small = Progress.whileReading(new PrintWriter(text), true, 4_000_000, System.nanoTime());
        small.stage("reading g10000.json (4 MB)");
        assertFalse(small.showing());
        assertEquals("", text.toString(), "10 000 circuits of JSON are read in a fraction of a second: no line");
        Progress large = Progress.whileReading(new PrintWriter(text), true, 40_000_000, System.nanoTime());
        large.stage("reading g100000.json (40 MB)");
        large.stage("calculating 100000 circuits");
        large.endLine();
        assertTrue(large.showing());
        assertTrue(text.toString().startsWith("\rfeedernote: reading g100000.json (40 MB) (0 s)\rfeedernote: calculating 100000 circuits"),
                text.toString());
        assertFalse(Progress.whileReading(new PrintWriter(text), false, 40_000_000, System.nanoTime()).showing(),
                "not on a terminal: nothing");
    }

    @Test
    void onATerminalEachStageIsNamedOnTheSameLineWhichIsEndedAtTheEnd() {
        StringWriter text = new StringWriter();
        Progress p = Progress.onTerminal(new PrintWriter(text), true, 500, System.nanoTime());
        runAllStages(p, 500);
        String out = text.toString();
        assertTrue(out.startsWith("\rfeedernote: calculating 500 circuits (0 s)"), out);
        assertTrue(out.contains("\rfeedernote: preparing the note (0 s)"), out);
        assertTrue(out.contains("\rfeedernote: writing the trace: section 500 of 500"), out);
        assertTrue(out.contains("\rfeedernote: laying out the note: section 1 of 500"), out);
        assertTrue(out.contains("\rfeedernote: laying out the note: section 500 of 500"), out);
        assertTrue(out.contains("\rfeedernote: finishing the PDF (0 s)"), out);
        assertTrue(out.endsWith(System.lineSeparator()), "the finished line is ended");
        assertEquals(1, out.split(System.lineSeparator(), -1).length - 1, "one line, rewritten");
        assertTrue(out.split("\r").length < 50, "counts rewritten a few times a second, not once per section");
    }

    @Test
    void aShorterStageBlanksWhatTheLongerOneLeft() {
        StringWriter text = new StringWriter();
        Progress p = Progress.onTerminal(new PrintWriter(text), true, 500, System.nanoTime());
        p.stage("fingerprinting the input");
        p.stage("preparing");
        String second = text.toString().substring(text.toString().lastIndexOf('\r'));
        assertEquals("\rfeedernote: fingerprinting the input (0 s)".length(), second.length());
        assertTrue(second.startsWith("\rfeedernote: preparing (0 s)   "), second);
    }

    @Test
    void aMessageDuringProgressStartsOnALineOfItsOwn() {
        StringWriter text = new StringWriter();
        PrintWriter err = new PrintWriter(text);
        Progress p = Progress.onTerminal(err, true, 500, System.nanoTime());
        p.stage("calculating 500 circuits");
        p.messages(err).println("feedernote: refused");
        p.endLine();
        assertEquals("\rfeedernote: calculating 500 circuits (0 s)" + System.lineSeparator() + "feedernote: refused"
                + System.lineSeparator(), text.toString());
    }
}
