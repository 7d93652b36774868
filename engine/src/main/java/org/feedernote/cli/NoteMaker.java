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

    record Made(byte[] pdf, String trace, String fingerprint) {}

    static String fingerprint(Installation inst, ReferenceData data) {
        return Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
    }

    static String trace(Installation inst, Result result, ReferenceData data) {
        return TraceJson.write(result.trace(), Version.engine(), data.version(), fingerprint(inst, data));
    }

    static Made make(Installation inst, Result result, ReferenceData data, Path templates, String changesSince,
                     List<String> changes) throws IOException {
        String fingerprint = fingerprint(inst, data);
        String trace = trace(inst, result, data);
        NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine(), changesSince, changes);
        byte[] bytes = new NoteRenderer(templates).pdf(view, inst.project().date(),
                new NoteRenderer.Attachment("input.canonical.json", "Design input (canonical form)",
                        inst.canonicalJson().getBytes(StandardCharsets.UTF_8)),
                new NoteRenderer.Attachment("trace.json", "Calculation trace", trace.getBytes(StandardCharsets.UTF_8)),
                new NoteRenderer.Attachment(org.feedernote.archive.NoteArchive.SOURCE_NAME, "Design input as written: "
                        + org.feedernote.report.NoteBuilder.fileName(inst.sourceName()), inst.sourceText().getBytes(StandardCharsets.UTF_8)));
        return new Made(bytes, trace, fingerprint);
    }
}
