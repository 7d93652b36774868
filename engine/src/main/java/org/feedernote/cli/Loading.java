package org.feedernote.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.DataGapException;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputError;
import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;
import org.feedernote.model.InputWarning;
import org.feedernote.model.Installation;

/** Reads a design input for a command, printing every error to standard error. */
final class Loading {
    private Loading() {}

    /**
     * Calculates the installation, or prints why the packaged tables cannot (a method or
     * condition they do not cover) and returns null: that is a problem of the input, exit 2.
     */
    static Result calculate(Installation inst, ReferenceData data, PrintWriter err) {
        return calculate(inst, data, err, true);
    }

    static Result calculate(Installation inst, ReferenceData data, PrintWriter err, boolean record) {
        try {
            return new Engine(data).run(inst, record);
        } catch (DataGapException e) {
            err.println(e.located() ? e.getMessage() : inst.sourceName() + ": " + e.getMessage());
            err.println("Nothing was written.");
            return null;
        }
    }

    /** A design input, or the input embedded in a note (PDF); null after the errors were printed. */
    static Installation loadAny(Path file, PrintWriter err) {
        try {
            if (Files.isRegularFile(file) && org.feedernote.archive.NoteArchive.looksLikePdf(file)) {
                org.feedernote.archive.NoteArchive note = org.feedernote.archive.NoteArchive.read(file);
                return warned(InputReader.parse(file + " (embedded input)", note.canonicalInput(), true), err);
            }
        } catch (org.feedernote.archive.NoteArchive.NotANote e) {
            err.println("feedernote: " + e.getMessage());
            return null;
        } catch (InputException e) {
            for (InputError error : e.errors()) err.println(error.text());
            return null;
        } catch (java.io.IOException e) {
            err.println("feedernote: " + file + ": " + e.getMessage());
            return null;
        }
        return load(file, err);
    }

    /** Prints the input's warnings (legal but unusual values); they change nothing else. */
    private static Installation warned(Installation inst, PrintWriter err) {
        for (InputWarning w : inst.warnings()) err.println(w.text());
        return inst;
    }

    /** The installation, or null after the errors were printed. */
    static Installation load(Path input, PrintWriter err) {
        boolean sheets = org.feedernote.input.SheetInput.isSheetInput(input);
        if (!Files.isRegularFile(input) && !(sheets && Files.exists(input))) {
            err.println("feedernote: " + input + ": no such file");
            return null;
        }
        try {
            // A workbook (.xlsx), a folder of CSV files or one of them: the same rules as YAML.
            return warned(sheets ? org.feedernote.input.SheetInput.read(input) : InputReader.read(input), err);
        } catch (InputException e) {
            for (InputError error : e.errors()) err.println(error.text());
            err.println(e.errors().size() + (e.errors().size() == 1 ? " error" : " errors") + "; nothing was written.");
            return null;
        }
    }
}
