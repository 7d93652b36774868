package org.feedernote.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.data.ReferenceData;
import org.feedernote.report.NoteRenderer;
import org.feedernote.report.SelfCheckReport;
import org.feedernote.verification.SelfVerification;

@Command(name = "selfcheck", mixinStandardHelpOptions = true,
        description = "Computes every published case the program is held to (tables, worked values of the standards) and prints "
                + "each with its source, the published and the computed value, the tolerance and PASS or FAIL.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:every case passes", "1:some case fails", "2:the command line is wrong or the PDF cannot be written",
                "3:internal error (a bug; please report it)"})
final class SelfCheckCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Option(names = "--pdf", paramLabel = "FILE", description = "also write the report as a PDF, in the calculation note's style")
    Path pdf;

    @Option(names = "--json", description = "print the cases as JSON instead of the table")
    boolean json;

    @Override public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        SelfVerification v = SelfVerification.run(ReferenceData.standard());
        out.print(json ? SelfCheckReport.json(v) : SelfCheckReport.text(v));
        out.flush();
        if (pdf != null) {
            try {
                Files.writeAtomically(pdf, new NoteRenderer(null).selfCheckPdf(SelfCheckReport.view(v)));
            } catch (IOException e) {
                spec.commandLine().getErr().println("feedernote: cannot write " + pdf + ": " + e.getMessage());
                return ExitStatus.BAD_INPUT;
            }
            if (!json) out.println("Written " + pdf);
        }
        return v.allPass() ? ExitStatus.PASS : ExitStatus.FAIL;
    }
}
