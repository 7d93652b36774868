package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.Fixtures;
import org.feedernote.report.NoteRenderer;

/** --templates: a restyled copy of the templates is used; an incomplete copy is refused with what is missing. */
class TemplatesTest {
    private static Path copyTemplates(Path into) throws Exception {
        Files.createDirectories(into);
        for (String f : NoteRenderer.TEMPLATE_FILES) {
            Files.copy(Fixtures.root().resolve("report-templates").resolve(f), into.resolve(f));
        }
        return into;
    }

    @Test
    void aCopyMissingAFileIsRefusedNamingIt(@TempDir Path dir) throws Exception {
        Path templates = copyTemplates(dir.resolve("t"));
        Files.delete(templates.resolve("section.ftlh"));
        CommandLineTest.Run r = CommandLineTest.run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(),
                "-o", dir.resolve("out").toString(), "--templates", templates.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("missing section.ftlh"), r.err());
        assertFalse(Files.exists(dir.resolve("out").resolve("KLB-E-CN-001-A.pdf")), "nothing is written");
    }

    @Test
    void anEditedCopyChangesTheNote(@TempDir Path dir) throws Exception {
        Path templates = copyTemplates(dir.resolve("t"));
        Path front = templates.resolve("front.ftlh");
        Files.writeString(front, Files.readString(front).replace("<div class=\"cover\">",
                "<div class=\"cover\"><div class=\"letterhead\">Invented Consulting Engineers Ltd</div>"));
        Files.writeString(templates.resolve("note.css"), Files.readString(templates.resolve("note.css"))
                + "\n.letterhead { font-size: 14pt; font-weight: bold; text-align: right; }\n");
        CommandLineTest.Run r = CommandLineTest.run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(),
                "-o", dir.resolve("out").toString(), "--templates", templates.toString());
        assertEquals(0, r.status(), r.err());
        try (PDDocument doc = Loader.loadPDF(dir.resolve("out").resolve("KLB-E-CN-001-A.pdf").toFile())) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setEndPage(1);
            assertTrue(stripper.getText(doc).contains("Invented Consulting Engineers Ltd"));
        }
        // The note carries the templates it was laid out with, so that it can be written again byte for byte.
        ArchiveTest.verifiesAndDetectsAnEditedByte(dir.resolve("out").resolve("KLB-E-CN-001-A.pdf"));
    }
}
