package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

import org.feedernote.report.view.ListingLine;

/** The input listing keeps the file's line numbers (the ones error messages give). */
class ListingTest {
    @Test
    void linesAreNumberedAsInTheFileAndALongLineContinuesUnnumbered() {
        String longLine = "x".repeat(NoteBuilder.LISTING_WIDTH * 2 + 5);
        List<ListingLine> lines = NoteBuilder.listing("a: 1\r\n" + longLine + "\n  b: 2\n");
        assertEquals(List.of("1", "2", "", "", "3"), lines.stream().map(ListingLine::number).toList());
        assertEquals(longLine, lines.get(1).text() + lines.get(2).text() + lines.get(3).text());
        assertEquals("  b: 2", lines.get(4).text(), "indentation is kept");
    }

    @Test
    void aFileWithoutAFinalNewlineLosesNoLine() {
        assertEquals(2, NoteBuilder.listing("a: 1\nb: 2").size());
    }
}
