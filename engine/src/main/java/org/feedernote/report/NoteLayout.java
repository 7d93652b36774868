package org.feedernote.report;

import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * How much working the note shows: compact blocks (the default), or the full working numbered step
 * by step, for every circuit or for the circuits named. The note records it (see {@link #token}) so
 * that {@code verify} lays the note out the same way again.
 */
public record NoteLayout(boolean full, Set<String> circuits) {
    public static final NoteLayout COMPACT = new NoteLayout(false, Set.of());
    public static final NoteLayout FULL = new NoteLayout(true, Set.of());

    public NoteLayout {
        circuits = java.util.Collections.unmodifiableSet(new LinkedHashSet<>(circuits));
    }

    /** The full working for these circuits; the others compact. */
    public static NoteLayout fullFor(List<String> ids) {
        return new NoteLayout(true, new LinkedHashSet<>(ids));
    }

    /** Whether a worked section (a circuit, the supply, a board's demand) is shown in full. */
    public boolean fullFor(String sectionId) {
        return full && (circuits.isEmpty() || circuits.contains(sectionId));
    }

    /** Every worked section in full. */
    public boolean allFull() {
        return full && circuits.isEmpty();
    }

    /** "compact", "full", or "full:ID,ID". */
    public String token() {
        if (!full) return "compact";
        return circuits.isEmpty() ? "full" : "full:" + String.join(",", circuits);
    }

    /** The layout a token names; null for a token that names none. */
    public static NoteLayout parse(String token) {
        if (token == null || token.equals("compact")) return COMPACT;
        if (token.equals("full")) return FULL;
        if (token.startsWith("full:")) return fullFor(Arrays.asList(token.substring(5).split(",")));
        return null;
    }

    /** How the note's cover describes the working it shows. */
    public String description() {
        if (!full) return "compact working (one block per circuit); the full working is written with --detail full";
        if (circuits.isEmpty()) return "full working, every step numbered";
        return "full working for " + String.join(", ", circuits) + "; compact blocks for the rest";
    }
}
