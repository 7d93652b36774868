package org.feedernote.report.figure;

import static org.junit.jupiter.api.Assertions.*;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.lowagie.text.Document;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfWriter;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.report.pdf.Fonts;
import org.feedernote.report.pdf.Markup;
import org.feedernote.report.pdf.StyleSheet;
import org.feedernote.report.pdf.Typesetter;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * The note's pictures as a reader of the PDF finds them: the diagram's text is text (every board
 * and circuit named, a failing circuit marked FAIL with a cross), a large tree is split over sheets
 * that refer to each other, nothing is smaller than 6 pt, and the same result gives the same bytes.
 * The inputs are the project's invented examples; what is checked is the drawing of their results,
 * not a calculation (no published values here).
 */
class NoteFiguresTest {
    private static Result run(Path input) throws Exception {
        return new Engine(ReferenceData.standard()).run(InputReader.read(input));
    }

    /** The figures alone on A4 pages with the note's margins, placed by the typesetter as the note places them. */
    private static byte[] pdf(Result result) throws Exception {
        NoteFigures figures = NoteFigures.of(result);
        StringBuilder markup = new StringBuilder("<body>");
        for (String sheet : figures.diagramSheets()) markup.append("<div class=\"figure\" data-figure=\"").append(sheet).append("\"/>");
        markup.append("<div class=\"figure\" data-figure=\"").append(figures.profile()).append("\"/></body>");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document document = new Document(PageSize.A4, 56.7f, 56.7f, 68f, 56.7f);
        PdfWriter writer = PdfWriter.getInstance(document, out);
        document.open();
        writer.getInfo().remove(com.lowagie.text.pdf.PdfName.CREATIONDATE);
        writer.getInfo().remove(com.lowagie.text.pdf.PdfName.MODDATE);
        writer.getInfo().remove(com.lowagie.text.pdf.PdfName.PRODUCER);
        Typesetter typesetter = new Typesetter(new Fonts(), StyleSheet.parse(""), document, writer, figures.registry());
        typesetter.place(typesetter.prepare(Markup.parse(markup.toString(), "test")));
        document.close();
        return out.toByteArray();
    }

