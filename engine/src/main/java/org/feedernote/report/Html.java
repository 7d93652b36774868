package org.feedernote.report;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Safe markup for the note: every piece of text is escaped first; only then are symbol
 * subscripts (I_b → I<sub>b</sub>) marked up. Nothing from an input can inject markup.
 */
public final class Html {
    /**
     * A symbol with a subscript: a base of one or two letters (I, ΔU, θ) standing alone, then '_'
     * and the subscript. Key paths such as length_m or basis.voltage_drop_method are left as
     * they are because their base is part of a longer word.
     */
    private static final Pattern SUBSCRIPT =
            Pattern.compile("(?<![\\p{L}\\p{N}_.\\[\\]])(\\p{L}{1,2}′?)_([\\p{L}\\p{N}]+(?:,[\\p{L}\\p{N}]+)*)");

    private Html() {}

    public static String escape(String text) {
        StringBuilder b = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '<': b.append("&lt;"); break;
                case '>': b.append("&gt;"); break;
                case '&': b.append("&amp;"); break;
                case '"': b.append("&quot;"); break;
                case '\'': b.append("&#39;"); break;
                default:
                    if (c < 0x20 && c != '\n' && c != '\t') b.append(' ');
                    else b.append(c);
            }
        }
        return b.toString();
    }

    /** Escaped text with subscripts marked up. */
    public static String math(String text) {
        String escaped = escape(text);
        if (escaped.indexOf('_') < 0) return escaped;
        Matcher m = SUBSCRIPT.matcher(escaped);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(b, Matcher.quoteReplacement(m.group(1) + "<sub>" + m.group(2) + "</sub>"));
        }
        m.appendTail(b);
        return b.toString();
    }

    /**
     * Like {@link #math(String)}, but the given words (the installation's ids that hold an
     * underscore, such as DB_1) are only escaped: an id is printed as written, never as a symbol
     * with a subscript. The longest word wins where two begin at the same place.
     */
    public static String math(String text, java.util.List<String> verbatim) {
        if (verbatim.isEmpty() || text.indexOf('_') < 0) return math(text);
        StringBuilder b = new StringBuilder();
        int from = 0;
        while (true) {
            int at = -1;
            String word = null;
            for (String w : verbatim) {
                int k = text.indexOf(w, from);
                if (k >= 0 && (at < 0 || k < at || (k == at && w.length() > word.length()))) {
                    at = k;
                    word = w;
                }
            }
            if (at < 0) break;
            b.append(math(text.substring(from, at))).append(escape(word));
            from = at + word.length();
        }
        return b.append(math(text.substring(from))).toString();
    }
}
