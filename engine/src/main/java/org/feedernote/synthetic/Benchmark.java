package org.feedernote.synthetic;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
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
 * In-process figures for bench/run: the note's layout against a bare-OpenPDF baseline that writes
 * the same text, in the same process; and the page count of a note. (The engine's figures come
 * from JMH, module bench/.) Not a unit test: machines are shared and noisy, so nothing here
 * asserts a time.
 */
public final class Benchmark {
    private Benchmark() {}

    public static void main(String[] args) throws Exception {
        String what = args.length > 0 ? args[0] : "note";
        ReferenceData data = ReferenceData.standard();
        if (what.equals("note")) {
            note(data, args.length > 1 ? Integer.parseInt(args[1]) : 1000);
        } else if (what.equals("pages")) {
            try (PDDocument doc = Loader.loadPDF(new java.io.File(args[1]))) {
                System.out.println(doc.getNumberOfPages());
            }
        } else if (what.equals("reference")) {
            reference();
        } else {
            throw new IllegalArgumentException("note N, pages FILE or reference");
        }
    }

    /**
     * A fixed workload that owes nothing to feedernote: four million seeded random numbers sorted
     * and summed, the median of five runs after three warm-ups. bench/run prints it at its start
     * and at its end, so that figures of runs on different days or hours can be read against the
     * speed the shared machine had at the time (the same figure twice: the machine's speed held).
     */
    private static void reference() {
        long[] numbers = new long[4_000_000];
        double[] ms = new double[5];
        long checksum = 0;
        for (int run = -3; run < ms.length; run++) {
            java.util.SplittableRandom random = new java.util.SplittableRandom(20261203);
            long start = System.nanoTime();
            for (int i = 0; i < numbers.length; i++) numbers[i] = random.nextLong();
            java.util.Arrays.sort(numbers);
            long sum = 0;
            for (int i = 0; i < numbers.length; i += 97) sum += numbers[i];
            checksum = sum;
            if (run >= 0) ms[run] = (System.nanoTime() - start) / 1e6;
        }
        java.util.Arrays.sort(ms);
        System.out.printf(Locale.ROOT, "%.0f ms (median of %d; fastest %.0f, slowest %.0f; checksum %x)%n", ms[ms.length / 2], ms.length,
                ms[0], ms[ms.length - 1], checksum);
    }

    /** Runs before the measured ones, so that the JIT compiler has finished with the code measured. */
    private static final int WARM_UPS = 3;
    private static final int MEASURED = 3;

    /**
     * The note's layout against bare OpenPDF writing the same text, both to a file, in the same
     * process. Each is run {@value #WARM_UPS} times unmeasured and then {@value #MEASURED} times;
     * the median is compared (the state of a long-running process, where the JIT compiler no
     * longer competes for the cores). The run after a single warm-up is printed beside it.
     */
    private static void note(ReferenceData data, int n) throws Exception {
        Installation inst = InputReader.parse("synthetic.json",
                SyntheticInstallation.toJson(SyntheticInstallation.generate(n, 1)), true);
        Result result = new Engine(data).run(inst, true);
        String fingerprint = Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
        NoteRenderer renderer = new NoteRenderer(null);
        Path dir = Files.createTempDirectory("feedernote-bench");
        try {
            Path pdf = dir.resolve("note.pdf");
            double[] noteSeconds = runs(() -> {
                NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine());
                renderer.write(view, org.feedernote.report.figure.NoteFigures.of(result), inst.project().date(), pdf, NoteRenderer.Progress.NONE);
            });
            String text;
            int pages;
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                pages = doc.getNumberOfPages();
                text = new PDFTextStripper().getText(doc);
            }
            Path bare = dir.resolve("bare.pdf");
            double[] bareSeconds = runs(() -> bare(text, bare));
            double note = median(noteSeconds);
            double base = median(bareSeconds);
            System.out.printf(Locale.ROOT, "note   %6d circuits: %d pages in %.1f s (%.0f pages/s, trace to view to XHTML to PDF; median of %d "
                            + "after %d warm-ups); bare OpenPDF writing the same text: %.1f s; ratio %.2f "
                            + "(after one warm-up: %.1f s against %.1f s, ratio %.2f)%n",
                    n, pages, note, pages / note, MEASURED, WARM_UPS, base, note / base,
                    noteSeconds[0], bareSeconds[0], noteSeconds[0] / bareSeconds[0]);
        } finally {
            try (var files = Files.walk(dir)) {
                for (Path p : files.sorted(java.util.Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
            }
        }
    }

    private interface Run {
        void run() throws Exception;
    }

    /** Seconds of the run after the first warm-up, then of each measured run. */
    private static double[] runs(Run run) throws Exception {
        double[] out = new double[1 + MEASURED];
        for (int i = 0; i < WARM_UPS + MEASURED; i++) {
            long t0 = System.nanoTime();
            run.run();
            double seconds = (System.nanoTime() - t0) / 1e9;
            if (i == 1) out[0] = seconds;
            if (i >= WARM_UPS) out[1 + i - WARM_UPS] = seconds;
        }
        return out;
    }

    private static double median(double[] runs) {
        double[] measured = java.util.Arrays.copyOfRange(runs, 1, runs.length);
        java.util.Arrays.sort(measured);
        return measured[measured.length / 2];
    }

    /** The rendering floor: the same text in paragraphs, same font, no layout engine. */
    static void bare(String text, Path file) throws Exception {
        try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            bare(text, out);
        }
    }

    static void bare(String text, OutputStream out) throws Exception {
        Document doc = new Document(PageSize.A4, 57, 57, 68, 57);
        PdfWriter.getInstance(doc, out);
        doc.open();
        BaseFont bf = BaseFont.createFont("liberation/LiberationSans-Regular.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
        Font font = new Font(bf, 9.5f);
        for (String line : text.split("\n")) doc.add(new Paragraph(line, font));
        doc.close();
    }

}
