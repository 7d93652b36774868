package org.feedernote.report.pdf;

import java.util.ArrayList;
import java.util.List;

import com.lowagie.text.Element;

/**
 * Breaks a paragraph's inline runs into lines the way the page will show them: greedy, at spaces
 * and line breaks only (a word in several styles, such as a symbol with its subscript, stays
 * whole), a word wider than the line broken between characters. Tab stops of inline blocks, a
 * list marker in a hanging indent, a right float at the end of the last line, and left, right,
 * centred or justified alignment. Pure layout on the font metrics: the result is written onto the
 * page by the {@link Typesetter} without a second layout pass.
 */
final class LineBreaker {
    /** Text in one style; a null text is a tab stop (the end of an inline block of fixed width). */
    record Run(String text, Style style) {}

    /** Text in one style at {@code x} points from the paragraph's left edge, {@code width} points wide. */
    record Fragment(float x, String text, Style style, float width) {}

    record Line(List<Fragment> fragments) {}

    /** Space between a heading line and a right float that shares its line. */
    private static final float FLOAT_GAP = 6f;

    private final Fonts fonts;
    private final float width;
    private final List<Line> lines = new ArrayList<>();
    private List<Fragment> line = new ArrayList<>();
    /** Per fragment of the current line: whether a space precedes it (where justification widens). */
    private List<Boolean> gapBefore = new ArrayList<>();
    private float x;
    private final StringBuilder pendingSpace = new StringBuilder();
    private Style pendingSpaceStyle;
    private float pendingSpaceWidth;
    private final List<Piece> word = new ArrayList<>();
    private float wordWidth;
    private final boolean justify;
    private final int align;
    /**
     * Text joined onto the line's last fragment and not yet written into it, with the fragment's
     * width so far (summed in the same order as one fragment after another would be): a line's
     * words are joined once, when the fragment is next read, not word by word.
     */
    private final StringBuilder joined = new StringBuilder();
    private boolean joining;
    private float joinedWidth;

    private LineBreaker(Fonts fonts, float width, int align) {
        this.fonts = fonts;
        this.width = width <= 10 ? Float.MAX_VALUE : width;
        this.align = align;
        this.justify = align == Element.ALIGN_JUSTIFIED || align == Element.ALIGN_JUSTIFIED_ALL;
    }

    /**
     * The lines of a paragraph {@code width} points wide whose first line begins at
     * {@code firstIndent}; {@code tabs} are the tab stops the null runs stand for, in order.
     */
    static List<Line> lines(Fonts fonts, List<Run> runs, List<Run> right, List<Float> tabs, float width, float firstIndent,
                            Run marker, float markerWidth, int align) {
        LineBreaker b = new LineBreaker(fonts, width, align);
        b.x = firstIndent;
        if (marker != null) {
            float w = fonts.width(marker.style(), marker.text());
            b.append(marker.text(), marker.style(), w);
            b.x = firstIndent + Math.max(w + 1, markerWidth);
        }
        int t = 0;
        for (Run r : runs) {
            if (r.text() == null) {
                b.flushWord();
                b.dropSpace();
                b.x = Math.max(b.x + 1, tabs.get(t++));
                continue;
            }
            b.text(r.text(), r.style());
        }
        b.flushWord();
        b.dropSpace();
        b.right(right);
        b.endLine(true);
        return List.copyOf(b.lines);
    }

