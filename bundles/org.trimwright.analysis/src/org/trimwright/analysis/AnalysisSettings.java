package org.trimwright.analysis;

import org.trimwright.engine.logic.GateLibrary;

/**
 * How fields are analysed: Monte Carlo size and seed, threads and the decoder gate library.
 *
 * @param trials     Monte Carlo trials per field (>= 1)
 * @param seed       random seed; results for a seed do not depend on the thread count
 * @param threads    worker threads (0: all cores)
 * @param maxFanIn   largest gate fan-in of the decoder library, 2 or 3
 */
public record AnalysisSettings(long trials, long seed, int threads, int maxFanIn) {

    /** Trials used when nothing else is said. */
    public static final long DEFAULT_TRIALS = 20_000;
    /** Seed used when nothing else is said. */
    public static final long DEFAULT_SEED = 1;

    public static final AnalysisSettings DEFAULTS = new AnalysisSettings(DEFAULT_TRIALS, DEFAULT_SEED, 0, 2);

    public AnalysisSettings {
        if (trials < 1) {
            throw new IllegalArgumentException("trials must be >= 1, got " + trials);
        }
        if (maxFanIn != 2 && maxFanIn != 3) {
            throw new IllegalArgumentException("gate library fan-in must be 2 or 3, got " + maxFanIn);
        }
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be >= 0, got " + threads);
        }
    }

    public GateLibrary gateLibrary() {
        return maxFanIn == 3 ? GateLibrary.THREE_INPUT : GateLibrary.TWO_INPUT;
    }

    public AnalysisSettings withTrials(long t) {
        return new AnalysisSettings(t, seed, threads, maxFanIn);
    }

    public AnalysisSettings withSeed(long s) {
        return new AnalysisSettings(trials, s, threads, maxFanIn);
    }
}
