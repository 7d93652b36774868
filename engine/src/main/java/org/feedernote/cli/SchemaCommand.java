package org.feedernote.cli;

import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.feedernote.input.JsonSchemaWriter;

@Command(name = "schema", mixinStandardHelpOptions = true,
        description = "Prints the JSON Schema of the design input (format 1), for editors and validators.")
final class SchemaCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Override public Integer call() {
        spec.commandLine().getOut().print(JsonSchemaWriter.schema());
        return ExitStatus.PASS;
    }
}