    private void text(String text, Style s) {
        int from = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c != ' ' && c != '\n') continue;
            if (i > from) piece(text.substring(from, i), s);
            from = i + 1;
            flushWord();
            if (c == '\n') {
                dropSpace();
                endLine(true);
            } else {
                // Runs of spaces count once, except in pre-formatted text.
                float space = fonts.width(s, " ");
                if (!s.pre) dropSpace();
                pendingSpace.append(' ');
                pendingSpaceStyle = s;
                pendingSpaceWidth += space;
            }
        }
        if (from < text.length()) piece(from == 0 ? text : text.substring(from), s);
    }

    /** Part of a word in one style, with its width. */
    private record Piece(String text, Style style, float width) {}

    private void piece(String text, Style s) {
        Piece p = new Piece(text, s, fonts.width(s, text));
        word.add(p);
        wordWidth += p.width();
    }

    private boolean lineHasContent() {
        return !line.isEmpty();
    }

    private void flushWord() {
        if (word.isEmpty()) return;
        if (lineHasContent() && x + pendingSpaceWidth + wordWidth > width) {
            dropSpace();
            endLine(false);
        }
        boolean gap = pendingSpace.length() > 0;
        if (gap) {
            if (justify) {
                x += pendingSpaceWidth;
            } else {
                append(pendingSpace.toString(), pendingSpaceStyle, pendingSpaceWidth);
            }
            dropSpace();
        }
        if (x + wordWidth > width && wordWidth > width) {
            for (Piece r : word) {
                String text = r.text();
                for (int i = 0; i < text.length(); i = text.offsetByCodePoints(i, 1)) {
                    String ch = text.substring(i, text.offsetByCodePoints(i, 1));
                    float w = fonts.width(r.style(), ch);
                    if (lineHasContent() && x + w > width) endLine(false);
                    append(ch, r.style(), w);
                }
            }
        } else {
            boolean first = true;
            for (Piece r : word) {
                if (first && justify && gap) startFragment(r.text(), r.style(), r.width(), true);
                else append(r.text(), r.style(), r.width());
                first = false;
            }
        }
        word.clear();
        wordWidth = 0;
    }

    private void dropSpace() {
        pendingSpace.setLength(0);
        pendingSpaceStyle = null;
        pendingSpaceWidth = 0;
    }

    /** Adds text at the current position, joining the previous fragment where it continues it in the same style. */
    private void append(String text, Style s, float w) {
        if (!line.isEmpty()) {
            Fragment last = line.get(line.size() - 1);
            float lastWidth = joining ? joinedWidth : last.width();
            if (last.style() == s && Math.abs(last.x() + lastWidth - x) < 0.001f) {
                joined.append(text);
                joinedWidth = lastWidth + w;
                joining = true;
                x += w;
                return;
            }
        }
        startFragment(text, s, w, false);
    }

    /** Writes the joined text into the line's last fragment. */
    private void closeFragment() {
        if (!joining) return;
        int i = line.size() - 1;
        Fragment last = line.get(i);
        line.set(i, new Fragment(last.x(), last.text() + joined, last.style(), joinedWidth));
        joined.setLength(0);
        joining = false;
    }

    private void startFragment(String text, Style s, float w, boolean gap) {
        closeFragment();
        line.add(new Fragment(x, text, s, w));
        gapBefore.add(gap);
        x += w;
    }

    private void right(List<Run> right) {
        float w = 0;
        for (Run r : right) if (r.text() != null) w += fonts.width(r.style(), r.text());
        if (w == 0) return;
        closeFragment();
        if (lineHasContent() && x + w + FLOAT_GAP > width) endLine(false);
        float end = width == Float.MAX_VALUE ? x + FLOAT_GAP + w : width;
        alignLine(false);
        float at = end - w;
        for (Run r : right) {
            if (r.text() == null) continue;
            float rw = fonts.width(r.style(), r.text());
            line.add(new Fragment(at, r.text(), r.style(), rw));
            gapBefore.add(false);
            at += rw;
        }
        lines.add(new Line(List.copyOf(line)));
        line = new ArrayList<>();
        gapBefore = new ArrayList<>();
        x = 0;
        aligned = true;
    }

    /** Set when the right float has closed the last line already. */
    private boolean aligned;

    private void endLine(boolean last) {
        closeFragment();
        if (aligned) {
            aligned = false;
            return;
        }
        alignLine(!last);
        lines.add(new Line(List.copyOf(line)));
        line = new ArrayList<>();
        gapBefore = new ArrayList<>();
        x = 0;
    }

    /** Shifts the current line's fragments for right, centred or (on lines that wrap) justified alignment. */
    private void alignLine(boolean wraps) {
        if (line.isEmpty() || width == Float.MAX_VALUE) return;
        Fragment lastFragment = line.get(line.size() - 1);
        float slack = width - (lastFragment.x() + lastFragment.width());
        if (slack <= 0) return;
        if (align == Element.ALIGN_RIGHT || align == Element.ALIGN_CENTER) {
            float dx = align == Element.ALIGN_RIGHT ? slack : slack / 2;
            line.replaceAll(f -> new Fragment(f.x() + dx, f.text(), f.style(), f.width()));
        } else if (justify && (wraps || align == Element.ALIGN_JUSTIFIED_ALL)) {
            int gaps = 0;
            for (Boolean g : gapBefore) if (g) gaps++;
            if (gaps == 0) return;
            float each = slack / gaps;
            float dx = 0;
            for (int i = 0; i < line.size(); i++) {
                if (gapBefore.get(i)) dx += each;
                Fragment f = line.get(i);
                line.set(i, new Fragment(f.x() + dx, f.text(), f.style(), f.width()));
            }
        }
    }
}
