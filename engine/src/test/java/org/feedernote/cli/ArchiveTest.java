package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.Fixtures;

/** The archive: notes that verify, tampering detected, revisions compared, safe writes. */
class ArchiveTest {
    @TempDir static Path dir;
    static Path note;

    @BeforeAll
    static void writeNote() {
        CommandLineTest.Run r = CommandLineTest.run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "-o", dir.toString());
        assertEquals(0, r.status(), r.err());
        note = dir.resolve("KLB-E-CN-001-A.pdf");
    }

    @Test
    void aFreshNoteVerifies() {
        CommandLineTest.Run r = CommandLineTest.run("verify", note.toString());
        assertEquals(0, r.status(), r.out() + r.err());
        assertTrue(r.out().startsWith("verified:"), r.out());
    }

    @Test
    void aDraftNoteVerifiesToo() throws IOException {
        Path draft = dir.resolve("draft.yaml");
        java.nio.file.Files.writeString(draft, java.nio.file.Files.readString(Fixtures.inputs().resolve("bakery-small.yaml"))
                .replace("status: for-review", "status: draft"));
        Path out = dir.resolve("draft");
        assertEquals(0, CommandLineTest.run("note", draft.toString(), "-o", out.toString()).status());
        CommandLineTest.Run r = CommandLineTest.run("verify", out.resolve("KLB-E-CN-001-A.pdf").toString());
        assertEquals(0, r.status(), "the draft mark must not make the bytes depend on the process: " + r.out());
    }

    /** A copy of the note with the embedded files whose names are accepted edited as text (the PDF saved by PDFBox). */
    private static Path altered(String name, java.util.function.Predicate<String> files,
                                java.util.function.UnaryOperator<String> edit) throws IOException {
        Path altered = dir.resolve(name);
        try (PDDocument doc = Loader.loadPDF(note.toFile())) {
            Map<String, PDComplexFileSpecification> specs = doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames();
            for (PDComplexFileSpecification spec : specs.values()) {
                if (!files.test(spec.getFilename())) continue;
                PDEmbeddedFile ef = spec.getEmbeddedFile();
                String text = new String(ef.toByteArray(), StandardCharsets.UTF_8);
                String changed = edit.apply(text);
                assertNotEquals(text, changed, "the edit changes " + spec.getFilename());
                try (var out = ef.getCOSObject().createOutputStream()) {
                    out.write(changed.getBytes(StandardCharsets.UTF_8));
                }
            }
            doc.save(altered.toFile());
        }
        return altered;
    }

    @Test
    void aNoteWhoseEmbeddedInputWasAlteredFails() throws Exception {
        Path altered = altered("altered.pdf", name -> !name.equals(org.feedernote.archive.NoteArchive.TRACE_NAME),
                text -> text.replace("\"length_m\":24", "\"length_m\":25").replace("length_m: 24", "length_m: 25"));
        CommandLineTest.Run r = CommandLineTest.run("verify", altered.toString());
        assertEquals(1, r.status(), r.out() + r.err());
        assertTrue(r.out().contains("fingerprint"), r.out());
        assertTrue(r.out().contains("L-SHOP"), "the changed circuit is named: " + r.out());
    }

    @Test
    void aNoteWhoseEmbeddedTraceWasAlteredFailsNamingTheStep() throws Exception {
        // The supply's nominal line voltage, the first step of the trace.
        Path altered = altered("altered-trace.pdf", org.feedernote.archive.NoteArchive.TRACE_NAME::equals,
                text -> text.replaceFirst("\"value\" : 400.0,", "\"value\" : 401.0,"));
        CommandLineTest.Run r = CommandLineTest.run("verify", altered.toString());
        assertEquals(1, r.status(), r.out() + r.err());
        assertTrue(r.out().contains("supply: Nominal line voltage U (supply/U): recorded 401.0 V, recomputed 400.0 V"), r.out());
    }

    @Test
    void aTruncatedOrNonPdfFileExitsTwo() throws IOException {
        Path truncated = dir.resolve("truncated.pdf");
        byte[] bytes = java.nio.file.Files.readAllBytes(note);
        java.nio.file.Files.write(truncated, java.util.Arrays.copyOf(bytes, bytes.length / 3));
        CommandLineTest.Run t = CommandLineTest.run("verify", truncated.toString());
        assertEquals(2, t.status());
        assertTrue(t.err().contains("damaged") || t.err().contains("not a feedernote note"), t.err());
        CommandLineTest.Run y = CommandLineTest.run("verify", Fixtures.inputs().resolve("bakery-small.yaml").toString());
        assertEquals(2, y.status());
        assertTrue(y.err().contains("not a PDF"), y.err());
        assertFalse(y.err().contains("Exception"), "no stack trace");
    }

    @Test
    void diffOfTwoRevisionsNamesWhatChanged() {
        CommandLineTest.Run r = CommandLineTest.run("diff", Fixtures.inputs().resolve("bakery-small.yaml").toString(),
                Fixtures.inputs().resolve("revisions/bakery-small-rev-b.yaml").toString());
        assertEquals(1, r.status());
        assertTrue(r.out().contains("M-PRV: circuit added"), r.out());
        assertTrue(r.out().contains("M-OVEN: cable size: 6 mm² → 10 mm²"), r.out());
        assertTrue(r.out().contains("L-SHOP: length_m: 24 → 38"), r.out());
        CommandLineTest.Run same = CommandLineTest.run("diff", note.toString(), Fixtures.inputs().resolve("bakery-small.yaml").toString());
        assertEquals(0, same.status(), "a note and its own input do not differ: " + same.out());
        CommandLineTest.Run json = CommandLineTest.run("diff", "--json", Fixtures.inputs().resolve("bakery-small.yaml").toString(),
                Fixtures.inputs().resolve("revisions/bakery-small-rev-b.yaml").toString());
        assertTrue(json.out().contains("\"added\""), json.out());
    }

    /** A copy of a note with one byte of its subject line changed: the PDF still reads, its bytes differ. */
    static Path withOneByteEdited(Path pdf, Path copy) throws IOException {
        byte[] bytes = java.nio.file.Files.readAllBytes(pdf);
        byte[] marker = "/Subject(Calculation note".getBytes(StandardCharsets.ISO_8859_1);
        int at = indexOf(bytes, marker);
        assertTrue(at >= 0, "the note has a subject line");
        int letter = at + "/Subject(C".length();
        bytes[letter] = (byte) (bytes[letter] == 'a' ? 'e' : 'a');
        java.nio.file.Files.write(copy, bytes);
        return copy;
    }

    private static int indexOf(byte[] haystack, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= haystack.length; i++) {
            for (int j = 0; j < needle.length; j++) if (haystack[i + j] != needle[j]) continue outer;
            return i;
        }
        return -1;
    }

    /** A note verifies; the same note with one byte edited is reported as differing (exit status 1). */
    static void verifiesAndDetectsAnEditedByte(Path pdf) throws IOException {
        CommandLineTest.Run ok = CommandLineTest.run("verify", pdf.toString());
        assertEquals(0, ok.status(), pdf + ": " + ok.out() + ok.err());
        assertTrue(ok.out().contains("byte-identical"), ok.out());
        Path edited = withOneByteEdited(pdf, pdf.resolveSibling("edited-" + pdf.getFileName()));
        CommandLineTest.Run bad = CommandLineTest.run("verify", edited.toString());
        assertEquals(1, bad.status(), edited + ": " + bad.out() + bad.err());
        assertTrue(bad.out().contains("bytes differ"), bad.out());
    }

    @Test
    void theCompactNoteVerifiesAndAnEditedByteIsFound() throws IOException {
        verifiesAndDetectsAnEditedByte(note);
    }

    @Test
    void theFullWorkingVerifiesInBothFormsAndAnEditedByteIsFound() throws IOException {
        Path full = dir.resolve("full");
        CommandLineTest.Run r = CommandLineTest.run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "-o", full.toString(),
                "--detail", "full");
        assertEquals(0, r.status(), r.err());
        verifiesAndDetectsAnEditedByte(full.resolve("KLB-E-CN-001-A.pdf"));
        Path some = dir.resolve("some");
        r = CommandLineTest.run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "-o", some.toString(),
                "--detail", "full", "--circuits", "L-SHOP,M-MIX");
        assertEquals(0, r.status(), r.err());
        verifiesAndDetectsAnEditedByte(some.resolve("KLB-E-CN-001-A.pdf"));
        assertTrue(java.nio.file.Files.size(full.resolve("KLB-E-CN-001-A.pdf")) > java.nio.file.Files.size(some.resolve("KLB-E-CN-001-A.pdf")));
    }

    @Test
    void detailOptionsThatMakeNoSenseAreRefused() {
        String input = Fixtures.inputs().resolve("bakery-small.yaml").toString();
        CommandLineTest.Run r = CommandLineTest.run("note", input, "-o", dir.resolve("x").toString(), "--detail", "brief");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("expected compact or full"), r.err());
        r = CommandLineTest.run("note", input, "-o", dir.resolve("x").toString(), "--circuits", "L-SHOP");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("--detail full"), r.err());
        r = CommandLineTest.run("note", input, "-o", dir.resolve("x").toString(), "--detail", "full", "--circuits", "L-NONE");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("no circuit L-NONE"), r.err());
    }

    @Test
    void aNoteForADifferentCalculationIsNotOverwrittenWithoutForce() throws IOException {
        Path other = dir.resolve("other");
        java.nio.file.Files.createDirectories(other);
        java.nio.file.Files.copy(note, other.resolve("KLB-E-CN-001-A.pdf"));
        Path changed = dir.resolve("changed.yaml");
        java.nio.file.Files.writeString(changed, java.nio.file.Files.readString(Fixtures.inputs().resolve("bakery-small.yaml"))
                .replace("length_m: 24", "length_m: 25"));
        CommandLineTest.Run refused = CommandLineTest.run("note", changed.toString(), "-o", other.toString());
        assertEquals(2, refused.status());
        assertTrue(refused.err().contains("--force"), refused.err());
        assertEquals(0, CommandLineTest.run("note", changed.toString(), "-o", other.toString(), "--force").status());
    }

    @Test
    void theNoteListsTheChangesSinceThePreviousRevision() throws Exception {
        Path out = dir.resolve("rev-b");
        CommandLineTest.Run r = CommandLineTest.run("note", Fixtures.inputs().resolve("revisions/bakery-small-rev-b.yaml").toString(),
                "-o", out.toString(), "--previous", note.toString());
        assertEquals(0, r.status(), r.err());
        try (PDDocument doc = Loader.loadPDF(out.resolve("KLB-E-CN-001-B.pdf").toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertTrue(text.contains("Changes since revision A"), "section present");
            assertTrue(text.contains("M-PRV: circuit added"));
            assertFalse(text.contains("[{"), "the changes are written out, never as JSON");
        }
        // The note carries the changes it lists, so that it can be written again byte for byte.
        verifiesAndDetectsAnEditedByte(out.resolve("KLB-E-CN-001-B.pdf"));
    }

    @Test
    void aWriteThatDiesLeavesNoPartialFile(@TempDir Path target) {
        Path file = target.resolve("note.pdf");
        assertThrows(IOException.class, () -> Files.writeAtomically(file, out -> {
            out.write(new byte[1000]);
            throw new IOException("killed");
        }));
        assertFalse(java.nio.file.Files.exists(file));
        assertEquals(0, target.toFile().list().length, "no temporary file is left behind");
    }

    @Test
    void aPairOfFilesIsReplacedTogetherOrNotAtAll(@TempDir Path target) throws IOException {
        Path trace = target.resolve("note.trace.json");
        Path note = target.resolve("note.pdf");
        java.nio.file.Files.writeString(trace, "old trace");
        java.nio.file.Files.writeString(note, "old note");
        assertThrows(IOException.class, () -> {
            try (Files.Staged staged = Files.stage(trace, out -> out.write("new trace".getBytes()))) {
                Files.writeAtomically(note, out -> {
                    throw new IOException("the note failed");
                });
                staged.putInPlace();
            }
        });
        assertEquals("old trace", java.nio.file.Files.readString(trace), "the trace is not replaced without its note");
        assertEquals("old note", java.nio.file.Files.readString(note));
        assertEquals(2, target.toFile().list().length, "no temporary file is left behind");
    }
}
