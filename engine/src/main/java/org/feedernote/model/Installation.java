package org.feedernote.model;

import java.util.List;
import java.util.function.Supplier;

/**
 * The whole design input, read and validated. canonical gives the input in canonical form (keys
 * sorted, layout dropped) for the fingerprint and the archive, made when first asked for (check
 * never needs it); sourceText is the file as written, for the note's input listing.
 */
public record Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                           List<Circuit> circuits, Supplier<String> canonical, String sourceText) {

    public String canonicalJson() {
        return canonical.get();
    }
}
