package org.feedernote.report.pdf;

import java.awt.Color;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The computed style of one element: font, colour, line height and alignment are inherited from
 * the parent; box properties (margins, padding, border, background, width, page breaks) are the
 * element's own. Lengths are in points. Instances are shared: {@link Resolver} returns the same
 * object for the same ancestry, tag, class and inline style.
 */
public final class Style {
    public static final float MM = 72f / 25.4f;

    // inherited
    final boolean mono;
    final boolean bold;
    final boolean italic;
    final boolean underline;
    final float fontSize;
    final Color color;
    final float lineHeight;
    final int align;
    final boolean pre;
    // the element's own
    final float marginTop, marginRight, marginBottom, marginLeft;
    final float paddingTop, paddingRight, paddingBottom, paddingLeft;
    final float textIndent;
    final float borderWidth;
    final Color borderColor;
    final Color background;
    /** A rule under the element (border-bottom), drawn for blocks of text. */
    final float ruleWidth;
    final Color ruleColor;
    final boolean breakBefore, breakAfterAvoid, breakInsideAvoid;
    /** Width in points, or a negative number: minus the percentage (-100 for 100 %); 0 where not given. */
    final float width;
    final float height;
    final boolean hidden;
    final boolean inlineBlock;
    final boolean floatRight;
    final float rise;
    final int verticalAlign;

    private Style(Style parent, Map<String, String> d) {
        float parentSize = parent == null ? 10f : parent.fontSize;
        String family = d.get("font-family");
        mono = family != null ? family.toLowerCase(Locale.ROOT).contains("mono") : parent != null && parent.mono;
        String weight = d.get("font-weight");
        bold = weight != null ? weight.equals("bold") || weight.startsWith("7") || weight.startsWith("8") || weight.startsWith("9")
                : parent != null && parent.bold;
        String fontStyle = d.get("font-style");
        italic = fontStyle != null ? fontStyle.equals("italic") || fontStyle.equals("oblique") : parent != null && parent.italic;
        String decoration = d.get("text-decoration");
        underline = decoration != null ? decoration.contains("underline") : parent != null && parent.underline;
        String size = d.get("font-size");
        fontSize = size != null ? length(size, parentSize, parentSize) : parentSize;
        String c = d.containsKey("color") ? d.get("color") : null;
        color = c != null ? color(c, Color.BLACK) : parent == null ? Color.BLACK : parent.color;
        String lh = d.get("line-height");
        lineHeight = lh != null ? lineHeightFactor(lh, fontSize) : parent == null ? 1.2f : parent.lineHeight;
        String ta = d.get("text-align");
        align = ta != null ? alignment(ta) : parent == null ? com.lowagie.text.Element.ALIGN_LEFT : parent.align;
        String ws = d.get("white-space");
        pre = ws != null ? ws.startsWith("pre") : parent != null && parent.pre;

        float[] margin = box(d, "margin", fontSize);
        marginTop = margin[0]; marginRight = margin[1]; marginBottom = margin[2]; marginLeft = margin[3];
        float[] padding = box(d, "padding", fontSize);
        paddingTop = padding[0]; paddingRight = padding[1]; paddingBottom = padding[2]; paddingLeft = padding[3];
        textIndent = d.containsKey("text-indent") ? length(d.get("text-indent"), fontSize, 0) : 0;
        float bw = 0;
        Color bc = Color.BLACK;
        String border = d.get("border");
        if (border != null && !border.equals("none") && !border.equals("0")) {
            for (String token : border.split("\\s+")) {
                if (Character.isDigit(token.charAt(0)) || token.charAt(0) == '.') bw = length(token, fontSize, 0);
                else if (token.startsWith("#")) bc = color(token, Color.BLACK);
            }
            if (bw == 0) bw = 0.75f;
        }
        borderWidth = bw;
        borderColor = bc;
        float rw = 0;
        Color rc = Color.BLACK;
        String rule = d.get("border-bottom");
        if (rule != null && !rule.equals("none")) {
            for (String token : rule.split("\\s+")) {
                if (Character.isDigit(token.charAt(0)) || token.charAt(0) == '.') rw = length(token, fontSize, 0);
                else if (token.startsWith("#")) rc = color(token, Color.BLACK);
            }
        }
        ruleWidth = rw;
        ruleColor = rc;
        String bg = d.containsKey("background-color") ? d.get("background-color") : d.get("background");
        background = bg == null || bg.equals("none") || bg.equals("transparent") ? null : color(bg, null);
        breakBefore = "always".equals(d.get("page-break-before"));
        breakAfterAvoid = "avoid".equals(d.get("page-break-after"));
        breakInsideAvoid = "avoid".equals(d.get("page-break-inside"));
        String w = d.get("width");
        width = w == null ? 0 : w.endsWith("%") ? -Float.parseFloat(w.substring(0, w.length() - 1)) : length(w, fontSize, 0);
        String h = d.get("height");
        height = h == null || h.endsWith("%") ? 0 : length(h, fontSize, 0);
        hidden = "none".equals(d.get("display"));
        inlineBlock = "inline-block".equals(d.get("display"));
        floatRight = "right".equals(d.get("float"));
        String va = d.getOrDefault("vertical-align", "");
        rise = va.equals("sub") ? -0.3f * parentSize : va.equals("super") ? 0.35f * parentSize : 0;
        verticalAlign = va.equals("middle") ? com.lowagie.text.Element.ALIGN_MIDDLE
                : va.equals("bottom") ? com.lowagie.text.Element.ALIGN_BOTTOM : com.lowagie.text.Element.ALIGN_TOP;
    }

