package org.trimwright.engine.mismatch.montecarlo;

/**
 * Monte Carlo settings.
 *
 * @param trials         number of trials (1..{@link #MAX_TRIALS})
 * @param seed           seed; results depend on it only, never on the thread count
 * @param threads        worker threads; 0 or less means all available processors
 * @param envelopeTrials trials (from the start of the run) kept per code for min/max envelopes (0..{@link #BLOCK})
 */
public record MonteCarloOptions(long trials, long seed, int threads, int envelopeTrials) {

    /** Trials per block; block b always draws from its own generator seeded from (seed, b). */
    public static final int BLOCK = 4096;
    /** Upper limit on trials (the per-trial maxima are kept as floats: 21 bytes a trial). */
    public static final long MAX_TRIALS = 50_000_000L;

    public MonteCarloOptions {
        if (trials < 1 || trials > MAX_TRIALS) {
            throw new IllegalArgumentException("trials must be 1.." + MAX_TRIALS + ", got " + trials);
        }
        if (envelopeTrials < 0 || envelopeTrials > BLOCK) {
            throw new IllegalArgumentException("envelope trials must be 0.." + BLOCK + ", got " + envelopeTrials);
        }
    }

    /** Defaults: all processors, 200 envelope trials (or fewer if fewer trials). */
    public static MonteCarloOptions of(long trials, long seed) {
        return new MonteCarloOptions(trials, seed, 0, (int) Math.min(200, trials));
    }

    /** Same options with another thread count. */
    public MonteCarloOptions withThreads(int n) {
        return new MonteCarloOptions(trials, seed, n, envelopeTrials);
    }

    /** Same options with another trial count. */
    public MonteCarloOptions withTrials(long n) {
        return new MonteCarloOptions(n, seed, threads, (int) Math.min(envelopeTrials, n));
    }

    /** The thread count to use. */
    public int effectiveThreads() {
        return threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
    }

    /** Seed of block b: a SplitMix64 finaliser of seed + (b + 1) * golden gamma. */
    public static long blockSeed(long seed, long block) {
        long z = seed + (block + 1) * 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
