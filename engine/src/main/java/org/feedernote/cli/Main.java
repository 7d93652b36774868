package org.feedernote.cli;

import java.io.PrintWriter;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;

import picocli.CommandLine;

/** Entry point of the command line. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        // POI brings the Log4j API, which commons-logging (PDFBox) then finds: without this, a complaint on standard error.
        org.feedernote.input.PoiLogging.quiet();
        if (args.length > 0 && CALCULATING.contains(args[0])) loadReferenceDataAlongside();
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int status;
        try {
            status = run(args, out, err);
        } catch (OutOfMemoryError e) {
            // What held the memory is unreachable by now, so the message can still be written; on a
            // terminal it starts below the progress line.
            if (Progress.standardErrorIsTerminal()) err.println();
            err.println("feedernote: not enough memory for this installation: the Java heap is limited to "
                    + Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MB. Nothing was written (files being written were removed).");
            err.println("Give the JVM more, for instance FEEDERNOTE_JAVA_OPTS=\"-XX:+UseParallelGC -XX:TieredStopAtLevel=1 -Xmx8g\".");
            status = ExitStatus.BAD_INPUT;
        }
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
            } catch (RuntimeException | Error e) {
                // The command reads them again and reports what went wrong.
            }
        }, "feedernote-reference-data");
        reading.setDaemon(true);
        reading.start();
    }

    /** A file-system failure in words: the file and the reason where the JDK names them. */
    static String describe(java.io.IOException e) {
        if (e instanceof java.nio.file.FileSystemException f) {
            String reason = f.getReason() != null ? f.getReason()
                    : f instanceof java.nio.file.AccessDeniedException ? "permission denied"
                    : f instanceof java.nio.file.NoSuchFileException ? "no such file or folder"
                    : f instanceof java.nio.file.FileAlreadyExistsException ? "already exists" : f.getClass().getSimpleName();
            return f.getFile() + ": " + reason;
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    /** Runs a command with the given streams and returns the exit status (for in-process tests). */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Feedernote());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            java.io.IOException io = ex instanceof java.io.IOException e ? e
                    : ex instanceof java.io.UncheckedIOException u ? u.getCause() : null;
            if (io != null) {
                // The file system refused (a folder that cannot be made, a full disk): not a bug.
                // Reading the input reports its own errors; what reaches here is writing.
                err.println("feedernote: cannot write the output: " + describe(io));
                err.println("Files being written were removed; correct the output path or make room, and run again.");
                return ExitStatus.BAD_INPUT;
            }
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
