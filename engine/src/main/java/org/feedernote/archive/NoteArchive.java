package org.feedernote.archive;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;

/**
 * What a feedernote note carries inside it: the canonical input and the trace as embedded files,
 * and the fingerprint in its metadata.
 */
public record NoteArchive(String canonicalInput, String trace, String fingerprint, String engineVersion,
                          String sourceText, String inputFile) {

    public static final String INPUT_NAME = "input.canonical.json";
    public static final String TRACE_NAME = "trace.json";
    public static final String SOURCE_NAME = "input.source.txt";

    /** Thrown when a file is not a feedernote note, or is damaged. */
    public static final class NotANote extends Exception {
        public NotANote(String message) {
            super(message);
        }
    }

    public static boolean looksLikePdf(Path file) throws IOException {
        try (var in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(5);
            return new String(head, StandardCharsets.ISO_8859_1).equals("%PDF-");
        }
    }

    public static NoteArchive read(Path file) throws NotANote {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new NotANote(file + ": cannot read the file (" + e.getMessage() + ")");
        }
        if (bytes.length < 5 || !new String(bytes, 0, 5, StandardCharsets.ISO_8859_1).equals("%PDF-")) {
            throw new NotANote(file + ": not a PDF file");
        }
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            PDDocumentNameDictionary names = doc.getDocumentCatalog().getNames();
            PDEmbeddedFilesNameTreeNode tree = names == null ? null : names.getEmbeddedFiles();
            Map<String, PDComplexFileSpecification> files = new java.util.HashMap<>();
            if (tree != null) collect(tree, files);
            if (!files.containsKey(INPUT_NAME) || !files.containsKey(TRACE_NAME)) {
                throw new NotANote(file + ": a PDF, but not a feedernote note (it carries no embedded design input and trace)");
            }
            String input = text(files.get(INPUT_NAME), file);
            String trace = text(files.get(TRACE_NAME), file);
            PDDocumentInformation info = doc.getDocumentInformation();
            String fingerprint = info.getCustomMetadataValue("Fingerprint");
            String engine = info.getCustomMetadataValue("EngineVersion");
            String inputFile = info.getCustomMetadataValue("InputFile");
            if (fingerprint == null) throw new NotANote(file + ": the note's metadata carries no fingerprint");
            String source = files.containsKey(SOURCE_NAME) ? text(files.get(SOURCE_NAME), file) : null;
            return new NoteArchive(input, trace, fingerprint, engine == null ? "" : engine, source,
                    inputFile == null ? "input" : inputFile);
        } catch (IOException e) {
            throw new NotANote(file + ": damaged or truncated PDF (" + e.getMessage() + ")");
        }
    }

    /** File specifications by file name, from every leaf of the name tree. */
    private static void collect(org.apache.pdfbox.pdmodel.common.PDNameTreeNode<PDComplexFileSpecification> node,
                                Map<String, PDComplexFileSpecification> out) throws IOException {
        Map<String, PDComplexFileSpecification> names = node.getNames();
        if (names != null) {
            for (PDComplexFileSpecification spec : names.values()) {
                String name = spec.getFileUnicode() != null ? spec.getFileUnicode() : spec.getFilename();
                if (name != null) out.put(name, spec);
            }
        }
        if (node.getKids() != null) for (var kid : node.getKids()) collect(kid, out);
    }

    private static String text(PDComplexFileSpecification spec, Path file) throws IOException, NotANote {
        PDEmbeddedFile ef = spec.getEmbeddedFile() != null ? spec.getEmbeddedFile() : spec.getEmbeddedFileUnicode();
        if (ef == null) throw new NotANote(file + ": embedded file " + spec.getFilename() + " is empty");
        return new String(ef.toByteArray(), StandardCharsets.UTF_8);
    }
}
