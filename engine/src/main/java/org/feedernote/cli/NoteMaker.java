package org.feedernote.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.feedernote.Version;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.Canonical;
import org.feedernote.model.Installation;
import org.feedernote.report.NoteBuilder;
import org.feedernote.report.NoteRenderer;
import org.feedernote.report.view.NoteView;
import org.feedernote.trace.TraceJson;

/** Makes a note's bytes and trace from a calculated installation: one path for note and verify. */
final class NoteMaker {
    private NoteMaker() {}

    static String fingerprint(Installation inst, ReferenceData data) {
        return Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
    }

    static String trace(Installation inst, Result result, ReferenceData data) {
        return TraceJson.write(result.trace(), Version.engine(), data.version(), fingerprint(inst, data));
    }

    /**
     * Writes the trace and then the note into their files, streaming both: the trace is attached
     * to the PDF from its file, so neither is ever held whole in memory. Returns the characters of
     * the input the note's fonts cannot show (as "U+6CF5"; printed as a placeholder).
     */
    static List<String> write(Installation inst, Result result, ReferenceData data, Path templates, String changesSince,
                              List<String> changes, Path pdf, Path traceFile, Progress progress) throws IOException {
        String fingerprint = fingerprint(inst, data);
        NoteRenderer renderer = new NoteRenderer(templates);
        progress.stage("preparing the note");
        NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine(), changesSince, changes);
        int sections = result.trace().sections().size();
        Files.writeAtomically(traceFile, out -> {
            java.io.Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
            TraceJson.write(result.trace(), Version.engine(), data.version(), fingerprint, w,
                    done -> progress.counted("writing the trace: section", done, sections));
            w.flush();
        });
        List<List<String>> unprintable = new java.util.ArrayList<>(1);
        Files.writeFileAtomically(pdf, tmp -> unprintable.add(renderer.write(view, inst.project().date(), tmp, progress, attachments(inst,
                NoteRenderer.Attachment.file(org.feedernote.archive.NoteArchive.TRACE_NAME, "Calculation trace", traceFile)))));
        return unprintable.isEmpty() ? List.of() : unprintable.get(0);
    }

    private static NoteRenderer.Attachment[] attachments(Installation inst, NoteRenderer.Attachment trace) {
        return new NoteRenderer.Attachment[] {
                new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.INPUT_NAME, "Design input (canonical form)",
                        inst.canonicalJson().getBytes(StandardCharsets.UTF_8)),
                trace,
                new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.SOURCE_NAME, "Design input as written: "
                        + NoteBuilder.fileName(inst.sourceName()), inst.sourceText().getBytes(StandardCharsets.UTF_8))};
    }

}
