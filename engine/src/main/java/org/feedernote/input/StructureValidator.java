package org.feedernote.input;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/** Checks a {@link Node} tree against a {@link Spec}; collects every error, never stops at the first. */
final class StructureValidator {
    private final String file;
    private final List<InputError> errors;

    StructureValidator(String file, List<InputError> errors) {
        this.file = file;
        this.errors = errors;
    }

    /**
     * A key path built only when an error needs it: validating a large input touches hundreds of
     * thousands of values, almost all of them valid.
     */
    private record Path(Path parent, String key, int index, String root) {
        static Path of(String root) {
            return new Path(null, null, -1, root);
        }

        Path key(String k) {
            return new Path(this, k, -1, null);
        }

        Path index(int i) {
            return new Path(this, null, i, null);
        }

        @Override public String toString() {
            if (parent == null) return root;
            String p = parent.toString();
            if (key == null) return p + "[" + index + "]";
            return p.isEmpty() ? key : p + "." + key;
        }
    }

    private final java.util.Map<Spec.Obj, java.util.Map<String, Spec.Field>> fields = new java.util.IdentityHashMap<>();
    private final java.util.Map<String, Pattern> patterns = new java.util.HashMap<>();

    void check(Node node, Spec spec, String path) {
        check(node, spec, Path.of(path));
    }

    private void check(Node node, Spec spec, Path path) {
        if (spec instanceof Spec.Obj obj) checkObj(node, obj, path);
        else if (spec instanceof Spec.Map map) checkMap(node, map, path);
        else if (spec instanceof Spec.Arr arr) checkArr(node, arr, path);
        else if (spec instanceof Spec.Str str) checkStr(node, str, path);
        else if (spec instanceof Spec.Num num) checkNum(node, num, path);
        else if (spec instanceof Spec.Date date) checkDate(node, date, path);
    }

    private static final String DATE_EXPECTED = "a date YYYY-MM-DD";

    private void checkDate(Node node, Spec.Date spec, Path path) {
        if (!(node instanceof Node.Scalar s) || !(s.value() instanceof String text)) {
            error(node.pos(), path, "expected " + DATE_EXPECTED + " (" + spec.description() + "), found " + describe(node));
            return;
        }
        if (!patterns.computeIfAbsent(Spec.Date.PATTERN, Pattern::compile).matcher(text).matches()) {
            error(node.pos(), path, "expected " + DATE_EXPECTED + " (" + spec.description() + "), found '" + text + "'");
            return;
        }
        try {
            java.time.LocalDate.parse(text, java.time.format.DateTimeFormatter.ofPattern("uuuu-MM-dd")
                    .withResolverStyle(java.time.format.ResolverStyle.STRICT));
        } catch (java.time.format.DateTimeParseException e) {
            java.time.YearMonth month = java.time.YearMonth.parse(text.substring(0, 7));
            error(node.pos(), path, "expected a date that exists, found '" + text + "': "
                    + month.getMonth().getDisplayName(java.time.format.TextStyle.FULL, Locale.ENGLISH) + " " + month.getYear()
                    + " has " + month.lengthOfMonth() + " days");
        }
    }

    private void error(Node.Pos pos, Path path, String message) {
        errors.add(new InputError(file, pos.line(), pos.column(), path.toString(), message));
    }

