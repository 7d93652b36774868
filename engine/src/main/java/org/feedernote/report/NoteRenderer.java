package org.feedernote.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Map;


import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfWriter;
import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.ext.beans.ZeroArgumentNonVoidMethodPolicy;
import freemarker.template.Configuration;
import freemarker.template.DefaultObjectWrapperBuilder;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import org.xhtmlrenderer.pdf.DefaultPDFCreationListener;
import org.xhtmlrenderer.pdf.ITextFontResolver;
import org.xhtmlrenderer.pdf.ITextRenderer;

import org.feedernote.report.view.NoteView;

/**
 * Lays the note out: FreeMarker templates → XHTML with paged-media CSS → PDF (flying-saucer on
 * OpenPDF), with the Liberation fonts embedded, the design input and trace attached, and the
 * three things that would differ between runs (creation date, document id, font-subset tags)
 * pinned to values derived from the fingerprint and the note's date.
 */
public final class NoteRenderer {
    private static final String[] FONTS = {
            "liberation/LiberationSans-Regular.ttf", "liberation/LiberationSans-Bold.ttf",
            "liberation/LiberationSans-Italic.ttf", "liberation/LiberationSans-BoldItalic.ttf",
            "liberation/LiberationMono-Regular.ttf"};

    private final Configuration freemarker;

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

    public String xhtml(NoteView note) throws IOException {
        try {
            Template t = freemarker.getTemplate("note.ftlh");
            StringWriter out = new StringWriter();
            t.process(Map.of("note", note), out);
            return out.toString();
        } catch (TemplateException e) {
            throw new IOException("the note template failed: " + e.getMessage(), e);
        }
    }

    /** Attachments carried inside the PDF. */
    public record Attachment(String name, String description, byte[] content) {}

    public byte[] pdf(NoteView note, String noteDate, Attachment... attachments) throws IOException {
        String xhtml = xhtml(note);
        ITextRenderer renderer = new ITextRenderer();
        ITextFontResolver fonts = renderer.getFontResolver();
        for (String f : FONTS) fonts.addFont(f, BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
        renderer.setListener(new DefaultPDFCreationListener() {
            @Override public void preOpen(ITextRenderer r) {
                super.preOpen(r);
                com.lowagie.text.pdf.PdfDictionary info = r.getWriter().getInfo();
                info.put(new com.lowagie.text.pdf.PdfName("Fingerprint"), new com.lowagie.text.pdf.PdfString(note.fingerprint()));
                info.put(new com.lowagie.text.pdf.PdfName("EngineVersion"), new com.lowagie.text.pdf.PdfString(note.engineVersion()));
                info.put(new com.lowagie.text.pdf.PdfName("Reference"), new com.lowagie.text.pdf.PdfString(note.cover().reference(), com.lowagie.text.pdf.PdfObject.TEXT_UNICODE));
                info.put(new com.lowagie.text.pdf.PdfName("Revision"), new com.lowagie.text.pdf.PdfString(note.cover().revision(), com.lowagie.text.pdf.PdfObject.TEXT_UNICODE));
                info.put(new com.lowagie.text.pdf.PdfName("InputFile"), new com.lowagie.text.pdf.PdfString(note.listingName(), com.lowagie.text.pdf.PdfObject.TEXT_UNICODE));
            }

            @Override public void onClose(ITextRenderer r) {
                PdfWriter writer = r.getWriter();
                try {
                    for (Attachment a : attachments) {
                        PdfFileSpecification spec = PdfFileSpecification.fileEmbedded(writer, null, a.name(), a.content());
                        writer.addFileAttachment(a.description(), spec);
                    }
                } catch (IOException e) {
                    throw new IllegalStateException("cannot attach " + e.getMessage(), e);
                }
            }
        });
        renderer.setDocumentFromString(xhtml);
        renderer.layout();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        renderer.createPDF(out);
        return Determinism.pin(out.toByteArray(), note.fingerprint(), noteDate);
    }

}
