package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDPageFitWidthDestination;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.outline.PDOutlineItem;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.model.Circuit;

/**
 * The compact note (the default): short enough for a checker to read. The page budgets are the
 * acceptance limits the project set itself for its two examples (issue 24: at most 16 and 60
 * pages); a final circuit's block never runs longer than a page.
 */
class CompactNoteTest {
    /** A heading bookmark: its title, its page (from 0) and its height on the page (points from the foot). */
    record Mark(String title, int page, float top) {}

    static List<Mark> marks(byte[] pdf) throws Exception {
        List<Mark> out = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            for (PDOutlineItem item : doc.getDocumentCatalog().getDocumentOutline().children()) {
                PDPageFitWidthDestination dest = (PDPageFitWidthDestination) item.getDestination();
                out.add(new Mark(item.getTitle(), doc.getPages().indexOf(dest.getPage()), dest.getTop()));
            }
        }
        return out;
    }

    static int pages(byte[] pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            return doc.getNumberOfPages();
        }
    }

    /** Page height (A4) and the body's top and foot, from the top of the page (note.css: 16 mm and 15 mm margins). */
    static final double PAGE = 841.89;
    static final double BODY_TOP = 16 * 72 / 25.4;
    static final double BODY_FOOT = PAGE - 15 * 72 / 25.4;

    /** Per page (from 0), how far down the page its lowest line of body text sits (points from the top). */
    static double[] lowestLines(byte[] pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            double[] lowest = new double[doc.getNumberOfPages()];
            org.apache.pdfbox.text.PDFTextStripper stripper = new org.apache.pdfbox.text.PDFTextStripper() {
                @Override protected void writeString(String text, List<org.apache.pdfbox.text.TextPosition> positions) {
                    int page = getCurrentPageNo() - 1;
                    for (org.apache.pdfbox.text.TextPosition t : positions) {
                        double y = t.getYDirAdj();
                        if (y < BODY_FOOT) lowest[page] = Math.max(lowest[page], y);
                    }
                }
            };
            stripper.getText(doc);
            return lowest;
        }
    }

    /**
     * The longest block of a final circuit, in pages of the body's height: from its heading to its
     * last line (the space a page break leaves below it is not the block's).
     */
    static double longestFinalBlock(NoteFixture note) throws Exception {
        Set<String> finals = note.input().circuits().stream().filter(c -> !c.isFeeder()).map(Circuit::id)
                .map(id -> "Circuit " + id + " ").collect(Collectors.toSet());
        List<Mark> marks = marks(note.pdf());
        double[] lowest = lowestLines(note.pdf());
        double body = BODY_FOOT - BODY_TOP;
        double longest = 0;
        for (int i = 0; i + 1 < marks.size(); i++) {
            Mark m = marks.get(i);
            if (finals.stream().noneMatch(f -> (m.title() + " ").contains(f))) continue;
            Mark next = marks.get(i + 1);
            double start = PAGE - m.top();
            double nextStart = PAGE - next.top();
            // The next heading at the head of its page: this block ended on the page before, at its lowest line.
            boolean nextOpensPage = nextStart < BODY_TOP + 20 && next.page() > m.page();
            int endPage = nextOpensPage ? next.page() - 1 : next.page();
            double end = nextOpensPage ? lowest[endPage] : nextStart;
            double length = (endPage - m.page()) * body + (end - start);
            longest = Math.max(longest, length / body);
        }
        return longest;
    }

    @Test
    void theSmallExampleIsAtMostSixteenPagesAndEveryFinalCircuitFitsAPage() throws Exception {
        NoteFixture note = NoteFixture.of(Fixtures.inputs().resolve("bakery-small.yaml"));
        assertTrue(pages(note.pdf()) <= 16, pages(note.pdf()) + " pages");
        double longest = longestFinalBlock(note);
        assertTrue(longest <= 1.0, "a final circuit's block runs " + longest + " pages");
    }

    @Test
    void theLargerExampleIsAtMostSixtyPagesAndEveryFinalCircuitFitsAPage() throws Exception {
        NoteFixture note = NoteFixture.of(Fixtures.inputs().resolve("sports-hall.yaml"));
        assertTrue(pages(note.pdf()) <= 60, pages(note.pdf()) + " pages");
        double longest = longestFinalBlock(note);
        assertTrue(longest <= 1.0, "a final circuit's block runs " + longest + " pages");
    }

    @Test
    void aGeneratedInstallationsFinalCircuitsEachFitAPage() throws Exception {
        // Invented data (the seeded generator): motors, sizing by auto, feeders two levels deep.
        String yaml = org.feedernote.synthetic.SyntheticInstallation.generate(150, 3);
        NoteFixture note = NoteFixture.of(org.feedernote.input.InputReader.parse("g.json",
                org.feedernote.synthetic.SyntheticInstallation.toJson(yaml), true));
        double longest = longestFinalBlock(note);
        assertTrue(longest <= 1.0, "a final circuit's block runs " + longest + " pages");
        // The budget for 1 000 circuits is 1 300 pages: about 1.3 pages a circuit at most.
        assertTrue(pages(note.pdf()) <= 1.3 * 150, pages(note.pdf()) + " pages");
    }

    @Test
    void theFullWorkingIsLongerAndKeepsEveryStepNumbered() throws Exception {
        Path input = Fixtures.inputs().resolve("bakery-small.yaml");
        NoteFixture compact = NoteFixture.of(input);
        NoteFixture full = NoteFixture.of(input, NoteLayout.FULL);
        assertTrue(pages(full.pdf()) > 2 * pages(compact.pdf()));
        // Every step the full working numbers is in the compact form under the same number, except the
        // lines the compact form gives once (the cable's impedance, in the cable data) or drops as repeats.
        assertTrue(compact.text().contains("9.2.3 "), "a step keeps its number");
        assertTrue(compact.text().contains("given once in the cable data"));
    }
}
