package org.feedernote.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;

import com.lowagie.text.Document;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfObject;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.PdfWriter;
import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.ext.beans.ZeroArgumentNonVoidMethodPolicy;
import freemarker.template.Configuration;
import freemarker.template.DefaultObjectWrapperBuilder;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;

import org.feedernote.report.figure.NoteFigures;
import org.feedernote.report.pdf.DeflatedAttachment;
import org.feedernote.report.pdf.DeflatingFile;
import org.feedernote.report.pdf.Fonts;
import org.feedernote.report.pdf.Markup;
import org.feedernote.report.pdf.PageFurniture;
import org.feedernote.report.pdf.Style;
import org.feedernote.report.pdf.StyleSheet;
import org.feedernote.report.pdf.Typesetter;
import org.feedernote.report.view.NoteView;
import org.feedernote.report.view.WorkedSection;

/**
 * Lays the note out: FreeMarker templates → XHTML → PDF pages written by OpenPDF through the
 * {@link Typesetter}, one part at a time (the front matter, each worked section, the appendices),
 * so the note streams to its file whatever its length. The Liberation fonts are embedded, the
 * design input and trace attached, and the three things that would differ between runs (creation
 * date, document id, font-subset tags) pinned to values derived from the fingerprint and the
 * note's date.
 */
public final class NoteRenderer {
    /** The files a template folder holds. */
    public static final List<String> TEMPLATE_FILES = List.of("front.ftlh", "figures.ftlh", "cables.ftlh", "section.ftlh", "compact.ftlh",
            "appendix.ftlh", "steps.ftlh", "note.css");

    /** What a browser gives without a style sheet; the note's note.css comes after it and wins. */
    private static final String DEFAULTS = "b, strong, th, h1, h2, h3, h4 { font-weight: bold; } i, em { font-style: italic; } "
            + "h1 { font-size: 16pt; } h2 { font-size: 13pt; } h3 { font-size: 11pt; } p { margin: 0 0 2mm 0; } "
            + "sub { font-size: 70%; vertical-align: sub; } sup { font-size: 70%; vertical-align: super; }\n";

    private final Configuration freemarker;

    /** Deflate level of the attached input and trace. */
    public static final int ATTACHMENT_COMPRESSION = 6;

    /** @param templates a folder holding a copy of the templates, or null for the packaged ones */
    public NoteRenderer(Path templates) throws IOException {
        Configuration cfg = new Configuration(Configuration.VERSION_2_3_34);
        if (templates == null) {
            cfg.setTemplateLoader(new ClassTemplateLoader(NoteRenderer.class, "/report-templates"));
        } else {
            cfg.setTemplateLoader(new FileTemplateLoader(templates.toFile()));
        }
        cfg.setDefaultEncoding("UTF-8");
        cfg.setOutputEncoding("UTF-8");
        cfg.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        cfg.setLogTemplateExceptions(false);
        cfg.setWrapUncheckedExceptions(true);
        cfg.setFallbackOnNullLoopVariable(false);
        cfg.setLocale(java.util.Locale.ROOT);
        cfg.setNumberFormat("computer");
        DefaultObjectWrapperBuilder wrapper = new DefaultObjectWrapperBuilder(Configuration.VERSION_2_3_34);
        wrapper.setRecordZeroArgumentNonVoidMethodPolicy(
                ZeroArgumentNonVoidMethodPolicy.BOTH_METHOD_AND_PROPERTY_UNLESS_BEAN_PROPERTY_READ_METHOD);
        cfg.setObjectWrapper(wrapper.build());
        this.freemarker = cfg;
    }

    /**
     * Attachments carried inside the PDF: bytes, or a file streamed from disk (large traces), or a
     * file already deflated at {@link #ATTACHMENT_COMPRESSION} while it was written (then
     * deflatedFrom is its length before compression; otherwise -1).
     */
    public record Attachment(String name, String description, byte[] content, Path file, long deflatedFrom) {
        public Attachment(String name, String description, byte[] content) {
            this(name, description, content, null, -1);
        }

        public static Attachment file(String name, String description, Path file) {
            return new Attachment(name, description, null, file, -1);
        }

