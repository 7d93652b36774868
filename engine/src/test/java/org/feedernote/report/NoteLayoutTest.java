package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDPageDestination;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.outline.PDOutlineItem;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;

/** How the worked steps sit on the pages: a step and its heading are never torn from what follows. */
class NoteLayoutTest {
    /** A step or section heading: "4.6.11  Resistance of the run". */
    private static final Pattern HEADING = Pattern.compile("^\\d+(\\.\\d+)+\\s+\\S.*");
    static List<List<String>> pages;
    /** Each bookmark's title and the page (from 1) it opens. */
    static List<Map.Entry<String, Integer>> bookmarks;

    @BeforeAll
    static void render() throws Exception {
        // The full working: its steps have headings of their own (the compact form is CompactNoteTest's).
        NoteFixture note = NoteFixture.of(Fixtures.inputs().resolve("sports-hall.yaml"), NoteLayout.FULL);
        pages = new ArrayList<>();
        bookmarks = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(note.pdf())) {
            for (PDOutlineItem item : doc.getDocumentCatalog().getDocumentOutline().children()) {
                PDPageDestination dest = (PDPageDestination) item.getDestination();
                bookmarks.add(Map.entry(item.getTitle(), doc.getPages().indexOf(dest.getPage()) + 1));
            }
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(true);
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                stripper.setStartPage(p);
                stripper.setEndPage(p);
                List<String> lines = new ArrayList<>();
                for (String line : NoteFixture.normalise(stripper.getText(doc)).split("\n")) {
                    if (!line.isBlank()) lines.add(line.strip());
                }
                pages.add(lines);
            }
        }
    }

    /** The lines of a page between the running header and the running footer. */
    private static List<String> body(List<String> page) {
        return page.subList(1, page.size() - 1);
    }

    @Test
    void everyPageCarriesTheRunningHeaderAndTheFooterWithTheTrueCount() {
        for (int p = 0; p < pages.size(); p++) {
            List<String> page = pages.get(p);
            assertTrue(page.get(0).endsWith("Calculation note"), "page " + (p + 1) + " header: " + page.get(0));
            assertTrue(page.get(page.size() - 1).endsWith("Page " + (p + 1) + " of " + pages.size()),
                    "page " + (p + 1) + " footer: " + page.get(page.size() - 1));
        }
    }

    @Test
    void noPageEndsWithAHeadingWhoseWorkingIsOnTheNextPage() {
        for (int p = 0; p < pages.size() - 1; p++) {
            List<String> body = body(pages.get(p));
            String last = body.get(body.size() - 1);
            assertFalse(HEADING.matcher(last).matches(), "page " + (p + 1) + " ends with a heading: " + last);
        }
    }

    @Test
    void aFormulaStepIsNotSplitAcrossPages() {
        // A formula step shows three lines: symbols, substituted values, result ("= 31.0 A").
        // A page must not begin with the substituted or result line of a step begun on the page before.
        for (int p = 1; p < pages.size(); p++) {
            List<String> body = body(pages.get(p));
            assertFalse(body.get(0).startsWith("= "), "page " + (p + 1) + " begins inside a step: " + body.get(0));
        }
    }

    @Test
    void aTableContinuedOnTheNextPageRepeatsItsHeaderRow() {
        // The summary schedule of the sports hall runs over two pages.
        String header = "Circuit From → to Load";
        int continued = 0;
        for (int p = 1; p < pages.size(); p++) {
            List<String> previous = body(pages.get(p - 1));
            List<String> body = body(pages.get(p));
            boolean tableGoesOn = previous.stream().anyMatch(l -> l.startsWith(header)) && previous.get(previous.size() - 1).contains("PASS");
            // A table that ends at a page's foot, before a part that begins a new page, does not go on.
            boolean nextIsTable = body.stream().limit(2).anyMatch(l -> l.startsWith(header) || l.contains("PASS") || l.contains("FAIL"));
            if (!tableGoesOn || !nextIsTable) continue;
            continued++;
            assertTrue(body.get(0).startsWith(header), "page " + (p + 1) + " continues the table without its header: " + body.get(0));
        }
        assertTrue(continued > 0, "the sports hall's summary schedule should run over a page break");
    }

    @Test
    void everyBookmarkOpensThePageThatCarriesItsHeading() {
        assertTrue(bookmarks.size() > 10, "a bookmark per top-level section");
        for (Map.Entry<String, Integer> b : bookmarks) {
            String heading = b.getKey().replaceAll("\\s+", " ");
            List<String> page = pages.get(b.getValue() - 1);
            assertTrue(page.stream().anyMatch(l -> l.replaceAll("\\s+", " ").startsWith(heading.substring(0, Math.min(heading.length(), 20)))),
                    "bookmark '" + heading + "' opens page " + b.getValue() + ", which does not carry it");
        }
    }
}
