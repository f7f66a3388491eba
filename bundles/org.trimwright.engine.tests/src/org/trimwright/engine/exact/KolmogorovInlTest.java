package org.trimwright.engine.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

class KolmogorovInlTest {

    @Test
    void kolmogorovDistributionMatchesCommonsMathKsSum() {
        // source: Apache Commons Math 3.6.1 KolmogorovSmirnovTest.ksSum, the limiting Kolmogorov distribution
        // 1 + 2 sum (-1)^k exp(-2 k^2 t^2) (Kolmogorov 1933)
        KolmogorovSmirnovTest reference = new KolmogorovSmirnovTest();
        for (double z = 0.3; z <= 3.0; z += 0.05) {
            assertEquals(reference.ksSum(z, 1e-20, 100_000), KolmogorovInl.kolmogorovCdf(z), 1e-14, "z=" + z);
        }
        // published quantile: K(1.3581) = 0.95 (the 5% critical value of the Kolmogorov-Smirnov test, value from
        // memory)
        assertEquals(0.95, KolmogorovInl.kolmogorovCdf(1.3581), 1e-4);
    }

    /** Monte Carlo of endpoint max|INL| of a unary array of n elements with sigma s (units). */
    private static double unaryYieldByMonteCarlo(int n, double s, double limit, int trials, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] v = new double[n + 1];
        int pass = 0;
        for (int t = 0; t < trials; t++) {
            for (int j = 0; j < n; j++) {
                v[j + 1] = v[j] + 1.0 + s * random.nextGaussian();
            }
            double lsb = v[n] / n;
            double max = 0.0;
            for (int k = 0; k <= n; k++) {
                max = Math.max(max, Math.abs(v[k] / lsb - k));
            }
            pass += max < limit ? 1 : 0;
        }
        return pass / (double) trials;
    }

    @Test
    void correctedBridgeLimitMatchesMonteCarloOfUnaryEndpointInl() {
        // Brownian-bridge limit (Heydenreich, van der Hofstad, Radulov, arXiv math/0606584; Kolmogorov 1933) with
        // Siegmund's corrected diffusion shift; checked against an all-codes Monte Carlo
        for (int n : new int[] {15, 63, 255}) {
            double s = 0.1;
            double limit = 1.0 * s * Math.sqrt(n);
            double mc = unaryYieldByMonteCarlo(n, s, limit, 100_000, 50L + n);
            InlYieldEstimate estimate = KolmogorovInl.unary(n, s, limit);
            assertEquals(mc, estimate.yield(), 0.01, "n=" + n);
            assertTrue(Math.abs(mc - estimate.yield()) < Math.abs(mc - estimate.limitingYield()),
                    "the correction must improve on the plain limit at n=" + n);
        }
    }

    @Test
    void segmentedEstimateIsAnUpperEstimateOfTheYield() {
        // all-codes Monte Carlo of a 7-bit segmented array (4 unary, 3 binary bits) at 5% unit sigma
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(7, CodingScheme.SEGMENTED, 4), 0.05);
        double limit = 0.5;
        InlYieldEstimate estimate = KolmogorovInl.forArray(sigmas, limit);
        SplittableRandom random = new SplittableRandom(77L);
        int trials = 50_000;
        int pass = 0;
        double[] w = sigmas.binary();
        double[] u = sigmas.unary();
        for (int t = 0; t < trials; t++) {
            double[] bin = new double[w.length];
            for (int k = 0; k < w.length; k++) {
                bin[k] = (1 << k) + w[k] * random.nextGaussian();
            }
            int codes = (1 << w.length) * (u.length + 1);
            double[] value = new double[codes];
            double unarySum = 0.0;
            for (int j = 0; j <= u.length; j++) {
                for (int low = 0; low < 1 << w.length; low++) {
                    double v = unarySum;
                    for (int k = 0; k < w.length; k++) {
                        v += (low >> k & 1) == 1 ? bin[k] : 0.0;
                    }
                    value[(j << w.length) + low] = v;
                }
                if (j < u.length) {
                    unarySum += (1 << w.length) + u[j] * random.nextGaussian();
                }
            }
            double lsb = (value[codes - 1] - value[0]) / (codes - 1);
            double max = 0.0;
            for (int c = 0; c < codes; c++) {
                max = Math.max(max, Math.abs((value[c] - value[0]) / lsb - c));
            }
            pass += max < limit ? 1 : 0;
        }
        double mc = pass / (double) trials;
        assertTrue(estimate.yield() >= mc - 0.01, estimate.yield() + " vs Monte Carlo " + mc);
    }

    @Test
    void zeroMismatchGivesYieldOne() {
        assertEquals(1.0, KolmogorovInl.unary(255, 0.0, 0.1).yield(), 0.0);
    }
}
