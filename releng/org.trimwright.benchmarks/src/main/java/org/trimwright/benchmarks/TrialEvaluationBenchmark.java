package org.trimwright.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.montecarlo.AllCodesEvaluator;
import org.trimwright.engine.mismatch.montecarlo.GaussianSource;
import org.trimwright.engine.mismatch.montecarlo.StructuralEvaluator;
import org.trimwright.engine.mismatch.montecarlo.TrialMetrics;
import org.trimwright.engine.mismatch.montecarlo.TrialSampler;

/**
 * Mismatch Monte Carlo (issue 4), one thread, structural O(elements) evaluation against the straightforward
 * all-codes evaluation ({@link AllCodesEvaluator}: builds the 4096-level transfer, then DNL and the three INL
 * definitions by walking every level) on the field of {@link MonteCarloField}.
 * <ul>
 * <li>{@code *Trial}: draw a trial ({@link TrialSampler}, one normal per element) and evaluate it;</li>
 * <li>{@code *Evaluate}: evaluate a fixed pool of {@value #POOL} trials drawn once in the setup (evaluation
 * cost alone);</li>
 * <li>{@code sampleOnly}: drawing alone;</li>
 * <li>{@code leanAllCodes*}: the same with {@link LeanAllCodesEvaluator}, an O(2^n) all-codes walk (prefix sums
 * instead of the engine reference's per-code summation of every element that is on).</li>
 * </ul>
 * Every invocation handles exactly {@value #POOL} trials and counts as {@value #POOL} operations: figures are trials
 * per second. The setup checks that both evaluators give the same figures on the pool (else the run fails).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class TrialEvaluationBenchmark {

    /** Trials per invocation. */
    public static final int POOL = 1024;

    private TrialSampler sampler;
    private StructuralEvaluator structural;
    private AllCodesEvaluator allCodes;
    private LeanAllCodesEvaluator leanAllCodes;
    private GaussianSource gauss;
    private double[][] unaryPool;
    private double[][] binaryPool;
    private double[] unary;
    private double[] binary;
    private final TrialMetrics metrics = new TrialMetrics();

    @Setup
    public void setUp() {
        ElementArray array = MonteCarloField.array();
        sampler = new TrialSampler(array);
        structural = new StructuralEvaluator(array);
        allCodes = new AllCodesEvaluator(array);
        leanAllCodes = new LeanAllCodesEvaluator(array.unaryCount(), array.binaryBits());
        gauss = new GaussianSource(MonteCarloField.SEED);
        unary = new double[array.unaryCount()];
        binary = new double[array.binaryBits()];
        unaryPool = new double[POOL][array.unaryCount()];
        binaryPool = new double[POOL][array.binaryBits()];
        TrialMetrics a = new TrialMetrics();
        TrialMetrics b = new TrialMetrics();
        TrialMetrics c = new TrialMetrics();
        for (int t = 0; t < POOL; t++) {
            sampler.draw(gauss, unaryPool[t], binaryPool[t]);
            structural.evaluate(unaryPool[t], binaryPool[t], a);
            allCodes.evaluate(unaryPool[t], binaryPool[t], b);
            leanAllCodes.evaluate(unaryPool[t], binaryPool[t], c);
            check(t, a, b);
            check(t, c, b);
        }
    }

    private static void check(int t, TrialMetrics a, TrialMetrics b) {
        double[] x = {a.maxDnl, a.maxDnlEndpoint, a.inlEndpoint, a.inlBestFit, a.inlAbsolute};
        double[] y = {b.maxDnl, b.maxDnlEndpoint, b.inlEndpoint, b.inlBestFit, b.inlAbsolute};
        for (int i = 0; i < x.length; i++) {
            if (Math.abs(x[i] - y[i]) > 1e-9 * Math.max(1.0, Math.abs(y[i])) || a.nonMonotonic != b.nonMonotonic) {
                throw new IllegalStateException("structural and all-codes evaluation differ at trial " + t
                        + ", figure " + i + ": " + x[i] + " vs " + y[i]);
            }
        }
    }

    private double digest() {
        TrialMetrics m = metrics;
        return m.maxDnl + m.maxDnlEndpoint + m.inlEndpoint + m.inlBestFit + m.inlAbsolute + (m.nonMonotonic ? 1 : 0);
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double structuralTrial() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            sampler.draw(gauss, unary, binary);
            structural.evaluate(unary, binary, metrics);
            s += digest();
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double allCodesTrial() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            sampler.draw(gauss, unary, binary);
            allCodes.evaluate(unary, binary, metrics);
            s += digest();
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double structuralEvaluate() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            structural.evaluate(unaryPool[t], binaryPool[t], metrics);
            s += digest();
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double allCodesEvaluate() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            allCodes.evaluate(unaryPool[t], binaryPool[t], metrics);
            s += digest();
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double sampleOnly() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            sampler.draw(gauss, unary, binary);
            s += unary[t % unary.length] + binary[t % binary.length];
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double leanAllCodesTrial() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            sampler.draw(gauss, unary, binary);
            leanAllCodes.evaluate(unary, binary, metrics);
            s += digest();
        }
        return s;
    }

    @Benchmark
    @OperationsPerInvocation(POOL)
    public double leanAllCodesEvaluate() {
        double s = 0;
        for (int t = 0; t < POOL; t++) {
            leanAllCodes.evaluate(unaryPool[t], binaryPool[t], metrics);
            s += digest();
        }
        return s;
    }
}
