package org.feedernote.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * The engine on a generated installation: the whole calculation with auto-sizing, figures only
 * (what check does) and with every step recorded (what note and --trace do); and the traced check
 * of the same installation with the sizes and ratings the sizing chose given (a designed
 * installation checked, no sizing search). One operation is one installation: circuits per second
 * = operations per second × circuits. Figures per core: the engine, which otherwise runs circuits
 * side by side on every core, is kept to the benchmark's thread (a common fork-join pool of no
 * workers) and the collector to one thread (the wrapper's parallel collector); the JIT compiles
 * on the other core while it warms up.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 10, time = 2)
@Measurement(iterations = 5, time = 3)
@Fork(value = 1, jvmArgsAppend = {"-Xmx4g", "-XX:+UseParallelGC", "-XX:ParallelGCThreads=1",
        "-Djava.util.concurrent.ForkJoinPool.common.parallelism=0"})
public class EngineBenchmark {
    @Param({"1000"})
    public int circuits;

    private Installation installation;
    private Installation sized;
    private Engine engine;

    @Setup(Level.Trial)
    public void generate() throws Exception {
        ReferenceData data = ReferenceData.standard();
        engine = new Engine(data);
        installation = InputReader.parse("synthetic.json",
                SyntheticInstallation.toJson(SyntheticInstallation.generate(circuits, 1)), true);
        sized = SyntheticInstallation.asSized(installation, engine.run(installation, false));
    }

    @Benchmark
    public Result figuresOnly() {
        return engine.run(installation, false);
    }

    @Benchmark
    public Result traced() {
        return engine.run(installation, true);
    }

    @Benchmark
    public Result tracedGivenSizes() {
        return engine.run(sized, true);
    }
}
