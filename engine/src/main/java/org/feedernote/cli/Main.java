package org.feedernote.cli;

import java.io.PrintWriter;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;

import picocli.CommandLine;

/** Entry point of the command line. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        if (args.length > 0 && CALCULATING.contains(args[0])) loadReferenceDataAlongside();
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int status = run(args, out, err);
        out.flush();
        err.flush();
        System.exit(status);
    }

    /** The commands that calculate, and so read the reference tables. */
    private static final java.util.Set<String> CALCULATING = java.util.Set.of("check", "note", "verify", "diff");

    /**
     * The reference tables are read on the second core while the command line is built (picocli
     * takes most of the first tenth of a second of every command); the command that needs them
     * waits for that reading, or does it itself if it has not begun.
     */
    private static void loadReferenceDataAlongside() {
        Thread reading = new Thread(() -> {
            try {
                org.feedernote.data.ReferenceData.standard();
            } catch (RuntimeException | LinkageError e) {
                // The command reads them again and reports what went wrong.
            }
        }, "feedernote-reference-data");
        reading.setDaemon(true);
        reading.start();
    }

    /** Runs a command with the given streams and returns the exit status (for in-process tests). */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Feedernote());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            err.println("feedernote: internal error: " + ex);
            for (StackTraceElement e : ex.getStackTrace()) {
                if (e.getClassName().startsWith("org.feedernote")) {
                    err.println("    at " + e);
                    break;
                }
            }
            err.println("This is a bug in feedernote. Please report it with the input file and the command line.");
            return ExitStatus.INTERNAL;
        });
        int status = cl.execute(args);
        out.flush();
        err.flush();
        return status;
    }
}
