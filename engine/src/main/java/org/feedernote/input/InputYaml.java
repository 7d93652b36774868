package org.feedernote.input;

import java.math.BigDecimal;

import com.fasterxml.jackson.core.io.JsonStringEncoder;

/**
 * A design input tree written as YAML, keys in the tree's order: texts in double quotes (so no
 * text is read back as a number or a word of YAML's), numbers in their shortest exact form. The
 * YAML reads back to the same canonical input.
 */
public final class InputYaml {
    private InputYaml() {}

    public static String write(Node root) {
        StringBuilder b = new StringBuilder(4096);
        if (root instanceof Node.Obj o && !o.entries().isEmpty()) entries(o, 0, false, b);
        else b.append(flow(root)).append('\n');
        return b.toString();
    }

    private static void entries(Node.Obj o, int indent, boolean firstInline, StringBuilder b) {
        boolean first = true;
        for (Node.Entry e : o.entries().values()) {
            if (!(first && firstInline)) b.append(" ".repeat(indent));
            first = false;
            b.append(key(e.key())).append(':');
            Node v = e.value();
            if (v instanceof Node.Obj child && !child.entries().isEmpty()) {
                b.append('\n');
                entries(child, indent + 2, false, b);
            } else if (v instanceof Node.Arr arr && !arr.items().isEmpty()) {
                b.append('\n');
                for (Node item : arr.items()) {
                    b.append(" ".repeat(indent + 2)).append("- ");
                    if (item instanceof Node.Obj io && !io.entries().isEmpty()) entries(io, indent + 4, true, b);
                    else b.append(flow(item)).append('\n');
                }
            } else {
                b.append(' ').append(flow(v)).append('\n');
            }
        }
    }

    /** A key as it is, where it is a plain word ([A-Za-z_][A-Za-z0-9_]*); otherwise quoted. */
    private static String key(String k) {
        return plainWord(k) ? k : quote(k);
    }

    private static boolean plainWord(String k) {
        if (k.isEmpty()) return false;
        for (int i = 0; i < k.length(); i++) {
            char c = k.charAt(i);
            boolean letter = (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || c == '_';
            if (!letter && !(i > 0 && c >= '0' && c <= '9')) return false;
        }
        return true;
    }

    private static String flow(Node n) {
        if (n instanceof Node.Obj o) {
            StringBuilder b = new StringBuilder("{");
            for (Node.Entry e : o.entries().values()) {
                if (b.length() > 1) b.append(", ");
                b.append(key(e.key())).append(": ").append(flow(e.value()));
            }
            return b.append('}').toString();
        }
        if (n instanceof Node.Arr a) {
            StringBuilder b = new StringBuilder("[");
            for (Node item : a.items()) {
                if (b.length() > 1) b.append(", ");
                b.append(flow(item));
            }
            return b.append(']').toString();
        }
        Object v = ((Node.Scalar) n).value();
        if (v == null) return "null";
        if (v instanceof Boolean bo) return bo.toString();
        if (v instanceof Long l) return l.toString();
        if (v instanceof Double d) {
            if (d.isNaN()) return ".nan";
            if (d.isInfinite()) return d > 0 ? ".inf" : "-.inf";
            String plain = new BigDecimal(Double.toString(d)).stripTrailingZeros().toPlainString();
            // A whole number stays a float in the YAML only where it was one; the canonical form is the same.
            return plain;
        }
        return quote(v.toString());
    }

    private static String quote(String s) {
        return "\"" + new String(JsonStringEncoder.getInstance().quoteAsString(s)) + "\"";
    }
}
