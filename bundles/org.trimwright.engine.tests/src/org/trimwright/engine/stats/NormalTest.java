package org.trimwright.engine.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * Checks {@link Normal} against Apache Commons Math 3.6.1 (NormalDistribution, special.Erf), the outside reference
 * named in the project rules. Commons Math computes erfc through the regularized incomplete gamma function
 * (continued fraction), an independent method from Cody's rational approximations used in {@link Normal}.
 */
class NormalTest {

    private static final NormalDistribution STANDARD = new NormalDistribution(0.0, 1.0);

    private static double relativeError(double actual, double expected) {
        return Math.abs(actual - expected) / Math.abs(expected);
    }

    @Test
    void upperTailMatchesCommonsMathToRelativePrecisionIntoTheFarTail() {
        // source: Apache Commons Math 3.6.1 Erf.erfc; Q(x) = erfc(x / sqrt 2) / 2
        for (double x = -8.0; x <= 37.0; x += 0.0625) {
            double expected = 0.5 * Erf.erfc(x / Math.sqrt(2.0));
            double actual = Normal.upperTail(x);
            // both sides lose about 2 y^2 eps relative accuracy to the rounding of x / sqrt 2 (3e-13 at x = 37)
            double tolerance = 2e-14 + 4e-16 * x * x;
            assertTrue(relativeError(actual, expected) < tolerance,
                    "Q(" + x + ") = " + actual + " vs commons " + expected);
        }
    }

    @Test
    void cdfMatchesCommonsMathNormalDistribution() {
        // source: Apache Commons Math 3.6.1 NormalDistribution.cumulativeProbability
        for (double x = -37.0; x <= 8.0; x += 0.01) {
            double expected = STANDARD.cumulativeProbability(x);
            double actual = Normal.cdf(x);
            double tolerance = 2e-14 + 4e-16 * x * x;
            assertTrue(relativeError(actual, expected) < tolerance,
                    "Phi(" + x + ") = " + actual + " vs commons " + expected);
        }
    }

    @Test
    void densityMatchesCommonsMath() {
        // source: Apache Commons Math 3.6.1 NormalDistribution.density
        for (double x = -30.0; x <= 30.0; x += 0.037) {
            assertTrue(relativeError(Normal.density(x), STANDARD.density(x)) < 1e-13, "phi(" + x + ")");
        }
    }

    @Test
    void erfcMatchesCommonsMathInEveryInterval() {
        // source: Apache Commons Math 3.6.1 Erf.erfc; covers Cody's three intervals and negative arguments.
        // Commons forms y^2 in double precision, which costs it up to y^2 eps relative accuracy.
        for (double y = -5.0; y <= 26.0; y += 0.01) {
            double expected = Erf.erfc(y);
            assertTrue(relativeError(Normal.erfc(y), expected) < 2e-14 + 4e-16 * y * y, "erfc(" + y + ")");
        }
    }

    @Test
    void inverseCdfMatchesCommonsMathAndRoundTrips() {
        // source: Apache Commons Math 3.6.1 NormalDistribution. Its inverseCumulativeProbability uses
        // sqrt(2) erfInv(2p - 1), which loses accuracy where 2p - 1 rounds (p < 1e-3), so there the check is the
        // round trip through the commons cdf; AS 241 claims about 1e-16 relative accuracy.
        double[] central = {1e-3, 0.01, 0.05, 0.075, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.925, 0.95,
            0.99, 0.999};
        for (double p : central) {
            double expected = STANDARD.inverseCumulativeProbability(p);
            assertEquals(expected, Normal.inverseCdf(p), 1e-12 * Math.max(1.0, Math.abs(expected)), "at " + p);
        }
        double[] all = {1e-300, 1e-100, 1e-20, 1e-12, 1e-9, 1e-6, 1e-3, 0.01, 0.05, 0.075, 0.1, 0.2, 0.3, 0.4,
            0.6, 0.7, 0.8, 0.9, 0.925, 0.95, 0.99, 0.999, 1 - 1e-6};
        for (double p : all) {
            double x = Normal.inverseCdf(p);
            double roundTrip = STANDARD.cumulativeProbability(x);
            assertTrue(relativeError(roundTrip, p) < 1e-13 * Math.max(1.0, x * x), "round trip at " + p);
        }
        assertEquals(0.0, Normal.inverseCdf(0.5), 0.0);
    }

    @Test
    void inverseUpperTailIsAccurateBelowDoubleResolutionOfOneMinusP() {
        // the tail quantile must round-trip through Q where 1 - p is not representable
        for (double p : new double[] {1e-30, 1e-18, 1e-10, 0.01, 0.3, 0.5, 0.7, 0.99}) {
            double x = Normal.inverseUpperTail(p);
            assertTrue(relativeError(Normal.upperTail(x), p) < 1e-13 * Math.max(1.0, x * x), "Q^-1(" + p + ")");
        }
    }

    @Test
    void inverseCdfRejectsProbabilitiesOutsideTheUnitInterval() {
        assertThrows(IllegalArgumentException.class, () -> Normal.inverseCdf(-0.1));
        assertThrows(IllegalArgumentException.class, () -> Normal.inverseCdf(1.5));
        assertEquals(Double.NEGATIVE_INFINITY, Normal.inverseCdf(0.0));
        assertEquals(Double.POSITIVE_INFINITY, Normal.inverseCdf(1.0));
    }
}
