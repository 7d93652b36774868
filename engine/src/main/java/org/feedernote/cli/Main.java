package org.feedernote.cli;

import java.io.PrintWriter;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;

import picocli.CommandLine;

/** Entry point of the command line. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int status = run(args, out, err);
        out.flush();
        err.flush();
        System.exit(status);
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
