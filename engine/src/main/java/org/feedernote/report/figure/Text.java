package org.feedernote.report.figure;

import java.awt.Font;
import java.awt.Graphics2D;

import org.feedernote.report.pdf.FigureFonts;

/**
 * Text in the figures: the symbols the figures themselves write (I_b, I_k, Z_e, u_k, each a word
 * of its own) get their subscript; anything else, ids and descriptions above all, is drawn as
 * written (characters the face lacks as the note's placeholder).
 */
final class Text {
    private Text() {}

    private static final java.util.Set<String> SYMBOLS = java.util.Set.of("I_b", "I_k", "Z_e", "u_k");

    /** The width the text takes when drawn by {@link #draw}. */
    static float width(FigureFonts fonts, Font f, String text) {
        float w = 0;
        for (String[] piece : pieces(fonts.printable(text))) {
            w += FigureFonts.width(piece[1] == null ? f : sub(f), piece[0]);
        }
        return w;
    }

    /** Draws the text from x on the baseline; returns where it ends. */
    static float draw(Graphics2D g, FigureFonts fonts, Font f, String text, float x, float baseline) {
        for (String[] piece : pieces(fonts.printable(text))) {
            if (piece[0].isEmpty()) continue;
            Font font = piece[1] == null ? f : sub(f);
            g.setFont(font);
            g.drawString(piece[0], x, piece[1] == null ? baseline : baseline + f.getSize2D() * 0.22f);
            x += FigureFonts.width(font, piece[0]);
        }
        return x;
    }

    private static Font sub(Font f) {
        return f.deriveFont(Math.max(6f, f.getSize2D() * 0.72f));
    }

    /** The text in pieces: {text, null} as it is, {text, "sub"} lowered and smaller. */
    private static java.util.List<String[]> pieces(String text) {
        java.util.List<String[]> out = new java.util.ArrayList<>();
        StringBuilder plain = new StringBuilder();
        String[] words = text.split(" ", -1);
        for (int i = 0; i < words.length; i++) {
            if (i > 0) plain.append(' ');
            String w = words[i];
            if (SYMBOLS.contains(w)) {
                plain.append(w, 0, 1);
                out.add(new String[] {plain.toString(), null});
                plain.setLength(0);
                out.add(new String[] {w.substring(2), "sub"});
            } else {
                plain.append(w);
            }
        }
        out.add(new String[] {plain.toString(), null});
        return out;
    }
}
