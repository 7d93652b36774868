package org.feedernote.archive;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;

/**
 * What a feedernote note carries inside it: the canonical input, the input as written and the
 * trace as embedded files, and the fingerprint in its metadata. The trace (hundreds of megabytes
 * for a large installation) is not read with the rest: {@link #openTrace()} streams it from the
 * note when it is wanted.
 */
public record NoteArchive(Path file, String canonicalInput, String fingerprint, String engineVersion,
                          String sourceText, String inputFile, String changesSince, List<String> changes,
                          Map<String, byte[]> templates, String detail) {

    public static final String INPUT_NAME = "input.canonical.json";
    public static final String TRACE_NAME = "trace.json";
    public static final String SOURCE_NAME = "input.source.txt";
    /**
     * A note written against an earlier revision carries that revision's name and the changes it
     * lists (one per line, the name first), so that verify writes the same note again.
     */
    public static final String CHANGES_NAME = "changes-since.txt";
    /** A note written with its own templates carries each of them under this prefix, for the same reason. */
    public static final String TEMPLATE_PREFIX = "template/";

    /** The changes record: the revision compared with on the first line, then one change a line. */
    public static byte[] changesRecord(String since, List<String> changes) {
        StringBuilder b = new StringBuilder(since).append('\n');
        for (String c : changes) b.append(c.replace('\n', ' ')).append('\n');
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

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
        try {
            if (!looksLikePdf(file)) throw new NotANote(file + ": not a PDF file");
        } catch (IOException e) {
            throw new NotANote(file + ": cannot read the file (" + e.getMessage() + ")");
        }
        // Loaded from the file, not from its bytes: PDFBox then reads the objects it is asked for.
        try (PDDocument doc = Loader.loadPDF(file.toFile())) {
            Map<String, PDComplexFileSpecification> files = embeddedFiles(doc);
            if (!files.containsKey(INPUT_NAME) || !files.containsKey(TRACE_NAME)) {
                throw new NotANote(file + ": a PDF, but not a feedernote note (it carries no embedded design input and trace)");
            }
            String input = text(files.get(INPUT_NAME), file);
            embedded(files.get(TRACE_NAME), file); // present, not read: openTrace streams it
            PDDocumentInformation info = doc.getDocumentInformation();
            String fingerprint = info.getCustomMetadataValue("Fingerprint");
            String engine = info.getCustomMetadataValue("EngineVersion");
            String inputFile = info.getCustomMetadataValue("InputFile");
            String detail = info.getCustomMetadataValue("Detail");
            if (fingerprint == null) throw new NotANote(file + ": the note's metadata carries no fingerprint");
            String source = files.containsKey(SOURCE_NAME) ? text(files.get(SOURCE_NAME), file) : null;
            String since = null;
            List<String> changes = List.of();
            if (files.containsKey(CHANGES_NAME)) {
                List<String> lines = List.of(text(files.get(CHANGES_NAME), file).split("\n", -1));
                since = lines.get(0);
                changes = lines.subList(1, lines.size()).stream().filter(l -> !l.isEmpty()).toList();
            }
            Map<String, byte[]> templates = new java.util.TreeMap<>();
            for (var e : files.entrySet()) {
                if (e.getKey().startsWith(TEMPLATE_PREFIX)) {
                    templates.put(e.getKey().substring(TEMPLATE_PREFIX.length()), embedded(e.getValue(), file).toByteArray());
                }
            }
            return new NoteArchive(file, input, fingerprint, engine == null ? "" : engine, source,
                    inputFile == null ? "input" : inputFile, since, changes, Map.copyOf(templates),
                    detail == null ? "full" : detail);
        } catch (IOException e) {
            throw new NotANote(file + ": damaged or truncated PDF (" + e.getMessage() + ")");
        }
    }

    /**
     * The embedded trace, decoded as it is read; closing the stream closes the note again.
     *
     * @throws NotANote where the note no longer reads as it did (changed or removed since)
     */
    public InputStream openTrace() throws NotANote {
        PDDocument doc;
        try {
            doc = Loader.loadPDF(file.toFile());
        } catch (IOException e) {
            throw new NotANote(file + ": damaged or truncated PDF (" + e.getMessage() + ")");
        }
        boolean handedOver = false;
        try {
            PDComplexFileSpecification spec = embeddedFiles(doc).get(TRACE_NAME);
            if (spec == null) throw new NotANote(file + ": the note carries no embedded trace");
            InputStream trace = new java.io.FilterInputStream(decoded(embedded(spec, file), file)) {
                @Override public void close() throws IOException {
                    try {
                        super.close();
                    } finally {
                        doc.close();
                    }
                }
            };
            handedOver = true;
            return trace;
        } catch (IOException e) {
            throw new NotANote(file + ": damaged or truncated PDF (" + e.getMessage() + ")");
        } finally {
            if (!handedOver) {
                try {
                    doc.close();
                } catch (IOException ignored) {
                    // the first failure is the one reported
                }
            }
        }
    }

    /** The embedded trace as text, whole (for small notes; a large one is read with {@link #openTrace()}). */
    public String trace() throws NotANote, IOException {
        try (InputStream in = openTrace()) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /**
     * The embedded file's content, inflated here as it is read from the note rather than by
     * PDFBox, which decodes a whole stream into memory before the first byte is read.
     */
    private static InputStream decoded(PDEmbeddedFile ef, Path file) throws IOException, NotANote {
        org.apache.pdfbox.cos.COSStream stream = ef.getCOSObject();
        List<COSName> filters = ef.getFilters();
        if (filters.isEmpty()) return stream.createRawInputStream();
        if (filters.size() == 1 && COSName.FLATE_DECODE.equals(filters.get(0)) && stream.getDictionaryObject(COSName.DECODE_PARMS) == null) {
            return new java.util.zip.InflaterInputStream(stream.createRawInputStream(), new java.util.zip.Inflater(), 1 << 16) {
                @Override public void close() throws IOException {
                    try {
                        super.close();
                    } finally {
                        inf.end();
                    }
                }
            };
        }
        // Not as feedernote writes it; PDFBox decodes whatever else a PDF may hold.
        return stream.createInputStream();
    }

    private static Map<String, PDComplexFileSpecification> embeddedFiles(PDDocument doc) throws IOException {
        PDDocumentNameDictionary names = doc.getDocumentCatalog().getNames();
        PDEmbeddedFilesNameTreeNode tree = names == null ? null : names.getEmbeddedFiles();
        Map<String, PDComplexFileSpecification> files = new java.util.HashMap<>();
        if (tree != null) collect(tree, files);
        return files;
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

    private static PDEmbeddedFile embedded(PDComplexFileSpecification spec, Path file) throws NotANote {
        PDEmbeddedFile ef = spec.getEmbeddedFile() != null ? spec.getEmbeddedFile() : spec.getEmbeddedFileUnicode();
        if (ef == null) throw new NotANote(file + ": embedded file " + spec.getFilename() + " is empty");
        return ef;
    }

    private static String text(PDComplexFileSpecification spec, Path file) throws IOException, NotANote {
        return new String(embedded(spec, file).toByteArray(), StandardCharsets.UTF_8);
    }
}
