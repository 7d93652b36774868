package org.feedernote.cli;

import java.io.PrintWriter;
import java.io.Writer;

import org.feedernote.report.NoteRenderer;

/**
 * How far a long note (or the check of a very large installation) has come, on one terminal line
 * rewritten as it goes: each stage named as it begins ("calculating 10000 circuits"), the counted
 * ones with their count ("writing the trace: section 1234 of 10002"), at most a few times a
 * second, with the seconds since the command began. Nothing at all when standard error is not a terminal or the installation is small.
 * Messages printed meanwhile go through {@link #messages}, which ends the line first; the command
 * ends the line when it is done ({@link #endLine()}).
 */
final class Progress implements NoteRenderer.Progress {
    /** Below this many circuits a note takes about a second: no progress line. */
    static final int SHOWN_FROM_CIRCUITS = 50;
    /** Below this many circuits check takes a few seconds at most: no progress line. */
    static final int CHECK_SHOWN_FROM_CIRCUITS = 20_000;
    /**
     * From this size on, check names the reading of its input before the circuits are known: some
     * 20 000 circuits of JSON (about 400 bytes each), read in a second or more.
     */
    static final long CHECK_READING_SHOWN_FROM_BYTES = 8_000_000;
    private static final long INTERVAL_NANOS = 250_000_000L;

    private final PrintWriter err;
    private final long started;
    private long last;
    /** The counted stage last shown. */
    private String counting;
    /** Characters of the line on the terminal now (0: none); a shorter line blanks the rest. */
    private int shown;

    private Progress(PrintWriter err, long started) {
        this.err = err;
        this.started = started;
    }

    /**
     * Whether standard error is a terminal. Java cannot tell by itself: the wrapper, which can,
     * says so in the system property {@code feedernote.stderr.terminal}; without it, whether the
     * JVM has a console (standard input and output on a terminal) stands in.
     */
    static boolean standardErrorIsTerminal() {
        String told = System.getProperty("feedernote.stderr.terminal");
        return told != null ? Boolean.parseBoolean(told) : System.console() != null;
    }

    /**
     * @param started System.nanoTime() when the command began: the seconds shown count from it
     */
    static Progress onTerminal(PrintWriter err, boolean terminal, int circuits, long started) {
        return onTerminal(err, terminal, circuits, SHOWN_FROM_CIRCUITS, started);
    }

    /** As above, shown from the given number of circuits on (check: {@link #CHECK_SHOWN_FROM_CIRCUITS}). */
    static Progress onTerminal(PrintWriter err, boolean terminal, int circuits, int shownFrom, long started) {
        return new Progress(terminal && circuits >= shownFrom ? err : null, started);
    }

    /** For check while it reads its input: shown when the input has {@link #CHECK_READING_SHOWN_FROM_BYTES} bytes or more. */
    static Progress whileReading(PrintWriter err, boolean terminal, long inputBytes, long started) {
        return new Progress(terminal && inputBytes >= CHECK_READING_SHOWN_FROM_BYTES ? err : null, started);
    }

    /** Whether the line is shown at all (standard error a terminal, the installation large). */
    boolean showing() {
        return err != null;
    }

    /**
     * Where to print while the progress line may be showing (standard output or error): a writer
     * that ends the line before the first character of a message, or the target itself when no
     * progress is shown.
     */
    PrintWriter messages(PrintWriter target) {
        if (err == null) return target;
        return new PrintWriter(new Writer() {
            @Override public void write(char[] text, int off, int len) {
                endLine();
                target.write(text, off, len);
            }

            @Override public void flush() {
                target.flush();
            }

            @Override public void close() {
                target.flush();
            }
        }, true);
    }

    /** A stage whose steps are not counted, named as it begins. */
    @Override public synchronized void stage(String what) {
        if (err == null) return;
        show(what, System.nanoTime());
    }

    /** A counted stage: shown as it begins, then at most a few times a second, and when it completes. */
    synchronized void counted(String what, int done, int total) {
        if (err == null) return;
        long now = System.nanoTime();
        if (done < total && now - last < INTERVAL_NANOS && what.equals(counting)) return;
        counting = what;
        show(what + " " + done + " of " + total, now);
    }

    @Override public synchronized void sectionDone(int done, int total) {
        counted("laying out the note: section", done, total);
    }

    /** Ends the progress line, if one is showing. */
    synchronized void endLine() {
        if (err == null || shown == 0) return;
        err.println();
        err.flush();
        shown = 0;
    }

    private void show(String what, long now) {
        last = now;
        String line = "feedernote: " + what + " (" + Math.round((now - started) / 1e9) + " s)";
        StringBuilder b = new StringBuilder("\r").append(line);
        for (int i = line.length(); i < shown; i++) b.append(' ');
        err.print(b);
        err.flush();
        shown = line.length();
    }
}
