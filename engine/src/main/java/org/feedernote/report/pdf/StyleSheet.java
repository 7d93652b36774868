package org.feedernote.report.pdf;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The part of CSS the note's typesetter understands: rules whose selectors are type, class and
 * type.class compounds joined by descendant combinators (comma groups allowed), ordered by
 * specificity and then by source order, plus the page margins of {@code @page}. Pseudo-elements
 * and other at-rules are skipped; unknown properties are kept and ignored by the typesetter.
 */
public final class StyleSheet {

    /** One compound selector: an optional element name and any number of classes. */
    record Compound(String tag, List<String> classes) {
        boolean matches(String elementTag, String classAttribute) {
            if (tag != null && !tag.equals(elementTag)) return false;
            for (String c : classes) if (!hasClass(classAttribute, c)) return false;
            return true;
        }
    }

    /** A rule: the compounds from the outermost ancestor to the element, and its declarations. */
    record Rule(List<Compound> selector, Map<String, String> declarations, int specificity, int order) {}

    private final List<Rule> rules;
    private final Map<String, String> page;

    private StyleSheet(List<Rule> rules, Map<String, String> page) {
        this.rules = rules;
        this.page = page;
    }

    List<Rule> rules() {
        return rules;
    }

    /** Declarations of the {@code @page} rule (its margin boxes are not read). */
    public Map<String, String> page() {
        return page;
    }

    static boolean hasClass(String classAttribute, String name) {
        if (classAttribute == null || classAttribute.isEmpty()) return false;
        int from = 0;
        int n = name.length();
        while (true) {
            int i = classAttribute.indexOf(name, from);
            if (i < 0) return false;
            boolean startOk = i == 0 || classAttribute.charAt(i - 1) == ' ';
            boolean endOk = i + n == classAttribute.length() || classAttribute.charAt(i + n) == ' ';
            if (startOk && endOk) return true;
            from = i + 1;
        }
    }

    public static StyleSheet parse(String css) {
        String text = css.replaceAll("(?s)/\\*.*?\\*/", " ");
        List<Rule> rules = new ArrayList<>();
        Map<String, String> page = new LinkedHashMap<>();
        int i = 0;
        int order = 0;
        while (i < text.length()) {
            int open = text.indexOf('{', i);
            if (open < 0) break;
            String prelude = text.substring(i, open).trim();
            int close = matchingBrace(text, open);
            String body = text.substring(open + 1, close);
            i = close + 1;
            if (prelude.startsWith("@page")) {
                page.putAll(declarations(body.replaceAll("(?s)@[a-z-]+\\s*\\{[^}]*\\}", " ")));
                continue;
            }
            if (prelude.startsWith("@")) continue;
            Map<String, String> decls = declarations(body);
            for (String group : prelude.split(",")) {
                List<Compound> selector = selector(group.trim());
                if (selector == null) continue;
                int specificity = 0;
                for (Compound c : selector) specificity += c.classes().size() * 10 + (c.tag() == null ? 0 : 1);
                rules.add(new Rule(selector, decls, specificity, order++));
            }
        }
        rules.sort((a, b) -> a.specificity() != b.specificity() ? Integer.compare(a.specificity(), b.specificity())
                : Integer.compare(a.order(), b.order()));
        return new StyleSheet(List.copyOf(rules), page);
    }

    private static int matchingBrace(String text, int open) {
        int depth = 0;
        for (int k = open; k < text.length(); k++) {
            char c = text.charAt(k);
            if (c == '{') depth++;
            else if (c == '}' && --depth == 0) return k;
        }
        return text.length() - 1;
    }

    /** The compounds of a selector, or null where it uses something this subset does not read. */
    private static List<Compound> selector(String text) {
        if (text.isEmpty() || text.contains(":") || text.contains(">") || text.contains("+") || text.contains("[")) return null;
        List<Compound> out = new ArrayList<>();
        for (String part : text.split("\\s+")) {
            String[] pieces = part.split("\\.", -1);
            String tag = pieces[0].isEmpty() || pieces[0].equals("*") ? null : pieces[0].toLowerCase(Locale.ROOT);
            List<String> classes = new ArrayList<>();
            for (int k = 1; k < pieces.length; k++) if (!pieces[k].isEmpty()) classes.add(pieces[k]);
            out.add(new Compound(tag, List.copyOf(classes)));
        }
        return List.copyOf(out);
    }

    /** Parses "a: b; c: d" into an ordered map (later declarations win). */
    public static Map<String, String> declarations(String body) {
        Map<String, String> out = new LinkedHashMap<>();
        for (String decl : body.split(";")) {
            int colon = decl.indexOf(':');
            if (colon < 0) continue;
            String name = decl.substring(0, colon).trim().toLowerCase(Locale.ROOT);
            String value = decl.substring(colon + 1).trim();
            if (!name.isEmpty() && !value.isEmpty()) out.put(name, value);
        }
        return out;
    }
}
