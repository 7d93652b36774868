package org.feedernote.input;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/** "Did you mean …?" for keys and enumerated words. */
final class Suggest {
    private Suggest() {}

    static String nearest(String given, Collection<String> options) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        String lower = given.toLowerCase(Locale.ROOT).replace('_', '-');
        for (String option : options) {
            String o = option.toLowerCase(Locale.ROOT).replace('_', '-');
            if (o.equals(lower)) return option;
            int d = distance(lower, o);
            if (d < bestDistance) {
                bestDistance = d;
                best = option;
            }
        }
        int allowed = Math.max(2, given.length() / 3);
        return bestDistance <= allowed ? best : null;
    }

    static String hint(String given, Collection<String> options) {
        List<String> completions = completions(given, options);
        if (completions.size() > 1) {
            return " (did you mean " + completions.stream().map(o -> "'" + o + "'")
                    .collect(Collectors.joining(", ")).replaceFirst(", ('[^']*')$", " or $1") + "?)";
        }
        String n = nearest(given, options);
        return n == null ? "" : " (did you mean '" + n + "'?)";
    }

    /**
     * The options the given word begins (a word cut short: 'D' for the methods D1 and D2), in
     * their order; nearest would name one of them, or a shorter option one letter away ('C').
     */
    static List<String> completions(String given, Collection<String> options) {
        String lower = given.toLowerCase(Locale.ROOT).replace('_', '-');
        List<String> out = new ArrayList<>();
        if (lower.isEmpty()) return out;
        for (String option : options) {
            String o = option.toLowerCase(Locale.ROOT).replace('_', '-');
            if (o.equals(lower)) return List.of();
            if (o.startsWith(lower)) out.add(option);
        }
        return out;
    }

    private static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) prev[j] = j;
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev; prev = cur; cur = t;
        }
        return prev[b.length()];
    }
}
