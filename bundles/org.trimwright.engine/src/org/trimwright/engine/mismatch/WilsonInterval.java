package org.trimwright.engine.mismatch;

import org.trimwright.engine.stats.Normal;

/**
 * The Wilson score interval for a binomial proportion (Wilson, J. Am. Stat. Assoc. 22(158), 1927): with p = k/n and
 * z the two-sided normal quantile, centre (p + z^2/2n) / (1 + z^2/n) and half-width
 * z / (1 + z^2/n) sqrt(p(1-p)/n + z^2/4n^2). Unlike the plain normal interval it stays inside [0, 1] and is not empty
 * at k = 0.
 */
public final class WilsonInterval {

    private WilsonInterval() {
    }

    /** {low, high} at two-sided confidence {@code level} (e.g. 0.95) for k successes in n trials. */
    public static double[] of(long k, long n, double level) {
        if (n <= 0 || k < 0 || k > n) {
            throw new IllegalArgumentException("need 0 <= k <= n, n > 0");
        }
        double z = Normal.inverseCdf(0.5 + level / 2);
        double p = (double) k / n;
        double z2 = z * z;
        double denom = 1 + z2 / n;
        double centre = (p + z2 / (2.0 * n)) / denom;
        double half = z / denom * Math.sqrt(p * (1 - p) / n + z2 / (4.0 * n * n));
        double low = k == 0 ? 0.0 : Math.max(0.0, centre - half);
        double high = k == n ? 1.0 : Math.min(1.0, centre + half);
        return new double[] {low, high};
    }
}
