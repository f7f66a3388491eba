package org.trimwright.engine.mismatch.montecarlo;

/**
 * Per-trial maxima of a Monte Carlo run (see {@link TrialMetrics} for the definitions), stored as floats in trial
 * order, so every statistic is independent of how the trials were spread over threads.
 */
public final class MonteCarloResult {

    private final long seed;
    private final int trials;
    private final boolean[] nonMonotonic;
    private final float[][] values;
    private final double seconds;

    MonteCarloResult(long seed, int trials, boolean[] nonMonotonic, float[][] values, double seconds) {
        this.seed = seed;
        this.trials = trials;
        this.nonMonotonic = nonMonotonic;
        this.values = values;
        this.seconds = seconds;
    }

    public long seed() {
        return seed;
    }

    public int trials() {
        return trials;
    }

    /** Wall time of the sampling, seconds. */
    public double seconds() {
        return seconds;
    }

    /** Trials with a negative step. */
    public long nonMonotonicCount() {
        long c = 0;
        for (boolean b : nonMonotonic) {
            if (b) {
                c++;
            }
        }
        return c;
    }

    /** Whether trial t had a negative step. */
    public boolean nonMonotonic(int t) {
        return nonMonotonic[t];
    }

    /** The value of {@code metric} in trial t. */
    public double value(Metric metric, int t) {
        return values[metric.ordinal()][t];
    }

    /** Fraction of trials with {@code metric} below {@code limit} (strictly). */
    public double yield(Metric metric, double limit) {
        float[] a = values[metric.ordinal()];
        long ok = 0;
        for (float x : a) {
            if (x < limit) {
                ok++;
            }
        }
        return (double) ok / trials;
    }

    /** Trials meeting all given limits at once (monotonic, DNL and INL of the given metric). */
    public long passCount(double dnlLimit, Metric inlMetric, double inlLimit) {
        float[] d = values[Metric.DNL.ordinal()];
        float[] i = values[inlMetric.ordinal()];
        long ok = 0;
        for (int t = 0; t < trials; t++) {
            if (!nonMonotonic[t] && d[t] < dnlLimit && i[t] < inlLimit) {
                ok++;
            }
        }
        return ok;
    }

    /** Mean of {@code metric} over trials (summed in trial order). */
    public double mean(Metric metric) {
        double s = 0;
        for (float x : values[metric.ordinal()]) {
            s += x;
        }
        return s / trials;
    }

    /** The q-quantile (0..1) of {@code metric}: the order statistic of rank ceil(q * trials), by selection. */
    public double quantile(Metric metric, double q) {
        float[] a = values[metric.ordinal()].clone();
        int k = (int) Math.min(trials - 1, Math.max(0, Math.ceil(q * trials) - 1));
        return select(a, k);
    }

    /** The k-th smallest value (0-based) of {@code a} by Hoare's selection (reorders {@code a}). */
    static float select(float[] a, int k) {
        int lo = 0;
        int hi = a.length - 1;
        while (lo < hi) {
            float pivot = median(a[lo], a[(lo + hi) >>> 1], a[hi]);
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (Float.compare(a[i], pivot) < 0) {
                    i++;
                }
                while (Float.compare(a[j], pivot) > 0) {
                    j--;
                }
                if (i <= j) {
                    float t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }

    private static float median(float a, float b, float c) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), c));
    }

    /** Histogram of {@code metric} over [0, max] in {@code bins} equal bins. */
    public Histogram histogram(Metric metric, int bins) {
        float[] a = values[metric.ordinal()];
        double max = 0;
        for (float x : a) {
            if (Float.isFinite(x)) {
                max = Math.max(max, x);
            }
        }
        double width = max > 0 ? max / bins : 1.0 / bins;
        long[] counts = new long[bins];
        long overflow = 0;
        for (float x : a) {
            if (!Float.isFinite(x)) {
                overflow++;
                continue;
            }
            int b = (int) Math.min(bins - 1, Math.floor(x / width));
            counts[b]++;
        }
        return new Histogram(metric.key(), 0.0, width, counts, overflow);
    }
}
