package org.feedernote.bench;

import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * Two builds of the engine in one process, each in its own class loader, run by turns on the same
 * design input: the fairest comparison this shared machine allows. Runs of the two builds a minute
 * apart differ by 20–30 % with the machine alone; taken by turns in the same process, both see
 * the same state of the machine, and the JIT compiles each build's code the same way.
 *
 * <pre>java -cp bench/target/benchmarks.jar org.feedernote.bench.CompareBuilds A.jar B.jar INPUT [runs] [--traced]</pre>
 *
 * Prints the minimum and the median of each build's runs (the first half are warm-up and not
 * counted). Uses only the engine's public entry points (InputReader.read, ReferenceData.standard,
 * Engine.run), so any two builds that have them can be compared. Asserts nothing.
 */
public final class CompareBuilds {
    private CompareBuilds() {}

    /** One build's engine, ready to run its own reading of the input. */
    private record Build(String name, Object engine, Method run, Object installation) {
        static Build load(String jar, Path input) throws ReflectiveOperationException, java.net.MalformedURLException {
            // The platform loader as parent: the engine's classes come from this jar only, never
            // from the benchmark's own class path (which holds the current engine).
            ClassLoader loader = new URLClassLoader(new URL[] {Path.of(jar).toUri().toURL()}, ClassLoader.getPlatformClassLoader());
            Class<?> reader = loader.loadClass("org.feedernote.input.InputReader");
            Object installation = reader.getMethod("read", Path.class).invoke(null, input);
            Class<?> dataClass = loader.loadClass("org.feedernote.data.ReferenceData");
            Object data = dataClass.getMethod("standard").invoke(null);
            Class<?> engineClass = loader.loadClass("org.feedernote.calc.Engine");
            Constructor<?> make = engineClass.getConstructor(dataClass);
            Method run = engineClass.getMethod("run", loader.loadClass("org.feedernote.model.Installation"), boolean.class);
            return new Build(jar, make.newInstance(data), run, installation);
        }

        long timeOne(boolean traced) throws ReflectiveOperationException {
            long start = System.nanoTime();
            run.invoke(engine, installation, traced);
            return System.nanoTime() - start;
        }
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 3) {
            System.err.println("usage: CompareBuilds A.jar B.jar INPUT [runs] [--traced]");
            System.exit(2);
        }
        Path input = Path.of(args[2]);
        int runs = args.length > 3 && !args[3].startsWith("--") ? Integer.parseInt(args[3]) : 16;
        boolean traced = Arrays.asList(args).contains("--traced");
        Build[] builds = {Build.load(args[0], input), Build.load(args[1], input)};
        long[][] times = new long[2][runs];
        for (int i = 0; i < runs; i++) {
            // Alternate which build goes first, so that neither always follows the other's garbage.
            for (int k = 0; k < 2; k++) {
                int b = (i + k) % 2;
                times[b][i] = builds[b].timeOne(traced);
            }
        }
        for (int b = 0; b < 2; b++) {
            long[] counted = Arrays.copyOfRange(times[b], runs / 2, runs);
            Arrays.sort(counted);
            System.out.printf(Locale.ROOT, "%s: min %.2f ms, median %.2f ms (%d runs counted of %d, %s)%n", builds[b].name(),
                    counted[0] / 1e6, counted[counted.length / 2] / 1e6, counted.length, runs, traced ? "traced" : "figures only");
        }
    }
}
