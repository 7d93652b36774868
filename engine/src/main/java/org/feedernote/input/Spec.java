package org.feedernote.input;

import java.util.List;

/**
 * A structural description of the design input. One description drives both the validation of
 * files and the JSON Schema that {@code feedernote schema} prints, so the two cannot disagree.
 */
public sealed interface Spec {

    String description();

    /** A mapping with named fields; unknown keys are errors. exactlyOne lists keys of which one must be given. */
    record Obj(String description, List<Field> fields, List<List<String>> exactlyOne) implements Spec {
        public Field field(String name) {
            return fields.stream().filter(f -> f.name().equals(name)).findFirst().orElse(null);
        }
    }

    /** Mapping whose keys are drawn from a fixed set and whose values all follow one spec. */
    record Map(String description, List<String> keys, Spec value) implements Spec {}

    record Arr(String description, Spec item, int minItems) implements Spec {}

    /**
     * A text value. allowed: if not empty, the only spellings accepted. pattern: a regular
     * expression the text must match, described by patternHint. numbersAsText: a YAML number
     * such as a revision 3 is accepted and read as text.
     */
    record Str(String description, List<String> allowed, String pattern, String patternHint,
               boolean numbersAsText) implements Spec {}

    /**
     * A number. Bounds may be null. allowed: if not empty, the only values accepted (standard
     * sizes). auto: the word 'auto' is also accepted.
     */
    record Num(String description, Double min, boolean minExclusive, Double max, boolean maxExclusive,
               boolean integer, List<Double> allowed, String allowedName, boolean auto) implements Spec {}

    /** A calendar date written YYYY-MM-DD that exists (no 30 February). */
    record Date(String description) implements Spec {
        /** The form; whether the day exists in its month is checked beside it. */
        public static final String PATTERN = "\\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\\d|3[01])";
    }

    /** A field of a mapping. defaultText states the default where the field is optional. */
    record Field(String name, Spec spec, boolean required, String defaultText) {}
}
