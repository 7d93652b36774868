package org.feedernote.report.pdf;

import java.awt.Color;

import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

/**
 * What every page carries: the running header (title left, label right) above a rule, the
 * running footer (left text; "Page X of Y" right) below a rule, and for a draft a large diagonal
 * mark behind the text. The page count is a template filled in when the document closes, so the
 * note is written in one pass.
 */
public final class PageFurniture extends PdfPageEventHelper {
    /** Texts and sizes of the furniture; the sizes come from the style sheet. */
    public record Texts(String headerLeft, String headerRight, String footerLeft, String watermark,
                        float headerSize, float footerSize, float watermarkSize, Color watermarkColor) {}

    private static final String WIDEST_PAGE_LABEL = "Page 888888 of 888888";

    private final Texts texts;
    private final BaseFont regular;
    private final BaseFont bold;
    private PdfTemplate total;

    public PageFurniture(Texts texts, Fonts fonts) {
        this.texts = texts;
        this.regular = fonts.regular();
        this.bold = fonts.bold();
    }

    @Override public void onOpenDocument(PdfWriter writer, Document document) {
        total = writer.getDirectContent().createTemplate(regular.getWidthPoint("888888", texts.footerSize()) + 2,
                texts.footerSize() * 1.5f);
    }

    @Override public void onEndPage(PdfWriter writer, Document document) {
        PdfContentByte cb = writer.getDirectContent();
        float left = document.left();
        float right = document.right();
        float headerRule = document.top() + 5 * Style.MM;
        float footerRule = document.bottom() - 5 * Style.MM;
        cb.saveState();
        cb.setLineWidth(0.5f);
        cb.setColorStroke(new Color(0x44, 0x44, 0x44));
        cb.moveTo(left, headerRule);
        cb.lineTo(right, headerRule);
        cb.moveTo(left, footerRule);
        cb.lineTo(right, footerRule);
        cb.stroke();
        cb.restoreState();

        float hs = texts.headerSize();
        float fs = texts.footerSize();
        text(cb, regular, hs, texts.headerLeft(), left, headerRule + 1.5f * Style.MM, Element.ALIGN_LEFT);
        text(cb, regular, hs, texts.headerRight(), right, headerRule + 1.5f * Style.MM, Element.ALIGN_RIGHT);
        float footerBase = footerRule - 1.5f * Style.MM - fs;
        text(cb, regular, fs, texts.footerLeft(), left, footerBase, Element.ALIGN_LEFT);
        String label = "Page " + writer.getPageNumber() + " of ";
        float start = right - regular.getWidthPoint(WIDEST_PAGE_LABEL, fs);
        text(cb, regular, fs, label, start, footerBase, Element.ALIGN_LEFT);
        cb.addTemplate(total, start + regular.getWidthPoint(label, fs), footerBase - fs * 0.3f);

        if (texts.watermark() != null) {
            PdfContentByte under = writer.getDirectContentUnder();
            under.saveState();
            under.setColorFill(texts.watermarkColor());
            under.beginText();
            under.setFontAndSize(bold, texts.watermarkSize());
            float cx = (document.left() + document.right()) / 2;
            float cy = (document.top() + document.bottom()) / 2;
            under.showTextAligned(Element.ALIGN_CENTER, texts.watermark(), cx, cy - texts.watermarkSize() / 3, 45);
            under.endText();
            under.restoreState();
        }
    }

    private static void text(PdfContentByte cb, BaseFont font, float size, String text, float x, float y, int align) {
        cb.beginText();
        cb.setFontAndSize(font, size);
        cb.showTextAligned(align, text, x, y, 0);
        cb.endText();
    }

    @Override public void onCloseDocument(PdfWriter writer, Document document) {
        total.beginText();
        total.setFontAndSize(regular, texts.footerSize());
        total.setTextMatrix(0, texts.footerSize() * 0.3f);
        total.showText(String.valueOf(writer.getPageNumber() - 1));
        total.endText();
    }
}
