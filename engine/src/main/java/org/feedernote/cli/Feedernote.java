package org.feedernote.cli;

import picocli.CommandLine.Command;

import org.feedernote.Version;

@Command(name = "feedernote", mixinStandardHelpOptions = true, versionProvider = Feedernote.VersionProvider.class,
        description = "Checks low-voltage installation designs and writes worked, traced calculation notes.%n"
                + "It supports, and does not replace, the judgement of a competent, licensed person; the applicable "
                + "local code and the manufacturer's data govern.",
        subcommands = {CheckCommand.class, NoteCommand.class, VerifyCommand.class, DiffCommand.class, SchemaCommand.class, GenerateCommand.class, SelfCheckCommand.class, WorkbookCommand.class},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:every check passes", "1:some check fails", "2:the input or the command line is wrong",
                "3:internal error (a bug; please report it)"})
public final class Feedernote implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    static final class VersionProvider implements picocli.CommandLine.IVersionProvider {
        @Override public String[] getVersion() {
            return new String[] {"feedernote " + Version.engine() + " (reference data "
                    + org.feedernote.data.ReferenceData.standard().version() + ")"};
        }
    }
}
