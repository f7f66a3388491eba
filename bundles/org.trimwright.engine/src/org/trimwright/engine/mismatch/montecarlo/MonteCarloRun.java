package org.trimwright.engine.mismatch.montecarlo;

import java.util.SplittableRandom;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
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

    /**
     * Runs {@code options.trials()} trials of {@code array}.
     *
     * @throws java.util.concurrent.CancellationException when the calling thread is interrupted (checked between
     *         blocks of {@link MonteCarloOptions#BLOCK} trials); the interrupt flag stays set
     */
    public static MonteCarloResult run(ElementArray array, MonteCarloOptions options) {
        int trials = (int) options.trials();
        boolean[] nonMono = new boolean[trials];
        float[][] values = new float[Metric.values().length][trials];
        int blocks = (trials + MonteCarloOptions.BLOCK - 1) / MonteCarloOptions.BLOCK;
        AtomicInteger next = new AtomicInteger();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        AtomicBoolean stop = new AtomicBoolean();
        Thread caller = Thread.currentThread();
        Runnable worker = () -> {
            try {
                TrialSampler sampler = new TrialSampler(array);
                StructuralEvaluator evaluator = new StructuralEvaluator(array);
                double[] u = new double[array.unaryCount()];
                double[] b = new double[array.binaryBits()];
                TrialMetrics m = new TrialMetrics();
                int block;
                while (failure.get() == null && !stop.get() && !caller.isInterrupted()
                        && (block = next.getAndIncrement()) < blocks) {
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
            boolean interrupted = false;
            for (Thread t : pool) {
                while (t.isAlive()) {
                    try {
                        t.join();
                    } catch (InterruptedException e) {
                        interrupted = true;
                        stop.set(true);
                    }
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
        if (stop.get() || caller.isInterrupted()) {
            throw new CancellationException("Monte Carlo cancelled (the calling thread was interrupted)");
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
