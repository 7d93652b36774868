package org.feedernote.report.pdf;

import java.awt.FontFormatException;
import java.awt.font.FontRenderContext;
import java.io.IOException;
import java.io.InputStream;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontMapper;

/**
 * The note's Liberation faces as AWT fonts, for figures: read from the same font files the PDF
 * embeds, so a figure measures its text with the widths the page shows (not with whatever fonts
 * the machine has), and {@link #mapper} hands OpenPDF's Graphics2D the embedded face of each, so
 * the figure's text is text in the PDF, searchable. Immutable once made.
 */
public final class FigureFonts {
    /** How figures measure text: fractional widths, no transform (as the PDF places it). */
    public static final FontRenderContext MEASURE = new FontRenderContext(null, true, true);

    private final java.awt.Font regular;
    private final java.awt.Font bold;

    public FigureFonts() throws IOException {
        regular = load("liberation/LiberationSans-Regular.ttf");
        bold = load("liberation/LiberationSans-Bold.ttf");
    }

    private static java.awt.Font load(String resource) throws IOException {
        try (InputStream in = BaseFont.class.getClassLoader().getResourceAsStream(resource)) {
            if (in == null) throw new IOException("the font " + resource + " is not on the class path");
            return java.awt.Font.createFont(java.awt.Font.TRUETYPE_FONT, in);
        } catch (FontFormatException e) {
            throw new IOException("the font " + resource + " cannot be read: " + e.getMessage(), e);
        }
    }

    public java.awt.Font regular(float size) {
        return regular.deriveFont(java.awt.Font.PLAIN, size);
    }

    public java.awt.Font bold(float size) {
        return bold.deriveFont(java.awt.Font.PLAIN, size);
    }

    /** The text with each character the faces cannot show replaced by the note's placeholder. */
    public String printable(String text) {
        if (regular.canDisplayUpTo(text) < 0 && bold.canDisplayUpTo(text) < 0) return text;
        StringBuilder b = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            if (regular.canDisplay(cp) && bold.canDisplay(cp)) b.appendCodePoint(cp);
            else b.append(Fonts.PLACEHOLDER);
        });
        return b.toString();
    }

    /** The width of a text in a font, in points. */
    public static float width(java.awt.Font font, String text) {
        return (float) font.getStringBounds(text, MEASURE).getWidth();
    }

    /**
     * Maps an AWT font to the note's embedded face: the bold file (or a bold style) to the bold
     * face, everything else to the regular one.
     */
    static FontMapper mapper(Fonts fonts) {
        return new FontMapper() {
            @Override public BaseFont awtToPdf(java.awt.Font font) {
                boolean bold = font.isBold() || font.getFontName(java.util.Locale.ROOT).contains("Bold");
                return bold ? fonts.bold() : fonts.regular();
            }

            @Override public java.awt.Font pdfToAwt(BaseFont font, int size) {
                throw new UnsupportedOperationException("figures draw with AWT fonts only");
            }
        };
    }
}