        /** A file compressed while it was written; the PDF's bytes are those of {@link #file} of the same content. */
        public static Attachment deflated(String name, String description, DeflatingFile file) {
            return new Attachment(name, description, null, file.file(), file.length());
        }
    }

    /** Told after each worked section is laid out. */
    public interface Progress {
        void sectionDone(int done, int total);

        /** A stage of the rendering that is not counted by sections begins. */
        default void stage(String what) {}

        Progress NONE = (done, total) -> {};
    }

    private String part(String template, Map<String, Object> model) throws IOException {
        try {
            Template t = freemarker.getTemplate(template);
            StringWriter out = new StringWriter(8192);
            t.process(model, out);
            return out.toString();
        } catch (TemplateException e) {
            throw new IOException("the note template " + template + " failed: " + e.getMessage(), e);
        }
    }

    /** The whole note's markup, part after part (for tests and for reading the templates' output). */
    public String xhtml(NoteView note) throws IOException {
        StringBuilder b = new StringBuilder();
        for (String template : frontParts(NoteFigures.NONE)) b.append(part(template, Map.of("note", note)));
        for (WorkedSection s : note.sections()) b.append(part(s.template(), Map.of("note", note, "section", s)));
        b.append(part("appendix.ftlh", appendixModel(note, unprintable(note, new Fonts()))));
        return b.toString();
    }

    /**
     * The characters of the input (as written, so every text a user gave) that the note's fonts
     * have no glyph for, as "U+6CF5": they are printed as {@link Fonts#PLACEHOLDER}.
     */
    private static List<String> unprintable(NoteView note, Fonts fonts) {
        StringBuilder text = new StringBuilder();
        for (org.feedernote.report.view.ListingLine line : note.listing()) text.append(line.text()).append('\n');
        return fonts.unprintable(text.toString());
    }

    /** The appendix's template model: the note, and the characters printed as a placeholder. */
    private static Map<String, Object> appendixModel(NoteView note, List<String> unprintable) {
        return Map.of("note", note, "unprintable", unprintable, "placeholder", Fonts.PLACEHOLDER);
    }

    private String css() throws IOException {
        TemplateLoader loader = freemarker.getTemplateLoader();
        Object source = loader.findTemplateSource("note.css");
        if (source == null) throw new IOException("the note templates have no note.css");
        try (Reader r = loader.getReader(source, "UTF-8")) {
            StringWriter w = new StringWriter();
            r.transferTo(w);
            return w.toString();
        } finally {
            loader.closeTemplateSource(source);
        }
    }

    public byte[] pdf(NoteView note, String noteDate, Attachment... attachments) throws IOException {
        return pdf(note, NoteFigures.NONE, noteDate, attachments);
    }

