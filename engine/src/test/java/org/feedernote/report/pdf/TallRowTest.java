package org.feedernote.report.pdf;

import static org.junit.jupiter.api.Assertions.*;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;

import com.lowagie.text.Document;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfWriter;

/**
 * A table cell longer than a page (a custom template can make one) is carried over to the next
 * pages: no line is lost and none is written below the page's bottom margin.
 */
class TallRowTest {
    private static final float MARGIN = 56.7f;

    @Test
    void aRowTallerThanAPageContinuesOnTheNextPageWithNothingBelowTheMargin() throws Exception {
        StringBuilder cell = new StringBuilder();
        int lines = 150;
        for (int i = 1; i <= lines; i++) cell.append("line ").append(i).append(i < lines ? "<br/>" : "");
        String xhtml = "<body><p>Before the table.</p><table><thead><tr><th>Head</th></tr></thead><tr><td>" + cell
                + "</td></tr><tr><td>after</td></tr></table></body>";
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document document = new Document(PageSize.A4, MARGIN, MARGIN, MARGIN, MARGIN);
        PdfWriter writer = PdfWriter.getInstance(document, out);
        document.open();
        Typesetter typesetter = new Typesetter(new Fonts(), StyleSheet.parse("body { font-size: 10pt; } td, th { border: 0.5pt solid #000; }"),
                document, writer);
        typesetter.place(typesetter.prepare(Markup.parse(xhtml, "test")));
        document.close();

        List<String> found = new ArrayList<>();
        List<Float> lowest = new ArrayList<>();
        try (PDDocument pdf = Loader.loadPDF(out.toByteArray())) {
            assertTrue(pdf.getNumberOfPages() >= 3, "150 lines of 10 pt need three pages, got " + pdf.getNumberOfPages());
            float height = pdf.getPage(0).getMediaBox().getHeight();
            PDFTextStripper stripper = new PDFTextStripper() {
                @Override protected void writeString(String text, List<TextPosition> positions) throws java.io.IOException {
                    found.add(text.strip());
                    for (TextPosition p : positions) lowest.add(height - p.getYDirAdj());
                    super.writeString(text, positions);
                }
            };
            stripper.setSortByPosition(true);
            stripper.getText(pdf);
        }
        for (int i = 1; i <= lines; i++) {
            String line = "line " + i;
            assertEquals(1, found.stream().filter(line::equals).count(), line + " should appear exactly once: " + found);
        }
        assertTrue(found.contains("after"));
        float min = lowest.stream().min(Float::compare).orElseThrow();
        assertTrue(min >= MARGIN - 0.5f, "text written " + (MARGIN - min) + " pt below the bottom margin");
    }
}
