package org.feedernote.input;

import java.util.ArrayList;
import java.util.List;

/**
 * The design input laid out as spreadsheet columns, from {@link InputSchema} alone: a sheet of
 * key/value rows for the project, basis and supply, and a sheet each of boards and circuits with a
 * column per key in its dotted form ({@code cable.size_mm2}). The reader, the template and the
 * converted workbooks all take their keys from here, so none can drift from the format.
 */
public final class SheetColumns {
    private SheetColumns() {}

    public static final String PROJECT = "project";
    public static final String BOARDS = "boards";
    public static final String CIRCUITS = "circuits";

    /**
     * One key as a column (or, on the project sheet, a row). required: the key must be given
     * wherever its mapping is; defaultText: what applies when it is left blank.
     */
    public record Column(String key, Spec spec, boolean required, String defaultText) {
        public String meaning() {
            return spec.description();
        }

        /** The unit, from the key's suffix (the format's convention), or the kind of value. */
        public String unit() {
            return unitOf(key, spec);
        }

        /** The closed set of spellings this key accepts (words, standard sizes and 'auto'), or empty. */
        public List<String> choices() {
            List<String> out = new ArrayList<>();
            if (spec instanceof Spec.Str s) out.addAll(s.allowed());
            if (spec instanceof Spec.Num n && !n.allowed().isEmpty()) {
                for (double d : n.allowed()) out.add(StructureValidator.num(d));
                if (n.auto()) out.add("auto");
            }
            return out;
        }

        /** A column comment: what the key is, whether it is required, its default and what it accepts. */
        public String describe() {
            StringBuilder b = new StringBuilder(key).append(": ").append(meaning()).append('.');
            b.append(required ? " Required." : " Optional; blank means: " + (defaultText == null ? "not given" : defaultText) + ".");
            if (spec instanceof Spec.Num n) b.append(" Expected: ").append(StructureValidator.expected(n)).append('.');
            else if (spec instanceof Spec.Str s) b.append(" Expected: ").append(StructureValidator.expected(s)).append('.');
            else if (spec instanceof Spec.Date) b.append(" Expected: a date YYYY-MM-DD.");
            return b.toString();
        }
    }

    private static final String[][] SUFFIXES = {
            {"_mm2", "mm²"}, {"_kmw", "K·m/W"}, {"_a2s", "A²s"}, {"_percent", "%"}, {"_ohm", "Ω"}, {"_kva", "kVA"},
            {"_mva", "MVA"}, {"_kw", "kW"}, {"_ka", "kA"}, {"_hz", "Hz"}, {"_mm", "mm"}, {"_m", "m"}, {"_a", "A"},
            {"_v", "V"}, {"_c", "°C"}, {"_s", "s"}};

    static String unitOf(String key, Spec spec) {
        if (spec instanceof Spec.Date) return "YYYY-MM-DD";
        if (spec instanceof Spec.Str s) return s.allowed().isEmpty() ? (s.pattern() != null ? "id" : "text") : "word";
        String leaf = key.substring(key.lastIndexOf('.') + 1);
        for (String[] s : SUFFIXES) if (leaf.endsWith(s[0])) return s[1];
        return "number";
    }

    public static List<Column> boards() {
        return rowColumns(BOARDS);
    }

    public static List<Column> circuits() {
        return rowColumns(CIRCUITS);
    }

    private static List<Column> rowColumns(String list) {
        Spec.Arr arr = (Spec.Arr) InputSchema.ROOT.field(list).spec();
        List<Column> out = new ArrayList<>();
        flatten("", (Spec.Obj) arr.item(), true, out, -1);
        return out;
    }

    /**
     * The rows of the project sheet: every key outside the boards and circuits, a list's items
     * numbered from 0 ({@code project.revisions[0].date}); revisions gives how many items to list.
     */
    public static List<Column> settings(int revisions) {
        List<Column> out = new ArrayList<>();
        for (Spec.Field f : InputSchema.ROOT.fields()) {
            if (f.name().equals(BOARDS) || f.name().equals(CIRCUITS)) continue;
            field("", f, true, out, revisions);
        }
        return out;
    }

    private static void flatten(String prefix, Spec.Obj obj, boolean required, List<Column> out, int items) {
        for (Spec.Field f : obj.fields()) field(prefix, f, required, out, items);
    }

    private static void field(String prefix, Spec.Field f, boolean required, List<Column> out, int items) {
        String key = prefix + f.name();
        boolean req = required && f.required();
        Spec spec = f.spec();
        if (spec instanceof Spec.Obj o) {
            flatten(key + ".", o, req, out, items);
        } else if (spec instanceof Spec.Map m) {
            for (String k : m.keys()) out.add(new Column(key + "." + k, m.value(), false, f.defaultText()));
        } else if (spec instanceof Spec.Arr a) {
            for (int i = 0; i < items; i++) {
                if (a.item() instanceof Spec.Obj o) flatten(key + "[" + i + "].", o, false, out, items);
                else out.add(new Column(key + "[" + i + "]", a.item(), false, f.defaultText()));
            }
        } else {
            out.add(new Column(key, spec, req, f.defaultText()));
        }
    }

    /** The spec of a dotted key ({@code supply.source.transformer.rating_kva}, {@code project.revisions[2].date}), or null. */
    public static Spec specAt(Spec start, String dotted) {
        Spec at = start;
        for (String part : dotted.split("\\.", -1)) {
            String name = part;
            int bracket = part.indexOf('[');
            if (bracket >= 0) name = part.substring(0, bracket);
            at = child(at, name);
            if (bracket >= 0) at = at instanceof Spec.Arr a ? a.item() : null;
            if (at == null) return null;
        }
        return at;
    }

    private static Spec child(Spec at, String name) {
        if (at instanceof Spec.Obj o) {
            Spec.Field f = o.field(name);
            return f == null ? null : f.spec();
        }
        if (at instanceof Spec.Map m) return m.keys().contains(name) ? m.value() : null;
        return null;
    }

    /** The spec of a row's item (a board or a circuit). */
    static Spec.Obj rowSpec(String list) {
        return (Spec.Obj) ((Spec.Arr) InputSchema.ROOT.field(list).spec()).item();
    }
}