    /** The note with its pictures (the figures part, figures.ftlh, after the front matter). */
    public byte[] pdf(NoteView note, NoteFigures figures, String noteDate, Attachment... attachments) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Rendered r = render(note, figures, noteDate, out, Progress.NONE, attachments);
        return Determinism.pin(out.toByteArray(), Math.toIntExact(r.tail()), note.fingerprint(), noteDate);
    }

    /**
     * Writes the note to a file, streaming; the caller moves it into place. Returns the characters
     * of the input the note's fonts cannot show (as "U+6CF5"), printed as a placeholder; the note's
     * appendix lists them too.
     */
    public List<String> write(NoteView note, String noteDate, Path file, Progress progress, Attachment... attachments) throws IOException {
        return write(note, NoteFigures.NONE, noteDate, file, progress, attachments);
    }

    /** As {@link #write(NoteView, String, Path, Progress, Attachment...)}, with the note's pictures. */
    public List<String> write(NoteView note, NoteFigures figures, String noteDate, Path file, Progress progress, Attachment... attachments)
            throws IOException {
        Rendered r;
        try (OutputStream out = new java.io.BufferedOutputStream(java.nio.file.Files.newOutputStream(file), 1 << 16)) {
            r = render(note, figures, noteDate, out, progress, attachments);
        }
        Determinism.pin(file, r.tail(), note.fingerprint(), noteDate);
        return r.unprintable();
    }

    /**
     * The self-verification report (selfcheck.ftlh, always the packaged template, with the note's
     * style sheet) as PDF bytes. It carries no date: its content depends only on the engine and its
     * reference data, so the PDF's date fields get a fixed value and the bytes are a function of
     * the content.
     */
    public byte[] selfCheckPdf(org.feedernote.report.view.SelfCheckView view) throws IOException {
        String xhtml = part("selfcheck.ftlh", Map.of("view", view));
        String fingerprint = sha256(xhtml);
        StyleSheet sheet = StyleSheet.parse(DEFAULTS + css());
        float[] margins = pageMargins(sheet);
        Document document = new Document(PageSize.A4, margins[3], margins[1], margins[0], margins[2]);
        Fonts fonts = new Fonts();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        CountingStream counted = new CountingStream(out);
        PdfWriter writer = PdfWriter.getInstance(document, counted);
        writer.setCompressionLevel(6);
        document.addTitle("feedernote self-verification against published values");
        document.addCreator("feedernote " + view.engineVersion());
        Typesetter typesetter = new Typesetter(fonts, sheet, document, writer);
        Style header = typesetter.styleOf("div", "running-header");
        Style footer = typesetter.styleOf("div", "running-footer");
        Style mark = typesetter.styleOf("div", "watermark");
        writer.setPageEvent(new PageFurniture(new PageFurniture.Texts("feedernote " + view.engineVersion(), "Self-verification",
                "Reference data " + view.dataVersion() + " · " + view.passed() + " of " + view.total() + " pass", null,
                header.fontSize(), footer.fontSize(), mark.fontSize(), mark.color()), fonts));
        document.open();
        PdfDate date = new PdfDate(calendar(UNDATED));
        writer.getInfo().put(PdfName.CREATIONDATE, date);
        writer.getInfo().put(PdfName.MODDATE, date);
        typesetter.place(typesetter.prepare(Markup.parse(xhtml, "selfcheck.ftlh")));
        long tail = counted.count;
        document.close();
        return Determinism.pin(out.toByteArray(), Math.toIntExact(tail), fingerprint, UNDATED);
    }

    /** The fixed date of an undated PDF's date fields. */
    private static final String UNDATED = "2000-01-01";

    private static String sha256(String text) {
        try {
            byte[] d = java.security.MessageDigest.getInstance("SHA-256").digest(text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
            return java.util.HexFormat.of().formatHex(d);
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The offset from which the bytes written on closing begin, and the characters printed as a placeholder. */
    private record Rendered(long tail, List<String> unprintable) {}

    /** Lays the note out into {@code out}. */
    private Rendered render(NoteView note, NoteFigures figures, String noteDate, OutputStream out, Progress progress, Attachment... attachments)
            throws IOException {
        StyleSheet sheet = StyleSheet.parse(DEFAULTS + css());
        float[] margins = pageMargins(sheet);
        Document document = new Document(PageSize.A4, margins[3], margins[1], margins[0], margins[2]);
        Fonts fonts = new Fonts();
        List<String> unprintable = unprintable(note, fonts);
        CountingStream counted = new CountingStream(out);
        PdfWriter writer = PdfWriter.getInstance(document, counted);
        writer.setCompressionLevel(6);
        document.addTitle(note.cover().reference() + " rev " + note.cover().revision() + " — " + note.cover().title());
        document.addSubject("Calculation note " + note.cover().reference() + " revision " + note.cover().revision());
        document.addKeywords("feedernote fingerprint " + note.fingerprint());
        document.addAuthor(note.cover().signatures().get(0).name());
        document.addCreator("feedernote " + note.engineVersion());
        Typesetter typesetter = new Typesetter(fonts, sheet, document, writer, figures.registry());
        Style header = typesetter.styleOf("div", "running-header");
        Style footer = typesetter.styleOf("div", "running-footer");
        Style mark = typesetter.styleOf("div", "watermark");
        writer.setPageEvent(new PageFurniture(new PageFurniture.Texts(fonts.printable(note.runningTitle()), "Calculation note",
                "Fingerprint " + note.fingerprintShort() + " · " + note.cover().status(), note.draft() ? "DRAFT" : null,
                header.fontSize(), footer.fontSize(), mark.fontSize(), mark.color()), fonts));
        document.open();
        PdfDictionary info = writer.getInfo();
        info.put(new PdfName("Fingerprint"), new PdfString(note.fingerprint()));
        info.put(new PdfName("EngineVersion"), new PdfString(note.engineVersion()));
        info.put(new PdfName("Reference"), new PdfString(note.cover().reference(), PdfObject.TEXT_UNICODE));
        info.put(new PdfName("Revision"), new PdfString(note.cover().revision(), PdfObject.TEXT_UNICODE));
        info.put(new PdfName("InputFile"), new PdfString(note.listingName(), PdfObject.TEXT_UNICODE));
        info.put(new PdfName("Detail"), new PdfString(note.detail(), PdfObject.TEXT_UNICODE));
        PdfDate date = new PdfDate(calendar(noteDate));
        info.put(PdfName.CREATIONDATE, date);
        info.put(PdfName.MODDATE, date);
        progress.stage("attaching the input and the trace");
        for (Attachment a : attachments) {
            // zlib's default level: OpenPDF's "compress" means level 9, three times slower on a
            // long trace for a file a few per cent smaller.
            PdfFileSpecification spec = a.deflatedFrom() >= 0 ? DeflatedAttachment.embed(writer, a.file(), a.name(), a.deflatedFrom())
                    : a.file() != null ? PdfFileSpecification.fileEmbedded(writer, a.file().toString(), a.name(), null, ATTACHMENT_COMPRESSION)
                    : PdfFileSpecification.fileEmbedded(writer, null, a.name(), a.content(), ATTACHMENT_COMPRESSION);
            writer.addFileAttachment(a.description(), spec);
        }
        placeParts(note, figures, typesetter, progress, appendixModel(note, unprintable));
        typesetter.finishPageReferences();
        // Bytes written so far; OpenPDF's getCurrentDocumentSize() adds an estimate of the
        // cross-reference table and so lies past the font objects of a long note.
        long tail = counted.count;
        progress.stage("finishing the PDF");
        document.close();
        return new Rendered(tail, unprintable);
    }

    /** Counts the bytes OpenPDF has written (it writes straight through, without a buffer of its own). */
    private static final class CountingStream extends java.io.FilterOutputStream {
        long count;

        CountingStream(OutputStream out) {
            super(out);
        }

        @Override public void write(int b) throws IOException {
            out.write(b);
            count++;
        }

        @Override public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
            count += len;
        }
    }

    /** How many parts the preparing thread may run ahead of the pages (bounds the memory held). */
    private static final int PREPARED_AHEAD = 16;

    /**
     * The front matter, every worked section and the appendices, in order. Building a part's view,
     * running its template, parsing the markup and turning it into blocks happens on a preparing
     * thread, a few parts ahead of the thread that places the blocks on the pages in order; while
     * the next part is not ready, the placing thread prepares parts nobody has begun rather than wait
     * (preparing costs more than placing). Each part's blocks depend on that part alone, so the
     * pages, and the bytes, come out the same as if one thread did everything.
     */
    private void placeParts(NoteView note, NoteFigures figures, Typesetter typesetter, Progress progress, Map<String, Object> appendix)
            throws IOException {
        int sections = note.sections().size();
        List<String> front = frontParts(figures);
        int before = front.size();
        int parts = before + sections + 1;
        java.util.concurrent.ExecutorService preparing = java.util.concurrent.Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "feedernote-note-prepare");
            t.setDaemon(true);
            return t;
        });
        try {
            java.util.ArrayDeque<java.util.concurrent.FutureTask<Typesetter.Prepared>> ahead = new java.util.ArrayDeque<>();
            int next = 0;
            while (next < parts && ahead.size() < PREPARED_AHEAD) {
                ahead.add(schedule(preparing, prepareTask(note, figures, typesetter, next++, sections, appendix)));
            }
            for (int i = 0; i < parts; i++) {
                if (i == 0) progress.stage("laying out the front matter and the summary schedule");
                if (i == 1 && !figures.isEmpty()) progress.stage("drawing the single-line diagram and the voltage-drop profile");
                if (i == before + sections) progress.stage("laying out the appendices");
                java.util.concurrent.FutureTask<Typesetter.Prepared> first = ahead.removeFirst();
                helpWhileWaiting(first, ahead);
                Typesetter.Prepared part = await(first);
                if (next < parts) ahead.add(schedule(preparing, prepareTask(note, figures, typesetter, next++, sections, appendix)));
                typesetter.place(part);
                if (i >= before && i < before + sections) progress.sectionDone(i - before + 1, sections);
            }
        } finally {
            preparing.shutdownNow();
        }
    }

    /** The parts laid out before the worked sections: the front matter, the pictures (where the note has them), the cable data. */
    private static List<String> frontParts(NoteFigures figures) {
        return figures.isEmpty() ? List.of("front.ftlh", "cables.ftlh") : List.of("front.ftlh", "figures.ftlh", "cables.ftlh");
    }

    private java.util.concurrent.Callable<Typesetter.Prepared> prepareTask(NoteView note, NoteFigures figures, Typesetter typesetter,
                                                                            int at, int sections, Map<String, Object> appendix) {
        List<String> front = frontParts(figures);
        return () -> {
            if (at < front.size()) {
                String template = front.get(at);
                return prepare(typesetter, template, template.equals("figures.ftlh") ? Map.of("note", note, "figures", figures) : Map.of("note", note));
            }
            int index = at - front.size();
            if (index >= sections) return prepare(typesetter, "appendix.ftlh", appendix);
            WorkedSection s = note.sections().get(index);
            return prepare(typesetter, s.template(), Map.of("note", note, "section", s));
        };
    }

    /** A part's template run, parsed and made into blocks; a figure the note lacks is the template's error. */
    private Typesetter.Prepared prepare(Typesetter typesetter, String template, Map<String, Object> model) throws IOException {
        Markup.Element root = Markup.parse(part(template, model), template);
        try {
            return typesetter.prepare(root);
        } catch (IllegalArgumentException e) {
            throw new IOException("the note template " + template + ": " + e.getMessage(), e);
        }
    }

    private static java.util.concurrent.FutureTask<Typesetter.Prepared> schedule(java.util.concurrent.ExecutorService preparing,
                                                                                 java.util.concurrent.Callable<Typesetter.Prepared> task) {
        java.util.concurrent.FutureTask<Typesetter.Prepared> future = new java.util.concurrent.FutureTask<>(task);
        preparing.execute(future);
        return future;
    }

    /**
     * While the part to place next is not ready, prepares here the first part nobody has begun:
     * that part itself, or one behind it, so that both cores prepare when preparing is the slower
     * side. A task's run does nothing once another thread has begun or finished it.
     */
    private static void helpWhileWaiting(java.util.concurrent.FutureTask<Typesetter.Prepared> wanted,
                                         java.util.Collection<java.util.concurrent.FutureTask<Typesetter.Prepared>> later) {
        wanted.run();
        for (java.util.concurrent.FutureTask<Typesetter.Prepared> task : later) {
            if (wanted.isDone()) return;
            if (!task.isDone()) task.run();
        }
    }

    private static Typesetter.Prepared await(java.util.concurrent.FutureTask<Typesetter.Prepared> future) throws IOException {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while laying out the note", e);
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof IOException io) throw io;
            if (cause instanceof RuntimeException re) throw re;
            if (cause instanceof Error err) throw err;
            throw new IOException(cause);
        }
    }

    private static Calendar calendar(String isoDate) {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"), java.util.Locale.ROOT);
        c.clear();
        String[] p = isoDate.split("-");
        c.set(Integer.parseInt(p[0]), Integer.parseInt(p[1]) - 1, Integer.parseInt(p[2]), 0, 0, 0);
        return c;
    }

    /** top, right, bottom, left in points, from the style sheet's @page margin (A4 defaults of 20 mm otherwise). */
    private static float[] pageMargins(StyleSheet sheet) {
        float mm = Style.MM;
        float[] out = {20 * mm, 20 * mm, 20 * mm, 20 * mm};
        String margin = sheet.page().get("margin");
        if (margin == null) return out;
        String[] v = margin.trim().split("\\s+");
        float[] l = new float[v.length];
        for (int i = 0; i < v.length; i++) l[i] = Style.points(v[i]);
        return switch (v.length) {
            case 1 -> new float[] {l[0], l[0], l[0], l[0]};
            case 2 -> new float[] {l[0], l[1], l[0], l[1]};
            case 3 -> new float[] {l[0], l[1], l[2], l[1]};
            default -> new float[] {l[0], l[1], l[2], l[3]};
        };
    }
}
