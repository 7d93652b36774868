package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.Version;
import org.feedernote.archive.NoteArchive;
import org.feedernote.archive.TraceComparison;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputError;
import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;

@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Recomputes an archived note from the design input embedded in it and confirms that it is still true.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:verified", "1:the note differs from what the engine computes from its input",
                "2:not a feedernote note, or damaged", "3:internal error (a bug; please report it)"})
final class VerifyCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(index = "0", paramLabel = "NOTE", description = "a calculation note (PDF) written by feedernote")
    Path note;

    @Override public Integer call() throws IOException {
        long started = System.nanoTime();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        NoteArchive archive;
        try {
            archive = NoteArchive.read(note);
        } catch (NoteArchive.NotANote e) {
            err.println("feedernote: " + e.getMessage());
            return ExitStatus.BAD_INPUT;
        }
        Installation inst;
        try {
            inst = archive.sourceText() != null
                    ? InputReader.parse(archive.inputFile(), archive.sourceText(), archive.inputFile().toLowerCase(java.util.Locale.ROOT).endsWith(".json"))
                    : InputReader.parse(note + " (embedded input)", archive.canonicalInput(), true);
        } catch (InputException e) {
            err.println("feedernote: " + note + ": the embedded design input is damaged:");
            for (InputError error : e.errors()) err.println("  " + error.text());
            return ExitStatus.BAD_INPUT;
        }
        Progress progress = Progress.onTerminal(err, Progress.standardErrorIsTerminal(), inst.circuits().size(), started);
        try {
            return verify(archive, inst, progress.messages(out), progress.messages(err), progress);
        } finally {
            progress.endLine();
        }
    }

    private Integer verify(NoteArchive archive, Installation inst, PrintWriter out, PrintWriter err, Progress progress)
            throws IOException {
        NoteMaker.canonicalAhead(inst);
        ReferenceData data = ReferenceData.standard();
        progress.stage("calculating " + inst.circuits().size() + " circuits");
        Result result = Loading.calculate(inst, data, err);
        if (result == null) return ExitStatus.BAD_INPUT;
        progress.stage("comparing the results with the note's trace");
        boolean sameEngine = Version.engine().equals(archive.engineVersion());
        String fingerprint = NoteMaker.fingerprint(inst, data);
        List<String> problems = new java.util.ArrayList<>();
        if (!inst.canonicalJson().equals(archive.canonicalInput())) {
            problems.add("the two embedded copies of the input disagree (as written, and canonical): one was altered");
        }
        if (!sameEngine) {
            out.println("note made by feedernote " + archive.engineVersion() + "; recomputed with " + Version.engine()
                    + " — differences below are between the two versions");
        } else if (!fingerprint.equals(archive.fingerprint())) {
            problems.add("fingerprint: recorded " + archive.fingerprint() + ", recomputed from the embedded input " + fingerprint
                    + " (the embedded input or the reference data has changed)");
        }
        // Section by section, both streamed: a large note's trace is never held whole.
        List<TraceComparison.Difference> differences;
        try (java.io.InputStream recorded = archive.openTrace()) {
            differences = TraceComparison.compare(TraceComparison.sections(recorded), TraceComparison.sections(result.trace()));
        } catch (NoteArchive.NotANote e) {
            err.println("feedernote: " + e.getMessage());
            return ExitStatus.BAD_INPUT;
        } catch (IllegalArgumentException | java.io.UncheckedIOException | IOException e) {
            err.println("feedernote: " + note + ": the embedded trace cannot be read (" + e.getMessage() + ")");
            return ExitStatus.BAD_INPUT;
        }
        for (TraceComparison.Difference d : differences) problems.add(d.text());
        if (sameEngine && problems.isEmpty()) {
            Path scratch = java.nio.file.Files.createTempDirectory("feedernote-verify");
            try {
                Path again = scratch.resolve("note.pdf");
                progress.stage("writing the note again to compare its bytes");
                Path templates = null;
                if (!archive.templates().isEmpty()) {
                    // The note was laid out with templates of its own: the copies it carries serve again.
                    templates = java.nio.file.Files.createDirectories(scratch.resolve("templates"));
                    for (var t : archive.templates().entrySet()) java.nio.file.Files.write(templates.resolve(t.getKey()), t.getValue());
                }
                org.feedernote.report.NoteLayout layout = org.feedernote.report.NoteLayout.parse(archive.detail());
                if (layout == null) layout = org.feedernote.report.NoteLayout.FULL;
                NoteMaker.write(inst, result, data, templates, archive.changesSince(), archive.changes(), layout, again,
                        scratch.resolve("trace.json"), progress);
                progress.stage("comparing the bytes");
                if (java.nio.file.Files.mismatch(again, note) >= 0) {
                    problems.add("the PDF's bytes differ from the note this engine writes for the embedded input"
                            + " (the document was edited after it was written)");
                }
            } finally {
                try (var files = java.nio.file.Files.walk(scratch)) {
                    for (Path p : files.sorted(java.util.Comparator.reverseOrder()).toList()) java.nio.file.Files.deleteIfExists(p);
                }
            }
        }
        if (problems.isEmpty()) {
            out.println("verified: " + note + " — " + inst.project().reference() + " revision " + inst.project().revision()
                    + ", fingerprint " + archive.fingerprint().substring(0, 12) + "; every result recomputes"
                    + (sameEngine ? " and the PDF is byte-identical" : ""));
            return ExitStatus.PASS;
        }
        out.println("differs: " + note);
        for (String p : problems) out.println("  " + p);
        return ExitStatus.FAIL;
    }
}
