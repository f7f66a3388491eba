package org.trimwright.engine.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

class ExactDnlYieldTest {

    private static final double Z999 = 3.2905;

    private static FieldCoding field(int bits, int unaryBits) {
        return unaryBits == 0 ? FieldCoding.of(bits, CodingScheme.BINARY, 0)
                : FieldCoding.of(bits, CodingScheme.SEGMENTED, unaryBits);
    }

    @Test
    void nominalYieldAgreesWithAllCodesMonteCarlo() {
        // outside check: independent all-codes sampler, 99.9% confidence interval
        Object[][] cases = {
            {field(4, 0), 0.10, 0.5, 21L},
            {field(5, 2), 0.10, 0.5, 22L},
            {field(6, 3), 0.08, 0.4, 23L},
            {field(6, 0), 0.05, 0.3, 24L},
        };
        for (Object[] c : cases) {
            ElementSigmas sigmas = ElementSigmas.forField((FieldCoding) c[0], (Double) c[1]);
            double x = (Double) c[2];
            ExactDnlYield exact = ExactYields.dnlYieldNominal(sigmas, x);
            BruteForceArray.Counts mc = BruteForceArray.run(sigmas, x, 200_000, (Long) c[3]);
            double y = mc.nominalYield();
            assertTrue(y <= 1 - 1e-3, "failure must be frequent for this check");
            assertEquals(y, exact.yield(), BruteForceArray.halfWidth(y, mc.trials(), Z999) + exact.numericalError(),
                    c[0] + " s=" + c[1]);
            assertEquals("nominal", exact.definition());
        }
    }

    @Test
    void endpointYieldAgreesWithMonteCarloWithinItsStatedError() {
        // the endpoint figure is an approximation whose error estimate is part of numericalError
        Object[][] cases = {{field(4, 0), 0.10, 31L}, {field(6, 3), 0.08, 32L}, {field(8, 4), 0.04, 33L}};
        for (Object[] c : cases) {
            ElementSigmas sigmas = ElementSigmas.forField((FieldCoding) c[0], (Double) c[1]);
            ExactDnlYield approx = ExactYields.dnlYieldEndpoint(sigmas, 0.5);
            BruteForceArray.Counts mc = BruteForceArray.run(sigmas, 0.5, 100_000, (Long) c[2]);
            double y = mc.endpointYield();
            assertEquals(y, approx.yield(), BruteForceArray.halfWidth(y, mc.trials(), Z999) + approx.numericalError(),
                    c[0] + " s=" + c[1]);
            assertEquals("endpoint", approx.definition());
        }
    }

    @Test
    void unaryYieldIsTheProductOfIndependentElementProbabilities() {
        // closed form with Apache Commons Math: (P(|u| < x))^(2^n - 1), u ~ N(0, s^2)
        NormalDistribution unit = new NormalDistribution(0.0, 0.2);
        double perElement = unit.cumulativeProbability(0.5) - unit.cumulativeProbability(-0.5);
        double expected = Math.pow(perElement, 255);
        ExactDnlYield r = ExactYields.dnlYieldNominal(FieldCoding.of(8, CodingScheme.THERMOMETER, 0), 0.2, 0.5);
        assertEquals(expected, r.yield(), 1e-12);
    }

    @Test
    void zeroSigmaGivesYieldOne() {
        assertEquals(1.0, ExactYields.dnlYieldNominal(field(12, 5), 0.0, 0.1).yield(), 0.0);
        assertEquals(1.0, ExactYields.dnlYieldEndpoint(field(12, 5), 0.0, 0.1).yield(), 0.0);
    }

    @Test
    void sixteenBitNominalYieldMeetsTheStatedNumericalError() {
        for (int m = 0; m <= 16; m++) {
            ExactDnlYield r = ExactYields.dnlYieldNominal(field(16, m), 0.01, 0.5);
            assertTrue(r.numericalError() < 1e-10, "M=" + m + ": " + r.numericalError());
        }
    }

    @Test
    void yieldGrowsWithTheLimit() {
        double previous = 0.0;
        for (double x = 0.1; x < 2.0; x += 0.1) {
            double y = ExactYields.dnlYieldNominal(field(10, 4), 0.03, x).yield();
            assertTrue(y >= previous - 1e-12, "yield fell at x=" + x);
            previous = y;
        }
    }
}
