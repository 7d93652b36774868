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
        BaseFont[] faces = {regular, bold, italic, boldItalic, mono};
        for (int k = 0; k < faces.length; k++) {
            boolean all = true;
            for (int c = 0x20; c < 0x250 && all; c++) all = Character.isISOControl(c) || shows(faces[k], c);
            latin[k] = all;
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
        return widths[index(face)];
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

    /**
     * Printed in place of a character a face has no glyph for (a Chinese description, say), so the
     * note never drops text silently; the embedded input keeps it as written.
     */
    public static final String PLACEHOLDER = "\u25a1";

    /** Per face and character: 0 not yet asked, 1 has a glyph, 2 has none. */
    private final byte[][] glyphs = new byte[5][65536];

    private boolean shows(BaseFont face, int codePoint) {
        if (Character.isWhitespace(codePoint) || Character.isISOControl(codePoint) || codePoint == 0xa0) return true;
        if (codePoint > 0xffff) return face.charExists(codePoint);
        byte[] known = glyphs[index(face)];
        byte k = known[codePoint];
        if (k == 0) {
            k = face.charExists(codePoint) ? (byte) 1 : (byte) 2;
            known[codePoint] = k;
        }
        return k == 1;
    }

    /** Per face: whether it has a glyph for every character below U+0250 (Latin) that is not a control. */
    private final boolean[] latin = new boolean[5];

    private int index(BaseFont face) {
        return face == regular ? 0 : face == bold ? 1 : face == italic ? 2 : face == boldItalic ? 3 : 4;
    }

    /** The text with each character {@code face} cannot show replaced by {@link #PLACEHOLDER}. */
    String printable(BaseFont face, String text) {
        int i = 0;
        if (latin[index(face)]) {
            while (i < text.length() && text.charAt(i) < 0x250) i++;
        } else {
            while (i < text.length() && text.charAt(i) < 0x250 && shows(face, text.charAt(i))) i++;
        }
        if (i == text.length()) return text;
        StringBuilder b = new StringBuilder(text.length());
        b.append(text, 0, i);
        while (i < text.length()) {
            int cp = text.codePointAt(i);
            if (shows(face, cp)) b.appendCodePoint(cp);
            else b.append(PLACEHOLDER);
            i += Character.charCount(cp);
        }
        return b.toString();
    }

    public String printable(String text) {
        return printable(regular, text);
    }

    /** The characters of {@code text} that the sans or the mono face cannot show, as "U+6CF5", in code point order. */
    public java.util.List<String> unprintable(String text) {
        java.util.TreeSet<Integer> missing = new java.util.TreeSet<>();
        text.codePoints().forEach(cp -> {
            if (!shows(regular, cp) || !shows(mono, cp)) missing.add(cp);
        });
        return missing.stream().map(cp -> String.format(java.util.Locale.ROOT, "U+%04X", cp)).toList();
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
