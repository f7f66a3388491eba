package org.trimwright.engine.mismatch.montecarlo;

/**
 * Counts of a per-trial maximum in equal bins: bin i covers [start + i width, start + (i+1) width).
 *
 * @param metric   the metric key
 * @param start    lower edge of bin 0 (LSB)
 * @param width    bin width (LSB)
 * @param counts   trials per bin
 * @param overflow trials with a non-finite value (degenerate transfer)
 */
public record Histogram(String metric, double start, double width, long[] counts, long overflow) {

    public Histogram {
        counts = counts.clone();
    }

    @Override
    public long[] counts() {
        return counts.clone();
    }
}
