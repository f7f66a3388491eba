package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.mismatch.montecarlo.GaussianSource;

/** The ziggurat generator against the normal distribution of Apache Commons Math 3.6.1. */
class GaussianSourceTest {

    @Test
    void zigguratDeviatesPassKolmogorovSmirnovTestAgainstStandardNormal() {
        for (long seed : new long[] {1, 2, 3}) {
            GaussianSource g = new GaussianSource(seed);
            double[] x = new double[200_000];
            for (int i = 0; i < x.length; i++) {
                x[i] = g.next();
            }
            // Apache Commons Math 3.6.1 one-sample KS test
            double p = new KolmogorovSmirnovTest().kolmogorovSmirnovTest(new NormalDistribution(), x);
            assertTrue(p > 1e-3, "seed " + seed + ": KS p-value " + p);
        }
    }

    @Test
    void zigguratTailFrequenciesMatchTheNormalTail() {
        GaussianSource g = new GaussianSource(42);
        int n = 4_000_000;
        double[] at = {1.0, 2.0, 3.0, 3.6541528853610088, 4.0};
        long[] count = new long[at.length];
        for (int i = 0; i < n; i++) {
            double z = Math.abs(g.next());
            for (int k = 0; k < at.length; k++) {
                if (z > at[k]) {
                    count[k]++;
                }
            }
        }
        NormalDistribution ref = new NormalDistribution(); // Apache Commons Math 3.6.1
        for (int k = 0; k < at.length; k++) {
            double p = 2 * ref.cumulativeProbability(-at[k]);
            double sd = Math.sqrt(p * (1 - p) / n);
            double f = (double) count[k] / n;
            assertTrue(Math.abs(f - p) < 4.5 * sd, "P(|Z| > " + at[k] + "): " + f + " vs " + p);
        }
    }
}
