package org.trimwright.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * Mismatch Monte Carlo (issue 4), the engine's whole run: {@link MonteCarloRun#run} of {@value #TRIALS} trials of the
 * 12-bit segmented field of {@link MonteCarloField}, each trial drawing one normal per element and computing
 * monotonicity, max|DNL| (nominal and endpoint LSB) and max|INL| under all three definitions in O(elements), and
 * storing the per-trial figures. Includes thread start-up and the allocation of the result arrays.
 * <p>
 * One invocation runs exactly {@value #TRIALS} trials and counts as {@value #TRIALS} operations, so the figure is
 * trials per second. {@code threads} = 1 gives the single-core rate, 2 all cores of the benchmark machine.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class MonteCarloRunBenchmark {

    /** Trials per invocation (the trial count of the command-level target). */
    public static final int TRIALS = 1_000_000;

    @Param({"1", "2"})
    public int threads;

    private ElementArray array;
    private MonteCarloOptions options;

    @Setup
    public void setUp() {
        array = MonteCarloField.array();
        options = new MonteCarloOptions(TRIALS, MonteCarloField.SEED, threads, 0);
    }

    @Benchmark
    @OperationsPerInvocation(TRIALS)
    public MonteCarloResult structuralRun() {
        MonteCarloResult r = MonteCarloRun.run(array, options);
        if (r.trials() != TRIALS) {
            throw new IllegalStateException("run returned " + r.trials() + " trials");
        }
        return r;
    }
}
