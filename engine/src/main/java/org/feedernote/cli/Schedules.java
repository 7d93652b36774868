package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

import org.feedernote.calc.Result;
import org.feedernote.sheet.CsvWriter;
import org.feedernote.sheet.ScheduleTables;
import org.feedernote.sheet.Table;
import org.feedernote.sheet.XlsxWriter;

/** Writes tables as a workbook or as CSV files in a folder, for the commands; says why it cannot. */
final class Schedules {
    private Schedules() {}

    /** The result schedule as a workbook; false after the reason was printed. */
    static boolean xlsx(Result result, Path file, PrintWriter err) {
        return xlsx(ScheduleTables.of(result), result.input().project().date(), file, err);
    }

    static boolean xlsx(List<Table> tables, String date, Path file, PrintWriter err) {
        try {
            Files.writeAtomically(file, stream -> XlsxWriter.write(tables, date, stream));
            return true;
        } catch (IOException | RuntimeException e) {
            err.println("feedernote: cannot write " + file + ": " + e.getMessage());
            return false;
        }
    }

    static boolean csv(Result result, Path folder, PrintWriter err) {
        return csv(ScheduleTables.of(result), folder, err);
    }

    /** One file per table, named after it (spaces as '-'), in folder (made if missing). */
    static boolean csv(List<Table> tables, Path folder, PrintWriter err) {
        try {
            java.nio.file.Files.createDirectories(folder);
            for (Table t : tables) {
                String name = t.name().replace(' ', '-') + ".csv";
                Files.writeAtomically(folder.resolve(name), CsvWriter.text(t));
            }
            return true;
        } catch (IOException | RuntimeException e) {
            err.println("feedernote: cannot write the CSV files into " + folder + ": " + e.getMessage());
            return false;
        }
    }
}
