package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;

/**
 * Golden files: for every example input, the trace JSON and the note's text in both forms (compact, the
 * default, and the full working) are compared whole with golden-reports/. After a deliberate change,
 * rewrite them with
 * {@code mvn -B verify -Dfeedernote.rewrite=true} and read the diff before committing.
 */
class GoldenNoteTest {
    static final boolean REWRITE = Boolean.getBoolean("feedernote.rewrite");

    @ParameterizedTest
    @MethodSource("org.feedernote.Fixtures#examples")
    void traceAndNoteTextMatchTheGoldenFiles(Path input) throws Exception {
        NoteFixture note = NoteFixture.of(input);
        String name = input.getFileName().toString().replaceFirst("\\.yaml$", "");
        Path golden = Fixtures.root().resolve("golden-reports");
        compare(golden.resolve(name + ".trace.json"), note.trace());
        compare(golden.resolve(name + ".note.txt"), note.text());
        // The full working, every step numbered (--detail full), has a golden text of its own.
        compare(golden.resolve(name + ".full.note.txt"), NoteFixture.of(input, NoteLayout.FULL).text());
        // The examples' own texts are plain: a placeholder could only come from the program's or the
        // reference data's texts, which must all be printable in the note's fonts.
        assertFalse(note.text().contains(org.feedernote.report.pdf.Fonts.PLACEHOLDER),
                name + ": a text of the program or its data has a character the note's fonts cannot show");
    }

    static void compare(Path file, String actual) throws IOException {
        if (REWRITE) {
            Files.createDirectories(file.getParent());
            Files.writeString(file, actual);
            return;
        }
        assertTrue(Files.exists(file), file + " is missing; create it with -Dfeedernote.rewrite=true");
        String expected = Files.readString(file);
        if (!expected.equals(actual)) fail(file.getFileName() + " differs from the golden file:\n" + diff(expected, actual)
                + "\nIf the change is deliberate, rewrite with -Dfeedernote.rewrite=true and read the diff.");
    }

    /** The first differing lines with a little context, enough to see what changed. */
    static String diff(String expected, String actual) {
        List<String> e = expected.lines().toList();
        List<String> a = actual.lines().toList();
        int i = 0;
        while (i < e.size() && i < a.size() && e.get(i).equals(a.get(i))) i++;
        StringBuilder b = new StringBuilder();
        for (int k = Math.max(0, i - 2); k < Math.min(Math.max(e.size(), a.size()), i + 6); k++) {
            String el = k < e.size() ? e.get(k) : "<end>";
            String al = k < a.size() ? a.get(k) : "<end>";
            if (el.equals(al)) b.append("  ").append(k + 1).append(":   ").append(el).append('\n');
            else b.append("  ").append(k + 1).append(": - ").append(el).append('\n')
                  .append("  ").append(k + 1).append(": + ").append(al).append('\n');
        }
        return b.toString();
    }
}
