package org.feedernote.synthetic;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Seeded mutations of a design input's text, for fuzzing the reader and the checks: numbers
 * replaced by extremes, keys deleted, misspelt or given twice, values of the wrong type, lines
 * deleted, repeated or indented, characters inserted and deleted. The same text and seed give
 * the same mutation. Works on the text, so it makes YAML slips as well as wrong values.
 */
public final class InputMutator {
    private InputMutator() {}

    /** A mutated text and what was done to it, in words (to reproduce a finding by hand). */
    public record Mutation(String text, String description) {}

    private static final String[] EXTREMES = {
        "0", "-1", "1e308", "-1e308", "1e-308", "1e400", ".nan", ".inf", "-.inf", "NaN", "nan", "Infinity",
        "99999999999999999999999", "9223372036854775807", "-9223372036854775808", "2147483648", "1e12", "1e9",
        "0.0000001", "0x7fffffff", "1_000_000", "012", "0.0", "-0", "1e-5", "4.9e-324", "1.7976931348623157e308",
    };

    private static final String[] VALUES = {
        "[1, 2]", "{a: 1}", "\"text\"", "true", "false", "null", "~", "''", "auto", "2026-02-30", "2026-13-45", "[]",
        "{}", "yes", "-", "'1e308'", "\"\"", "*alias", "&anchor x", "!!binary AAAA", "|", ">", "1:30", "0o17",
    };

    private static final String INSERTED = ":{}[],'\"#&*!|>%@\t-? \n\\`=~0123456789.eEaz_é泵\u00a0\u0000\u001b";

    private static final Pattern NUMBER = Pattern.compile("(?<=[:,\\[] )-?\\d+(?:\\.\\d+)?(?:[eE][-+]?\\d+)?(?=[,}\\]\\s]|$)",
            Pattern.MULTILINE);
    private static final Pattern KEY = Pattern.compile("(?<=[\\s{,])([a-z][a-z_0-9]*): ");
    /** A key and its value up to the next comma, closing brace or end of line. */
    private static final Pattern ENTRY = Pattern.compile("(?<=[\\s{,])([a-z][a-z_0-9]*): ([^,}\\n]*)");

    /** One to three mutations stacked. */
    public static Mutation mutate(String text, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int count = 1 + (random.nextInt(10) < 7 ? 0 : random.nextInt(1, 3));
        List<String> done = new ArrayList<>();
        String t = text;
        for (int i = 0; i < count; i++) {
            Mutation m = once(t, random);
            t = m.text();
            done.add(m.description());
        }
        return new Mutation(t, String.join("; ", done));
    }