    /** The text of each page, as PDFBox extracts it (by position). */
    private static List<String> pages(byte[] pdf) throws Exception {
        List<String> pages = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(true);
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                stripper.setStartPage(p);
                stripper.setEndPage(p);
                pages.add(stripper.getText(doc).replace('\u2009', ' '));
            }
        }
        return pages;
    }

    private static String diagramText(List<String> pages) {
        StringBuilder b = new StringBuilder();
        for (String p : pages) if (p.contains("Single-line diagram, sheet")) b.append(p);
        return b.toString();
    }

    private static boolean names(String text, String id) {
        return Pattern.compile("(^|\\s)" + Pattern.quote(id) + "(\\s|$|:)", Pattern.MULTILINE).matcher(text).find();
    }

    @Test
    void theDiagramNamesEveryBoardAndCircuitAsSearchableText() throws Exception {
        for (String input : List.of("bakery-small.yaml", "sports-hall.yaml")) {
            Result result = run(Fixtures.inputs().resolve(input));
            String text = diagramText(pages(pdf(result)));
            assertTrue(text.contains("Supply"), input);
            for (BoardResult b : result.boards()) assertTrue(names(text, b.id()), input + ": board " + b.id() + " not in the diagram's text");
            for (CircuitResult c : result.circuits()) {
                assertTrue(names(text, c.id()), input + ": circuit " + c.id() + " not in the diagram's text");
            }
            for (String line : text.split("\n")) {
                if (!line.contains("a check of the circuit or board fails")) assertFalse(line.contains("FAIL"), input + " passes, yet: " + line);
            }
        }
    }

    @Test
    void aFailingCircuitIsMarkedWithTheWordAndTheCrossOnItsOwnLine() throws Exception {
        Result result = run(Fixtures.root().resolve("engine/src/test/resources/trial/kestrel-yard.yaml"));
        String text = diagramText(pages(pdf(result)));
        List<String> failing = result.circuits().stream().filter(c -> !c.pass()).map(CircuitResult::id).toList();
        assertFalse(failing.isEmpty(), "the trial input has failing circuits");
        for (String id : failing) {
            boolean marked = false;
            for (String line : text.split("\n")) marked |= names(line, id) && line.contains("× FAIL");
            assertTrue(marked, id + " fails but its line in the diagram carries no × FAIL");
        }
        for (CircuitResult c : result.circuits()) {
            if (!c.pass()) continue;
            for (String line : text.split("\n")) {
                if (names(line, c.id()) && !line.contains("fed from") && !line.contains("continued")) {
                    assertFalse(line.contains("FAIL"), c.id() + " passes but is marked: " + line);
                }
            }
        }
    }

    /**
     * What the figures draw, page by page: the pages' and their form XObjects' content streams. (The
     * whole note's bytes, figures included, are held equal by NoteStructureTest; OpenPDF's own
     * document id and font-subset tags are pinned there by Determinism.)
     */
    private static List<byte[]> drawing(byte[] pdf) throws Exception {
        List<byte[]> out = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            for (org.apache.pdfbox.pdmodel.PDPage page : doc.getPages()) {
                try (java.io.InputStream in = page.getContents()) {
                    out.add(in.readAllBytes());
                }
                for (org.apache.pdfbox.cos.COSName name : page.getResources().getXObjectNames()) {
                    var x = page.getResources().getXObject(name);
                    try (java.io.InputStream in = x.getStream().createInputStream()) {
                        out.add(in.readAllBytes());
                    }
                }
            }
        }
        return out;
    }

    @Test
    void theSameResultIsDrawnTheSame() throws Exception {
        Result result = run(Fixtures.inputs().resolve("sports-hall.yaml"));
        List<byte[]> first = drawing(pdf(result));
        List<List<byte[]>> again = List.of(drawing(pdf(result)), drawing(pdf(run(Fixtures.inputs().resolve("sports-hall.yaml")))));
        for (List<byte[]> other : again) {
            assertEquals(first.size(), other.size());
            for (int i = 0; i < first.size(); i++) assertArrayEquals(first.get(i), other.get(i), "stream " + i);
        }
    }

    @Test
    void noTextIsSmallerThanSixPoints() throws Exception {
        Result result = run(Fixtures.root().resolve("engine/src/test/resources/trial/kestrel-yard.yaml"));
        List<Float> sizes = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf(result))) {
            PDFTextStripper stripper = new PDFTextStripper() {
                @Override protected void processTextPosition(TextPosition text) {
                    // The size as drawn (getFontSizeInPt rounds down to whole points).
                    sizes.add(text.getXScale());
                    super.processTextPosition(text);
                }
            };
            stripper.getText(doc);
        }
        assertFalse(sizes.isEmpty());
        float smallest = sizes.stream().min(Float::compare).orElseThrow();
        // 6 pt at most drawn 0.03 % smaller: the sheets are 482 pt wide, the note's body 481.9 pt.
        assertTrue(smallest >= 5.99f, "smallest text " + smallest + " pt");
    }

    @Test
    void aLargeTreeIsSplitOverSheetsThatReferToEachOther() throws Exception {
        String yaml = SyntheticInstallation.generate(160, 7);
        Result result = new Engine(ReferenceData.standard()).run(InputReader.parse("synthetic.json", SyntheticInstallation.toJson(yaml), true));
        NoteFigures figures = NoteFigures.of(result);
        int sheets = figures.diagramSheets().size();
        assertTrue(sheets > 2, "160 circuits on " + sheets + " sheet(s)");
        for (String name : figures.diagramSheets()) {
            assertTrue(figures.registry().get(name).height(SingleLineDiagram.WIDTH) <= SingleLineDiagram.MAX_HEIGHT, name);
        }
        List<String> pages = pages(pdf(result));
        String text = diagramText(pages);
        for (CircuitResult c : result.circuits()) assertTrue(names(text, c.id()), "circuit " + c.id() + " not in the diagram");

        // Each sheet's text, by its caption.
        List<String> bySheet = new ArrayList<>();
        Matcher caption = Pattern.compile("Single-line diagram, sheet (\\d+) of (\\d+)").matcher(text);
        List<int[]> at = new ArrayList<>();
        while (caption.find()) at.add(new int[] {caption.start(), Integer.parseInt(caption.group(1))});
        assertEquals(sheets, at.size());
        for (int i = 0; i < at.size(); i++) {
            assertEquals(i + 1, at.get(i)[1]);
            bySheet.add(text.substring(at.get(i)[0], i + 1 < at.size() ? at.get(i + 1)[0] : text.length()));
        }
        // Every "continued on diagram sheet N" of a board leads to a sheet that says where it is fed from.
        Matcher onward = Pattern.compile("(\\S+) [^\\n]*?: continued on diagram sheet (\\d+)").matcher(text);
        int references = 0;
        while (onward.find()) {
            references++;
            String board = onward.group(1);
            int target = Integer.parseInt(onward.group(2));
            String sheet = bySheet.get(target - 1);
            assertTrue(sheet.contains("fed from diagram sheet"), "sheet " + target + " does not say where " + board + " is fed from");
            assertTrue(names(sheet, board), "sheet " + target + " does not show " + board);
        }
        Matcher carried = Pattern.compile("(\\S+) continues on diagram sheet (\\d+)").matcher(text);
        while (carried.find()) {
            references++;
            int target = Integer.parseInt(carried.group(2));
            assertTrue(bySheet.get(target - 1).contains(carried.group(1) + " continued from diagram sheet " + (target - 1)),
                    "sheet " + target + " does not take " + carried.group(1) + " up");
        }
        assertTrue(references >= sheets - 1, references + " references between " + sheets + " sheets");
    }
}
