package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.input.InputException;
import org.feedernote.input.InputReader;
import org.feedernote.input.InputYaml;
import org.feedernote.input.Node;
import org.feedernote.input.SheetInput;
import org.feedernote.model.Installation;
import org.feedernote.sheet.InputTables;
import org.feedernote.sheet.Table;

@Command(name = "workbook", mixinStandardHelpOptions = true,
        description = {"Writes a design input as a spreadsheet: without INPUT, an empty workbook (the template: every key as a column "
                + "with its unit, a comment and, for words and sizes, a list to choose from); with INPUT, that input.",
                "With -o FILE.yaml it writes the input (a workbook, CSV files, YAML or JSON) as YAML instead."},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:written", "2:the input or the command line is wrong; nothing written", "3:internal error (a bug; please report it)"})
final class WorkbookCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "INPUT", description = "design input (YAML, JSON, .xlsx, or CSV files); none: the empty template")
    Path input;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "FILE.xlsx: the workbook; FILE.yaml or .yml: the input as YAML")
    Path output;

    @Option(names = "--csv", paramLabel = "DIR", description = "write project.csv, boards.csv and circuits.csv into DIR instead")
    Path csv;

    @Override public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if ((output == null) == (csv == null)) {
            err.println("feedernote: give one of -o FILE (.xlsx or .yaml) and --csv DIR");
            return ExitStatus.BAD_INPUT;
        }
        String kind = output == null ? "csv" : extension(output);
        if (!List.of("csv", "xlsx", "yaml", "yml").contains(kind)) {
            err.println("feedernote: -o " + output + ": expected a file ending in .xlsx, .yaml or .yml");
            return ExitStatus.BAD_INPUT;
        }
        Node tree = null;
        String date = "2000-01-01";
        if (input != null) {
            Installation inst = Loading.load(input, err);
            if (inst == null) return ExitStatus.BAD_INPUT;
            tree = tree(inst);
            date = inst.project().date();
        } else if (kind.startsWith("y")) {
            err.println("feedernote: writing YAML needs an INPUT");
            return ExitStatus.BAD_INPUT;
        }
        List<Table> tables = input == null ? InputTables.template() : InputTables.of(tree);
        boolean ok;
        switch (kind) {
            case "xlsx":
                ok = Schedules.xlsx(tables, date, output, err);
                break;
            case "csv":
                ok = Schedules.csv(tables, csv, err);
                break;
            default:
                Files.writeAtomically(output, InputYaml.write(tree));
                ok = true;
                break;
        }
        if (!ok) return ExitStatus.BAD_INPUT;
        out.println("wrote " + (output != null ? output : csv));
        return ExitStatus.PASS;
    }

    /** The input's located tree: read again from the text it was read from (a workbook's is its YAML form). */
    private Node tree(Installation inst) {
        boolean json = !SheetInput.isSheetInput(input) && input.toString().toLowerCase(Locale.ROOT).endsWith(".json");
        try {
            return InputReader.tree(inst.sourceName(), inst.sourceText(), json);
        } catch (InputException e) {
            throw new IllegalStateException("an input read once could not be read again", e);
        }
    }

    private static String extension(Path p) {
        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
        int dot = n.lastIndexOf('.');
        return dot < 0 ? "" : n.substring(dot + 1);
    }
}
