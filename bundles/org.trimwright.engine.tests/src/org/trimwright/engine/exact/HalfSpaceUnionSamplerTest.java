package org.trimwright.engine.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

class HalfSpaceUnionSamplerTest {

    private static final double Z999 = 3.2905;

    /** Linear gradient over the unary elements in switching order: offset g * (j - centre) units. */
    private static double[] linearGradient(int n, double g) {
        double[] offsets = new double[n];
        for (int j = 0; j < n; j++) {
            offsets[j] = g * (j - 0.5 * (n - 1));
        }
        return offsets;
    }

    @Test
    void estimatesAOnePerTenMillionEventWithinTwentyPercentAndAgreesWithTheExactRecursion() {
        // 16 bits, 9 unary MSBs, 1% unit sigma: exact P(non-monotonic) is about 9e-8
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(16, CodingScheme.SEGMENTED, 9), 0.01);
        ExactMonotonicity exact = ExactYields.monotonicity(sigmas);
        assertTrue(exact.probabilityNonMonotonic() > 1e-8 && exact.probabilityNonMonotonic() < 1e-6);
        RareEventEstimate sampled = HalfSpaceUnionSampler.nonMonotonic(ArrayElements.of(sigmas, null, null),
                20_000, 5L);
        double relativeHalfWidth = (sampled.ci95High() - sampled.estimate()) / sampled.estimate();
        assertTrue(relativeHalfWidth < 0.2, "relative 95% half-width " + relativeHalfWidth);
        double halfWidth999 = (sampled.ci95High() - sampled.estimate()) * Z999 / 1.96;
        assertEquals(exact.probabilityNonMonotonic(), sampled.estimate(), halfWidth999 + exact.numericalError());
    }

    @Test
    void dnlFailureAgreesWithTheExactNominalYield() {
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(12, CodingScheme.SEGMENTED, 9), 0.02);
        double exactFailure = 1.0 - ExactYields.dnlYieldNominal(sigmas, 0.5).yield();
        RareEventEstimate sampled = HalfSpaceUnionSampler.dnlFailure(ArrayElements.of(sigmas, null, null), 0.5,
                20_000, 6L);
        double halfWidth999 = (sampled.ci95High() - sampled.estimate()) * Z999 / 1.96;
        assertEquals(exactFailure, sampled.estimate(), halfWidth999 + 1e-12);
    }

    @Test
    void withAGradientAgreesWithAllCodesMonteCarloWhereFailuresAreFrequent() {
        // outside check: independent all-codes sampler with the same element means (99.9% intervals)
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(6, CodingScheme.SEGMENTED, 3), 0.07);
        double[] gradient = linearGradient(sigmas.unaryCount(), 0.15);
        ArrayElements elements = ArrayElements.of(sigmas, null, gradient);
        BruteForceArray.Counts mc = BruteForceArray.run(elements.binaryMeans(), elements.binarySigmas(),
                elements.unaryMeans(), elements.unarySigmas(), 0.4, 200_000, 41L);
        RareEventEstimate mono = HalfSpaceUnionSampler.nonMonotonic(elements, 20_000, 42L);
        double p = mc.nonMonotonicRate();
        assertTrue(p >= 1e-3, "event must be frequent, got " + p);
        double tolerance = BruteForceArray.halfWidth(p, mc.trials(), Z999)
                + (mono.ci95High() - mono.estimate()) * Z999 / 1.96;
        assertEquals(p, mono.estimate(), tolerance);
        RareEventEstimate dnl = HalfSpaceUnionSampler.dnlFailure(elements, 0.4, 20_000, 43L);
        double f = 1.0 - mc.nominalYield();
        double dnlTolerance = BruteForceArray.halfWidth(f, mc.trials(), Z999)
                + (dnl.ci95High() - dnl.estimate()) * Z999 / 1.96;
        assertEquals(f, dnl.estimate(), dnlTolerance);
    }

    @Test
    void gradientMovesTheRareEventAndKeepsTheIntervalTight() {
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(16, CodingScheme.SEGMENTED, 9), 0.009);
        ArrayElements plain = ArrayElements.of(sigmas, null, null);
        ArrayElements graded = ArrayElements.of(sigmas, null, linearGradient(sigmas.unaryCount(), 0.001));
        RareEventEstimate without = HalfSpaceUnionSampler.nonMonotonic(plain, 20_000, 8L);
        RareEventEstimate with = HalfSpaceUnionSampler.nonMonotonic(graded, 20_000, 8L);
        assertTrue(with.estimate() > without.ci95High(), "a gradient shortens the worst unary steps");
        assertTrue((with.ci95High() - with.estimate()) / with.estimate() < 0.2);
        assertTrue(with.estimate() <= with.unionBound() * (1 + 1e-12));
    }

    @Test
    void unaryArrayHasNoNonMonotonicHalfSpace() {
        ElementSigmas sigmas = ElementSigmas.forField(FieldCoding.of(6, CodingScheme.THERMOMETER, 0), 0.5);
        assertEquals(0.0, HalfSpaceUnionSampler.nonMonotonic(ArrayElements.of(sigmas, null, null), 100, 1L)
                .estimate(), 0.0);
    }
}
