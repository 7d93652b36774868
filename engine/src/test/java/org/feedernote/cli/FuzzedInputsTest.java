package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.Fixtures;
import org.feedernote.synthetic.InputFuzz;

/**
 * Whatever is done to a good input, check never fails with an internal error, and when it refuses
 * the input (exit 2) it says where: a message with file, line and column. Seeded mutations of the
 * examples (numbers replaced by extremes, keys deleted, misspelt or given twice, values of the
 * wrong type, lines deleted, repeated or indented, characters inserted); bench/fuzz runs 100 000.
 */
class FuzzedInputsTest {
    private static final int MUTATIONS_PER_EXAMPLE = 750;
    private static final long SEED = 20_261_203L;

    @Test
    void checkNeverFailsInternallyAndAlwaysSaysWhereTheInputIsWrong(@TempDir Path dir) throws Exception {
        List<String> problems = new ArrayList<>();
        List<Path> examples = Fixtures.examples().toList();
        Path input = dir.resolve("mutated.yaml");
        int run = 0;
        for (Path example : examples) {
            String text = Files.readString(example);
            for (int i = 0; i < MUTATIONS_PER_EXAMPLE; i++) {
                InputFuzz.Outcome o = InputFuzz.run(text, SEED + run++, input);
                if (o.problem() != null) {
                    problems.add(example.getFileName() + ", seed " + o.seed() + " (" + o.mutation().description() + "): "
                            + o.problem() + "\n" + o.err());
                }
            }
        }
        assertTrue(problems.isEmpty(), problems.size() + " of " + run + " mutations:\n"
                + String.join("\n", problems.subList(0, Math.min(5, problems.size()))));
    }
}
