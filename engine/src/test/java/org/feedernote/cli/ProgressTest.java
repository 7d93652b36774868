package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

import org.feedernote.report.NoteRenderer;

/** Progress of a long note: on a terminal a single rewritten line; elsewhere nothing. */
class ProgressTest {
    @Test
    void nothingIsWrittenWhenStandardErrorIsNotATerminal() {
        assertSame(NoteRenderer.Progress.NONE, Progress.onTerminal(new PrintWriter(new StringWriter()), false, 10_000));
    }

    @Test
    void aSmallNoteShowsNoProgress() {
        assertSame(NoteRenderer.Progress.NONE, Progress.onTerminal(new PrintWriter(new StringWriter()), true, 7));
    }

    @Test
    void onATerminalTheLineIsRewrittenAndEndsWithTheTotal() {
        StringWriter text = new StringWriter();
        NoteRenderer.Progress p = Progress.onTerminal(new PrintWriter(text), true, 500);
        for (int i = 1; i <= 500; i++) p.sectionDone(i, 500);
        String out = text.toString();
        assertTrue(out.startsWith("\rfeedernote: laying out the note: section 1 of 500"), out);
        assertTrue(out.contains("\rfeedernote: laying out the note: section 500 of 500"), out);
        assertTrue(out.endsWith(System.lineSeparator()), "the finished line is ended");
        assertTrue(out.split("\r").length < 50, "rewritten a few times a second, not once per section");
    }
}