    private void checkObj(Node node, Spec.Obj spec, Path path) {
        if (!(node instanceof Node.Obj obj)) {
            error(node.pos(), path, "expected a mapping (" + spec.description() + "), found " + describe(node));
            return;
        }
        java.util.Map<String, Spec.Field> byName = fields.computeIfAbsent(spec, s -> {
            java.util.Map<String, Spec.Field> m = new java.util.HashMap<>();
            for (Spec.Field f : s.fields()) m.putIfAbsent(f.name(), f);
            return m;
        });
        // A misspelt key that stands for a missing one is one mistake, told once at the misspelling.
        java.util.Set<String> misspelt = null;
        for (Node.Entry e : obj.entries().values()) {
            Spec.Field f = byName.get(e.key());
            if (f == null) {
                List<String> names = spec.fields().stream().map(Spec.Field::name).toList();
                String meant = Suggest.nearest(e.key(), names);
                String need = meant == null || obj.entries().containsKey(meant) ? null : need(spec, byName.get(meant), obj.entries());
                if (need != null && (misspelt == null || !misspelt.contains(meant))) {
                    if (misspelt == null) misspelt = new java.util.HashSet<>();
                    misspelt.add(meant);
                    error(e.keyPos(), path.key(e.key()), "'" + e.key() + "' is not a key: did you mean '" + meant + "', which "
                            + need + "? (expected one of: " + String.join(", ", names) + ")");
                } else {
                    error(e.keyPos(), path.key(e.key()), "unknown key '" + e.key() + "'" + Suggest.hint(e.key(), names)
                            + "; expected one of: " + String.join(", ", names));
                }
            } else {
                check(e.value(), f.spec(), path.key(e.key()));
            }
        }
        for (Spec.Field f : spec.fields()) {
            if (f.required() && !obj.entries().containsKey(f.name()) && (misspelt == null || !misspelt.contains(f.name()))) {
                error(obj.pos(), path.key(f.name()), "missing required key '" + f.name() + "' (" + f.spec().description() + ")");
            }
        }
        for (List<String> group : spec.exactlyOne()) {
            List<String> present = new ArrayList<>(2);
            for (String key : group) if (obj.entries().containsKey(key)) present.add(key);
            if (present.isEmpty() && misspelt != null && group.stream().anyMatch(misspelt::contains)) continue;
            if (present.size() != 1) {
                error(obj.pos(), path, present.isEmpty()
                        ? "give exactly one of " + String.join(", ", group) + "; none is given"
                        : "give exactly one of " + String.join(", ", group) + "; found " + String.join(" and ", present));
            }
        }
    }

    /** Why a missing field is needed ("is required", "is required unless 'to' is given"), or null if it may be left out. */
    private static String need(Spec.Obj spec, Spec.Field field, java.util.Map<String, Node.Entry> given) {
        if (field == null) return null;
        if (field.required()) return "is required";
        for (List<String> group : spec.exactlyOne()) {
            if (group.contains(field.name()) && group.stream().noneMatch(given::containsKey)) {
                List<String> others = group.stream().filter(k -> !k.equals(field.name())).map(k -> "'" + k + "'").toList();
                return "is required unless " + String.join(" or ", others) + " is given";
            }
        }
        return null;
    }

    private void checkMap(Node node, Spec.Map spec, Path path) {
        if (!(node instanceof Node.Obj obj)) {
            error(node.pos(), path, "expected a mapping (" + spec.description() + "), found " + describe(node));
            return;
        }
        for (Node.Entry e : obj.entries().values()) {
            if (!spec.keys().contains(e.key())) {
                error(e.keyPos(), path.key(e.key()), "unknown key '" + e.key() + "'" + Suggest.hint(e.key(), spec.keys())
                        + "; expected one of: " + String.join(", ", spec.keys()));
            } else {
                check(e.value(), spec.value(), path.key(e.key()));
            }
        }
    }

    private void checkArr(Node node, Spec.Arr spec, Path path) {
        if (!(node instanceof Node.Arr arr)) {
            error(node.pos(), path, "expected a list (" + spec.description() + "), found " + describe(node));
            return;
        }
        if (arr.items().size() < spec.minItems()) {
            error(arr.pos(), path, "expected at least " + spec.minItems() + " item(s), found " + arr.items().size());
        }
        for (int i = 0; i < arr.items().size(); i++) check(arr.items().get(i), spec.item(), path.index(i));
    }

    private void checkStr(Node node, Spec.Str spec, Path path) {
        if (!(node instanceof Node.Scalar s) || s.value() == null || s.value() instanceof Boolean
                || (s.isNumber() && !spec.numbersAsText())) {
            error(node.pos(), path, "expected " + expected(spec) + ", found " + describe(node));
            return;
        }
        String text = s.value() instanceof String str ? str : s.describe();
        if (!spec.allowed().isEmpty() && !spec.allowed().contains(text)) {
            error(node.pos(), path, "expected " + expected(spec) + ", found '" + text + "'" + Suggest.hint(text, spec.allowed()));
            return;
        }
        if (spec.pattern() != null && !patterns.computeIfAbsent(spec.pattern(), Pattern::compile).matcher(text).matches()) {
            error(node.pos(), path, "expected " + spec.patternHint() + ", found '" + text + "'");
        }
    }