    private static Mutation once(String text, SplittableRandom random) {
        switch (random.nextInt(11)) {
            case 0:
            case 1:
            case 2: {
                List<int[]> numbers = spans(NUMBER, text, 0);
                if (numbers.isEmpty()) break;
                int[] n = numbers.get(random.nextInt(numbers.size()));
                String by = EXTREMES[random.nextInt(EXTREMES.length)];
                return replaced(text, n, by, "number '" + text.substring(n[0], n[1]) + "' at " + lineOf(text, n[0]) + " → " + by);
            }
            case 3: {
                List<int[]> entries = spans(ENTRY, text, 0);
                if (entries.isEmpty()) break;
                int[] e = entries.get(random.nextInt(entries.size()));
                int end = e[1];
                if (end + 2 <= text.length() && text.startsWith(", ", end)) end += 2;
                return replaced(text, new int[] {e[0], end}, "", "entry '" + text.substring(e[0], e[1]) + "' at " + lineOf(text, e[0]) + " deleted");
            }
            case 4: {
                List<int[]> keys = spans(KEY, text, 1);
                if (keys.isEmpty()) break;
                int[] k = keys.get(random.nextInt(keys.size()));
                String key = text.substring(k[0], k[1]);
                int[] o = keys.get(random.nextInt(keys.size()));
                String other = text.substring(o[0], o[1]);
                String by = misspelt(key, other, random);
                return replaced(text, k, by, "key '" + key + "' at " + lineOf(text, k[0]) + " → '" + by + "'");
            }
            case 5: {
                List<int[]> entries = spans(ENTRY, text, 0);
                if (entries.isEmpty()) break;
                int[] e = entries.get(random.nextInt(entries.size()));
                String entry = text.substring(e[0], e[1]);
                boolean flow = e[1] < text.length() && (text.charAt(e[1]) == ',' || text.charAt(e[1]) == '}');
                String copy = flow ? ", " + entry : "\n" + " ".repeat(column(text, e[0])) + entry;
                return replaced(text, new int[] {e[1], e[1]}, copy, "entry '" + entry + "' at " + lineOf(text, e[0]) + " given twice");
            }
            case 6: {
                List<int[]> values = spans(ENTRY, text, 2);
                if (values.isEmpty()) break;
                int[] v = values.get(random.nextInt(values.size()));
                if (v[0] == v[1]) break;
                String by = VALUES[random.nextInt(VALUES.length)];
                return replaced(text, v, by, "value '" + text.substring(v[0], v[1]) + "' at " + lineOf(text, v[0]) + " → " + by);
            }
            case 7: {
                String[] lines = text.split("\n", -1);
                int i = random.nextInt(lines.length);
                List<String> out = new ArrayList<>(List.of(lines));
                switch (random.nextInt(3)) {
                    case 0:
                        out.remove(i);
                        return new Mutation(String.join("\n", out), "line " + (i + 1) + " deleted");
                    case 1:
                        out.add(i, lines[i]);
                        return new Mutation(String.join("\n", out), "line " + (i + 1) + " given twice");
                    default: {
                        String[] indents = {" ", "  ", "\t", "-"};
                        String by = indents[random.nextInt(indents.length)];
                        boolean remove = random.nextBoolean() && lines[i].startsWith("  ");
                        out.set(i, remove ? lines[i].substring(2) : by + lines[i]);
                        return new Mutation(String.join("\n", out), "line " + (i + 1) + (remove ? " outdented" : " indented by '" + by + "'"));
                    }
                }
            }
            case 8:
            case 9: {
                int at = random.nextInt(text.length() + 1);
                char c = INSERTED.charAt(random.nextInt(INSERTED.length()));
                return replaced(text, new int[] {at, at}, String.valueOf(c),
                        "character U+" + String.format("%04X", (int) c) + " inserted at " + lineOf(text, at));
            }
            default: {
                if (text.isEmpty()) break;
                int at = random.nextInt(text.length());
                return replaced(text, new int[] {at, at + 1}, "", "character '" + text.charAt(at) + "' deleted at " + lineOf(text, at));
            }
        }
        return new Mutation(text, "unchanged");
    }

    private static String misspelt(String key, String other, SplittableRandom random) {
        switch (random.nextInt(6)) {
            case 0:
                if (key.length() < 2) return key + key;
                int i = random.nextInt(key.length() - 1);
                return key.substring(0, i) + key.charAt(i + 1) + key.charAt(i) + key.substring(i + 2);
            case 1:
                int d = random.nextInt(key.length());
                return key.length() < 2 ? "x" : key.substring(0, d) + key.substring(d + 1);
            case 2:
                return key.toUpperCase(java.util.Locale.ROOT);
            case 3:
                return key.replace('_', '-');
            case 4:
                return other;
            default:
                return key + "s";
        }
    }

    private static List<int[]> spans(Pattern pattern, String text, int group) {
        List<int[]> found = new ArrayList<>();
        Matcher m = pattern.matcher(text);
        while (m.find()) found.add(new int[] {m.start(group), m.end(group)});
        return found;
    }

    private static Mutation replaced(String text, int[] span, String by, String description) {
        return new Mutation(text.substring(0, span[0]) + by + text.substring(span[1]), description);
    }

    private static String lineOf(String text, int at) {
        int line = 1;
        for (int i = 0; i < at && i < text.length(); i++) if (text.charAt(i) == '\n') line++;
        return "line " + line;
    }

    private static int column(String text, int at) {
        int start = text.lastIndexOf('\n', at - 1) + 1;
        return at - start;
    }
}
