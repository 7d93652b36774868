package org.feedernote.report.pdf;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfEFStream;
import com.lowagie.text.pdf.PdfEncodings;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfIndirectReference;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfNumber;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.PdfWriter;

/**
 * An embedded file whose content is already deflated (a {@link DeflatingFile}): the same objects,
 * in the same order, as OpenPDF's {@code PdfFileSpecification.fileEmbedded} writes for a file it
 * compresses itself, with the compressed bytes copied instead of compressed again. LongNoteBytesTest
 * holds the two to the same bytes.
 */
public final class DeflatedAttachment extends PdfFileSpecification {

    private DeflatedAttachment(PdfWriter writer) {
        this.writer = writer;
    }

    /**
     * @param deflated the file's content in zlib's format
     * @param length   the length of the content before compression (the embedded file's /Size)
     */
    public static PdfFileSpecification embed(PdfWriter writer, Path deflated, String name, long length) throws IOException {
        DeflatedAttachment spec = new DeflatedAttachment(writer);
        spec.put(PdfName.F, new PdfString(name));
        spec.setUnicodeFileName(name, !PdfEncodings.isPdfDocEncoding(name));
        PdfIndirectReference parameters = writer.getPdfIndirectReference();
        PdfIndirectReference content;
        try (InputStream in = Files.newInputStream(deflated)) {
            Stream stream = new Stream(in, writer, length);
            stream.put(PdfName.TYPE, PdfName.EMBEDDEDFILE);
            PdfDictionary params = new PdfDictionary();
            stream.put(PdfName.PARAMS, parameters);
            content = writer.addToBody(stream).getIndirectReference();
            stream.writeLength();
            params.put(PdfName.SIZE, new PdfNumber(stream.getRawLength()));
            writer.addToBody(params, parameters);
        }
        PdfDictionary files = new PdfDictionary();
        files.put(PdfName.F, content);
        files.put(PdfName.UF, content);
        spec.put(PdfName.EF, files);
        return spec;
    }

    /** The embedded file's stream: the deflated bytes as they are, marked as deflated. */
    private static final class Stream extends PdfEFStream {
        private final long length;

        Stream(InputStream deflated, PdfWriter writer, long length) {
            super(deflated, writer);
            this.length = length;
        }

        /** The length before compression, where OpenPDF would count the bytes it compressed. */
        @Override public long getRawLength() {
            return length;
        }

        @Override public void toPdf(PdfWriter writer, OutputStream os) throws IOException {
            // Where OpenPDF marks a stream it compresses while writing it.
            put(PdfName.FILTER, PdfName.FLATEDECODE);
            super.toPdf(writer, os);
        }
    }
}
