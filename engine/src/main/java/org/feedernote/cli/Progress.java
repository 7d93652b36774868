package org.feedernote.cli;

import java.io.PrintWriter;
import java.util.Locale;

import org.feedernote.report.NoteRenderer;

/**
 * "note: section 1 234 of 10 006" on one terminal line, rewritten at most a few times a second,
 * for notes long enough to take a while; nothing at all when standard error is not a terminal.
 */
final class Progress implements NoteRenderer.Progress {
    /** Below this many circuits a note takes about a second: no progress line. */
    static final int SHOWN_FROM_CIRCUITS = 50;
    private static final long INTERVAL_NANOS = 250_000_000L;

    private final PrintWriter err;
    private final long started = System.nanoTime();
    private long last;

    private Progress(PrintWriter err) {
        this.err = err;
    }

    static NoteRenderer.Progress onTerminal(PrintWriter err, boolean terminal, int circuits) {
        return terminal && circuits >= SHOWN_FROM_CIRCUITS ? new Progress(err) : NoteRenderer.Progress.NONE;
    }

    @Override public void sectionDone(int done, int total) {
        long now = System.nanoTime();
        if (done < total && now - last < INTERVAL_NANOS) return;
        last = now;
        err.print(String.format(Locale.ROOT, "\rfeedernote: laying out the note: section %d of %d (%.0f s)", done, total,
                (now - started) / 1e9));
        if (done == total) err.println();
        err.flush();
    }
}
