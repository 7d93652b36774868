package org.feedernote;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The data goes one way: calculations never format and templates never calculate. Checked on the
 * imports of the sources.
 */
class LayeringTest {
    private static final Map<String, List<String>> FORBIDDEN = Map.of(
            "calc", List.of("report", "cli"),
            "formula", List.of("calc", "report", "cli", "input"),
            "expr", List.of("calc", "report", "cli", "input", "formula", "trace", "data", "model"),
            "trace", List.of("calc", "report", "cli", "input"),
            "model", List.of("calc", "report", "cli", "input", "trace"),
            "data", List.of("calc", "report", "cli", "input"),
            "input", List.of("calc", "report", "cli"),
            "report", List.of("cli"),
            "verification", List.of("report", "cli"),
            "sheet", List.of("report", "cli"));

    @Test
    void packagesOnlyImportDownstream() throws IOException {
        Path src = Fixtures.root().resolve("engine/src/main/java/org/feedernote");
        for (var entry : FORBIDDEN.entrySet()) {
            try (Stream<Path> files = Files.walk(src.resolve(entry.getKey()))) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    String text = Files.readString(f);
                    for (String other : entry.getValue()) {
                        assertFalse(text.contains("import org.feedernote." + other + ".")
                                        || text.contains("import static org.feedernote." + other + "."),
                                f + " imports org.feedernote." + other);
                    }
                }
            }
        }
    }
}
