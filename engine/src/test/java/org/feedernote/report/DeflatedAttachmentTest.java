package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.archive.NoteArchive;
import org.feedernote.report.pdf.DeflatingFile;

/**
 * The note command deflates a long trace on a second thread while writing it, and embeds the
 * deflated bytes: the note must be the same file as when OpenPDF compresses the trace itself, and
 * the trace must come out of the note as written.
 */
class DeflatedAttachmentTest {

    /** About three chunks of the compressing thread's, of text that compresses as a trace does. */
    private static byte[] traceLikeText() {
        StringBuilder b = new StringBuilder();
        for (int i = 0; b.length() < 800_000; i++) {
            b.append("    {\n      \"id\": \"C-").append(i).append("/vd/dU\",\n      \"value\": ").append(i * 0.0137).append(",\n")
                    .append("      \"unit\": \"V\"\n    },\n");
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] deflatedInOneGo(byte[] content, int level) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Deflater deflater = new Deflater(level);
        try (DeflaterOutputStream d = new DeflaterOutputStream(out, deflater)) {
            d.write(content);
        }
        deflater.end();
        return out.toByteArray();
    }

    /** Writes content in pieces of uneven lengths, single bytes among them, as a character encoder does. */
    private static void writeInPieces(DeflatingFile out, byte[] content) throws IOException {
        int at = 0;
        for (int piece = 1; at < content.length; piece = piece * 7 % 10_007 + 1) {
            if (piece % 5 == 0) {
                out.write(content[at++]);
                continue;
            }
            int n = Math.min(piece, content.length - at);
            out.write(content, at, n);
            at += n;
        }
    }

    @Test
    void theFileHoldsWhatOneDeflaterMakesOfTheWholeContent(@TempDir Path dir) throws IOException {
        byte[] content = traceLikeText();
        Path file = dir.resolve("trace.deflated");
        try (DeflatingFile out = new DeflatingFile(file, NoteRenderer.ATTACHMENT_COMPRESSION)) {
            writeInPieces(out, content);
            out.finish();
            assertEquals(content.length, out.length());
            assertArrayEquals(deflatedInOneGo(content, NoteRenderer.ATTACHMENT_COMPRESSION), Files.readAllBytes(file));
        }
        assertFalse(Files.exists(file), "closing removes the scratch file");
    }

    @Test
    void closedUnfinishedItStopsAndLeavesNoFile(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("abandoned.deflated");
        try (DeflatingFile out = new DeflatingFile(file, NoteRenderer.ATTACHMENT_COMPRESSION)) {
            out.write(traceLikeText());
        }
        assertFalse(Files.exists(file));
    }

    @Test
    void aScratchFileLivesInTheNotesFolderUntilClosed(@TempDir Path dir) throws IOException {
        Path file;
        try (DeflatingFile out = DeflatingFile.scratch(dir, ".note.trace.json", NoteRenderer.ATTACHMENT_COMPRESSION)) {
            file = out.file();
            assertEquals(dir, file.getParent());
            assertTrue(file.getFileName().toString().startsWith(".note.trace.json"), "hidden, and named after the trace");
            out.finish();
            assertTrue(Files.exists(file));
        }
        assertFalse(Files.exists(file));
    }

    @Test
    void nothingIsWrittenAfterFinishing(@TempDir Path dir) throws IOException {
        try (DeflatingFile out = new DeflatingFile(dir.resolve("t"), 6)) {
            out.write(1);
            out.finish();
            assertThrows(IOException.class, () -> out.write(2));
        }
    }

    @Test
    void aNoteEmbeddingTheDeflatedTraceIsTheSameFileAsOneLettingOpenPdfCompressIt(@TempDir Path dir) throws Exception {
        NoteFixture note = NoteFixture.of(Path.of("../inputs/bakery-small.yaml"));
        byte[] trace = note.trace().getBytes(StandardCharsets.UTF_8);
        Path traceFile = dir.resolve("trace.json");
        Files.write(traceFile, trace);
        NoteRenderer renderer = new NoteRenderer(null);
        NoteRenderer.Attachment input = new NoteRenderer.Attachment(NoteArchive.INPUT_NAME, "Design input (canonical form)",
                note.input().canonicalJson().getBytes(StandardCharsets.UTF_8));
        Path byOpenPdf = dir.resolve("openpdf.pdf");
        renderer.write(note.view(), note.input().project().date(), byOpenPdf, NoteRenderer.Progress.NONE, input,
                NoteRenderer.Attachment.file(NoteArchive.TRACE_NAME, "Calculation trace", traceFile));
        Path byThread = dir.resolve("thread.pdf");
        try (DeflatingFile deflated = new DeflatingFile(dir.resolve("trace.deflated"), NoteRenderer.ATTACHMENT_COMPRESSION)) {
            writeInPieces(deflated, trace);
            deflated.finish();
            renderer.write(note.view(), note.input().project().date(), byThread, NoteRenderer.Progress.NONE, input,
                    NoteRenderer.Attachment.deflated(NoteArchive.TRACE_NAME, "Calculation trace", deflated));
        }
        assertArrayEquals(Files.readAllBytes(byOpenPdf), Files.readAllBytes(byThread));
        assertEquals(note.trace(), NoteArchive.read(byThread).trace(), "the trace comes out of the note as written");
    }
}
