package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * Endpoint INL of a unary array of M elements: the endpoint-corrected partial sums form a discrete Brownian bridge,
 * sigma at code k = s_u sqrt(k (M - k) / M), and P(max|INL| &lt; a) tends to the Kolmogorov distribution
 * K(a / (s_u sqrt(M))) (Heydenreich, van der Hofstad, Radulov, arXiv math/0606584).
 */
class BrownianBridgeTest {

    @Test
    void analyticEndpointInlSigmaOfUnaryArrayIsTheBrownianBridgeFormula() {
        double su = 0.01;
        int n = 8;
        int m = (1 << n) - 1;
        ElementArray array = ElementArray.of(FieldCoding.of(n, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(su));
        double[] sigma = PerCodeSigma.of(array).inl(InlDefinition.ENDPOINT);
        for (int k = 0; k <= m; k++) {
            // Heydenreich, van der Hofstad, Radulov, arXiv math/0606584: var INL_k = s^2 k (M - k) / M
            // prefix-sum evaluation: accurate to about sqrt(M * 1e-16) of the sigma scale
            assertEquals(su * Math.sqrt((double) k * (m - k) / m), sigma[k], 1e-6 * su * Math.sqrt(m), "k = " + k);
        }
    }

    @Test
    void sampledEndpointInlMatchesTheBrownianBridgeSigma() {
        double su = 0.01;
        int n = 6;
        int m = (1 << n) - 1;
        ElementArray array = ElementArray.of(FieldCoding.of(n, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(su));
        Draws d = new Draws(array, 2024);
        int trials = 30_000;
        int[] codes = {1, 10, 31, 32, 50, 62};
        double[] sum2 = new double[codes.length];
        for (int t = 0; t < trials; t++) {
            d.next();
            double[] v = d.magnitudeTransfer();
            double lsb = v[m] / m;
            for (int c = 0; c < codes.length; c++) {
                double inl = v[codes[c]] / lsb - codes[c];
                sum2[c] += inl * inl;
            }
        }
        // Apache Commons Math 3.6.1 chi-square quantiles for the second moment of a zero-mean normal
        ChiSquaredDistribution chi = new ChiSquaredDistribution(trials);
        for (int c = 0; c < codes.length; c++) {
            int k = codes[c];
            double expected = su * su * k * (m - k) / m;
            double lo = chi.inverseCumulativeProbability(0.0005) / trials * expected;
            double hi = chi.inverseCumulativeProbability(0.9995) / trials * expected;
            double var = sum2[c] / trials;
            // the endpoint LSB is itself random: first-order theory, allow 1 % beyond the 99.9 % band
            assertTrue(var > lo * 0.99 && var < hi * 1.01, "code " + k + ": " + var + " vs " + expected);
        }
    }

    @Test
    void maxEndpointInlOfLargeUnaryArrayFollowsTheKolmogorovDistribution() {
        int n = 12;
        int m = (1 << n) - 1;
        double su = 0.01;
        ElementArray array = ElementArray.of(FieldCoding.of(n, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(su));
        int trials = 40_000;
        MonteCarloResult mc = MonteCarloRun.run(array, new MonteCarloOptions(trials, 5, 0, 0));
        double scale = su * Math.sqrt(m);
        KolmogorovSmirnovTest ks = new KolmogorovSmirnovTest();
        for (double x : new double[] {0.6, 0.8, 1.0, 1.36, 1.8}) {
            // Apache Commons Math 3.6.1: ksSum(t) = 1 + 2 sum (-1)^i exp(-2 i^2 t^2), the Kolmogorov CDF
            double kolmogorov = ks.ksSum(x, 1e-12, 100000);
            double mcYield = mc.yield(Metric.INL_ENDPOINT, x * scale);
            double[] ci = WilsonInterval.of(Math.round(mcYield * trials), trials, 0.999);
            // discrete maximum over 4095 points lies slightly below the continuous supremum: allow 0.02
            assertTrue(kolmogorov > ci[0] - 0.02 && kolmogorov < ci[1] + 0.02,
                    "x = " + x + ": Kolmogorov " + kolmogorov + ", Monte Carlo " + mcYield);
        }
    }
}