    private void checkNum(Node node, Spec.Num spec, Path path) {
        if (node instanceof Node.Scalar s && "auto".equals(s.value()) && spec.auto()) return;
        if (!(node instanceof Node.Scalar s) || !s.isNumber()) {
            String found = describe(node);
            String hint = node instanceof Node.Scalar sc && sc.value() instanceof String str && spec.auto()
                    ? Suggest.hint(str, List.of("auto")) : "";
            error(node.pos(), path, "expected " + expected(spec) + ", found " + found + hint);
            return;
        }
        double v = s.number();
        if (!Double.isFinite(v)) {
            // YAML's .inf and .nan, or a number beyond the largest double (1e400): never a quantity.
            error(node.pos(), path, "expected " + expected(spec) + ", found " + (Double.isNaN(v) ? "not-a-number (" + s.describe() + ")"
                    : "a number too large to hold (" + s.describe() + ")"));
            return;
        }
        if (spec.integer() && v != Math.rint(v)) {
            error(node.pos(), path, "expected a whole number, found " + s.describe());
            return;
        }
        if (!spec.allowed().isEmpty()) {
            if (spec.allowed().stream().noneMatch(a -> a == v)) {
                error(node.pos(), path, "expected " + expected(spec) + ", found " + s.describe() + nearestAllowed(spec.allowed(), v));
            }
            return;
        }
        if (spec.min() != null && (v < spec.min() || (spec.minExclusive() && v == spec.min()))
                || spec.max() != null && (v > spec.max() || (spec.maxExclusive() && v == spec.max()))) {
            error(node.pos(), path, "expected " + expected(spec) + ", found " + s.describe());
        }
    }

    private static String nearestAllowed(List<Double> allowed, double v) {
        Double below = null;
        Double above = null;
        for (double a : allowed) {
            if (a < v && (below == null || a > below)) below = a;
            if (a > v && (above == null || a < above)) above = a;
        }
        List<String> near = new ArrayList<>();
        if (below != null) near.add(num(below));
        if (above != null) near.add(num(above));
        return near.isEmpty() ? "" : " (nearest: " + String.join(" or ", near) + ")";
    }

    static String num(double d) {
        return d == Math.rint(d) ? Long.toString((long) d) : Double.toString(d);
    }

    static String expected(Spec.Str spec) {
        if (!spec.allowed().isEmpty()) {
            return "one of " + spec.allowed().stream().map(a -> "'" + a + "'").collect(Collectors.joining(", "));
        }
        if (spec.pattern() != null) return spec.patternHint();
        return "a text";
    }

    static String expected(Spec.Num spec) {
        String auto = spec.auto() ? " or 'auto'" : "";
        if (!spec.allowed().isEmpty()) {
            String list = spec.allowed().stream().map(StructureValidator::num).collect(Collectors.joining(", "));
            return (spec.allowedName() == null ? "one of " : spec.allowedName() + " (") + list + (spec.allowedName() == null ? "" : ")") + auto;
        }
        StringBuilder b = new StringBuilder(spec.integer() ? "a whole number" : "a number");
        if (spec.min() != null && spec.max() != null) {
            b.append(spec.minExclusive() ? " greater than " : " from ").append(num(spec.min()))
             .append(spec.maxExclusive() ? " and below " : (spec.minExclusive() ? " and at most " : " to ")).append(num(spec.max()));
        } else if (spec.min() != null) {
            b.append(spec.minExclusive() ? " greater than " : " of at least ").append(num(spec.min()));
        } else if (spec.max() != null) {
            b.append(spec.maxExclusive() ? " below " : " of at most ").append(num(spec.max()));
        }
        return b + auto;
    }

    static String describe(Node node) {
        if (node instanceof Node.Obj) return "a mapping";
        if (node instanceof Node.Arr) return "a list";
        Node.Scalar s = (Node.Scalar) node;
        if (s.value() == null) return "nothing (null)";
        if (s.value() instanceof Boolean b) return b.toString().toLowerCase(Locale.ROOT);
        return s.describe();
    }
}
