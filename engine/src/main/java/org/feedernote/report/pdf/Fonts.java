package org.feedernote.report.pdf;

import java.awt.Color;
import java.io.IOException;
import java.util.Map;

import com.lowagie.text.Font;
import com.lowagie.text.pdf.BaseFont;

/** The Liberation faces (from openpdf-fonts-extra), embedded and subset, and Font objects per style. */
public final class Fonts {
    private final BaseFont regular;
    private final BaseFont bold;
    private final BaseFont italic;
    private final BaseFont boldItalic;
    private final BaseFont mono;
    private final Map<Key, Font> fonts = new java.util.concurrent.ConcurrentHashMap<>();

    private record Key(BaseFont face, float size, Color color, boolean underline) {}

    public Fonts() throws IOException {
        regular = load("liberation/LiberationSans-Regular.ttf");
        bold = load("liberation/LiberationSans-Bold.ttf");
        italic = load("liberation/LiberationSans-Italic.ttf");
        boldItalic = load("liberation/LiberationSans-BoldItalic.ttf");
        mono = load("liberation/LiberationMono-Regular.ttf");
        for (int k = 0; k < widths.length; k++) {
            widths[k] = new float[65536];
            java.util.Arrays.fill(widths[k], -1);
        }
    }

    private static BaseFont load(String resource) throws IOException {
        return BaseFont.createFont(resource, BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
    }

    BaseFont face(Style s) {
        if (s.mono) return mono;
        if (s.bold) return s.italic ? boldItalic : bold;
        return s.italic ? italic : regular;
    }

    /**
     * Advance widths per character of each face, looked up once (OpenPDF's own lookup boxes every
     * character; -1 where not yet looked up). Filled lazily from several threads: a thread that
     * does not yet see another's entry looks the same width up again.
     */
    private final float[][] widths = new float[5][];

    private float[] widths(BaseFont face) {
        return widths[face == regular ? 0 : face == bold ? 1 : face == italic ? 2 : face == boldItalic ? 3 : 4];
    }

    /** The advance width of a text in points, without kerning (as OpenPDF lays it out). */
    float width(BaseFont face, String text, float size) {
        float[] w = widths(face);
        float units = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            float cw = w[c];
            if (cw < 0) {
                cw = face.getWidth(c);
                w[c] = cw;
            }
            units += cw;
        }
        return units * size / 1000f;
    }

    float width(Style s, String text) {
        return width(face(s), text, s.fontSize);
    }

    public BaseFont regular() {
        return regular;
    }

    public BaseFont bold() {
        return bold;
    }

    Font font(Style s) {
        BaseFont face = face(s);
        return fonts.computeIfAbsent(new Key(face, s.fontSize, s.color, s.underline), k -> {
            // Black is the page's default fill: a font without a colour writes no colour operators per chunk.
            return new Font(k.face(), k.size(), k.underline() ? Font.UNDERLINE : Font.NORMAL,
                    Color.BLACK.equals(k.color()) ? null : k.color());
        });
    }
}
