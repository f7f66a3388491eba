package org.trimwright.engine.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

class ExactMonotonicityTest {

    /** Runs this class's jqwik properties (tycho-surefire does not discover them; see PropertyRunner). */
    @org.junit.jupiter.api.Test
    void jqwikPropertiesHold() {
        org.trimwright.engine.testing.PropertyRunner.assertAllHold(ExactMonotonicityTest.class);
    }


    /** 99.9% two-sided normal quantile: the brute-force runs below use fixed seeds and several fields. */
    private static final double Z999 = 3.2905;
    private static final NormalDistribution STANDARD = new NormalDistribution(0.0, 1.0);

    private static FieldCoding field(int bits, int unaryBits) {
        return unaryBits == 0 ? FieldCoding.of(bits, CodingScheme.BINARY, 0)
                : FieldCoding.of(bits, CodingScheme.SEGMENTED, unaryBits);
    }

    /**
     * Union bound from the closed form: the step of bit t is 1 + e_t - (e_0 + ... + e_(t-1)), Gaussian with mean 1
     * and variance sigma_t^2 + sum of the lower variances, so P(step &lt; 0) = Phi(-1 / sd) (Phi from Apache Commons
     * Math); each of the unary boundaries 1 + u_j - (sum of all binary errors) likewise.
     */
    private static double[] unionAndLargest(ElementSigmas s) {
        double[] b = s.binary();
        double lower = 0.0;
        double union = 0.0;
        double largest = 0.0;
        for (int t = 0; t < b.length; t++) {
            if (t > 0) {
                double p = STANDARD.cumulativeProbability(-1.0 / Math.sqrt(b[t] * b[t] + lower));
                union += p;
                largest = Math.max(largest, p);
            }
            lower += b[t] * b[t];
        }
        if (b.length > 0) {
            for (double u : s.unary()) {
                double p = STANDARD.cumulativeProbability(-1.0 / Math.sqrt(u * u + lower));
                union += p;
                largest = Math.max(largest, p);
            }
        }
        return new double[] {union, largest};
    }

    @Test
    void exactAgreesWithAllCodesMonteCarloWhereNonMonotonicityIsFrequent() {
        // outside check: an independent all-codes sampler (BruteForceArray) with 99.9% confidence intervals
        Object[][] cases = {
            {ElementSigmas.forField(field(4, 0), 0.10), 11L},
            {ElementSigmas.forField(field(5, 2), 0.10), 12L},
            {ElementSigmas.forField(field(6, 3), 0.09), 13L},
            {ElementSigmas.forField(field(6, 1), 0.07, 0.07), 14L},
        };
        for (Object[] c : cases) {
            ElementSigmas sigmas = (ElementSigmas) c[0];
            ExactMonotonicity exact = ExactYields.monotonicity(sigmas);
            BruteForceArray.Counts mc = BruteForceArray.run(sigmas, 0.5, 200_000, (Long) c[1]);
            double p = mc.nonMonotonicRate();
            assertTrue(p >= 1e-3, "the event must be frequent for this check, got " + p);
            double tolerance = BruteForceArray.halfWidth(p, mc.trials(), Z999) + exact.numericalError();
            assertEquals(p, exact.probabilityNonMonotonic(), tolerance, sigmas.toString());
        }
    }

    @Property(tries = 40)
    void exactLiesBetweenLargestTransitionAndUnionBound(@ForAll @IntRange(min = 2, max = 12) int bits,
            @ForAll @IntRange(min = 0, max = 6) int unaryBits,
            @ForAll @DoubleRange(min = 0.002, max = 0.2) @Scale(4) double s) {
        // P(union of step events) is at most the sum (union bound) and at least the largest single event
        int m = Math.min(unaryBits, bits - 1);
        ElementSigmas sigmas = ElementSigmas.forField(field(bits, m), s);
        ExactMonotonicity exact = ExactYields.monotonicity(sigmas);
        double[] bounds = unionAndLargest(sigmas);
        double p = exact.probabilityNonMonotonic();
        assertTrue(p <= bounds[0] * (1 + 1e-9) + exact.numericalError(), p + " > union bound " + bounds[0]);
        assertTrue(p >= bounds[1] * (1 - 1e-9) - exact.numericalError(), p + " < largest " + bounds[1]);
    }

    @Test
    void exactApproachesTheUnionBoundWhenOneTransitionDominates() {
        // 12-bit binary at 0.2% unit sigma: the MSB step dominates; the exact value sits just below the sum
        ElementSigmas sigmas = ElementSigmas.forField(field(12, 0), 0.002);
        double[] bounds = unionAndLargest(sigmas);
        double p = ExactYields.monotonicity(sigmas).probabilityNonMonotonic();
        assertTrue(p <= bounds[0] && p > 0.9 * bounds[0], p + " vs union bound " + bounds[0]);
    }

    @Test
    void zeroSigmaGivesExactlyZero() {
        ExactMonotonicity r = ExactYields.monotonicity(field(10, 4), 0.0);
        assertEquals(0.0, r.probabilityNonMonotonic(), 0.0);
        assertEquals(0.0, r.numericalError(), 0.0);
        assertEquals(0.0, ExactYields.monotonicity(field(8, 0), 0.0).probabilityNonMonotonic(), 0.0);
    }

    @Property(tries = 30)
    void unaryFieldIsMonotonicForAnyMismatch(@ForAll @IntRange(min = 1, max = 16) int bits,
            @ForAll @DoubleRange(min = 0.0, max = 10.0) double s) {
        assertEquals(0.0, ExactYields.monotonicity(FieldCoding.of(bits, CodingScheme.THERMOMETER, 0), s)
                .probabilityNonMonotonic(), 0.0);
        assertEquals(0.0, ExactYields.monotonicity(FieldCoding.of(bits, CodingScheme.SEGMENTED, bits), s)
                .probabilityNonMonotonic(), 0.0);
    }

    @Test
    void sixteenBitFieldsMeetTheStatedNumericalErrorForEverySplit() {
        for (int m = 0; m <= 16; m++) {
            for (double s : new double[] {0.0005, 0.002, 0.01, 0.05}) {
                ExactMonotonicity r = ExactYields.monotonicity(field(16, m), s);
                assertTrue(r.numericalError() < 1e-10, "M=" + m + " s=" + s + ": " + r.numericalError());
                assertTrue(r.probabilityNonMonotonic() >= 0 && r.probabilityNonMonotonic() <= 1);
            }
        }
    }

    @Test
    void probabilityFallsAsMismatchShrinks() {
        double previous = 1.0;
        for (double s = 0.05; s > 0.001; s *= 0.7) {
            double p = ExactYields.monotonicity(field(10, 3), s).probabilityNonMonotonic();
            assertTrue(p <= previous + 1e-12, "not decreasing at s=" + s);
            previous = p;
        }
    }
}
