package org.feedernote.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.feedernote.Version;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.Canonical;
import org.feedernote.model.Installation;
import org.feedernote.report.NoteBuilder;
import org.feedernote.report.NoteLayout;
import org.feedernote.report.NoteRenderer;
import org.feedernote.report.figure.NoteFigures;
import org.feedernote.report.pdf.DeflatingFile;
import org.feedernote.report.view.NoteView;
import org.feedernote.trace.TraceJson;

/** Makes a note's bytes and trace from a calculated installation: one path for note and verify. */
final class NoteMaker {
    private NoteMaker() {}

    /**
     * Starts making the input's canonical form (for the fingerprint and the attachment) on a thread
     * of its own, beside the calculation, which leaves a core idle for much of its time; whoever
     * asks for it first waits for it (the form is made once).
     */
    static void canonicalAhead(Installation inst) {
        Thread t = new Thread(() -> {
            try {
                inst.canonicalJson();
            } catch (RuntimeException | Error e) {
                // Made again, and the failure reported, where the form is needed.
            }
        }, "feedernote-canonical");
        t.setDaemon(true);
        t.start();
    }

    static String fingerprint(Installation inst, ReferenceData data) {
        return Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
    }

    /**
     * Writes the trace and then the note, streaming both, so neither is ever held whole in memory:
     * while the trace is written, a second thread deflates it for the PDF (on a long trace that
     * costs more than writing it) and a third builds the note's view; the note embeds the deflated
     * bytes. Both are written under temporary names and put in place together at the end. Returns
     * the characters of the input the note's fonts cannot show (as "U+6CF5"; printed as a
     * placeholder).
     */
    static List<String> write(Installation inst, Result result, ReferenceData data, Path templates, String changesSince,
                              List<String> changes, NoteLayout layout, Path pdf, Path traceFile, Progress progress) throws IOException {
        String fingerprint = fingerprint(inst, data);
        NoteRenderer renderer = new NoteRenderer(templates);
        int sections = result.trace().sections().size();
        Path folder = pdf.toAbsolutePath().getParent();
        java.nio.file.Files.createDirectories(folder);
        // The view is built on a third thread: the trace's writing waits on its compression, and
        // the view needs neither.
        java.util.concurrent.FutureTask<NoteView> building = new java.util.concurrent.FutureTask<>(
                () -> NoteBuilder.build(result, data, fingerprint, Version.engine(), changesSince, changes, layout));
        Thread builder = new Thread(building, "feedernote-view");
        builder.setDaemon(true);
        builder.start();
        try (DeflatingFile deflated = DeflatingFile.scratch(folder, "." + traceFile.getFileName(), NoteRenderer.ATTACHMENT_COMPRESSION);
             Files.Staged trace = Files.stage(traceFile, out -> {
                 java.io.Writer w = new java.io.OutputStreamWriter(new Both(out, deflated), StandardCharsets.UTF_8);
                 TraceJson.write(result.trace(), Version.engine(), data.version(), fingerprint, w,
                         done -> progress.counted("writing the trace: section", done, sections));
                 w.flush();
             })) {
            progress.stage("preparing the note");
            NoteView view = built(building);
            NoteFigures figures = NoteFigures.of(result);
            progress.stage("compressing the trace");
            deflated.finish();
            List<List<String>> unprintable = new java.util.ArrayList<>(1);
            try (Files.Staged note = Files.stageFile(pdf, tmp -> unprintable.add(renderer.write(view, figures, inst.project().date(), tmp,
                    progress, attachments(inst, NoteRenderer.Attachment.deflated(org.feedernote.archive.NoteArchive.TRACE_NAME,
                            "Calculation trace", deflated), templates, changesSince, changes))))) {
                // The pair is replaced together: a run stopped before here leaves the previous note
                // and trace (if any) as they were, never a new trace beside an old note.
                trace.putInPlace();
                note.putInPlace();
            }
            return unprintable.isEmpty() ? List.of() : unprintable.get(0);
        }
    }

    private static NoteView built(java.util.concurrent.FutureTask<NoteView> building) throws IOException {
        try {
            return building.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("interrupted while the note was prepared");
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            if (e.getCause() instanceof Error err) throw err;
            throw new IOException(e.getCause());
        }
    }

    /** Writes to two streams (the trace's file and its compression); flushes and closes only the first. */
    private static final class Both extends java.io.FilterOutputStream {
        private final OutputStream second;

        Both(OutputStream first, OutputStream second) {
            super(first);
            this.second = second;
        }

        @Override public void write(int b) throws IOException {
            out.write(b);
            second.write(b);
        }

        @Override public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
            second.write(b, off, len);
        }
    }

    /**
     * The input, the trace, the input as written, and what else the note needs to be written again
     * byte for byte: the changes it lists against an earlier revision, the templates it was laid out
     * with where they are not the packaged ones.
     */
    private static NoteRenderer.Attachment[] attachments(Installation inst, NoteRenderer.Attachment trace, Path templates,
                                                         String changesSince, List<String> changes) throws IOException {
        List<NoteRenderer.Attachment> all = new java.util.ArrayList<>(List.of(
                new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.INPUT_NAME, "Design input (canonical form)",
                        inst.canonicalJson().getBytes(StandardCharsets.UTF_8)),
                trace,
                new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.SOURCE_NAME, "Design input as written: "
                        + NoteBuilder.fileName(inst.sourceName()), inst.sourceText().getBytes(StandardCharsets.UTF_8))));
        if (changesSince != null) {
            all.add(new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.CHANGES_NAME, "Changes since revision " + changesSince
                    + " (as listed in the note)", org.feedernote.archive.NoteArchive.changesRecord(changesSince, changes)));
        }
        if (templates != null) {
            for (String name : NoteRenderer.TEMPLATE_FILES) {
                all.add(new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.TEMPLATE_PREFIX + name, "Note template " + name
                        + " (the copy this note was laid out with)", java.nio.file.Files.readAllBytes(templates.resolve(name))));
            }
        }
        return all.toArray(new NoteRenderer.Attachment[0]);
    }

}
