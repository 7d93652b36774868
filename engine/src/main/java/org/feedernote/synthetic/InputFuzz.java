package org.feedernote.synthetic;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

import org.feedernote.cli.ExitStatus;
import org.feedernote.cli.Main;

/**
 * Runs {@code check} in process on seeded mutations of example inputs ({@link InputMutator}) and
 * judges how each run ended: never an internal error, and a refused input (exit 2) always with a
 * message naming file, line and column. FuzzedInputsTest runs a few thousand in the test suite;
 * bench/fuzz runs 100 000 through {@link #main}.
 */
public final class InputFuzz {
    private InputFuzz() {}

    /** file:line:column: at the start of a line of standard error. */
    private static final Pattern POSITIONED = Pattern.compile("(?m)^.+:\\d+:\\d+: ");

    /** How one mutated input fared: check's exit status, its standard error, what is wrong (null: nothing). */
    public record Outcome(InputMutator.Mutation mutation, long seed, int status, String err, String problem) {}

    /** What is wrong with how check ended, or null when it ended as it should. */
    public static String problem(int status, String err) {
        if (status == ExitStatus.INTERNAL) return "internal error (exit 3)";
        if (status == ExitStatus.BAD_INPUT && !POSITIONED.matcher(err).find()) return "exit 2 without a line and column";
        return null;
    }

    /** Mutates text with the seed, writes it to file and runs check on it in this process. */
    public static Outcome run(String text, long seed, Path file) throws IOException {
        InputMutator.Mutation m = InputMutator.mutate(text, seed);
        Files.writeString(file, m.text());
        StringWriter err = new StringWriter();
        int status = Main.run(new String[] {"check", file.toString()}, new PrintWriter(new StringWriter()), new PrintWriter(err));
        return new Outcome(m, seed, status, err.toString(), problem(status, err.toString()));
    }

    /**
     * Arguments: number of mutations (100 000), first seed (1), then the example inputs (default:
     * inputs/*.yaml and inputs/revisions/*.yaml). Prints the counts by exit status and every
     * problem found, and writes each problem's input to target/fuzz-findings/ to reproduce it.
     * Exit status 0 when nothing was found, 1 otherwise.
     */
    public static void main(String[] args) throws IOException {
        int count = args.length > 0 ? Integer.parseInt(args[0].replace("_", "")) : 100_000;
        long firstSeed = args.length > 1 ? Long.parseLong(args[1]) : 1;
        List<Path> examples = new ArrayList<>();
        for (int i = 2; i < args.length; i++) examples.add(Path.of(args[i]));
        if (examples.isEmpty()) {
            for (String folder : new String[] {"inputs", "inputs/revisions"}) {
                try (var files = Files.list(Path.of(folder))) {
                    files.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(examples::add);
                }
            }
        }
        List<String> texts = new ArrayList<>();
        for (Path p : examples) texts.add(Files.readString(p));
        Path scratch = Files.createTempFile("feedernote-fuzz", ".yaml");
        Path findings = Path.of("target", "fuzz-findings");
        int[] byStatus = new int[4];
        int problems = 0;
        long t0 = System.nanoTime();
        try {
            for (int i = 0; i < count; i++) {
                long seed = firstSeed + i;
                int which = i % texts.size();
                Outcome o = run(texts.get(which), seed, scratch);
                if (o.status() >= 0 && o.status() < byStatus.length) byStatus[o.status()]++;
                if (o.problem() != null) {
                    problems++;
                    Files.createDirectories(findings);
                    Path kept = findings.resolve("seed-" + seed + ".yaml");
                    Files.writeString(kept, o.mutation().text());
                    System.out.println("PROBLEM " + o.problem() + ": " + examples.get(which) + ", seed " + seed + " ("
                            + o.mutation().description() + "), input kept as " + kept);
                    System.out.print(o.err().indent(4));
                }
                if ((i + 1) % 10_000 == 0) {
                    System.out.printf(Locale.ROOT, "%d mutations, %d problems, %.0f s%n", i + 1, problems, (System.nanoTime() - t0) / 1e9);
                }
            }
        } finally {
            Files.deleteIfExists(scratch);
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        System.out.printf(Locale.ROOT, "%d mutations of %d inputs, seeds %d to %d, in %.0f s (%.1f ms each)%n", count, texts.size(),
                firstSeed, firstSeed + count - 1, seconds, seconds * 1000 / Math.max(1, count));
        System.out.printf(Locale.ROOT, "exit 0 (pass): %d; exit 1 (some check fails): %d; exit 2 (input refused): %d; exit 3 (internal error): %d%n",
                byStatus[0], byStatus[1], byStatus[2], byStatus[3]);
        System.out.println(problems == 0 ? "no problems found" : problems + " problem(s) found");
        System.exit(problems == 0 ? 0 : 1);
    }
}
