package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

/**
 * DNL sigma of binary-weighted and segmented arrays. Formulation: every figure is in units of the nominal unit element
 * (= nominal LSB); a unit has relative sigma s_u, so an element of k units has variance k s_u^2.
 */
class DnlSigmaTest {

    /**
     * Binary mid-scale step: b_{N-1} - sum_{j&lt;N-1} b_j has variance (2^(N-1) + 2^(N-1) - 1) s_u^2, i.e. sigma
     * sqrt(2^N - 1) s_u, the worst DNL of a binary array (the textbook sum-of-variances result; value from memory).
     */
    @Test
    void binaryMidScaleDnlSigmaIsSqrtOfTwoToTheNMinusOneTimesUnitSigma() {
        double su = 0.013;
        for (int n = 1; n <= 16; n++) {
            ElementArray array = ElementArray.of(FieldCoding.of(n, CodingScheme.BINARY, 0),
                    ElementModel.ofUnitSigma(su));
            Transition worst = TransitionAnalysis.of(array).worstSigma();
            assertEquals(Math.sqrt((1 << n) - 1) * su, worst.sigma(), 1e-15, "n = " + n);
            assertEquals(n - 1, worst.index());
            assertEquals((1 << (n - 1)) - 1, worst.fromLevel());
        }
    }

    /** The Monte Carlo sample variance of the mid-scale step agrees with (2^N - 1) s_u^2 (chi-square 99.9 % band). */
    @Test
    void sampledMidScaleStepHasTheAnalyticVariance() {
        int n = 8;
        double su = 0.02;
        ElementArray array = ElementArray.of(FieldCoding.of(n, CodingScheme.BINARY, 0), ElementModel.ofUnitSigma(su));
        Draws d = new Draws(array, 99);
        int trials = 40_000;
        double sum = 0;
        double sum2 = 0;
        for (int t = 0; t < trials; t++) {
            d.next();
            double[] v = d.magnitudeTransfer();
            double step = v[1 << (n - 1)] - v[(1 << (n - 1)) - 1];
            sum += step;
            sum2 += step * step;
        }
        double mean = sum / trials;
        double var = (sum2 - trials * mean * mean) / (trials - 1);
        double expected = ((1 << n) - 1) * su * su;
        // sample variance: (n-1) S^2 / sigma^2 ~ chi-square(n-1); Apache Commons Math 3.6.1 quantiles
        ChiSquaredDistribution chi = new ChiSquaredDistribution(trials - 1);
        double lo = chi.inverseCumulativeProbability(0.0005) / (trials - 1) * expected;
        double hi = chi.inverseCumulativeProbability(0.9995) / (trials - 1) * expected;
        assertTrue(var > lo && var < hi, "variance " + var + " outside [" + lo + ", " + hi + "]");
    }

    /** Segmenting reduces the worst DNL sigma: unary step U - sum b has variance (2^B + 2^B - 1) s_u^2. */
    @Test
    void segmentedWorstDnlSigmaIsThatOfTheBinaryPartPlusOneUnaryElement() {
        double su = 0.01;
        for (int m = 1; m < 10; m++) {
            int b = 10 - m;
            ElementArray array = ElementArray.of(FieldCoding.of(10, CodingScheme.SEGMENTED, m),
                    ElementModel.ofUnitSigma(su));
            double expected = Math.sqrt((1 << b) + (1 << b) - 1) * su;
            assertEquals(expected, TransitionAnalysis.of(array).worstSigma().sigma(), 1e-15);
        }
    }
}
