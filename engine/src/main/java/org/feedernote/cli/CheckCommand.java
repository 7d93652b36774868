package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.Version;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Installation;
import org.feedernote.report.ResultJson;
import org.feedernote.report.TerminalSummary;
import org.feedernote.trace.TraceJson;

@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Checks every circuit of a design input and prints a summary (or JSON).",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:every check passes", "1:some check fails", "2:the input or the command line is wrong",
                "3:internal error (a bug; please report it)"})
final class CheckCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(index = "0", paramLabel = "INPUT", description = "design input (format 1): YAML, JSON, an .xlsx workbook, or CSV files (a folder, or one of its files)")
    Path input;

    @Option(names = "--json", description = "print the result as JSON (the documented result format)")
    boolean json;

    @Option(names = "--trace", paramLabel = "FILE", description = "also write the full calculation trace as JSON to FILE")
    Path trace;

    @Option(names = "--xlsx", paramLabel = "FILE", description = "also write the result schedule as a workbook: every circuit, a sheet per board, the boards' fault levels and demand")
    Path xlsx;

    @Option(names = "--csv", paramLabel = "DIR", description = "also write the result schedule as CSV files into DIR (schedule.csv, boards.csv, one per board)")
    Path csv;

    @Option(names = "--timings", description = "print the time each stage took to standard error (for profiling)")
    boolean timings;

    @Override public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        long t0 = System.nanoTime();
        boolean terminal = Progress.standardErrorIsTerminal();
        // A very large input takes seconds to read before its circuits are counted: named by its size.
        long bytes = sizeOf(input);
        Progress progress = Progress.whileReading(err, terminal, bytes, t0);
        Result result;
        long t1;
        long t2;
        try {
            progress.stage("reading " + input.getFileName() + " (" + Math.round(bytes / 1e6) + " MB)");
            Installation inst = Loading.load(input, progress.messages(err));
            if (inst == null) return ExitStatus.BAD_INPUT;
            t1 = System.nanoTime();
            if (!progress.showing()) {
                progress = Progress.onTerminal(err, terminal, inst.circuits().size(), Progress.CHECK_SHOWN_FROM_CIRCUITS, t0);
            }
            PrintWriter messages = progress.messages(err);
            progress.stage("calculating " + inst.circuits().size() + " circuits");
            ReferenceData data = ReferenceData.standard();
            result = Loading.calculate(inst, data, messages, trace != null);
            if (result == null) return ExitStatus.BAD_INPUT;
            t2 = System.nanoTime();
            if (trace != null && !writeTrace(result, data, progress, messages)) return ExitStatus.BAD_INPUT;
            if (xlsx != null) {
                progress.stage("writing " + xlsx.getFileName());
                if (!Schedules.xlsx(result, xlsx, messages)) return ExitStatus.BAD_INPUT;
            }
            if (csv != null && !Schedules.csv(result, csv, messages)) return ExitStatus.BAD_INPUT;
        } finally {
            progress.endLine();
        }
        return report(result, out, err, t0, t1, t2);
    }

    private static long sizeOf(Path file) {
        try {
            return java.nio.file.Files.isRegularFile(file) ? java.nio.file.Files.size(file) : 0;
        } catch (IOException e) {
            return 0;
        }
    }

    /** Writes the trace file; false after the reason was printed. */
    private boolean writeTrace(Result result, ReferenceData data, Progress progress, PrintWriter err) {
        int sections = result.trace().sections().size();
        try {
            Files.writeAtomically(trace, stream -> {
                java.io.Writer w = new java.io.OutputStreamWriter(stream, java.nio.charset.StandardCharsets.UTF_8);
                TraceJson.write(result.trace(), Version.engine(), data.version(), "", w,
                        done -> progress.counted("writing the trace: section", done, sections));
                w.flush();
            });
            return true;
        } catch (IOException e) {
            err.println("feedernote: cannot write the trace to " + trace + ": " + e.getMessage());
            return false;
        }
    }

    private int report(Result result, PrintWriter out, PrintWriter err, long t0, long t1, long t2) {
        if (json) {
            try {
                ResultJson.write(result, out);
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        } else {
            out.print(TerminalSummary.render(result, input.getFileName().toString()));
        }
        if (timings) {
            out.flush();
            err.printf(java.util.Locale.ROOT, "read and validate %.0f ms; calculate %.0f ms; write %.0f ms%n",
                    (t1 - t0) / 1e6, (t2 - t1) / 1e6, (System.nanoTime() - t2) / 1e6);
        }
        return result.pass() ? ExitStatus.PASS : ExitStatus.FAIL;
    }
}