    static Style root(Map<String, String> declarations) {
        return new Style(null, declarations);
    }

    public float fontSize() {
        return fontSize;
    }

    public Color color() {
        return color;
    }

    /** A CSS length (mm, cm, pt, px) in points. */
    public static float points(String value) {
        return length(value, 10, 0);
    }

    /** The leading of a line of this element's text. */
    float leading() {
        return fontSize * lineHeight;
    }

    boolean boxed() {
        return borderWidth > 0 || background != null;
    }

    static float length(String value, float fontSize, float percentOf) {
        String v = value.trim().toLowerCase(Locale.ROOT);
        try {
            if (v.endsWith("mm")) return Float.parseFloat(v.substring(0, v.length() - 2)) * MM;
            if (v.endsWith("cm")) return Float.parseFloat(v.substring(0, v.length() - 2)) * MM * 10;
            if (v.endsWith("pt")) return Float.parseFloat(v.substring(0, v.length() - 2));
            if (v.endsWith("px")) return Float.parseFloat(v.substring(0, v.length() - 2)) * 0.75f;
            if (v.endsWith("em")) return Float.parseFloat(v.substring(0, v.length() - 2)) * fontSize;
            if (v.endsWith("%")) return Float.parseFloat(v.substring(0, v.length() - 1)) / 100f * percentOf;
            if (v.equals("auto")) return 0;
            return Float.parseFloat(v);
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    private static float lineHeightFactor(String value, float fontSize) {
        String v = value.trim();
        if (v.equals("normal")) return 1.2f;
        if (Character.isLetter(v.charAt(v.length() - 1)) || v.endsWith("%")) return length(v, fontSize, fontSize) / fontSize;
        return length(v, fontSize, 1);
    }

    /** margin: / padding: shorthand (1 to 4 values) with the -top/-right/-bottom/-left longhands on top. */
    private static float[] box(Map<String, String> d, String property, float fontSize) {
        float[] out = new float[4];
        String shorthand = d.get(property);
        if (shorthand != null) {
            String[] v = shorthand.trim().split("\\s+");
            float[] l = new float[v.length];
            for (int i = 0; i < v.length; i++) l[i] = length(v[i], fontSize, 0);
            switch (v.length) {
                case 1 -> { out[0] = l[0]; out[1] = l[0]; out[2] = l[0]; out[3] = l[0]; }
                case 2 -> { out[0] = l[0]; out[2] = l[0]; out[1] = l[1]; out[3] = l[1]; }
                case 3 -> { out[0] = l[0]; out[1] = l[1]; out[3] = l[1]; out[2] = l[2]; }
                default -> { out[0] = l[0]; out[1] = l[1]; out[2] = l[2]; out[3] = l[3]; }
            }
        }
        String[] sides = {"top", "right", "bottom", "left"};
        for (int i = 0; i < 4; i++) {
            String v = d.get(property + "-" + sides[i]);
            if (v != null) out[i] = length(v, fontSize, 0);
        }
        return out;
    }

    static Color color(String value, Color fallback) {
        String v = value.trim().toLowerCase(Locale.ROOT);
        try {
            if (v.startsWith("#") && v.length() == 7) return new Color(Integer.parseInt(v.substring(1), 16));
            if (v.startsWith("#") && v.length() == 4) {
                int r = Integer.parseInt(v.substring(1, 2), 16), g = Integer.parseInt(v.substring(2, 3), 16),
                        b = Integer.parseInt(v.substring(3, 4), 16);
                return new Color(r * 17, g * 17, b * 17);
            }
        } catch (NumberFormatException e) {
            return fallback;
        }
        return switch (v) {
            case "black" -> Color.BLACK;
            case "white" -> Color.WHITE;
            case "gray", "grey" -> Color.GRAY;
            default -> fallback;
        };
    }

    private static int alignment(String value) {
        return switch (value.trim()) {
            case "right" -> com.lowagie.text.Element.ALIGN_RIGHT;
            case "center" -> com.lowagie.text.Element.ALIGN_CENTER;
            case "justify" -> com.lowagie.text.Element.ALIGN_JUSTIFIED;
            default -> com.lowagie.text.Element.ALIGN_LEFT;
        };
    }

    /**
     * Computes styles against a style sheet. A style is cached per (parent style, tag, class,
     * inline style): the parent style stands for the whole ancestry, so descendant selectors
     * stay correct.
     */
    public static final class Resolver {
        private final StyleSheet sheet;
        private final Map<Key, Style> cache = new java.util.concurrent.ConcurrentHashMap<>();
        private final Style root;

        private record Key(Style parent, String tag, String classes, String inline) {}

        public Resolver(StyleSheet sheet) {
            this.sheet = sheet;
            this.root = Style.root(Map.of());
        }

        public Style root() {
            return root;
        }

        /**
         * @param parent    the style this resolver gave the parent element (it stands for the whole
         *                  ancestry in the cache key, so it must be the parent's own style)
         * @param ancestors tag and class of each ancestor, outermost first, ending with the parent
         */
        Style resolve(Style parent, List<String[]> ancestors, String tag, String classes, String inline) {
            Key key = new Key(parent, tag, classes == null ? "" : classes, inline == null ? "" : inline);
            Style cached = cache.get(key);
            if (cached != null) return cached;
            Map<String, String> d = new java.util.LinkedHashMap<>();
            for (StyleSheet.Rule rule : sheet.rules()) {
                if (matches(rule.selector(), ancestors, tag, key.classes())) d.putAll(rule.declarations());
            }
            if (!key.inline().isEmpty()) d.putAll(StyleSheet.declarations(key.inline()));
            Style s = new Style(parent, d);
            // One instance per key whichever thread comes first: runs of text compare styles by identity.
            Style first = cache.putIfAbsent(key, s);
            return first != null ? first : s;
        }

        private static boolean matches(List<StyleSheet.Compound> selector, List<String[]> ancestors, String tag, String classes) {
            int last = selector.size() - 1;
            if (!selector.get(last).matches(tag, classes)) return false;
            int a = ancestors.size() - 1;
            for (int k = last - 1; k >= 0; k--) {
                StyleSheet.Compound c = selector.get(k);
                while (a >= 0 && !c.matches(ancestors.get(a)[0], ancestors.get(a)[1])) a--;
                if (a < 0) return false;
                a--;
            }
            return true;
        }
    }
}
