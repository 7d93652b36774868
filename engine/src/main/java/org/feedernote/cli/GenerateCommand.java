package org.feedernote.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.synthetic.SyntheticInstallation;

@Command(name = "generate", mixinStandardHelpOptions = true,
        description = "Writes a synthetic installation (invented data, for benchmarks and scale tests). The same seed gives the same file.")
final class GenerateCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Option(names = "--circuits", required = true, paramLabel = "N", description = "number of circuits")
    int circuits;

    @Option(names = "--seed", paramLabel = "S", description = "random seed (default: 1)")
    long seed = 1;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "write to FILE instead of standard output")
    Path output;

    @Option(names = "--json", description = "write JSON instead of YAML (the same design input; faster to read for very large files)")
    boolean json;

    @Override public Integer call() throws IOException {
        if (circuits < 1) {
            spec.commandLine().getErr().println("feedernote: --circuits must be at least 1");
            return ExitStatus.BAD_INPUT;
        }
        String text = SyntheticInstallation.generate(circuits, seed);
        if (json) text = SyntheticInstallation.toJson(text);
        if (output == null) spec.commandLine().getOut().print(text);
        else Files.writeAtomically(output, text);
        return ExitStatus.PASS;
    }
}
