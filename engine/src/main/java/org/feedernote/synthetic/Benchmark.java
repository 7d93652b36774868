package org.feedernote.synthetic;

import java.io.ByteArrayOutputStream;
import java.util.Locale;

import com.lowagie.text.Document;
import com.lowagie.text.Font;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfWriter;
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
import org.feedernote.report.NoteBuilder;
import org.feedernote.report.NoteRenderer;
import org.feedernote.report.view.NoteView;

/**
 * In-process figures for bench/run: engine throughput with and without the recording trace, note
 * rendering against a bare-OpenPDF baseline that writes the same text, and heap. Not a unit test:
 * machines are shared and noisy, so nothing here asserts a time.
 */
public final class Benchmark {
    private Benchmark() {}

    public static void main(String[] args) throws Exception {
        int noteCircuits = args.length > 0 ? Integer.parseInt(args[0]) : 1000;
        ReferenceData data = ReferenceData.standard();
        for (int n : new int[] {1000, 10000}) {
            Installation inst = InputReader.parse("synthetic.json", SyntheticInstallation.toJson(SyntheticInstallation.generate(n, 1)), true);
            new Engine(data).run(inst, false);
            long t0 = System.nanoTime();
            new Engine(data).run(inst, false);
            double figures = (System.nanoTime() - t0) / 1e9;
            t0 = System.nanoTime();
            new Engine(data).run(inst, true);
            double traced = (System.nanoTime() - t0) / 1e9;
            System.out.printf(Locale.ROOT, "engine %6d circuits: %.2f s figures only (%.0f circuits/s), %.2f s traced (%.0f traced circuits/s, one thread)%n",
                    n, figures, n / figures, traced, n / traced);
        }
        Installation inst = InputReader.parse("synthetic.json",
                SyntheticInstallation.toJson(SyntheticInstallation.generate(noteCircuits, 1)), true);
        Result result = new Engine(data).run(inst, true);
        String fingerprint = Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
        NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine());
        NoteRenderer renderer = new NoteRenderer(null);
        long t0 = System.nanoTime();
        byte[] pdf = renderer.pdf(view, inst.project().date());
        double noteSeconds = (System.nanoTime() - t0) / 1e9;
        String text;
        int pages;
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            pages = doc.getNumberOfPages();
            text = new PDFTextStripper().getText(doc);
        }
        t0 = System.nanoTime();
        byte[] baseline = bare(text);
        double baseSeconds = (System.nanoTime() - t0) / 1e9;
        System.out.printf(Locale.ROOT, "note   %6d circuits: %d pages in %.1f s (%.1f pages/s); bare OpenPDF, same text: %.1f s (%d bytes); ratio %.1f%n",
                noteCircuits, pages, noteSeconds, pages / noteSeconds, baseSeconds, baseline.length, noteSeconds / baseSeconds);
        Runtime rt = Runtime.getRuntime();
        System.out.printf(Locale.ROOT, "heap in use after the note: %d MB (max %d MB)%n",
                (rt.totalMemory() - rt.freeMemory()) >> 20, rt.maxMemory() >> 20);
    }

    /** The rendering floor: the same text in paragraphs, same font, no layout engine. */
    static byte[] bare(String text) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 57, 57, 68, 57);
        PdfWriter.getInstance(doc, out);
        doc.open();
        BaseFont bf = BaseFont.createFont("liberation/LiberationSans-Regular.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
        Font font = new Font(bf, 9.5f);
        for (String line : text.split("\n")) doc.add(new Paragraph(line, font));
        doc.close();
        return out.toByteArray();
    }

}
