package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.verification.PublishedCases;

/** selfcheck: every published case computed, printed with its source and verdict, and written as a PDF with the same bytes each run. */
class SelfCheckCommandTest {

    @Test
    void everyPublishedCasePassesAndThePdfIsWrittenTheSameTwice(@TempDir Path dir) throws Exception {
        int total = PublishedCases.all().size();
        Path pdf = dir.resolve("selfcheck.pdf");
        CommandLineTest.Run r = CommandLineTest.run("selfcheck", "--pdf", pdf.toString());
        assertEquals(0, r.status(), r.out() + r.err());
        assertTrue(r.out().contains("R20-01  PASS"), r.out());
        assertTrue(r.out().contains("IEC 60228:2004, Table 2"), "the source beside the value");
        assertTrue(r.out().contains(total + " of " + total + " published cases pass"), r.out());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains("ALL CASES PASS"), "the verdict on the first page");
            assertTrue(text.contains("competent, licensed person"), "the caution");
            assertTrue(text.contains("ZS-11"), "the last cases too");
        }
        Path again = dir.resolve("again.pdf");
        assertEquals(0, CommandLineTest.run("selfcheck", "--pdf", again.toString()).status());
        assertArrayEquals(Files.readAllBytes(pdf), Files.readAllBytes(again), "undated, so byte for byte the same");
    }

    @Test
    void jsonNamesEveryCaseWithItsSourceAndVerdict() throws Exception {
        CommandLineTest.Run r = CommandLineTest.run("selfcheck", "--json");
        assertEquals(0, r.status(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals("PASS", json.get("verdict").asText());
        assertEquals(PublishedCases.all().size(), json.get("cases").size());
        JsonNode first = json.get("cases").get(0);
        assertEquals("IEC 60228:2004", first.get("source").get("document").asText());
        assertEquals(12.1, first.get("expected").asDouble(), 0);
        assertEquals("PASS", first.get("verdict").asText());
    }
}
