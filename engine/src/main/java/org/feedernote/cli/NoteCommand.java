package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.archive.Revisions;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Installation;
import org.feedernote.report.NoteLayout;
import org.feedernote.model.Status;
import org.feedernote.report.NoteRenderer;

@Command(name = "note", mixinStandardHelpOptions = true,
        description = "Writes the worked, stamped calculation note (PDF) and the trace (JSON) for a design input.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:written; every check passes", "1:written, stamped as not conforming (or refused: an issued note must conform)",
                "2:the input or the command line is wrong; nothing written", "3:internal error (a bug; please report it)"})
final class NoteCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(index = "0", paramLabel = "INPUT", description = "design input (format 1): YAML, JSON, an .xlsx workbook, or CSV files (a folder, or one of its files)")
    Path input;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", description = "folder to write into (default: the current folder)")
    Path output = Path.of(".");

    @Option(names = "--templates", paramLabel = "DIR", description = "a folder with a copy of the note templates (every file of report-templates) to use instead of the packaged ones")
    Path templates;

    @Option(names = "--xlsx", description = "also write the result schedule as a workbook beside the PDF (<reference>-<revision>.xlsx)")
    boolean xlsx;

    @Option(names = "--force", description = "replace an existing note that holds a different calculation")
    boolean force;

    @Option(names = "--previous", paramLabel = "OLD", description = "an earlier revision (input or note): the note gains a section listing the changes since it")
    Path previous;

    @Option(names = "--detail", paramLabel = "FORM", description = "compact (default): one block per circuit, a cable's impedance derived once; full: every step numbered, as a checker follows it line by line")
    String detail = "compact";

    @Option(names = "--circuits", paramLabel = "ID,ID", split = ",", description = "with --detail full: the circuits worked in full (the others stay compact)")
    List<String> circuits;

    static String existingFingerprint(Path pdf) {
        try {
            return org.feedernote.archive.NoteArchive.read(pdf).fingerprint();
        } catch (org.feedernote.archive.NoteArchive.NotANote e) {
            return null;
        }
    }

    @Override public Integer call() throws IOException {
        long started = System.nanoTime();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter terminal = spec.commandLine().getErr();
        Installation inst = Loading.load(input, terminal);
        if (inst == null) return ExitStatus.BAD_INPUT;
        Progress progress = Progress.onTerminal(terminal, Progress.standardErrorIsTerminal(), inst.circuits().size(), started);
        try {
            return write(inst, progress.messages(out), progress.messages(terminal), progress);
        } finally {
            progress.endLine();
        }
    }

    /** The layout the options ask for, or null (after saying why) where they are wrong. */
    private NoteLayout layout(Installation inst, PrintWriter err) {
        if (!detail.equals("compact") && !detail.equals("full")) {
            err.println("feedernote: --detail " + detail + ": expected compact or full");
            return null;
        }
        if (circuits == null || circuits.isEmpty()) return detail.equals("full") ? NoteLayout.FULL : NoteLayout.COMPACT;
        if (!detail.equals("full")) {
            err.println("feedernote: --circuits names the circuits worked in full: give it with --detail full");
            return null;
        }
        java.util.Set<String> known = new java.util.HashSet<>();
        for (var c : inst.circuits()) known.add(c.id());
        List<String> unknown = circuits.stream().filter(id -> !known.contains(id)).toList();
        if (!unknown.isEmpty()) {
            err.println("feedernote: --circuits: no circuit " + String.join(", ", unknown) + " in " + input);
            return null;
        }
        return NoteLayout.fullFor(circuits);
    }

    private Integer write(Installation inst, PrintWriter out, PrintWriter err, Progress progress) throws IOException {
        NoteLayout layout = layout(inst, err);
        if (layout == null) return ExitStatus.BAD_INPUT;
        if (templates != null) {
            List<String> missing = NoteRenderer.TEMPLATE_FILES.stream()
                    .filter(f -> !java.nio.file.Files.isRegularFile(templates.resolve(f))).toList();
            if (!missing.isEmpty()) {
                err.println("feedernote: --templates " + templates + ": missing " + String.join(", ", missing)
                        + " (copy the whole report-templates folder and edit the copy)");
                return ExitStatus.BAD_INPUT;
            }
        }
        NoteMaker.canonicalAhead(inst);
        ReferenceData data = ReferenceData.standard();
        progress.stage("calculating " + inst.circuits().size() + " circuits");
        Result result = Loading.calculate(inst, data, err);
        if (result == null) return ExitStatus.BAD_INPUT;
        if (inst.project().status() == Status.ISSUED && (!result.pass() || !result.notPerformed().isEmpty())) {
            err.println("feedernote: refused: project.status is 'issued' but the design does not conform:");
            for (CircuitResult c : result.circuits()) {
                if (!c.pass()) {
                    err.println("  " + c.id() + ": " + c.failing().stream().map(k -> k.name()).collect(Collectors.joining(", ")));
                }
            }
            if (!result.notPerformed().isEmpty()) {
                err.println("  not checked by this version: " + String.join(", ", result.notPerformed()));
            }
            err.println("A failing design is never issued. Correct the design, or set status to draft or for-review.");
            return ExitStatus.FAIL;
        }
        String base = safe(inst.project().reference()) + "-" + safe(inst.project().revision());
        Path pdf = output.resolve(base + ".pdf");
        Path traceFile = output.resolve(base + ".trace.json");
        String since = null;
        java.util.List<String> changes = java.util.List.of();
        if (previous != null) {
            progress.stage("calculating the previous revision");
            Installation old = Loading.loadAny(previous, err);
            if (old == null) return ExitStatus.BAD_INPUT;
            Result oldResult = Loading.calculate(old, data, err);
            if (oldResult == null) return ExitStatus.BAD_INPUT;
            Revisions.Report report = Revisions.compare(previous.getFileName().toString(), old, oldResult,
                    input.getFileName().toString(), inst, result);
            since = old.project().revision();
            changes = report.all().stream().map(Revisions.Change::text).toList();
        }
        progress.stage("fingerprinting the input");
        String fingerprint = NoteMaker.fingerprint(inst, data);
        if (java.nio.file.Files.exists(pdf) && !force) {
            String existing = existingFingerprint(pdf);
            if (!fingerprint.equals(existing)) {
                err.println("feedernote: " + pdf + " exists and holds a different calculation (fingerprint "
                        + (existing == null ? "unknown" : existing.substring(0, 12)) + ", this one " + fingerprint.substring(0, 12)
                        + "); give --force to replace it, or a new revision");
                return ExitStatus.BAD_INPUT;
            }
        }
        List<String> unprintable = NoteMaker.write(inst, result, data, templates, since, changes, layout, pdf, traceFile, progress);
        if (!unprintable.isEmpty()) {
            StringBuilder chars = new StringBuilder();
            for (String u : unprintable) chars.append(chars.length() == 0 ? "" : ", ").append(u).append(' ')
                    .appendCodePoint(Integer.parseInt(u.substring(2), 16));
            err.println("feedernote: warning: the note's fonts have no glyph for " + unprintable.size() + " character(s) of the input ("
                    + chars + "); each is printed as " + org.feedernote.report.pdf.Fonts.PLACEHOLDER
                    + " in the note (Appendix B says so) and the embedded input keeps it as written");
        }
        out.println("wrote " + pdf);
        out.println("wrote " + traceFile);
        if (xlsx) {
            Path schedule = output.resolve(base + ".xlsx");
            if (!Schedules.xlsx(result, schedule, err)) return ExitStatus.BAD_INPUT;
            out.println("wrote " + schedule);
        }
        out.println(result.pass()
                ? (result.notPerformed().isEmpty() ? "every check passes" : "the checks made pass; not checked by this version: " + String.join(", ", result.notPerformed()))
                : result.failingChecks() + " check(s) fail; the note is stamped DOES NOT CONFORM");
        return result.pass() ? ExitStatus.PASS : ExitStatus.FAIL;
    }

    static String safe(String s) {
        String cleaned = s.replaceAll("[^A-Za-z0-9._-]+", "-").replaceAll("^-+|-+$", "");
        return cleaned.isEmpty() ? "note" : cleaned;
    }
}
