package org.trimwright.engine.mismatch.montecarlo;

import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

import org.trimwright.engine.mismatch.ElementArray;

/**
 * Runs the Monte Carlo over all cores. Trials are cut into fixed blocks of {@link MonteCarloOptions#BLOCK}; block b
 * draws from a {@link SplittableRandom} seeded from (seed, b) and writes its trials' slots, so the results are the
 * same for a seed whatever the thread count. Each trial costs O(elements) ({@link StructuralEvaluator}).
 */
public final class MonteCarloRun {

    private MonteCarloRun() {
    }

    /** Runs {@code options.trials()} trials of {@code array}. */
    public static MonteCarloResult run(ElementArray array, MonteCarloOptions options) {
        int trials = (int) options.trials();
        boolean[] nonMono = new boolean[trials];
        float[][] values = new float[Metric.values().length][trials];
        int blocks = (trials + MonteCarloOptions.BLOCK - 1) / MonteCarloOptions.BLOCK;
        AtomicInteger next = new AtomicInteger();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Runnable worker = () -> {
            try {
                TrialSampler sampler = new TrialSampler(array);
                StructuralEvaluator evaluator = new StructuralEvaluator(array);
                double[] u = new double[array.unaryCount()];
                double[] b = new double[array.binaryBits()];
                TrialMetrics m = new TrialMetrics();
                int block;
                while ((block = next.getAndIncrement()) < blocks && failure.get() == null) {
                    GaussianSource g = blockSource(options.seed(), block);
                    int from = block * MonteCarloOptions.BLOCK;
                    int to = Math.min(trials, from + MonteCarloOptions.BLOCK);
                    for (int t = from; t < to; t++) {
                        sampler.draw(g, u, b);
                        evaluator.evaluate(u, b, m);
                        nonMono[t] = m.nonMonotonic;
                        values[0][t] = (float) m.maxDnl;
                        values[1][t] = (float) m.maxDnlEndpoint;
                        values[2][t] = (float) m.inlEndpoint;
                        values[3][t] = (float) m.inlBestFit;
                        values[4][t] = (float) m.inlAbsolute;
                    }
                }
            } catch (Throwable e) {
                failure.compareAndSet(null, e);
            }
        };
        long start = System.nanoTime();
        int threads = Math.min(options.effectiveThreads(), blocks);
        if (threads <= 1) {
            worker.run();
        } else {
            Thread[] pool = new Thread[threads];
            for (int i = 0; i < threads; i++) {
                pool[i] = new Thread(worker, "trimwright-mc-" + i);
                pool[i].setDaemon(true);
                pool[i].start();
            }
            for (Thread t : pool) {
                try {
                    t.join();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IllegalStateException("Monte Carlo interrupted", e);
                }
            }
        }
        if (failure.get() != null) {
            throw new IllegalStateException("Monte Carlo worker failed", failure.get());
        }
        double seconds = (System.nanoTime() - start) * 1e-9;
        return new MonteCarloResult(options.seed(), trials, nonMono, values, seconds);
    }

    /** The Gaussian source of block b, the same in every run with this seed. */
    public static GaussianSource blockSource(long seed, int block) {
        return new GaussianSource(new SplittableRandom(MonteCarloOptions.blockSeed(seed, block)));
    }
}
