package org.feedernote.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.archive.Revisions;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Installation;

@Command(name = "diff", mixinStandardHelpOptions = true,
        description = "Shows what changed between two revisions of a design (inputs or notes): verdicts, circuits, sizes, inputs, figures.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:no changes", "1:changes found", "2:an input or the command line is wrong", "3:internal error (a bug; please report it)"})
final class DiffCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OLD", description = "earlier revision: design input or note (PDF)")
    Path before;

    @Parameters(index = "1", paramLabel = "NEW", description = "later revision: design input or note (PDF)")
    Path after;

    @Option(names = "--json", description = "print the changes as JSON")
    boolean json;

    @Override public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Installation a = Loading.loadAny(before, err);
        Installation b = Loading.loadAny(after, err);
        if (a == null || b == null) return ExitStatus.BAD_INPUT;
        ReferenceData data = ReferenceData.standard();
        Result ra = Loading.calculate(a, data, err);
        Result rb = Loading.calculate(b, data, err);
        if (ra == null || rb == null) return ExitStatus.BAD_INPUT;
        Revisions.Report report = Revisions.compare(before.getFileName().toString(), a, ra, after.getFileName().toString(), b, rb);
        out.print(json ? Revisions.json(report) : Revisions.text(report));
        return report.empty() ? ExitStatus.PASS : ExitStatus.FAIL;
    }
}
