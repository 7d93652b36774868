package org.feedernote.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

import org.feedernote.Version;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.Canonical;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;
import org.feedernote.report.view.NoteView;
import org.feedernote.trace.TraceJson;

/** Builds the note of an input the way the note command does, for tests. */
record NoteFixture(Installation input, Result result, NoteView view, String trace, byte[] pdf) {

    static NoteFixture of(Path file) throws Exception {
        return of(InputReader.read(file));
    }

    static NoteFixture of(Installation inst) throws Exception {
        return of(inst, NoteLayout.COMPACT);
    }

    static NoteFixture of(Path file, NoteLayout layout) throws Exception {
        return of(InputReader.read(file), layout);
    }

    static NoteFixture of(Installation inst, NoteLayout layout) throws Exception {
        ReferenceData data = ReferenceData.standard();
        Result result = new Engine(data).run(inst);
        String fingerprint = Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
        String trace = TraceJson.write(result.trace(), Version.engine(), data.version(), fingerprint);
        NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine(), null, java.util.List.of(), layout);
        byte[] pdf = new NoteRenderer(null).pdf(view, org.feedernote.report.figure.NoteFigures.of(result), inst.project().date(),
                new NoteRenderer.Attachment("input.canonical.json", "Design input (canonical form)", inst.canonicalJson().getBytes(StandardCharsets.UTF_8)),
                new NoteRenderer.Attachment("trace.json", "Calculation trace", trace.getBytes(StandardCharsets.UTF_8)));
        return new NoteFixture(inst, result, view, trace, pdf);
    }

    /** The note's text as PDFBox extracts it, normalised: thin spaces as spaces, no trailing blanks. */
    String text() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(true);
            return normalise(stripper.getText(doc));
        }
    }

    static String normalise(String text) {
        StringBuilder b = new StringBuilder();
        for (String line : text.replace("\r\n", "\n").replace('\u2009', ' ').replace('\u00a0', ' ').split("\n", -1)) {
            b.append(line.stripTrailing()).append('\n');
        }
        return b.toString().replaceAll("\n+$", "\n");
    }
}
