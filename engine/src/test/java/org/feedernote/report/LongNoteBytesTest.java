package org.feedernote.report;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.Version;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.Canonical;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;
import org.feedernote.report.view.NoteView;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * A note archived with the project record must be reproducible byte for byte. A long note is
 * streamed to its file, and the bytes OpenPDF writes on closing (font-subset tags among them) are
 * pinned afterwards: the note of a generated installation (invented data) rendered twice is the
 * same file.
 */
class LongNoteBytesTest {
    private static final Pattern SUBSET = Pattern.compile("/([A-Z]{6})\\+Liberation");

    @Test
    void aLongNoteStreamedToAFileIsTheSameBytesEveryTime(@TempDir Path dir) throws Exception {
        Installation inst = InputReader.parse("synthetic.json", SyntheticInstallation.toJson(SyntheticInstallation.generate(200, 2)), true);
        ReferenceData data = ReferenceData.standard();
        Result result = new Engine(data).run(inst, true);
        String fingerprint = Canonical.fingerprint(inst.canonicalJson(), Version.engine(), data.version());
        NoteView view = NoteBuilder.build(result, data, fingerprint, Version.engine());
        NoteRenderer renderer = new NoteRenderer(null);
        Path first = dir.resolve("first.pdf");
        Path second = dir.resolve("second.pdf");
        renderer.write(view, inst.project().date(), first, NoteRenderer.Progress.NONE);
        renderer.write(view, inst.project().date(), second, NoteRenderer.Progress.NONE);
        byte[] a = Files.readAllBytes(first);
        assertTrue(SUBSET.matcher(new String(a, StandardCharsets.ISO_8859_1)).find(), "the note embeds subset fonts");
        assertArrayEquals(a, Files.readAllBytes(second), "two renders of one note differ");
    }
}
