package org.feedernote.model;

import java.util.List;
import java.util.function.Supplier;

/**
 * The whole design input, read and validated. canonical gives the input in canonical form (keys
 * sorted, layout dropped) for the fingerprint and the archive, made when first asked for (check
 * never needs it); source gives the file as written, for the note's input listing (a workbook's
 * YAML form, made only when a note asks for it). warnings: what is legal but unusual in the input,
 * in file order (printed by the commands, for the note to show).
 */
public record Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                           List<Circuit> circuits, Supplier<String> canonical, Supplier<String> source, List<InputWarning> warnings) {

    public Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                        List<Circuit> circuits, Supplier<String> canonical, String sourceText, List<InputWarning> warnings) {
        this(sourceName, project, basis, supply, boards, circuits, canonical, () -> sourceText, warnings);
    }

    /** An installation without warnings (made by a program rather than read). */
    public Installation(String sourceName, Project project, Basis basis, Supply supply, List<Board> boards,
                        List<Circuit> circuits, Supplier<String> canonical, String sourceText) {
        this(sourceName, project, basis, supply, boards, circuits, canonical, sourceText, List.of());
    }

    /** The input as written (for a workbook or CSV files, its YAML form). */
    public String sourceText() {
        return source.get();
    }

    public String canonicalJson() {
        return canonical.get();
    }
}
